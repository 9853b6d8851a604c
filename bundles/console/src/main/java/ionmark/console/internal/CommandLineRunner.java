package ionmark.console.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.acidity.api.TableService;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableRegression;
import ionmark.store.api.TableStore;

/**
 * When the framework was started by {@code ./ionmark check|batch|table}, runs that command once the
 * services are up, then ends the process with the command's exit code. The launcher passes the
 * arguments NUL-separated in the file named by the framework property {@code ionmark.args.file}.
 */
@Component(immediate = true)
public final class CommandLineRunner {
    static final long STORE_WAIT_MS = 20_000;

    /**
     * The table store service, once its activation has put the right table in use (the store's head, the
     * head file, or the shipped table with a note); null when it did not come up in time or failed to
     * activate: then the command does not run (see {@link #run}).
     */
    static org.osgi.util.tracker.ServiceTracker<TableStore, TableStore> storeTracker(BundleContext ctx) {
        org.osgi.util.tracker.ServiceTracker<TableStore, TableStore> t = new org.osgi.util.tracker.ServiceTracker<>(ctx,
                TableStore.class, null);
        t.open();
        return t;
    }

    /** Arguments as the launcher wrote them: each followed by NUL; an empty argument stays an argument. */
    static List<String> split(String raw) {
        List<String> args = new java.util.ArrayList<>(Arrays.asList(raw.split("\0", -1)));
        if (!args.isEmpty() && args.get(args.size() - 1).isEmpty()) {
            args.remove(args.size() - 1);
        }
        return args;
    }

    static final String ARGS_FILE = "ionmark.args.file";

    /**
     * Stops the store's bundle before the process ends: its deactivation closes the database, so nothing the
     * command wrote depends on the process ending cleanly (each commit is also forced to disk when made).
     */
    static void closeStore(org.osgi.util.tracker.ServiceTracker<TableStore, TableStore> tracker) {
        try {
            var ref = tracker.getServiceReference();
            tracker.close();
            if (ref != null && ref.getBundle() != null) {
                ref.getBundle().stop();
            }
        } catch (Exception e) {
            System.err.println("ionmark: closing the table store: " + e.getMessage());
        }
    }

    /**
     * The calibration service when the calibration bundle is in this runtime, else null. Found by name, not by a
     * reference: the console imports the calibration API optionally, and a component whose constructor names a
     * type the bundle cannot load would not start.
     */
    static Object calibration(BundleContext ctx) throws InterruptedException {
        if (Arrays.stream(ctx.getBundles()).noneMatch(b -> CALIBRATION_BUNDLE.equals(b.getSymbolicName()))) {
            return null;
        }
        org.osgi.util.tracker.ServiceTracker<Object, Object> t = new org.osgi.util.tracker.ServiceTracker<>(ctx,
                CALIBRATION_SERVICE, null);
        t.open();
        try {
            return t.waitForService(STORE_WAIT_MS);
        } finally {
            t.close();
        }
    }

    static final String CALIBRATION_BUNDLE = "ionmark.calibration";
    /**
     * Why the table file a one-shot command was started with ({@code IONMARK_TABLE}) cannot be used, or null when
     * it validates. The table service only warns about such a file and keeps the table it has, which suits a
     * running notebook that polls the file; a command run once would silently report on the wrong table.
     */
    static String tableFileProblem(TableService tables, Path file) {
        String json;
        try {
            json = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException e) {
            return "cannot read the table file " + file + " (IONMARK_TABLE): " + e.getMessage();
        }
        var report = tables.validate(json);
        if (report.ok()) {
            return null;
        }
        var errors = report.errors();
        return "the table file " + file + " (IONMARK_TABLE) does not validate, " + errors.size() + " error"
                + (errors.size() == 1 ? "" : "s") + ":\n  " + String.join("\n  ",
                        errors.stream().limit(10).map(String::valueOf).toList())
                + (errors.size() > 10 ? "\n  …" : "");
    }

    static final String CALIBRATION_SERVICE = "ionmark.calibration.api.TableCalibration";

    @Activate
    public CommandLineRunner(@Reference Speciation speciation, @Reference TableRegression regression,
            @Reference TableService tables, @Reference ionmark.speciation.measured.MeasuredImport imports,
            BundleContext ctx) {
        String file = ctx.getProperty(ARGS_FILE);
        if (file == null || file.isBlank()) {
            return;
        }
        Thread t = new Thread(() -> {
            int code;
            org.osgi.util.tracker.ServiceTracker<TableStore, TableStore> tracker = storeTracker(ctx);
            try {
                List<String> args = split(Files.readString(Path.of(file), StandardCharsets.UTF_8));
                String tableFile = ctx.getProperty("ionmark.table.file");
                String tableProblem = tableFile == null ? null : tableFileProblem(tables, Path.of(tableFile));
                TableStore store = tableProblem != null ? null : tracker.waitForService(STORE_WAIT_MS);
                if (tableProblem != null) {
                    // a one-shot command must not measure or write with the shipped table instead of the named one
                    System.err.println("ionmark: " + tableProblem + "; nothing was run");
                    code = 2;
                } else if (store == null && tableFile == null) {
                    // the store component failed to activate (its error is above) or hung: no silent fallback
                    System.err.println("ionmark: the table store did not start (see the message above); nothing was run");
                    code = 1;
                } else {
                    Object calibration = calibration(ctx);
                    code = (calibration == null
                            ? new Cli(speciation, regression, tables, null, store, imports, System.out, System.err)
                            : CalibrationLink.cli(speciation, regression, tables, calibration, store, imports)).run(args);
                }
            } catch (IOException | RuntimeException e) {
                System.err.println("ionmark: " + (e.getMessage() == null ? e.toString() : e.getMessage()));
                code = 1;
            } catch (InterruptedException e) {
                code = 1;
            }
            closeStore(tracker);
            System.out.flush();
            System.err.flush();
            Runtime.getRuntime().halt(code);
        }, "ionmark-cli");
        t.start();
    }
}
