package ionmark.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same graph on Apache Flink's embedded mini-cluster ({@code --flinkMaster=[local]}), two task slots:
 * the records equal {@code batch}'s, as on the direct runner. This is the runner a cluster uses; only the
 * master address differs.
 */
class FlinkRunnerTest {
    @TempDir
    Path dir;

    @Test
    void embeddedFlinkWritesBatchsRecords() throws Exception {
        Path in = Fixtures.sdf(dir, 20);
        Path out = dir.resolve("out");
        var got = Fixtures.byKey(Fixtures.pipeline(out, "records", "--in=" + in, "--out=" + out, "--ph=7.4",
                "--timeoutMillis=" + Fixtures.TIMEOUT, "--runner=FlinkRunner", "--flinkMaster=[local]",
                "--parallelism=2"));
        var want = Fixtures.byKey(Fixtures.batch(in, "--ph", "7.4"));
        assertEquals(20, want.size());
        assertEquals(want, got);
    }
}
