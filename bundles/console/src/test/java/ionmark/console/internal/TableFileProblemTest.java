package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.acidity.api.AcidityTable;

/** A one-shot command started with a table file that does not validate refuses to run instead of using another table. */
class TableFileProblemTest {
    @TempDir
    Path dir;

    @Test
    void theShippedTableWrittenOutIsUsable() throws Exception {
        AcidityTable t = CliTest.TABLES.current();
        Path f = Files.writeString(dir.resolve("table.json"), CliTest.TABLES.toJson(t));
        assertNull(CommandLineRunner.tableFileProblem(CliTest.TABLES, f));
    }

    @Test
    void aClassPatternThatDoesNotCompileIsNamedWithItsPath() throws Exception {
        String json = CliTest.TABLES.toJson(CliTest.TABLES.current());
        String smarts = CliTest.TABLES.current().groups().get(0).smarts();
        String broken = json.replaceFirst(java.util.regex.Pattern.quote("\"" + smarts.replace("\\", "\\\\") + "\""),
                java.util.regex.Matcher.quoteReplacement("\"" + smarts.substring(0, smarts.length() - 1) + "\""));
        Path f = Files.writeString(dir.resolve("draft.json"), broken);
        String problem = CommandLineRunner.tableFileProblem(CliTest.TABLES, f);
        assertTrue(problem != null && problem.contains("does not validate, 1 error") && problem.contains("$.groups[0].smarts"),
                String.valueOf(problem));
    }

    @Test
    void aMissingFileIsAProblemToo() {
        String problem = CommandLineRunner.tableFileProblem(CliTest.TABLES, dir.resolve("nowhere.json"));
        assertTrue(problem != null && problem.startsWith("cannot read the table file"), String.valueOf(problem));
    }
}
