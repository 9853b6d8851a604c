package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.speciation.internal.MeasuredImportService;

/** {@code table add-measured}: per-row problems with row numbers, a draft that validates. */
class AddMeasuredTest {
    final ByteArrayOutputStream out = new ByteArrayOutputStream();

    @TempDir
    Path dir;

    int run(String... args) {
        return new Cli(CliTest.SPECIATION, CliTest.SPECIATION, CliTest.TABLES, CliTest.CALIBRATION, null,
                new MeasuredImportService(),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(new ByteArrayOutputStream(), true,
                        StandardCharsets.UTF_8)).run(List.of(args));
    }

    @Test
    void rowsWithProblemsAreNamedByRowNumberAndTheOthersGoIntoTheDraft() throws IOException {
        // 2,6-dimethylpyridine 6.72 and 2,4-dimethylpyridine 6.99 (CRC Handbook, 25 °C, from memory)
        Path tsv = dir.resolve("lab.tsv");
        Files.writeString(tsv, String.join("\n", "id\tsmiles\tpka_values\ttemperature\tionic_strength\tmethod\tsource\tname",
                "lut26\tCc1cccc(C)n1\t6.72\t25\t0\tpotentiometry\tcrc\t2,6-dimethylpyridine",
                "lut24\tCc1ccnc(C)c1\tsix\t25\t0\tpotentiometry\tcrc\t2,4-dimethylpyridine", ""));
        Path draft = dir.resolve("draft.json");
        assertEquals(1, run("table", "add-measured", tsv.toString(), "--out", draft.toString()));
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("row 3: error: pKa value 'six' is not a number"), text);
        assertTrue(text.contains("row 2 (lut26)"), text);
        assertTrue(text.contains("1 of 2 rows ready"), text);
        assertTrue(CliTest.TABLES.validate(Files.readString(draft)).ok());
        assertTrue(Files.readString(draft).contains("2,6-dimethylpyridine"));
    }
}
