package ionmark.store.internal;

import java.util.Optional;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;

import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.store.api.VersionInfo;

/**
 * Keeps one instance's table service on the store's head: polls the head and installs a newer one.
 * Every instance on a shared database runs one, so a publish anywhere reaches every notebook within
 * the poll interval.
 */
final class HeadFollower implements AutoCloseable {
    private final JdbcTableStore store;
    private final TableService tables;
    private final ScheduledExecutorService poller;
    private volatile int installed;
    private final java.nio.file.Path headFile;
    /** The head last refused, so that a refused head is reported once, not at every poll. */
    private volatile int refused;

    HeadFollower(JdbcTableStore store, TableService tables, int pollSeconds) {
        this(store, tables, pollSeconds, null);
    }

    /** {@code headFile}: where to write each installed head for command-line runs (null: nowhere). */
    HeadFollower(JdbcTableStore store, TableService tables, int pollSeconds, java.nio.file.Path headFile) {
        this.store = store;
        this.tables = tables;
        this.headFile = headFile;
        follow();
        this.poller = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "ionmark-store-head");
            t.setDaemon(true);
            return t;
        });
        poller.scheduleWithFixedDelay(this::follow, pollSeconds, pollSeconds, TimeUnit.SECONDS);
    }

    /** Installs the store's head when it is newer than what this instance installed. */
    void follow() {
        try {
            Optional<VersionInfo> head = store.head();
            if (head.isEmpty() || head.get().number() == installed) {
                return;
            }
            String json = store.content(head.get().number()).orElseThrow();
            ValidationReport r = tables.validate(json);
            if (r.ok()) {
                tables.install(r.table().orElseThrow());
                installed = head.get().number();
                if (headFile != null) {
                    CliTable.write(headFile, json);
                }
            } else {
                System.err.println("ionmark: store head v" + head.get().number() + " does not validate: " + r.errors());
            }
        } catch (StoreIntegrityException e) {
            int head = store.snapshot().head();
            if (refused != head) {
                refused = head;
                System.err.println("ionmark: " + e.getMessage() + "; the notebook keeps the table it has in use"
                        + (installed == 0 ? "" : " (v" + installed + ")"));
                try {
                    store.audit("ionmark", "verify", head, "refused", e.getMessage());
                } catch (RuntimeException ignored) {
                    // the audit trail is in the same store; the message above is the report
                }
            }
        } catch (RuntimeException e) {
            System.err.println("ionmark: cannot follow the table store: " + e.getMessage());
        }
    }

    @Override
    public void close() {
        poller.shutdownNow();
    }
}
