package ionmark.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;

import ionmark.console.internal.AnalysisJson;
import ionmark.host.api.MarkdownEntries;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.notebook.api.AnnotatedStructure;
import ionmark.notebook.api.EntryAnnotation;
import ionmark.notebook.api.EntryAnnotations;
import ionmark.speciation.api.Analysis;

/**
 * The demo entries (invented scenario, shipped with the reference host) through the pipeline and through the
 * notebook's reader: one answer per structure and condition. Stated temperatures, ionic strengths, pH ranges,
 * SMILES in the text, reaction components and reagent solutions are read by the notebook, not by a reader of
 * the pipeline's own.
 */
class EntryEqualityTest {
    static final Path DEMO = Path.of("../../bundles/host/src/main/resources/ionmark/host/internal/demo");

    @TempDir
    static Path dir;
    static Map<String, JsonNode> got;

    @BeforeAll
    static void run() throws Exception {
        assertTrue(Files.isDirectory(DEMO), DEMO.toAbsolutePath() + " holds the demo entries");
        Path out = dir.resolve("out");
        got = Fixtures.byKey(Fixtures.pipeline(out, "records", "--in=" + DEMO, "--out=" + out,
                "--timeoutMillis=" + Fixtures.TIMEOUT, "--targetParallelism=2"));
    }

    @Test
    void everyStructureAndConditionIsTheNotebooksAnswer() throws Exception {
        EntryAnnotation notebook = EntryAnnotations.of(Engines.get(EngineSpec.of("shipped", EngineSpec.MAX_HEAVY_ATOMS,
                Fixtures.TIMEOUT)));
        Map<String, JsonNode> want = new TreeMap<>();
        try (var files = Files.list(DEMO)) {
            for (Path p : files.filter(f -> f.toString().endsWith(".md")).sorted().toList()) {
                String name = p.getFileName().toString().replaceFirst("\\.md$", "");
                AnnotatedEntry a = notebook.annotate(MarkdownEntries.parse(name, Files.readString(p)));
                int n = 0;
                for (AnnotatedStructure s : a.structures()) {
                    String id = name + "#" + ++n;
                    assertTrue(s.ok(), id + ": " + s.error());
                    for (Analysis x : s.analyses()) {
                        JsonNode j = Fixtures.JSON.readTree(AnalysisJson.of(id, x).toString());
                        want.put(id + " @ " + j.path("conditions").path("pH").asText("none"), j);
                    }
                    JsonNode c = got.get(id + " @ " + (s.conditions().ph() == null ? "none"
                            : s.conditions().ph())).path("conditions");
                    assertEquals(s.conditions().temperatureC(), c.path("temperatureC").asDouble(), id);
                    assertEquals(s.conditions().ionicStrengthM(), c.path("ionicStrengthM").asDouble(), id);
                }
            }
        }
        assertEquals(want.keySet(), got.keySet());
        want.forEach((k, v) -> assertEquals(v, got.get(k), k));
    }

    // Check values read from the entries' text.
    @Test
    void aBufferEntrysTemperatureAndIonicStrengthApply() {
        JsonNode c = got.get("04-buffer-preparation#1 @ 6.8").path("conditions");
        assertEquals(37.0, c.path("temperatureC").asDouble());
        assertEquals(0.1, c.path("ionicStrengthM").asDouble());
    }

    @Test
    void aStatedRangeGivesARecordAtEachEnd() {
        assertTrue(got.containsKey("06-stability-ph12#2 @ 5.0"), got.keySet().toString());
        assertTrue(got.containsKey("06-stability-ph12#2 @ 6.0"), got.keySet().toString());
    }

    @Test
    void aSmilesWrittenInTheTextIsAStructure() {
        JsonNode r = got.get("02-salt-screen#5 @ 4.0");
        assertEquals("OC(=O)c1ccc(cc1)N1CCN(C)CC1", r.path("input").asText());
    }

    // PBS 7.4 is its formulation's stated pH (common practice), as in the notebook's reading tests.
    @Test
    void aReagentSolutionImpliesItsPh() {
        assertTrue(got.keySet().stream().anyMatch(k -> k.startsWith("07-coupling-workup#") && k.endsWith("@ 7.4")),
                got.keySet().toString());
    }
}
