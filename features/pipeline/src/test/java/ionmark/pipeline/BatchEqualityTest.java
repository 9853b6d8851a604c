package ionmark.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * The pipeline's records equal {@code batch}'s, record for record (values, sites, errors), on the shipped
 * reference set, as TSV and as SDF written by CDK. Only the order of the records may differ.
 */
class BatchEqualityTest {
    @TempDir
    Path dir;

    @Test
    void referenceSetTsvAtPh74EqualsBatch() throws Exception {
        Path in = Fixtures.tsv(dir);
        List<String> batch = Fixtures.batch(in, "--ph", "7.4");
        // the shipped table under a file name of its own: an engine key no other test has built
        Path table = dir.resolve("table.json");
        var tables = new ionmark.acidity.internal.TableSnapshotService(null);
        java.nio.file.Files.writeString(table, tables.toJson(ionmark.acidity.internal.TableSnapshotService.shipped()));
        int before = Engines.builds();
        same(batch, in, "--ph=7.4", "--table=" + table);
        assertEquals(1, Engines.builds() - before, "one engine for the run, not one per element or thread");
    }

    @Test
    void referenceSetSdfWithoutPhEqualsBatch() throws Exception {
        Path in = Fixtures.sdf(dir, 30);
        same(Fixtures.batch(in), in);
    }

    @Test
    void briefRecordsEqualBatchBrief() throws Exception {
        Path in = Fixtures.sdf(dir, 60);
        same(Fixtures.batch(in, "--ph", "2", "--brief"), in, "--ph=2", "--brief");
    }

    @Test
    void severalPhValuesGiveOneBatchRecordEach() throws Exception {
        Path in = Fixtures.sdf(dir, 20);
        Path out = dir.resolve("out");
        Map<String, JsonNode> got = Fixtures.byKey(Fixtures.pipeline(out, "records", "--in=" + in, "--out=" + out,
                "--ph=2,7.4", "--timeoutMillis=" + Fixtures.TIMEOUT));
        Map<String, JsonNode> want = new java.util.TreeMap<>();
        want.putAll(Fixtures.byKey(Fixtures.batch(in, "--ph", "2")));
        want.putAll(Fixtures.byKey(Fixtures.batch(in, "--ph", "7.4")));
        assertEquals(40, want.size());
        assertEquals(want, got);
    }

    private void same(List<String> batch, Path in, String... options) throws Exception {
        Path out = dir.resolve("out");
        String[] args = new String[options.length + 4];
        args[0] = "--in=" + in;
        args[1] = "--out=" + out;
        args[2] = "--timeoutMillis=" + Fixtures.TIMEOUT;
        args[3] = "--targetParallelism=2";
        System.arraycopy(options, 0, args, 4, options.length);
        List<String> lines = Fixtures.pipeline(out, "records", args);
        assertEquals(batch.size(), lines.size(), "one record per structure, as batch writes");
        Map<String, JsonNode> want = Fixtures.byKey(batch);
        Map<String, JsonNode> got = Fixtures.byKey(lines);
        for (Map.Entry<String, JsonNode> e : want.entrySet()) {
            assertEquals(e.getValue(), got.get(e.getKey()), e.getKey());
        }
        assertTrue(want.values().stream().anyMatch(n -> n.has("error")) == lines.stream().anyMatch(l -> l.contains(
                "\"error\"")), "error records are written, not dropped");
    }
}
