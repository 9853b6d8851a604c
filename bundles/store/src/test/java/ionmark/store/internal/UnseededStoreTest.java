package ionmark.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.store.api.AuditEvent;

/**
 * A notebook stopped while it starts can leave a store whose tables exist but that has no version yet. The next
 * run of any kind must find the shipped table there, not an error: the command line seeds it as the notebook
 * does, once, with an audit line, and writes the head file it reads from then on.
 */
class UnseededStoreTest {
    @TempDir
    Path dir;

    @Test
    void aCommandLineRunSeedsAStoreThatWasCreatedButNeverSeeded() throws Exception {
        for (JdbcTableStore s : Backends.fresh(dir)) {
            assertTrue(s.head().isEmpty(), "the store starts without a version, as after a stopped first start");
            Path ws = Files.createDirectories(dir.resolve("ws-" + s.hashCode()));
            // a table service of its own: installing the head must not change the one the other tests share
            new CliTable(new ionmark.acidity.internal.TableSnapshotService(null), ws, null, () -> s).install();

            int shipped = Backends.TABLES.current().version().number();
            assertEquals(shipped, s.head().orElseThrow().number(), "the first version keeps the shipped number");
            AuditEvent seeded = s.audit(10).stream().filter(e -> e.action().equals("seed")).findFirst().orElseThrow();
            assertEquals(shipped, seeded.version());
            String headFile = Files.readString(ws.resolve(CliTable.HEAD_FILE), StandardCharsets.UTF_8);
            assertEquals(s.content(shipped).orElseThrow(), headFile, "the head file is the seeded content");

            // a second run, notebook or command line, finds the head and seeds nothing
            assertFalse(s.seedIfEmpty());
            assertEquals(1, s.history().size());
        }
    }
}
