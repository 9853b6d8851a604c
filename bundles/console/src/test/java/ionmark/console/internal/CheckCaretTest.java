package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;

/** {@code check} shows where an unreadable SMILES went wrong: the SMILES, and a caret under the character. */
class CheckCaretTest {
    final ByteArrayOutputStream out = new ByteArrayOutputStream();

    int check(String... args) {
        return new Cli(CliTest.SPECIATION, CliTest.TABLES, null, null, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8))
                .run(List.of(args));
    }

    @Test
    void theCaretStandsUnderTheCharacterOutsideTheGrammar() {
        assertEquals(1, check("check", "CC(=O)Ox"));
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.endsWith("\n  CC(=O)Ox\n         ^\n"), text); // under the x, the eighth character
    }

    @Test
    void aStructureThatCannotBeTreatedHasNoCaret() {
        assertEquals(1, check("check", "C[N](C)(C)(C)(C)C"));
        assertFalse(out.toString(StandardCharsets.UTF_8).contains("^"), out.toString(StandardCharsets.UTF_8));
    }
}
