package ionmark.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A publish confirmed to its caller survives the publisher's death. A child JVM publishes in a loop and
 * prints each confirmed version; it is killed with SIGKILL at a random point; the store is reopened and
 * every confirmed version must be there with the content its hash names. The second test ends the child
 * with {@code Runtime.halt} right after one confirmed publish (what the command line did), then reads the
 * history. Rounds per backend: {@code -Dionmark.killRounds=N} or {@code IONMARK_KILL_ROUNDS} (default 3 for CI;
 * {@code 50} for the full figure). Each round prints one line to stdout: backend, round, confirmed so far, head.
 */
class ConfirmedPublishKillTest {
    @TempDir
    Path dir;

    /** Rounds per backend: the system property {@code ionmark.killRounds}, else {@code IONMARK_KILL_ROUNDS}, else 3. */
    static int rounds() {
        String r = System.getProperty("ionmark.killRounds", "");
        if (r.isBlank()) {
            r = System.getenv("IONMARK_KILL_ROUNDS");
        }
        return r == null || r.isBlank() ? 3 : Integer.parseInt(r.strip());
    }

    private List<String[]> targets() throws Exception {
        // -Dionmark.killBackends=h2 or postgresql runs one of them (two long runs side by side); default both
        String only = System.getProperty("ionmark.killBackends", "");
        List<String[]> targets = new ArrayList<>();
        if (!only.equals("postgresql")) {
            targets.add(new String[] {Backends.h2(dir), "sa", ""});
        }
        if (Backends.pgUrl() != null && !only.equals("h2")) {
            Backends.fresh(dir.resolve("pg")); // empties the PostgreSQL schema
            targets.add(new String[] {Backends.pgUrl(), System.getenv("IONMARK_PG_USER"),
                    System.getenv("IONMARK_PG_PASSWORD")});
        }
        return targets;
    }

