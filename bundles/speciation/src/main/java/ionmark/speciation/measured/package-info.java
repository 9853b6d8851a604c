/**
 * Learning from a department's measurements: bulk import of measured pKa values into a draft table, and
 * which predictions those measurements move through their analogs.
 *
 * <pre>{@code
 * MeasuredImport.Result r = imports.read(Files.readString(tsv), MeasuredImport.Format.TSV, head);
 * r.rows().stream().filter(row -> !row.ok()).forEach(row -> System.out.println(row.line() + ": " + row.problems()));
 * if (r.ok()) tables.toJson(r.draft());   // the head plus the new measured compounds and references
 * }</pre>
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package ionmark.speciation.measured;
