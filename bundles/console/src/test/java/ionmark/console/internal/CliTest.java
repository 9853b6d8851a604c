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

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.calibration.internal.CalibrationService;
import ionmark.speciation.internal.SpeciationService;

/** The command line, run in-process with the real services built by plain new. */
class CliTest {
    static final TableSnapshotService TABLES = new TableSnapshotService(null);
    static final SpeciationService SPECIATION = new SpeciationService(TABLES.current(), 300, 10_000);
    static final CalibrationService CALIBRATION = new CalibrationService(SPECIATION);
    final ByteArrayOutputStream out = new ByteArrayOutputStream();
    final ByteArrayOutputStream err = new ByteArrayOutputStream();

    @TempDir
    Path dir;

    int run(String... args) {
        return new Cli(SPECIATION, SPECIATION, TABLES, CALIBRATION, null, null,
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8))
                .run(List.of(args));
    }

    String out() {
        return out.toString(StandardCharsets.UTF_8);
    }

    @Test
    void tableValidateReportsRealErrorsWithPathsOnABrokenCopy() throws IOException {
        String json = TABLES.toJson(TABLES.current());
        Path broken = dir.resolve("broken.json");
        Files.writeString(broken, json.replaceFirst("\\[CX4:2\\]\\[CX3\\]\\(=O\\)\\[OX2H1:1\\]", "[CX4:2][CX3](=O)[OX2H1")
                .replaceFirst("\"pka\": 9.25", "\"pka\": 99.25"));
        assertEquals(1, run("table", "validate", broken.toString()));
        assertTrue(out().contains("$.groups["), out());
        assertTrue(out().contains("SMARTS does not compile"), out());
        assertTrue(out().contains("outside the physical range"), out());
    }

    @Test
    void accuracyWithZTopReportsChargeStatesAndKeepsTheOpenSubset() throws IOException {
        // D00005 is frozen by the split rule, D00001 open; acetic acid 4.76, ethylamine 10.65 (CRC, from memory)
        Path truth = dir.resolve("t.tsv");
        Files.writeString(truth, "id\tsmiles\tpka_values\tz_top\nD00001\tCC(=O)O\t4.76\t0\nD00005\tCCN\t10.65\t1\n");
        assertEquals(0, run("accuracy", "--truth", truth.toString(), "--out", dir.resolve("r").toString(), "--subset",
                "open"));
        assertTrue(out().contains("molecules=1 "), out());
        assertTrue(out().contains("charge states: compounds=1 failed=0"), out());
        assertTrue(Files.readString(dir.resolve("r/report.md")).contains("## Charge states"));
    }

    @Test
    void accuracyRefusesAnUnknownSubset() {
        assertEquals(2, run("accuracy", "--truth", "x.tsv", "--subset", "all"));
    }

    @Test
    void tableValidateAcceptsTheShippedTable() throws IOException {
        Path good = dir.resolve("good.json");
        Files.writeString(good, TABLES.toJson(TABLES.current()));
        assertEquals(0, run("table", "validate", good.toString()));
        assertTrue(out().contains("0 errors"), out());
    }

    @Test
    void checkPrintsTheContractFields() throws IOException {
        assertEquals(0, run("check", "CC(=O)O", "--ph", "4.76", "--format", "json"));
        JsonNode o = new ObjectMapper().readTree(out());
        for (String k : List.of("input", "sites", "macroPka", "tableVersion", "netCharge", "fractionNeutral", "species")) {
            assertTrue(o.has(k), k);
        }
        JsonNode site = o.get("sites").get(0);
        for (String k : List.of("atom", "group", "type", "pka", "sd", "derivation", "protonated")) {
            assertTrue(site.has(k), k);
        }
        // acetic acid, pKa 4.76 (CRC): half protonated at pH 4.76
        assertEquals(0.5, site.get("protonated").asDouble(), 0.01);
    }

    @Test
    void batchKeepsInputOrderAndReportsBadRecordsInLine() throws IOException {
        Path in = dir.resolve("in.smi");
        Files.writeString(in, "CC(=O)O\tm1\nC1CC(\tm2\nNCC(=O)O\tm3\n");
        Path outFile = dir.resolve("out.jsonl");
        assertEquals(0, run("batch", "--in", in.toString(), "--out", outFile.toString(), "--ph", "7.4"));
        List<String> lines = Files.readAllLines(outFile);
        assertEquals(3, lines.size());
        ObjectMapper m = new ObjectMapper();
        assertEquals("m1", m.readTree(lines.get(0)).get("id").asText());
        assertTrue(m.readTree(lines.get(1)).has("error"));
        assertEquals("m3", m.readTree(lines.get(2)).get("id").asText());
    }

    @Test
    void briefBatchKeepsSitesAndChargeAndLeavesOutSpecies() throws IOException {
        Path in = dir.resolve("in.smi");
        Files.writeString(in, "NCC(=O)O\tglycine\n");
        Path full = dir.resolve("full.jsonl");
        Path brief = dir.resolve("brief.jsonl");
        assertEquals(0, run("batch", "--in", in.toString(), "--out", full.toString(), "--ph", "6.0"));
        assertEquals(0, run("batch", "--in", in.toString(), "--out", brief.toString(), "--ph", "6.0", "--brief"));
        ObjectMapper m = new ObjectMapper();
        JsonNode f = m.readTree(Files.readAllLines(full).get(0));
        JsonNode b = m.readTree(Files.readAllLines(brief).get(0));
        assertTrue(b.get("brief").asBoolean());
        assertTrue(!b.has("species") && !b.has("logD") && f.has("species"), b.toString());
        for (String k : List.of("macroPka", "netCharge", "fractionNeutral", "chargeStates", "tableVersion")) {
            assertEquals(f.get(k), b.get(k), k);
        }
        // the same sites; the full object alone adds the couplings between sites (worth 0) to the derivations
        JsonNode fs = f.get("sites").deepCopy();
        for (JsonNode site : fs) {
            var kept = m.createArrayNode();
            site.get("derivation").forEach(t -> {
                if (!t.get("term").asText().startsWith("coupling")) {
                    kept.add(t);
                }
            });
            assertTrue(kept.size() < site.get("derivation").size(), "glycine's two sites are coupled: " + site);
            ((com.fasterxml.jackson.databind.node.ObjectNode) site).set("derivation", kept);
        }
        assertEquals(fs, b.get("sites"));
    }

    @Test
    void usageErrorsExitWithTwo() {
        assertEquals(2, run("frobnicate"));
        assertEquals(2, run("check", "CCO", "--ph", "99"));
        assertEquals(2, run("check", "CCO", "--colour", "red"));
        assertEquals(2, run("batch"));
        assertEquals(1, run("check", "C1CC("));
    }

    /** The notebook runtime has no calibration bundle: the commands that need it say so, the others still run. */
    @Test
    void withoutTheCalibrationBundleAccuracyAndCalibrateSayWhatIsMissing() {
        Cli lean = new Cli(SPECIATION, TABLES, null, null, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(1, lean.run(List.of("accuracy", "--truth", "x.tsv")));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("accuracy needs the calibration bundle"), err.toString());
        assertEquals(1, lean.run(List.of("table", "calibrate", "--truth", "x.tsv", "--out", "y.json")));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("table calibrate needs the calibration bundle"));
        assertEquals(0, lean.run(List.of("check", "CC(=O)O")));
    }

    @Test
    void scoringPairsOneToOneByLeastTotalError() {
        // the same pairing as the reviewers' script: 4.1 pairs with 4.0, 9.9 with 10.0, 6.0 stays unpaired
        List<int[]> pairs = ionmark.speciation.spi.MacroPairing.assign(List.of(4.0, 10.0), List.of(9.9, 6.0, 4.1));
        assertEquals(2, pairs.size());
        assertTrue(pairs.stream().anyMatch(p -> p[0] == 0 && p[1] == 2));
        assertTrue(pairs.stream().anyMatch(p -> p[0] == 1 && p[1] == 0));
    }
}
