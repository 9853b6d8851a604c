package ionmark.console.internal;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableService;
import ionmark.speciation.api.Speciation;

/**
 * {@code ./ionmark check} without the OSGi framework: the launcher runs this on a plain class path of the
 * product's bundles. The table in use is the workspace's head file (written by the notebook and by every
 * command-line publish; hash-checked), the {@code IONMARK_TABLE} file, or, in a workspace without a store, the
 * shipped table with a note. When the workspace has a store but no head file it exits {@link #NEEDS_FRAMEWORK}
 * and the launcher runs the command in the framework, which reads the store. The implementation classes are
 * reached by name, so the console bundle imports nothing private in OSGi.
 *
 * <p>Before any of that, a notebook serving the workspace is asked ({@link ChannelClient}); without one, or when it
 * refuses, the check runs here. A head text validated before is only checked against its hash
 * ({@link VerifiedTables}). {@code IONMARK_DEBUG_TIMING=1} prints where the time went ({@link PhaseTimer}).
 */
public final class LeanCheck {
    /** Exit code asking the launcher to run the command in the framework instead. */
    static final int NEEDS_FRAMEWORK = 90;

    private LeanCheck() {
    }

    /**
     * A private class of another bundle, named at run time: bnd reads constant class names and would make the
     * console bundle import the private package, which no bundle exports.
     */
    private static String impl(String bundle, String type) {
        return String.join(".", List.of("ionmark", bundle, "internal", type));
    }

    public static void main(String[] argv) throws Exception {
        PhaseTimer time = new PhaseTimer();
        List<String> args = CommandLineRunner.split(Files.readString(Path.of(argv[0]), StandardCharsets.UTF_8));
        Path dir = Path.of(System.getProperty("ionmark.workspace", "workspace"), ".ionmark");
        String own = System.getProperty("ionmark.table.file", "");
        if (own.isBlank() && !namesAFile(args) && !"off".equals(System.getProperty("ionmark.channel"))) {
            // a notebook serving this workspace answers with its table (the store's head), already warm
            var answer = ChannelClient.check(dir, args);
            time.mark("channel " + (answer.isPresent() ? "answered" : "none"));
            if (answer.isPresent()) {
                System.out.print(answer.get().out());
                System.err.print(answer.get().err());
                System.out.flush();
                System.err.flush();
                System.exit(answer.get().code());
            }
        }
        TableService tables;
        if (!own.isBlank()) {
            tables = (TableService) Class.forName(impl("acidity", "TableSnapshotService"))
                    .getConstructor(Class.forName(impl("acidity", "TableConfiguration"))).newInstance((Object) null);
            String problem = CommandLineRunner.tableFileProblem(tables, Path.of(own));
            if (problem != null) {
                System.err.println("ionmark: " + problem + "; nothing was run");
                System.exit(2);
            }
        } else if (Files.isRegularFile(dir.resolve("head.json"))) {
            Path head = dir.resolve("head.json");
            AcidityTable t = VerifiedTables.head(dir, Files.readString(head, StandardCharsets.UTF_8)).orElse(null);
            if (t == null) {
                System.err.println("ionmark: " + head + " does not match its hash or does not validate: remove it"
                        + " and run the command again (it is rewritten from the store)");
                System.exit(1);
            }
            tables = new LeanTables(t);
        } else if (Files.isRegularFile(dir.resolve("table-store.mv.db"))) {
            System.exit(NEEDS_FRAMEWORK);
            return;
        } else {
            tables = new LeanTables(VerifiedTables.shipped());
            System.err.println("ionmark: there is no table store in the workspace " + dir.getParent()
                    + " (`./ionmark serve --workspace DIR` creates one; give the command the same --workspace):"
                    + " using the shipped table " + tables.current().version().label());
        }
        time.mark("table " + tables.current().version().label());
        Object engine = Class.forName(impl("speciation", "SpeciationService"))
                .getConstructor(AcidityTable.class, int.class, int.class).newInstance(tables.current(), 300, 5000);
        time.mark("engine");
        int code = new Cli((Speciation) engine, tables, null, null, System.out, System.err)
                .run(args);
        System.out.flush();
        time.mark("check");
        System.exit(code);
    }

    /**
     * Whether an argument names a file here: such a check runs locally, since the notebook would look for the
     * file from its own folder.
     */
    static boolean namesAFile(List<String> args) {
        for (String a : args.subList(Math.min(1, args.size()), args.size())) {
            try {
                if (!a.isBlank() && a.length() < 250 && Files.isRegularFile(Path.of(a))) {
                    return true;
                }
            } catch (java.nio.file.InvalidPathException e) {
                // not a path
            }
        }
        return false;
    }
}
