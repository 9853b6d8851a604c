package ionmark.pipeline.bench;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.console.internal.Cli;
import ionmark.pipeline.EngineSpec;
import ionmark.speciation.internal.SpeciationService;

/**
 * {@code ionmark batch} in a plain JVM with the services the application wires (shipped table, the pipeline's
 * engine limits), for timing it against the pipeline without the OSGi start-up on either side. Arguments are
 * batch's; {@code --timeoutMillis N} (first) sets the engine's limit.
 */
public final class BatchMain {
    private BatchMain() {
    }

    public static void main(String[] args) {
        int timeout = EngineSpec.TIMEOUT_MILLIS;
        List<String> rest = List.of(args);
        if (!rest.isEmpty() && rest.get(0).equals("--timeoutMillis")) {
            timeout = Integer.parseInt(rest.get(1));
            rest = rest.subList(2, rest.size());
        }
        TableSnapshotService tables = new TableSnapshotService(null);
        SpeciationService sp = new SpeciationService(tables.current(), EngineSpec.MAX_HEAVY_ATOMS, timeout);
        PrintStream out = new PrintStream(new java.io.FileOutputStream(java.io.FileDescriptor.out), false,
                StandardCharsets.UTF_8);
        int rc = new Cli(sp, tables, null, null, out, System.err).run(concat("batch", rest));
        out.flush();
        System.exit(rc);
    }

    private static List<String> concat(String first, List<String> rest) {
        List<String> all = new java.util.ArrayList<>();
        all.add(first);
        all.addAll(rest);
        return all;
    }
}
