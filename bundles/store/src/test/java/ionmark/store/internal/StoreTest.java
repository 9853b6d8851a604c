package ionmark.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.store.api.AuditEvent;
import ionmark.store.api.StoreConflictException;
import ionmark.store.api.StoreRejectedException;
import ionmark.store.api.VersionInfo;

/** The same suite against every available database (H2 always, PostgreSQL where a server is given). */
class StoreTest {
    @TempDir
    Path dir;

    static String table(String pka) {
        return Backends.smallTable().replace("\"pka\": 4.76, \"relation\"", "\"pka\": " + pka + ", \"relation\"");
    }

    @Test
    void publishesVersionsInOrderWithTheirMetadata() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            VersionInfo v1 = s.publish(table("4.76"), 0, "a.admin", "first");
            VersionInfo v2 = s.publish(table("4.80"), 1, "b.admin", "second");
            assertEquals(1, v1.number());
            assertEquals(2, v2.number());
            assertEquals(1, v2.parent());
            assertEquals("b.admin", s.head().orElseThrow().author());
            assertEquals(List.of(2, 1), s.history().stream().map(VersionInfo::number).toList());
            assertTrue(s.content(2).orElseThrow().contains("4.8"));
            assertEquals(64, v2.hash().length());
        }
    }

    @Test
    void aStaleBaseIsAConflictAndTheHeadStays() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            s.publish(table("4.76"), 0, "a", "first");
            s.publish(table("4.80"), 1, "a", "second");
            StoreConflictException e = assertThrows(StoreConflictException.class,
                    () -> s.publish(table("4.90"), 1, "b", "late"));
            assertEquals(2, e.head());
            assertTrue(e.getMessage().contains("head is now version 2"));
            assertEquals(2, s.head().orElseThrow().number());
            assertTrue(s.audit(10).stream().anyMatch(a -> a.outcome().equals("conflict") && a.user().equals("b")));
        }
    }

    @Test
    void invalidDraftsAreRejectedAndTheHeadDoesNotChange() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            s.publish(table("4.76"), 0, "a", "first");
            for (String bad : List.of(table("4.76").replace("[CX4:2][CX3](=O)[OX2H1:1]", "[CX4:2][CX3](=O)[OX2H1"),
                    table("44.0"), table("4.76").replace("\"smiles\": \"CC(=O)O\"", "\"smiles\": \"CC(\""),
                    table("4.76").replace("\"source\": \"crc\", \"groups\"", "\"source\": \"nowhere\", \"groups\""),
                    "not json")) {
                StoreRejectedException e = assertThrows(StoreRejectedException.class,
                        () -> s.publish(bad, 1, "a", "broken draft"));
                assertTrue(!e.problems().isEmpty());
                assertEquals(1, s.head().orElseThrow().number());
            }
            assertThrows(StoreRejectedException.class, () -> s.publish(table("4.80"), 1, "a", " "));
            assertEquals(6, s.audit(100).stream().filter(a -> a.outcome().equals("rejected")).count());
        }
    }

    @Test
    void rollbackPublishesAnEarlierContentAsANewVersion() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            s.publish(table("4.76"), 0, "a", "first");
            s.publish(table("4.80"), 1, "a", "second");
            VersionInfo v3 = s.rollback(1, 2, "a", "the 4.80 was a typo");
            assertEquals(3, v3.number());
            assertTrue(s.content(3).orElseThrow().contains("4.76"));
            assertTrue(s.diff(2, 3).stream().anyMatch(l -> l.contains("groups[acid].pka")), s.diff(2, 3).toString());
            assertTrue(s.audit(5).stream().anyMatch(a -> a.action().equals("rollback") && a.version() == 3));
        }
    }

    @Test
    void diffIsByRecordAndField() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            s.publish(table("4.76"), 0, "a", "first");
            s.publish(table("4.80").replace("{\"id\": \"chloro\"", "{\"id\": \"bromo\""), 1, "a", "second");
            List<String> d = s.diff(1, 2);
            assertTrue(d.contains("changed groups[acid].pka: 4.76 → 4.8"), d.toString());
            assertTrue(d.stream().anyMatch(l -> l.startsWith("removed substituents[chloro]: {") && l.contains("\"sigmaPara\"")), d.toString());
            assertTrue(d.stream().anyMatch(l -> l.startsWith("added substituents[bromo]: {")), d.toString());
        }
    }

    @Test
    void eightThreadsPublishingOnStaleAndFreshBasesLoseNothing() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            s.publish(table("4.76"), 0, "seed", "seed");
            AtomicInteger accepted = new AtomicInteger();
            AtomicInteger conflicts = new AtomicInteger();
            ConcurrentLinkedQueue<Integer> numbers = new ConcurrentLinkedQueue<>();
            ExecutorService pool = Executors.newFixedThreadPool(8);
            List<java.util.concurrent.Future<Object>> tasks = new ArrayList<>();
            for (int t = 0; t < 8; t++) {
                int thread = t;
                tasks.add(pool.submit(() -> {
                    for (int i = 0; i < 100; i++) {
                        int head = s.head().orElseThrow().number();
                        int base = ThreadLocalRandom.current().nextBoolean() ? head : Math.max(0, head - 1);
                        try {
                            numbers.add(s.publish(table(String.format("%.2f", 4 + (thread * 100 + i) / 1000.0)), base,
                                    "t" + thread, "attempt " + i).number());
                            accepted.incrementAndGet();
                        } catch (StoreConflictException e) {
                            conflicts.incrementAndGet();
                        } catch (StoreRejectedException e) {
                            throw new AssertionError(e);
                        }
                    }
                    return null;
                }));
            }
            pool.shutdown();
            assertTrue(pool.awaitTermination(5, TimeUnit.MINUTES));
            for (var task : tasks) {
                task.get(); // a worker that died on anything but a conflict fails the test with its cause
            }
            assertEquals(800, accepted.get() + conflicts.get());
            int head = s.head().orElseThrow().number();
            assertEquals(1 + accepted.get(), head, "every accepted publish is a version");
            List<Integer> history = new ArrayList<>(s.history().stream().map(VersionInfo::number).toList());
            for (int n = head; n >= 1; n--) {
                assertEquals(n, history.get(head - n), "versions strictly sequential");
            }
            for (VersionInfo v : s.history()) {
                assertEquals(v.number() - 1, v.parent(), "each version names its predecessor");
            }
            List<AuditEvent> audit = s.audit(10_000);
            assertEquals(accepted.get() + 1, audit.stream().filter(a -> a.action().equals("publish")
                    && a.outcome().equals("ok")).count());
            assertEquals(conflicts.get(), audit.stream().filter(a -> a.outcome().equals("conflict")).count());
        }
    }
}
