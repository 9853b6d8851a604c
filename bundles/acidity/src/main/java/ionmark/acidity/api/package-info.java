/**
 * The shared pKa table as an immutable, versioned snapshot, and the services that hand it out.
 *
 * <pre>{@code
 * AcidityTable table = tableService.current();
 * GroupClass acid = table.group("carboxylic-aliphatic").orElseThrow();
 * double pka = acid.pka();            // pKa of the protonated form, 25 °C, I = 0
 * String why = table.citation(acid.source("pka"));
 * }</pre>
 *
 * <p>2.0.0 (a major version: a record component changed type): a class's resonance demand is the enum
 * {@link ionmark.acidity.api.Resonance} instead of the strings "p", "p-" and "p+" (the table file keeps the
 * strings), and {@link ionmark.acidity.api.Substituent#sigmaPara(Resonance)} takes it.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("2.0.0")
package ionmark.acidity.api;
