package ionmark.acidity.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.metatype.annotations.Designate;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableListener;
import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;

/**
 * Holds the current table snapshot. Starts from the shipped table or from a configured file, which
 * it polls: a valid new file content becomes the current snapshot atomically and every
 * {@link TableListener} hears of it; an invalid one is reported and ignored.
 */
@Component(service = TableService.class, configurationPid = "ionmark.acidity.table")
@Designate(ocd = TableConfiguration.class)
public final class TableSnapshotService implements TableService {
    /** The curated base and the fitted overlay the shipped table is built from (bundles/acidity/table). */
    static final String CURATED = "/ionmark/acidity/internal/table/curated.json";
    static final String FITTED = "/ionmark/acidity/internal/table/fitted.json";
    /** System property naming a table file when the configuration names none (the launcher's IONMARK_TABLE). */
    static final String TABLE_FILE_PROPERTY = "ionmark.table.file";

    private final AtomicReference<AcidityTable> current = new AtomicReference<>();
    private final List<TableListener> listeners = new CopyOnWriteArrayList<>();
    private final ScheduledExecutorService worker = Executors.newSingleThreadScheduledExecutor(r -> {
        Thread t = new Thread(r, "ionmark-table");
        t.setDaemon(true);
        return t;
    });
    private volatile FileTime lastSeen;

    @Activate
    public TableSnapshotService(TableConfiguration config) {
        current.set(shipped());
        String file = config == null ? "" : config.tableFile().strip();
        if (file.isEmpty()) {
            file = System.getProperty(TABLE_FILE_PROPERTY, "").strip();
        }
        if (!file.isEmpty()) {
            Path path = Path.of(file);
            // without a configuration (the command line's lean path) the file is read once and polled every 2 s
            int poll = config == null ? 2 : config.pollSeconds();
            if (poll < 1) {
                throw new IllegalArgumentException("pollSeconds must be at least 1, not " + poll);
            }
            reloadFrom(path);
            worker.scheduleWithFixedDelay(() -> reloadFrom(path), poll, poll, TimeUnit.SECONDS);
        }
    }

    /** The table shipped inside this bundle: the curated base with the fitted overlay. */
    public static AcidityTable shipped() {
        List<ionmark.acidity.api.Problem> problems = new java.util.ArrayList<>();
        AcidityTable t = TableSplitter.build(resource(CURATED), resource(FITTED), problems);
        if (t == null) {
            throw new IllegalStateException("the shipped table does not build: " + problems);
        }
        return t;
    }

    static String resource(String name) {
        try (InputStream in = TableSnapshotService.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("the table file " + name + " is missing from the bundle");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException("cannot read the table file " + name, e);
        }
    }

    private void reloadFrom(Path path) {
        try {
            if (!Files.isRegularFile(path)) {
                return;
            }
            FileTime t = Files.getLastModifiedTime(path);
            if (t.equals(lastSeen)) {
                return;
            }
            lastSeen = t;
            ValidationReport r = validate(Files.readString(path));
            if (r.ok()) {
                install(r.table().orElseThrow());
            } else {
                System.err.println("ionmark: table file " + path + " ignored: " + r.errors().size() + " errors, first: "
                        + r.errors().get(0));
            }
        } catch (IOException | RuntimeException e) {
            System.err.println("ionmark: cannot read table file " + path + ": " + e.getMessage());
        }
    }

    @Deactivate
    void deactivate() {
        worker.shutdownNow();
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void addListener(TableListener l) {
        listeners.add(l);
    }

    void removeListener(TableListener l) {
        listeners.remove(l);
    }

    @Override
    public AcidityTable current() {
        return current.get();
    }

    @Override
    public ValidationReport validate(String json) {
        return TableValidator.validate(json);
    }

    @Override
    public String toJson(AcidityTable table) {
        return TableWriter.write(Objects.requireNonNull(table, "table"));
    }

    @Override
    public void install(AcidityTable table) {
        ValidationReport r = validate(toJson(Objects.requireNonNull(table, "table")));
        if (!r.ok()) {
            throw new IllegalArgumentException("table does not validate: " + r.errors());
        }
        AcidityTable next = r.table().orElseThrow();
        current.set(next);
        for (TableListener l : listeners) {
            worker.execute(() -> l.tableChanged(next));
        }
    }
}
