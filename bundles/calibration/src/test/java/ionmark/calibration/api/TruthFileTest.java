package ionmark.calibration.api;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.IntStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TruthFileTest {

    /** Glycine 2.34 and 9.60, acetic acid 4.76 (CRC Handbook, 25 °C; from memory). */
    @Test
    void readsValuesInAscendingOrderAndSkipsTheHeaderBlankAndShortLines(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("truth.tsv");
        Files.writeString(f, "id\tsmiles\tpka_values\trecords\nG1\tNCC(=O)O\t9.60; 2.34\t2\n\nshort\tCC\n"
                + "A1\tCC(=O)O\t4.76\t1\n", StandardCharsets.UTF_8);
        List<Observation> got = TruthFile.read(f);
        assertEquals(List.of(new Observation("G1", "NCC(=O)O", List.of(2.34, 9.60)),
                new Observation("A1", "CC(=O)O", List.of(4.76))), got);
    }

    @Test
    void everyIdIsInExactlyOneFold() {
        for (String id : IntStream.range(0, 500).mapToObj(i -> String.format("D%05d", i)).toList()) {
            long folds = IntStream.range(0, 5).filter(k -> TruthFile.inFold(id, k, 5)).count();
            assertEquals(1, folds, id);
        }
        long inFirst = IntStream.range(0, 500).filter(i -> TruthFile.inFold(String.format("D%05d", i), 1, 5)).count();
        assertEquals(100, inFirst, 30, "fold 1 of 5 holds about a fifth");
    }
}
