/**
 * Rules about the table's SMARTS patterns that more than one bundle applies; no table records here.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package ionmark.acidity.patterns;
