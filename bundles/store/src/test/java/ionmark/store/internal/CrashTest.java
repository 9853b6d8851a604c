package ionmark.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.store.api.VersionInfo;

/**
 * A publishing process killed (SIGKILL) at random points: the store reopens with a head that names
 * a complete version, versions 1…head all present, each with the hash of its content.
 */
class CrashTest {
    @TempDir
    Path dir;

    @Test
    void aKilledPublisherLeavesAConsistentStore() throws Exception {
        List<String[]> targets = new ArrayList<>();
        targets.add(new String[] {Backends.h2(dir), "sa", ""});
        if (Backends.pgUrl() != null) {
            Backends.fresh(dir.resolve("pg")); // empties the PostgreSQL schema
            targets.add(new String[] {Backends.pgUrl(), System.getenv("IONMARK_PG_USER"),
                    System.getenv("IONMARK_PG_PASSWORD")});
        }
        for (String[] t : targets) {
            for (int round = 0; round < 2; round++) {
                Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-cp",
                        System.getProperty("java.class.path"), PublishLoop.class.getName(), t[0], t[1], t[2])
                        .redirectErrorStream(true).start();
                BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream()));
                String first = out.readLine();
                assertEquals("ready", first, "child did not start");
                Thread.sleep(200 + ThreadLocalRandom.current().nextInt(800));
                p.destroyForcibly();
                assertTrue(p.waitFor(30, TimeUnit.SECONDS));
                try (JdbcTableStore s = new JdbcTableStore(Backends.TABLES, t[0], t[1], t[2])) {
                    check(s, t[0] + " round " + round);
                }
            }
        }
    }

    private static void check(JdbcTableStore s, String where) {
        JdbcTableStore.Snapshot snap = s.snapshot();
        int head = snap.head();
        assertEquals(head, snap.versions().isEmpty() ? 0 : snap.versions().get(0), () -> where
                + ": the head row names the newest version; newest versions " + snap.versions().stream().limit(4).toList());
        List<VersionInfo> history = s.history();
        for (int i = 0; i < history.size(); i++) {
            VersionInfo v = history.get(i);
            assertEquals(head - i, v.number(), "no gap in the versions");
            String content = s.content(v.number()).orElseThrow();
            assertEquals(v.hash(), Backends.TABLES.validate(content).table().orElseThrow().version().hash(),
                    "version " + v.number() + " content matches its hash");
        }
    }
}
