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
 * The table store as a service. An empty store is seeded with the table in use as version 1. Every
 * instance polls the head and installs a new head into the table service, so that all notebooks on
 * one database show a publish within the poll interval.
 */
@Component(service = TableStore.class, immediate = true, configurationPid = "ionmark.store")
@Designate(ocd = StoreConfiguration.class)
public final class StoreComponent implements TableStore {
    private final JdbcTableStore store;
    private final TableService tables;
    /** Null when this run was given its own table file. */
    private final HeadFollower follower;
    /** The launcher's table file (IONMARK_TABLE), the same property the table service reads. */
    static final String LOCAL_TABLE_PROPERTY = "ionmark.table.file";

    @Activate
    public StoreComponent(@Reference TableService tables, StoreConfiguration config, BundleContext ctx) throws IOException {
        this.tables = tables;
        if (config.pollSeconds() < 1) {
            throw new IllegalArgumentException("pollSeconds must be at least 1, not " + config.pollSeconds());
        }
        String url = config.jdbcUrl().strip();
        if (url.isEmpty()) {
            String ws = ctx.getProperty("ionmark.workspace");
            Path dir = Path.of(ws == null || ws.isBlank() ? "workspace" : ws, ".ionmark").toAbsolutePath();
            Files.createDirectories(dir);
            // AUTO_SERVER lets a command-line run open the store while the notebook has it open
            url = "jdbc:h2:file:" + dir.resolve("table-store") + ";AUTO_SERVER=TRUE";
        }
        String password = config.passwordFile().isBlank() ? "" : Files.readAllLines(Path.of(config.passwordFile()))
                .stream().findFirst().orElse("").strip();
        this.store = new JdbcTableStore(tables, url, config.user(), password);
        String localFile = ctx.getProperty(LOCAL_TABLE_PROPERTY);
        if (localFile != null && !localFile.isBlank()) {
            // a run given its own table file (IONMARK_TABLE: a draft, a calibration or cross-validation
            // fold) uses that file; following the shared head would silently replace it
            System.err.println("ionmark: using the table file " + localFile + "; the table store's head is not "
                    + "followed in this run");
            this.follower = null;
        } else {
            seed();
            this.follower = new HeadFollower(store, tables, config.pollSeconds());
        }
    }

    private void seed() {
        if (store.head().isEmpty()) {
            try {
                // the store numbers its own versions from 1; say which table it started from, so that "v1"
                // in a notebook can be traced to the shipped table's own number
                store.publish(tables.toJson(tables.current()), 0, "ionmark", "initial version: the table in use when the "
                        + "store was created (its own version block: v" + tables.current().version().number() + ")");
            } catch (StoreConflictException e) {
                // another instance seeded it first
            } catch (StoreRejectedException e) {
                throw new IllegalStateException("the table in use does not validate: " + e.problems(), e);
            }
        }
    }

    private void follow() {
        if (follower != null) {
            follower.follow();
        }
    }

    @Deactivate
    void deactivate() {
        if (follower != null) {
            follower.close();
        }
        store.close();
    }

    @Override
    public Optional<VersionInfo> head() {
        return store.head();
    }

    @Override
    public List<VersionInfo> history() {
        return store.history();
    }

    @Override
    public Optional<String> content(int version) {
        return store.content(version);
    }

    @Override
    public VersionInfo publish(String json, int basedOn, String author, String comment)
            throws StoreConflictException, StoreRejectedException {
        VersionInfo v = store.publish(json, basedOn, author, comment);
        follow();
        return v;
    }

    @Override
    public VersionInfo rollback(int toVersion, int basedOn, String author, String comment)
            throws StoreConflictException, StoreRejectedException {
        VersionInfo v = store.rollback(toVersion, basedOn, author, comment);
        follow();
        return v;
    }

    @Override
    public void audit(String user, String action, int version, String outcome, String detail) {
        store.audit(user, action, version, outcome, detail);
    }

    @Override
    public List<AuditEvent> audit(int limit) {
        return store.audit(limit);
    }

    @Override
    public List<String> diff(int from, int to) {
        return store.diff(from, to);
    }
}
