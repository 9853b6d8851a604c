package ionmark.pipeline;

import java.io.IOException;
import java.io.Serializable;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.ValidationReport;
import ionmark.acidity.internal.TableSnapshotService;

/**
 * What a worker needs to build its engine: the table's JSON text (null: the table shipped in the acidity
 * bundle) and the engine's limits. The text travels inside the serialized DoFn, so workers need no access
 * to the launcher's files.
 */
public record EngineSpec(String tableJson, String label, int maxHeavyAtoms, int timeoutMillis) implements Serializable {
    private static final long serialVersionUID = 1L;
    /** The defaults of the speciation bundle's configuration, so records equal {@code batch}'s. */
    public static final int MAX_HEAVY_ATOMS = 300;
    public static final int TIMEOUT_MILLIS = 5000;

    /** {@code ""} or {@code "shipped"}: the shipped table; else a table file, validated here, on the launcher. */
    public static EngineSpec of(String table, int maxHeavyAtoms, int timeoutMillis) throws IOException {
        if (table == null || table.isBlank() || table.equals("shipped")) {
            return new EngineSpec(null, "shipped", maxHeavyAtoms, timeoutMillis);
        }
        String json = Files.readString(Path.of(table), StandardCharsets.UTF_8);
        read(json, table);
        return new EngineSpec(json, table, maxHeavyAtoms, timeoutMillis);
    }

    /** The table, read and checked by the acidity bundle's codec and validator. */
    AcidityTable table() {
        return tableJson == null ? TableSnapshotService.shipped() : read(tableJson, label);
    }

    private static AcidityTable read(String json, String label) {
        ValidationReport r = new TableSnapshotService(null).validate(json);
        if (!r.ok()) {
            throw new IllegalArgumentException("table " + label + " does not validate: " + r.errors().size()
                    + " errors, first: " + r.errors().get(0));
        }
        return r.table().orElseThrow();
    }

    @Override
    public String toString() {
        return "EngineSpec[" + label + ", " + maxHeavyAtoms + " atoms, " + timeoutMillis + " ms]";
    }
}
