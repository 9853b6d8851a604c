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
import ionmark.store.api.TableStore;
import ionmark.speciation.api.TableCalibration;

/**
 * When the framework was started by {@code ./ionmark check|batch|table}, runs that command once the
 * services are up, then ends the process with the command's exit code. The launcher passes the
 * arguments NUL-separated in the file named by the framework property {@code ionmark.args.file}.
 */
@Component(immediate = true)
public final class CommandLineRunner {
    static final long STORE_WAIT_MS = 20_000;

    /**
     * The table store, once it has opened and installed its head (its activation does both), so that
     * commands see the department's table; null with a warning when it is not available in time.
     */
    static TableStore store(BundleContext ctx) {
        org.osgi.util.tracker.ServiceTracker<TableStore, TableStore> t = new org.osgi.util.tracker.ServiceTracker<>(ctx,
                TableStore.class, null);
        t.open();
        try {
            TableStore s = t.waitForService(STORE_WAIT_MS);
            if (s == null) {
                System.err.println("ionmark: the table store is not available: using the table in the bundle");
            }
            return s;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return null;
        }
    }

    static final String ARGS_FILE = "ionmark.args.file";

    @Activate
    public CommandLineRunner(@Reference Speciation speciation, @Reference TableService tables,
            @Reference TableCalibration calibration, @Reference ionmark.speciation.measured.MeasuredImport imports,
            BundleContext ctx) {
        String file = ctx.getProperty(ARGS_FILE);
        if (file == null || file.isBlank()) {
            return;
        }
        Thread t = new Thread(() -> {
            int code;
            try {
                String raw = Files.readString(Path.of(file), StandardCharsets.UTF_8);
                List<String> args = Arrays.stream(raw.split("\0", -1)).filter(s -> !s.isEmpty()).toList();
                code = new Cli(speciation, tables, calibration, store(ctx), imports, System.out, System.err).run(args);
            } catch (IOException | RuntimeException e) {
                System.err.println("ionmark: " + e);
                code = 1;
            }
            System.out.flush();
            System.err.flush();
            Runtime.getRuntime().halt(code);
        }, "ionmark-cli");
        t.start();
    }
}
