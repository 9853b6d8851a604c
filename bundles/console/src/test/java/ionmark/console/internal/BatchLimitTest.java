package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code batch} reads its input whole, so its size is capped with a message that says what to do instead. */
class BatchLimitTest {
    @TempDir
    Path dir;

    final ByteArrayOutputStream out = new ByteArrayOutputStream();
    final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int batch(Path in, long maxBytes, int maxRecords) {
        return new BatchCommand(CliTest.SPECIATION, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), maxBytes, maxRecords)
                .run(List.of("--in", in.toString(), "--ph", "7"));
    }

    @Test
    void tooManyStructuresAreRefusedBeforeAnyIsAnalysed() throws Exception {
        Path in = Files.writeString(dir.resolve("in.smi"), "CCO ethanol\nCC(=O)O acetic\nc1ccccc1O phenol\n");
        assertEquals(1, batch(in, 1 << 20, 2));
        assertEquals("", out.toString(StandardCharsets.UTF_8));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("too many structures for batch (3; at most 2)"), err.toString());
    }

    @Test
    void aTooLargeFileIsRefusedBeforeItIsRead() throws Exception {
        Path in = Files.writeString(dir.resolve("in.smi"), "CCO ethanol\n".repeat(100));
        assertEquals(1, batch(in, 1000, 100_000));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("is too large for batch (1200 bytes; at most 1000)"),
                err.toString());
    }

    @Test
    void underTheCapsEveryRecordIsAnsweredInInputOrder() throws Exception {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < 150; i++) { // more records than the look-ahead of two cores' work
            b.append(i % 2 == 0 ? "CC(=O)O" : "CCN").append(" r").append(i).append('\n');
        }
        Path in = Files.writeString(dir.resolve("in.smi"), b.toString());
        assertEquals(0, batch(in, 1 << 20, 150));
        List<String> lines = out.toString(StandardCharsets.UTF_8).lines().toList();
        assertEquals(150, lines.size());
        for (int i = 0; i < 150; i++) {
            assertTrue(lines.get(i).contains("\"r" + i + "\""), lines.get(i));
        }
    }
}