    private static Process child(String mode, String[] t) throws Exception {
        return new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-cp",
                System.getProperty("java.class.path"), ConfirmingPublisher.class.getName(), mode, t[0], t[1], t[2])
                .redirectErrorStream(true).start();
    }

    @Test
    void everyConfirmedPublishSurvivesAKill() throws Exception {
        for (String[] t : targets()) {
            Map<Integer, String> confirmed = new LinkedHashMap<>();
            checked.clear(); // version numbers start again on the next backend
            for (int round = 0; round < rounds(); round++) {
                Process p = child("loop", t);
                BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
                assertEquals("ready", out.readLine(), "child did not start");
                int before;
                synchronized (confirmed) {
                    before = confirmed.size();
                }
                Thread reader = new Thread(() -> read(out, confirmed));
                reader.start();
                // kill at a random point after the child's first confirmed publish of this round
                long until = System.currentTimeMillis() + 60_000;
                while (System.currentTimeMillis() < until) {
                    synchronized (confirmed) {
                        if (confirmed.size() > before) {
                            break;
                        }
                    }
                    Thread.sleep(5);
                }
                Thread.sleep(ThreadLocalRandom.current().nextInt(1000));
                p.destroyForcibly(); // SIGKILL
                assertTrue(p.waitFor(30, TimeUnit.SECONDS));
                reader.join(10_000);
                int known;
                synchronized (confirmed) {
                    known = confirmed.size();
                }
                assertTrue(known > before, "the child confirmed nothing within 60 s");
                try (JdbcTableStore s = new JdbcTableStore(Backends.TABLES, t[0], t[1], t[2])) {
                    verify(s, confirmed, t[0] + " round " + round);
                    System.out.println("kill round " + (round + 1) + "/" + rounds() + " " + backend(t[0]) + ": "
                            + known + " confirmed versions so far, all present with their content");
                }
            }
        }
    }

    @Test
    void aPublishThenHaltIsInTheHistory() throws Exception {
        for (String[] t : targets()) {
            Map<Integer, String> confirmed = new LinkedHashMap<>();
            checked.clear(); // version numbers start again on the next backend
            for (int round = 0; round < rounds(); round++) {
                Process p = child("once", t);
                BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
                assertEquals("ready", out.readLine(), "child did not start");
                read(out, confirmed);
                assertTrue(p.waitFor(30, TimeUnit.SECONDS));
                assertEquals(round + 1, confirmed.size(), "one confirmed publish per run");
                try (JdbcTableStore s = new JdbcTableStore(Backends.TABLES, t[0], t[1], t[2])) {
                    verify(s, confirmed, t[0] + " run " + round);
                    System.out.println("halt run " + (round + 1) + "/" + rounds() + " " + backend(t[0])
                            + ": the confirmed publish is the head");
                    int last = confirmed.keySet().stream().mapToInt(Integer::intValue).max().orElseThrow();
                    assertEquals(last, s.head().orElseThrow().number(), "history after the run names its publish as head");
                }
            }
        }
    }

    private static String backend(String url) {
        return url.startsWith("jdbc:h2") ? "H2" : "PostgreSQL";
    }

    private static void read(BufferedReader out, Map<Integer, String> confirmed) {
        try {
            for (String line; (line = out.readLine()) != null;) {
                if (line.startsWith("confirmed ")) {
                    String[] f = line.split(" ");
                    synchronized (confirmed) {
                        String before = confirmed.put(Integer.parseInt(f[1]), f[2]);
                        if (before != null && !before.equals(f[2])) {
                            confirmed.put(-Integer.parseInt(f[1]), "reused"); // a number given twice
                        }
                    }
                }
            }
        } catch (java.io.IOException e) {
            // the child died mid-line: the line was not a confirmation
        }
    }

    /**
     * SHA-256 of each version's content once it has passed the store's full check ({@code content}: parse,
     * validation, number and hash): later rounds compare the raw bytes with it instead of validating every earlier
     * version again (a second or more each on a loaded machine, and 50 rounds re-read over a hundred versions).
     */
    private final Map<Integer, String> checked = new java.util.HashMap<>();

    private static String rawSha(JdbcTableStore s, int number) throws java.sql.SQLException {
        try (var c = s.connect(); var p = c.prepareStatement("select content from ionmark_version where number = ?")) {
            p.setInt(1, number);
            try (var r = p.executeQuery()) {
                assertTrue(r.next(), "version " + number + " has no row");
                return sha(r.getString(1));
            }
        }
    }

    private static String sha(String text) {
        try {
            return java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private void verify(JdbcTableStore s, Map<Integer, String> confirmed, String where) throws java.sql.SQLException {
        synchronized (confirmed) {
            assertTrue(confirmed.keySet().stream().allMatch(n -> n > 0), where + ": a version number was confirmed twice");
            Map<Integer, ionmark.store.api.VersionInfo> history = new java.util.HashMap<>();
            s.history().forEach(v -> history.put(v.number(), v));
            for (Map.Entry<Integer, String> e : confirmed.entrySet()) {
                var info = java.util.Optional.ofNullable(history.get(e.getKey()));
                assertTrue(info.isPresent(), where + ": confirmed version " + e.getKey() + " is lost; head "
                        + s.head().map(v -> v.number()).orElse(0));
                assertEquals(e.getValue(), info.get().hash(), where + ": version " + e.getKey() + " has other content");
                String before = checked.get(e.getKey());
                if (before != null) {
                    assertEquals(before, rawSha(s, e.getKey()), where + ": version " + e.getKey() + " content changed");
                    continue;
                }
                // content() refuses a text that does not validate or whose number or hash differ from the row's
                String content = s.content(e.getKey()).orElseThrow();
                assertEquals(e.getValue(), Backends.TABLES.validate(content).table().orElseThrow().version().hash(),
                        where + ": version " + e.getKey() + " content matches the confirmed hash");
                checked.put(e.getKey(), sha(content));
            }
        }
    }
}
