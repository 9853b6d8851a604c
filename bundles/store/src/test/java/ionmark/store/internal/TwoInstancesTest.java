package ionmark.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.store.api.VersionInfo;

/**
 * Two notebook instances on one database (PostgreSQL where given, else one H2 file): a publish
 * through one is in use in the other within 5 s.
 */
class TwoInstancesTest {
    @TempDir
    Path dir;

    @Test
    @SuppressWarnings("try") // the followers are held open for the body; they work in the background
    void aPublishOnOneInstanceReachesTheOtherWithinFiveSeconds() throws Exception {
        for (JdbcTableStore base : Backends.fresh(dir)) {
            base.publish(Backends.smallTable(), 0, "seed", "seed");
            String url = base.connectUrl();
            TableSnapshotService tablesA = new TableSnapshotService(null);
            TableSnapshotService tablesB = new TableSnapshotService(null);
            try (HeadFollower a = new HeadFollower(base, tablesA, 1);
                    HeadFollower b = new HeadFollower(new JdbcTableStore(tablesB, url, base.user(), base.password()),
                            tablesB, 1)) {
                assertEquals(1, tablesB.current().version().number());
                VersionInfo v = base.publish(StoreTest.table("4.91"), 1, "instance-a", "published on A");
                long start = System.currentTimeMillis();
                while (tablesB.current().version().number() != v.number() && System.currentTimeMillis() - start < 5000) {
                    Thread.sleep(50);
                }
                assertEquals(v.number(), tablesB.current().version().number(), "instance B did not follow within 5 s");
                assertEquals(4.91, tablesB.current().group("acid").orElseThrow().pka(), 1e-9);
            }
        }
    }
}
