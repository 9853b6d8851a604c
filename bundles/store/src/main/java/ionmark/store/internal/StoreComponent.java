package ionmark.store.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.metatype.annotations.Designate;

import ionmark.acidity.api.TableService;
import ionmark.store.api.AuditEvent;
import ionmark.store.api.StoreConflictException;
import ionmark.store.api.StoreRejectedException;
import ionmark.store.api.TableStore;
import ionmark.store.api.VersionInfo;

/**
 * The table store as a service. In the notebook: an empty store is seeded with the shipped table under that
 * table's own number; the head is polled and installed into the table service, and written to
 * {@code .ionmark/head.json} (owner-only) for command-line runs. In a command-line run ({@code ionmark.args.file}
 * set): the store is never created; the table in use is {@code head.json} when there (no database opened), else
 * the store's head; the database is opened only for commands that need it. See {@link CliTable}.
 */
@Component(service = TableStore.class, immediate = true, configurationPid = "ionmark.store")
@Designate(ocd = StoreConfiguration.class)
public final class StoreComponent implements TableStore {
    private final TableService tables;
    /** Null when this run was given its own table file, or in a command-line run. */
    private final HeadFollower follower;
    private final StoreConfiguration config;
    private final String url;
    private final String password;
    /** Why the database cannot be used in this run (command line without a store), else null. */
    private final String unavailable;
    private volatile JdbcTableStore store;
    /** The workspace's .ionmark folder (default H2 store), else null. */
    private final Path dir;
    /** The launcher's table file (IONMARK_TABLE), the same property the table service reads. */
    static final String LOCAL_TABLE_PROPERTY = "ionmark.table.file";
    static final String CLI_PROPERTY = "ionmark.args.file";

    @Activate
    public StoreComponent(@Reference TableService tables, StoreConfiguration config, BundleContext ctx) throws IOException {
        this.tables = tables;
        this.config = config;
        if (config.pollSeconds() < 1) {
            throw new IllegalArgumentException("pollSeconds must be at least 1, not " + config.pollSeconds());
        }
        boolean cli = ctx.getProperty(CLI_PROPERTY) != null && !ctx.getProperty(CLI_PROPERTY).isBlank();
        String configured = config.jdbcUrl().strip();
        String workspace = config.workspace().isBlank() ? ctx.getProperty("ionmark.workspace") : config.workspace();
        this.dir = configured.isEmpty() ? StoreOpener.folder(workspace) : null;
        this.url = dir == null ? configured : StoreOpener.h2Url(dir);
        this.password = config.passwordFile().isBlank() ? "" : Files.readAllLines(Path.of(config.passwordFile()))
                .stream().findFirst().orElse("").strip();
        String localFile = ctx.getProperty(LOCAL_TABLE_PROPERTY);
        boolean ownTable = localFile != null && !localFile.isBlank();
        if (cli) {
            this.unavailable = dir != null && !StoreOpener.exists(dir) ? "there is no table store in the workspace "
                    + dir.getParent() + " (`./ionmark serve --workspace DIR` creates one; give the command the same"
                    + " --workspace)" : null;
            this.follower = null;
            if (!ownTable) {
                try {
                    new CliTable(tables, dir, unavailable, this::db).install();
                } catch (RuntimeException e) {
                    // fail fast, one line, non-zero: a command must not run on a table other than the one asked for
                    System.err.println("ionmark: " + e.getMessage());
                    deactivate();
                    System.err.flush();
                    Runtime.getRuntime().halt(1);
                }
            }
            return;
        }
        this.unavailable = null;
        this.store = StoreOpener.open(tables, url, config.user(), password, StoreOpener.DEFAULT_WAIT_MS);
        if (ownTable) {
            // a run given its own table file (IONMARK_TABLE: a draft, a calibration or cross-validation
            // fold) uses that file; following the shared head would silently replace it
            System.err.println("ionmark: using the table file " + localFile + "; the table store's head is not "
                    + "followed in this run");
            this.follower = null;
        } else {
            store.seedIfEmpty();
            this.follower = new HeadFollower(store, tables, config.pollSeconds(),
                    dir == null ? null : dir.resolve(CliTable.HEAD_FILE));
        }
    }

    /** The database, opened on first use in a command-line run (waiting for the notebook's file lock). */
    JdbcTableStore db() {
        return db(StoreOpener.DEFAULT_WAIT_MS);
    }

    private synchronized JdbcTableStore db(long waitMs) {
        if (store == null) {
            if (unavailable != null) {
                throw new IllegalStateException(unavailable);
            }
            store = StoreOpener.open(tables, url, config.user(), password, waitMs);
        }
        return store;
    }

    private void follow() {
        if (follower != null) {
            follower.follow();
        } else if (dir != null && store != null) {
            // a command-line publish: the next command-line run reads the new head from the head file
            store.head().flatMap(h -> store.content(h.number()))
                    .ifPresent(json -> CliTable.write(dir.resolve(CliTable.HEAD_FILE), json));
        }
    }

    @Deactivate
    void deactivate() {
        if (follower != null) {
            follower.close();
        }
        JdbcTableStore s = store;
        if (s != null) {
            s.close();
        }
    }

    @Override
    public Optional<VersionInfo> head() {
        return db().head();
    }

    @Override
    public List<VersionInfo> history() {
        return db().history();
    }

    @Override
    public Optional<String> content(int version) {
        return db().content(version);
    }

    @Override
    public VersionInfo publish(String json, int basedOn, String author, String comment)
            throws StoreConflictException, StoreRejectedException {
        VersionInfo v = db().publish(json, basedOn, author, comment);
        follow();
        return v;
    }

    @Override
    public VersionInfo rollback(int toVersion, int basedOn, String author, String comment)
            throws StoreConflictException, StoreRejectedException {
        VersionInfo v = db().rollback(toVersion, basedOn, author, comment);
        follow();
        return v;
    }

    @Override
    public void audit(String user, String action, int version, String outcome, String detail) {
        if (store == null && unavailable != null) {
            return; // a command-line run without a store: nothing to append to (the command itself says so)
        }
        try {
            db(1000).audit(user, action, version, outcome, detail);
        } catch (IllegalStateException e) {
            if (follower != null || store != null) {
                throw e;
            }
            // a command-line validate or export while a notebook holds the store: say it, do not fail the command
            System.err.println("ionmark: note: no audit line written for this " + action + ": " + e.getMessage());
        }
    }

    @Override
    public List<AuditEvent> audit(int limit) {
        return db().audit(limit);
    }

    @Override
    public List<String> diff(int from, int to) {
        return db().diff(from, to);
    }
}
