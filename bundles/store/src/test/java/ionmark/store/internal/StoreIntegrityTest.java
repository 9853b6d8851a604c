package ionmark.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.store.api.VersionInfo;

/** Content checked against its hash when read and when installed; one version number everywhere. */
class StoreIntegrityTest {
    @TempDir
    Path dir;

    private static void rewrite(JdbcTableStore s, int number, String content, String hash) throws Exception {
        try (Connection c = s.connect(); PreparedStatement p = c.prepareStatement(hash == null
                ? "update ionmark_version set content = ? where number = ?"
                : "update ionmark_version set content = ?, hash = ? where number = ?")) {
            p.setString(1, content);
            if (hash == null) {
                p.setInt(2, number);
            } else {
                p.setString(2, hash);
                p.setInt(3, number);
            }
            p.executeUpdate();
        }
    }

    @Test
    @SuppressWarnings("try") // the follower is opened only for its first poll, which installs (or refuses) the head
    void aVersionRewrittenOutsideTheStoreIsRefusedWhenReadAndNotInstalled() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            s.publish(StoreTest.table("4.76"), 0, "a", "first");
            VersionInfo v2 = s.publish(StoreTest.table("4.80"), 1, "a", "second");
            String good = s.content(2).orElseThrow();
            // the acid class moved by five units, hash column left as it was (the attack the issue describes)
            rewrite(s, 2, good.replace("\"pka\": 4.8,", "\"pka\": 9.8,"), null);
            StoreIntegrityException e = assertThrows(StoreIntegrityException.class, () -> s.content(2));
            assertTrue(e.getMessage().contains("version 2 refused"), e.getMessage());
            TableSnapshotService tables = new TableSnapshotService(null);
            try (HeadFollower f = new HeadFollower(s, tables, 60)) {
                assertTrue(tables.current().version().number() != 2, "a refused head is not installed");
            }
            assertTrue(s.audit(5).stream().anyMatch(a -> a.action().equals("verify") && a.outcome().equals("refused")));
            // the hash recomputed and both written: the block no longer names the row's hash
            String other = StoreTest.table("9.80");
            rewrite(s, 2, other, v2.hash().replace(v2.hash().charAt(0), v2.hash().charAt(0) == 'a' ? 'b' : 'a'));
            assertThrows(StoreIntegrityException.class, () -> s.content(2));
            // a rollback to a refused version is refused too
            assertThrows(StoreIntegrityException.class, () -> s.rollback(2, 2, "a", "restore"));
            rewrite(s, 2, good, v2.hash());
            assertEquals(good, s.content(2).orElseThrow());
        }
    }

    @Test
    void aNewStoreStartsAtTheShippedNumberAndEachVersionCarriesItsNumber() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            String shipped = Backends.TABLES.toJson(Backends.TABLES.current());
            int own = Backends.TABLES.current().version().number();
            assertTrue(own > 1, "the shipped table has a number of its own");
            assertTrue(s.seed(shipped, "ionmark", "initial version"));
            assertEquals(own, s.head().orElseThrow().number());
            assertTrue(!s.seed(shipped, "ionmark", "again"), "a seeded store is not seeded twice");
            VersionInfo next = s.publish(StoreTest.table("4.80"), own, "a", "next");
            assertEquals(own + 1, next.number());
            for (int n : new int[] {own, own + 1}) {
                assertEquals(n, Backends.TABLES.validate(s.content(n).orElseThrow()).table().orElseThrow().version()
                        .number(), "the content of v" + n + " says v" + n);
            }
        }
    }

    @Test
    void anOverlongCommentIsRefusedBeforeTheDatabase() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            s.publish(StoreTest.table("4.76"), 0, "a", "first");
            var e = assertThrows(ionmark.store.api.StoreRejectedException.class,
                    () -> s.publish(StoreTest.table("4.80"), 1, "a", "x".repeat(5000)));
            assertTrue(e.getMessage().contains("at most 2000 characters"), e.getMessage());
            assertEquals(1, s.head().orElseThrow().number());
        }
    }
}
