package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The frameworkless check: which table it uses, and when it hands over to the framework path. */
class LeanCheckTest {
    @TempDir
    Path dir;

    private String[] run(Path workspace) throws Exception {
        Path args = dir.resolve("args");
        Files.writeString(args, "check\0CC(=O)O\0--ph\0" + "7\0", StandardCharsets.UTF_8);
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Dionmark.workspace=" + workspace, "-cp", System.getProperty("java.class.path"),
                LeanCheck.class.getName(), args.toString()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS));
        return new String[] {String.valueOf(p.exitValue()), out};
    }

    @Test
    void usesTheHeadFileRefusesATamperedOneAndHandsOverWithoutOne() throws Exception {
        Path ws = Files.createDirectories(dir.resolve("ws"));
        String[] none = run(ws);
        assertEquals("0", none[0], none[1]);
        assertTrue(none[1].contains("there is no table store") && none[1].contains("CC(=O)O"), none[1]);

        Path ionmark = Files.createDirectories(ws.resolve(".ionmark"));
        Files.writeString(ionmark.resolve("table-store.mv.db"), "");
        assertEquals(String.valueOf(LeanCheck.NEEDS_FRAMEWORK), run(ws)[0], "a store without a head file");

        String head = CliTest.TABLES.toJson(CliTest.TABLES.current());
        Files.writeString(ionmark.resolve("head.json"), head);
        String[] ok = run(ws);
        assertEquals("0", ok[0], ok[1]);
        assertTrue(!ok[1].contains("there is no table store"), ok[1]);

        assertEquals(List.of(VerifiedTables.sha256(head)), Files.readAllLines(ionmark.resolve(VerifiedTables.MARKS)),
                "a head that validated is remembered by its SHA-256");
        String[] again = run(ws);
        assertEquals(ok[1], again[1], "the remembered head gives the same answer");

        String tampered = head.replaceFirst("\"pka\": ([0-9.]+)", "\"pka\": 9.99");
        Files.writeString(ionmark.resolve("head.json"), tampered);
        String[] bad = run(ws);
        assertEquals("1", bad[0], bad[1]);
        assertTrue(bad[1].contains("does not match its hash"), bad[1]);
        // even a forged "validated before" mark does not let a text past its content hash
        Files.write(ionmark.resolve(VerifiedTables.MARKS), List.of(VerifiedTables.sha256(tampered)));
        String[] forged = run(ws);
        assertEquals("1", forged[0], forged[1]);
        assertTrue(forged[1].contains("does not match its hash"), forged[1]);
    }
}
