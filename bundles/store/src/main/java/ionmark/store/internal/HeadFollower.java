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

    HeadFollower(JdbcTableStore store, TableService tables, int pollSeconds) {
        this.store = store;
        this.tables = tables;
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
            } else {
                System.err.println("ionmark: store head v" + head.get().number() + " does not validate: " + r.errors());
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
