/**
 * Ionization of one structure at stated conditions: sites, estimated pKa values with their
 * derivation, microstate populations, charge, and how much is neutral.
 *
 * <pre>{@code
 * Analysis a = speciation.analyse("CC(=O)O", Conditions.atPh(4.76));
 * a.sites().get(0).pka();          // about 4.76
 * a.sites().get(0).protonated();   // about 0.5
 * a.fractionNeutral();             // about 0.5 (net charge 0, zwitterions included)
 * a.fractionUncharged();           // about 0.5 (no charged site; since 1.2)
 * }</pre>
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.3.0")
package ionmark.speciation.api;
