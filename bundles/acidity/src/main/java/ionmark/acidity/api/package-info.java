/**
 * The shared pKa table as an immutable, versioned snapshot, and the services that hand it out.
 *
 * <pre>{@code
 * AcidityTable table = tableService.current();
 * GroupClass acid = table.group("carboxylic-aliphatic").orElseThrow();
 * double pka = acid.pka();            // pKa of the protonated form, 25 °C, I = 0
 * String why = table.citation(acid.source("pka"));
 * }</pre>
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.4.0")
package ionmark.acidity.api;
