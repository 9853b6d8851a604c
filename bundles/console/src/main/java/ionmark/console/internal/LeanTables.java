package ionmark.console.internal;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.Problem;
import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;

/**
 * The table service of the frameworkless check: holds one table and reaches the acidity bundle's codec and
 * validator by name (the console bundle imports nothing private in OSGi). Unlike the bundle's service it does not
 * build the shipped table when it starts, and it can read a table without the full validation (pattern
 * compilation and every example SMILES) when {@link VerifiedTables} has seen that exact text validate before.
 */
final class LeanTables implements TableService {
    private volatile AcidityTable current;

    LeanTables(AcidityTable table) {
        this.current = Objects.requireNonNull(table, "table");
    }

    /** The shipped table, built and validated by the acidity bundle. */
    static AcidityTable shipped() {
        return (AcidityTable) call("TableSnapshotService", "shipped", new Class<?>[0]);
    }

    /** The full validation: JSON shape, patterns, every example, references, fits, the content hash. */
    static ValidationReport validateText(String json) {
        return (ValidationReport) call("TableValidator", "validate", new Class<?>[] {String.class}, json);
    }

    /**
     * Reads a table text without the pattern and example checks: only for a text whose full validation passed
     * before. The content must still name its own hash.
     */
    static Optional<AcidityTable> readVerified(String json) {
        Object read = call("TableCodec", "read", new Class<?>[] {String.class}, json);
        try {
            Method table = read.getClass().getDeclaredMethod("table");
            Method problems = read.getClass().getDeclaredMethod("problems");
            table.setAccessible(true);
            problems.setAccessible(true);
            AcidityTable t = (AcidityTable) table.invoke(read);
            @SuppressWarnings("unchecked")
            List<Problem> p = (List<Problem>) problems.invoke(read);
            if (t == null || p.stream().anyMatch(x -> x.severity() == Problem.Severity.ERROR)
                    || t.version().hash().isEmpty() || !t.version().hash().equals(hash(t))) {
                return Optional.empty();
            }
            return Optional.of(t);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("the acidity bundle's codec is not the one this console was built with", e);
        }
    }

    /** The table's content hash, as the codec computes it. */
    static String hash(AcidityTable t) {
        return (String) call("TableWriter", "hash", new Class<?>[] {AcidityTable.class}, t);
    }

    private static Object call(String type, String method, Class<?>[] params, Object... args) {
        try {
            Method m = Class.forName(String.join(".", List.of("ionmark", "acidity", "internal", type)))
                    .getDeclaredMethod(method, params);
            m.setAccessible(true);
            return m.invoke(null, args);
        } catch (InvocationTargetException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("the acidity bundle's " + type + "." + method + " is not reachable", e);
        }
    }

    @Override
    public AcidityTable current() {
        return current;
    }

    @Override
    public ValidationReport validate(String json) {
        return validateText(json);
    }

    @Override
    public String toJson(AcidityTable table) {
        return (String) call("TableWriter", "write", new Class<?>[] {AcidityTable.class}, table);
    }

    @Override
    public void install(AcidityTable table) {
        ValidationReport r = validate(toJson(Objects.requireNonNull(table, "table")));
        if (!r.ok()) {
            throw new IllegalArgumentException("table does not validate: " + r.errors());
        }
        current = r.table().orElseThrow();
    }
}
