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

import com.fasterxml.jackson.databind.JsonNode;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.notebook.internal.Annotator;
import ionmark.speciation.internal.SpeciationService;

/** {@code ionmark annotate}: the notebook's reading of an entry, as JSON for scripts and archives. */
class AnnotateCommandTest {
    static final Annotator NOTEBOOK = new Annotator(new SpeciationService(TableSnapshotService.shipped(), 300, 10_000));

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    Run run(String entry, String... flags) throws Exception {
        Path f = dir.resolve("workup-7.md");
        Files.writeString(f, entry);
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        List<String> args = new java.util.ArrayList<>(List.of(f.toString()));
        args.addAll(List.of(flags));
        int code = new AnnotateCommand(NOTEBOOK, new PrintStream(o, true, StandardCharsets.UTF_8),
                new PrintStream(e, true, StandardCharsets.UTF_8)).run(args);
        return new Run(code, o.toString(StandardCharsets.UTF_8), e.toString(StandardCharsets.UTF_8));
    }

    @Test
    void printsTheEntryAsJsonWithTheWordsEachConditionCameFrom() throws Exception {
        Run r = run("# Work-up\n\nThe organic layer was washed with sat. NaHCO3 (EtOAc/water 1:1).\n\n```smiles\n"
                + "OC(=O)c1ccccc1\n```\n");
        assertEquals(0, r.code(), r.err());
        JsonNode j = AnalysisJson.JSON.readTree(r.out());
        assertEquals("workup-7", j.get("entry").asText());
        assertTrue(j.get("tableVersion").asText().startsWith("v"));
        JsonNode s = j.get("structures").get(0);
        assertEquals("OC(=O)c1ccccc1", s.get("words").asText());
        assertEquals("smiles", s.get("source").asText());
        assertTrue(s.get("conditions").get("implied").asBoolean());
        assertEquals("sat. NaHCO3", s.get("conditions").get("pHWords").asText());
        assertEquals(8.3, s.get("conditions").get("pH").asDouble(), 0.1);
        assertEquals(25.0, s.get("conditions").get("temperatureC").asDouble(), 1e-9);
        // benzoic acid (pKa 4.20, CRC) at pH 8.3 is charged: nearly all of it in the aqueous layer
        assertTrue(s.get("phases").get(0).get("fractionOrganic").asDouble() < 0.01, s.get("phases").toString());
        assertTrue(s.get("analysis").has("sites"), s.get("analysis").toString());
        assertTrue(j.get("warnings").isArray());
    }

    @Test
    void aBadBlockIsAnErrorOnThatStructureAndTheExitCodeSaysSo() throws Exception {
        Run r = run("at pH 7\n\n```smiles ph=20\nCCN\n```\n\n```smiles\nCC(=O)O\n```\n");
        assertEquals(1, r.code());
        JsonNode s = AnalysisJson.JSON.readTree(r.out()).get("structures");
        assertTrue(s.get(0).get("error").asText().contains("outside pH"));
        assertTrue(s.get(1).get("analysis").get("macroPka").size() > 0);
    }

    @Test
    void textFormatForReading() throws Exception {
        Run r = run("at pH 7\n\n```smiles\nCC(=O)O\n```\n", "--format", "text");
        assertTrue(r.out().contains("pH 7.00 from 'pH 7'"), r.out());
        assertTrue(r.out().contains("Estimates for planning"), r.out());
    }

    @Test
    void anUnreadableStructureShowsWhereTheReaderStopped() throws Exception {
        String entry = "at pH 7\n\n```smiles\nCC(=O)Ox\n```\n";
        Run text = run(entry, "--format", "text");
        assertEquals(1, text.code(), text.out());
        assertTrue(text.out().contains("\n  CC(=O)Ox\n         ^\n"), text.out()); // under the x, the eighth character
        Run json = run(entry);
        JsonNode at = AnalysisJson.JSON.readTree(json.out()).get("structures").get(0).get("analysis").get("errorPosition");
        assertEquals("character", at.get("unit").asText(), json.out());
        assertEquals(7, at.get("index").asInt());
    }

    @Test
    void withoutTheNotebookItSaysSo() {
        AnnotateCommand c = new AnnotateCommand(null, System.out, new PrintStream(new ByteArrayOutputStream()));
        assertEquals(1, c.run(List.of("x.md")));
    }
}
