package ionmark.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Array;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * {@code --parquet}: the Parquet files, read back by DuckDB (an independent reader: not parquet-java, which
 * wrote them), hold one row per JSON record with the same id, pH, fractions, macroscopic pKa values, sites and
 * error.
 */
class ParquetOutputTest {
    @TempDir
    Path dir;

    @Test
    void duckDbReadsOneRowPerRecordWithTheRecordsValues() throws Exception {
        StringBuilder smi = new StringBuilder();
        int k = 0;
        for (Map.Entry<String, String> e : Fixtures.referenceSet().entrySet()) {
            if (k++ == 40) {
                break;
            }
            smi.append(e.getValue()).append(' ').append(e.getKey()).append('\n');
        }
        smi.append("C1CC( not-a-smiles\n");
        Path in = Files.writeString(dir.resolve("set.smi"), smi.toString());
        Path out = dir.resolve("out");
        Map<String, JsonNode> records = Fixtures.byKey(Fixtures.pipeline(out, "records", "--in=" + in, "--out=" + out,
                "--ph=7.4", "--parquet", "--timeoutMillis=" + Fixtures.TIMEOUT, "--targetParallelism=2"));
        assertEquals(41, records.size());
        int rows = 0;
        try (Connection c = DriverManager.getConnection("jdbc:duckdb:"); Statement st = c.createStatement();
                ResultSet rs = st.executeQuery("SELECT id, \"pH\", fractionNeutral, macroPka, len(sites), "
                        + "list_transform(sites, lambda s: s.\"group\"), error, temperatureC FROM read_parquet('" + out
                        + "/records-*.parquet')")) {
            while (rs.next()) {
                rows++;
                String id = rs.getString(1);
                double ph = rs.getDouble(2);
                String key = id + " @ " + (rs.wasNull() ? "none" : Double.toString(ph));
                JsonNode r = records.get(key);
                assertTrue(r != null, "a row without a record: " + key);
                assertEquals(r.path("error").asText(null), rs.getString(7), key);
                if (r.has("error")) {
                    continue;
                }
                assertEquals(r.path("fractionNeutral").asDouble(), rs.getDouble(3), 0.0, key);
                assertEquals(numbers(r.path("macroPka")), numbers((Object[]) rs.getArray(4).getArray()), key);
                assertEquals(r.path("sites").size(), rs.getInt(5), key);
                List<String> groups = new ArrayList<>();
                r.path("sites").forEach(s -> groups.add(s.path("group").asText()));
                Array g = rs.getArray(6);
                assertEquals(groups, List.of((Object[]) g.getArray()), key);
                assertEquals(25.0, rs.getDouble(8), key);
            }
        }
        assertEquals(records.size(), rows);
        assertFalse(records.get("not-a-smiles @ none").path("error").asText().isEmpty());
    }

    private static List<Double> numbers(JsonNode arr) {
        List<Double> out = new ArrayList<>();
        arr.forEach(v -> out.add(v.asDouble()));
        return out;
    }

    private static List<Double> numbers(Object[] arr) {
        List<Double> out = new ArrayList<>();
        for (Object o : arr) {
            out.add(((Number) o).doubleValue());
        }
        return out;
    }
}
