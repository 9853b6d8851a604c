package ionmark.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * {@code impact --parquet}: one row per structure and pH compared, changed or not, read back by DuckDB (an
 * independent reader). The same change as {@link ImpactJobTest} (the phosphinic-acid class moved up by
 * 2): methyl(octyl)phosphinic acid at pH 5 turns from anion to neutral and its row says so with the changed lines; acetic acid
 * keeps its measured 4.76 (CRC, from memory) and its row is there but not reported; every reported row equals
 * its JSON line; the pinned entry's row carries its version.
 */
class ImpactParquetTest {
    @TempDir
    Path dir;

    @Test
    void everyComparedStructureAndPhIsOneRowWithBothSidesAndTheChange() throws Exception {
        Path changed = ImpactJobTest.changedTable(dir, "CCCCCCCCP(C)(=O)O", 2.0);
        Files.writeString(dir.resolve("set.smi"), "CCCCCCCCP(C)(=O)O methyloctylphosphinic-acid\nCC(=O)O acetic-acid\nCCO ethanol\n"
                + "c1ccncc1 pyridine\nC1CC( broken\n");
        Path entries = Files.createDirectories(dir.resolve("entries"));
        Files.writeString(entries.resolve("pinned.md"), "# Old work-up\nTable version: v2\n\nAt pH 5 the acid "
                + "stays in water.\n\n```smiles\nCCCCCCCCP(C)(=O)O\n```\n");
        Path out = dir.resolve("out");
        List<String> lines = Fixtures.pipeline(out, "impact", "impact", "--in=" + dir.resolve("set.smi") + ","
                + entries, "--out=" + out, "--ph=5,9", "--before=shipped", "--after=" + changed, "--parquet");
        lines = new ArrayList<>(lines);
        lines.addAll(Fixtures.lines(out, "impact-pinned"));
        Map<String, JsonNode> reported = new TreeMap<>();
        for (String l : lines) {
            JsonNode n = Fixtures.JSON.readTree(l);
            reported.put(n.path("id").asText() + " @ " + n.path("pH").asText(), n);
        }
        Map<String, Row> rows = rows(out);
        // five structures at two pH values, and the pinned entry's one structure at its stated pH 5
        assertEquals(11, rows.size(), rows.keySet().toString());
        Row probe = rows.get("methyloctylphosphinic-acid @ 5.0");
        assertTrue(probe.reported, probe.toString());
        assertEquals(-1, probe.beforeCharge);
        assertEquals(0, probe.afterCharge);
        assertTrue(probe.delta > 0.3, probe.toString());
        assertTrue(probe.changed.contains("charge state"), probe.toString());
        assertTrue(probe.lines.stream().anyMatch(x -> x.startsWith("+ pKa ")), probe.toString());
        Row acetic = rows.get("acetic-acid @ 5.0");
        assertFalse(acetic.reported, acetic.toString());
        assertTrue(acetic.changed.isEmpty());
        assertTrue(Math.abs(acetic.delta) <= 0.05, acetic.toString());
        assertEquals(acetic.beforeCharge, acetic.afterCharge);
        Row broken = rows.get("broken @ 9.0");
        assertFalse(broken.reported);
        assertTrue(broken.beforeError != null && !broken.beforeError.isEmpty(), broken.toString());
        assertEquals(2, rows.get("pinned#1 @ 5.0").pinned);
        // a row is reported exactly when the JSON Lines carry it, with the same values
        for (Row r : rows.values()) {
            JsonNode j = reported.get(r.key);
            assertEquals(j != null, r.reported, r.key);
            if (j != null) {
                assertEquals(j.path("deltaFractionNeutral").asDouble(), r.delta, 0.0, r.key);
                assertEquals(j.path("before").path("fractionNeutral").asDouble(), r.beforeFraction, 0.0, r.key);
                assertEquals(j.path("after").path("fractionNeutral").asDouble(), r.afterFraction, 0.0, r.key);
                List<String> why = new ArrayList<>();
                j.path("changed").forEach(v -> why.add(v.asText()));
                assertEquals(why, r.changed, r.key);
            }
        }
        assertEquals(reported.size(), rows.values().stream().filter(r -> r.reported).count());
    }

    private record Row(String key, boolean reported, List<String> changed, Integer beforeCharge, Integer afterCharge,
            double beforeFraction, double afterFraction, double delta, String beforeError, int pinned,
            List<String> lines) {
    }

    private static Map<String, Row> rows(Path out) throws Exception {
        Map<String, Row> rows = new TreeMap<>();
        try (Connection c = DriverManager.getConnection("jdbc:duckdb:"); Statement st = c.createStatement();
                ResultSet rs = st.executeQuery("SELECT id, \"pH\", reported, changed, before.dominantCharge, "
                        + "after.dominantCharge, before.fractionNeutral, after.fractionNeutral, deltaFractionNeutral, "
                        + "before.error, pinnedTableVersion, flatten(list_transform(derivationChanges, "
                        + "lambda d: d.lines)) FROM read_parquet('" + out + "/impact-*.parquet')")) {
            while (rs.next()) {
                String key = rs.getString(1) + " @ " + rs.getDouble(2);
                Row r = new Row(key, rs.getBoolean(3), strings(rs.getArray(4)), (Integer) rs.getObject(5),
                        (Integer) rs.getObject(6), rs.getDouble(7), rs.getDouble(8), rs.getDouble(9), rs.getString(10),
                        rs.getInt(11), strings(rs.getArray(12)));
                assertTrue(rows.put(key, r) == null, "two rows for " + key);
            }
        }
        return rows;
    }

    private static List<String> strings(java.sql.Array a) throws Exception {
        List<String> out = new ArrayList<>();
        if (a != null) {
            for (Object o : (Object[]) a.getArray()) {
                out.add(String.valueOf(o));
            }
        }
        return out;
    }
}
