package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;

import com.fasterxml.jackson.databind.ObjectMapper;

/** Input checks of the command line: limits, JSON always JSON, empty arguments, terminal-safe store text. */
class CliInputTest {
    final ByteArrayOutputStream out = new ByteArrayOutputStream();
    final ByteArrayOutputStream err = new ByteArrayOutputStream();

    int run(String... args) {
        return new Cli(CliTest.SPECIATION, CliTest.SPECIATION, CliTest.TABLES, CliTest.CALIBRATION, null, null,
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8))
                .run(List.of(args));
    }

    @Test
    void anAbsurdIonicStrengthIsRefused() {
        assertEquals(2, run("check", "CC(=O)O", "--ionic", "1e300"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("Davies"), err.toString(StandardCharsets.UTF_8));
        assertEquals(0, run("check", "CC(=O)O", "--ionic", "0.15"));
    }

    @Test
    void formatJsonAnswersInJsonEvenForAUsageProblem() throws Exception {
        assertEquals(2, run("check", "CC(=O)O", "--ph", "abc", "--format", "json"));
        var node = new ObjectMapper().readTree(out.toString(StandardCharsets.UTF_8));
        assertTrue(node.get("error").asText().contains("--ph"), node.toString());
        out.reset();
        assertEquals(1, run("check", "\u0000\u00ff not a molecule", "--format", "json"));
        assertTrue(new ObjectMapper().readTree(out.toString(StandardCharsets.UTF_8)).has("error"));
    }

    @Test
    void anEmptyArgumentIsAnArgument() {
        assertEquals(List.of("check", "", "--ph", "7"), CommandLineRunner.split("check\0\0--ph\0" + "7\0"));
        assertEquals(List.of("check"), CommandLineRunner.split("check\0"));
        assertEquals(1, run("check", "")); // an empty structure: an analysis error, not "check takes one structure"
    }

    @Test
    void storeTextCannotForgeALineOrEscapeTheTerminal() {
        String forged = "x\n2026-12-05T00:00:00Z  admin        publish   v99   ok        \u001b[2Kfine";
        String shown = Printable.of(forged);
        assertTrue(!shown.contains("\n") && !shown.contains("\u001b"), shown);
        assertTrue(shown.contains("\\u000a") && shown.contains("\\u001b"), shown);
        assertEquals("a\\\\u000a", Printable.of("a\\u000a")); // a written escape is not taken for a real one
    }
}
