package ionmark.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Conditions;

/**
 * The impact job against a table whose phosphinic-acid class moves two units up: methyl(octyl)phosphinic acid
 * (a class with no measured compound in the table, so no measured analog pulls the move back; dimethylphosphinic
 * acid 3.08, Perrin 1981, from memory) at pH 5 goes from mostly anion to mostly neutral and is reported with the
 * changed derivation lines; acetic acid keeps its measured 4.76 (CRC, from memory), and ethanol and pyridine have
 * no such site; a pinned entry is reported apart. (A class with measured compounds is a poor probe: its measured
 * analogs correct most of a class move back, as they should.)
 */
class ImpactJobTest {
    @TempDir
    Path dir;

    @Test
    void aMovedClassValueReportsTheStructuresItFlipsWithTheChangedLines() throws Exception {
        Path changed = changedTable(dir, "CCCCCCCCP(C)(=O)O", 2.0);
        Files.writeString(dir.resolve("set.smi"), "CCCCCCCCP(C)(=O)O methyloctylphosphinic-acid\nCC(=O)O acetic-acid\nCCO ethanol\nc1ccncc1 pyridine\n");
        Path entries = Files.createDirectories(dir.resolve("entries"));
        Files.writeString(entries.resolve("pinned.md"), "# Old work-up\nTable version: v2\n\nAt pH 5 the acid "
                + "stays in water.\n\n```smiles\nCCCCCCCCP(C)(=O)O\n```\n");
        Files.writeString(entries.resolve("open.md"), "# Buffer\n\nSet to pH 5.\n\n```smiles\nOP(C)(=O)CCCCCCCC\n```\n");
        Path out = dir.resolve("out");
        List<String> lines = Fixtures.pipeline(out, "impact", "impact", "--in=" + dir.resolve("set.smi") + ","
                + entries, "--out=" + out, "--ph=5", "--before=shipped", "--after=" + changed);
        Map<String, JsonNode> got = byId(lines);
        assertEquals(java.util.Set.of("methyloctylphosphinic-acid", "open#1"), got.keySet());
        JsonNode probe = got.get("methyloctylphosphinic-acid");
        assertEquals(-1, probe.path("before").path("dominantCharge").asInt());
        assertEquals(0, probe.path("after").path("dominantCharge").asInt());
        assertTrue(probe.path("deltaFractionNeutral").asDouble() > 0.3, probe.toString());
        double before = probe.path("before").path("macroPka").get(0).asDouble();
        double after = probe.path("after").path("macroPka").get(0).asDouble();
        assertTrue(after > before + 0.5, probe.toString());
        assertTrue(probe.path("derivationChanges").toString().contains("+ pKa "), probe.toString());
        Map<String, JsonNode> pinned = byId(Fixtures.pipeline(out, "impact-pinned", "impact", "--in=" + entries,
                "--out=" + out, "--before=shipped", "--after=" + changed));
        assertEquals(java.util.Set.of("pinned#1"), pinned.keySet());
        assertEquals(2, pinned.get("pinned#1").path("pinnedTableVersion").asInt());
    }

    @Test
    void theSameTableOnBothSidesChangesNothing() throws Exception {
        Files.writeString(dir.resolve("set.smi"), "CC(=O)O acetic-acid\nNCCC(=O)O beta-alanine\n");
        Path out = dir.resolve("out");
        assertEquals(List.of(), Fixtures.pipeline(out, "impact", "impact", "--in=" + dir.resolve("set.smi"),
                "--out=" + out, "--ph=2,5,7.4,10", "--before=shipped", "--after=shipped"));
    }

    /** The shipped table with the class that takes {@code smiles}'s first site moved by {@code shift}. */
    static Path changedTable(Path dir, String smiles, double shift) throws Exception {
        String group = Engines.get(EngineSpec.of("shipped", 300, 60_000)).analyse(smiles, Conditions.atPh(5)).sites()
                .get(0).group();
        String json = new TableSnapshotService(null).toJson(TableSnapshotService.shipped());
        JsonNode root = Fixtures.JSON.readTree(json);
        for (JsonNode g : root.path("groups")) {
            if (g.path("id").asText().equals(group)) {
                ((ObjectNode) g).put("pka", g.path("pka").asDouble() + shift);
            }
        }
        ((ObjectNode) root.path("version")).put("hash", "");
        return Files.writeString(dir.resolve("changed.json"), Fixtures.JSON.writeValueAsString(root));
    }

    private static Map<String, JsonNode> byId(List<String> lines) throws Exception {
        Map<String, JsonNode> out = new java.util.TreeMap<>();
        for (String l : lines) {
            JsonNode n = Fixtures.JSON.readTree(l);
            out.put(n.path("id").asText(), n);
        }
        return out;
    }
}
