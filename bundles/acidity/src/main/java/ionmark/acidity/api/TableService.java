package ionmark.acidity.api;

import org.osgi.annotation.versioning.ProviderType;

/**
 * The current shared table, and the codec and validator for its JSON text.
 *
 * <pre>{@code
 * ValidationReport r = tableService.validate(Files.readString(path));
 * r.problems().forEach(System.out::println);   // "error $.groups[3].smarts: …"
 * }</pre>
 */
@ProviderType
public interface TableService {

    /** The current snapshot; readers never see a half-applied change. */
    AcidityTable current();

    /** Reads, checks and reports every problem in a table text at once. */
    ValidationReport validate(String json);

    /** The table as canonical JSON text (stable key order, one record per line block). */
    String toJson(AcidityTable table);

    /**
     * Makes a validated table the current one (the admin workflow's publish ends here).
     *
     * @throws IllegalArgumentException when the table does not validate
     */
    void install(AcidityTable table);
}
