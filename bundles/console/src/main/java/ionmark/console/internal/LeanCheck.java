package ionmark.console.internal;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.speciation.api.Speciation;

/**
 * {@code ./ionmark check} without the OSGi framework: the launcher runs this on a plain class path of the
 * product's bundles. The table in use is the workspace's head file (written by the notebook and by every
 * command-line publish; hash-checked), the {@code IONMARK_TABLE} file, or, in a workspace without a store, the
 * shipped table with a note. When the workspace has a store but no head file it exits {@link #NEEDS_FRAMEWORK}
 * and the launcher runs the command in the framework, which reads the store. The implementation classes are
 * reached by name, so the console bundle imports nothing private in OSGi.
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
        List<String> args = CommandLineRunner.split(Files.readString(Path.of(argv[0]), StandardCharsets.UTF_8));
        Path dir = Path.of(System.getProperty("ionmark.workspace", "workspace"), ".ionmark");
        String own = System.getProperty("ionmark.table.file", "");
        TableService tables = (TableService) Class.forName(impl("acidity", "TableSnapshotService"))
                .getConstructor(Class.forName(impl("acidity", "TableConfiguration"))).newInstance((Object) null);
        if (own.isBlank()) {
            Path head = dir.resolve("head.json");
            if (Files.isRegularFile(head)) {
                String json = Files.readString(head, StandardCharsets.UTF_8);
                ValidationReport r = tables.validate(json);
                AcidityTable t = r.table().orElse(null);
                if (!r.ok() || t == null || t.version().hash().isEmpty()
                        || r.warnings().stream().anyMatch(p -> p.path().equals("$.version.hash"))) {
                    System.err.println("ionmark: " + head + " does not match its hash or does not validate: remove it"
                            + " and run the command again (it is rewritten from the store)");
                    System.exit(1);
                }
                tables.install(t);
            } else if (Files.isRegularFile(dir.resolve("table-store.mv.db"))) {
                System.exit(NEEDS_FRAMEWORK);
            } else {
                System.err.println("ionmark: there is no table store in the workspace " + dir.getParent()
                        + " (`./ionmark serve --workspace DIR` creates one; give the command the same --workspace):"
                        + " using the shipped table " + tables.current().version().label());
            }
        }
        Object engine = Class.forName(impl("speciation", "SpeciationService"))
                .getConstructor(AcidityTable.class, int.class, int.class).newInstance(tables.current(), 300, 5000);
        int code = new Cli((Speciation) engine, tables, null, null, System.out, System.err)
                .run(args);
        System.out.flush();
        System.exit(code);
    }
}
