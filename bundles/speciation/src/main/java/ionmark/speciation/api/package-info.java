/**
 * Ionization of one structure at stated conditions: sites, estimated pKa values with their
 * derivation, microstate populations, charge, and how much is neutral.
 *
 * <pre>{@code
 * Analysis a = speciation.analyse("CC(=O)O", Conditions.atPh(4.76));
 * a.sites().get(0).pka();          // about 4.76
 * a.sites().get(0).protonated();   // about 0.5
 * a.fractionNeutral();             // about 0.5 (net charge 0, zwitterions included)
 * a.fractionUncharged();           // about 0.5 (no charged site)
 * a.profile().logD();              // a full analysis only; screen(...) leaves the profile out (null)
 * }</pre>
 *
 * <p>2.0.0 (a major version: types were removed): the calibration and scoring types ({@code TableCalibration},
 * {@code ClassFit}, {@code Observation}) moved to {@code ionmark.calibration.api} in the calibration bundle, which
 * the runtime does not need; {@code MacroPairing} moved to {@code ionmark.speciation.spi}. What a notebook host
 * calls stays here: {@code Speciation}, its values, and {@code TableRegression} (the table admin page's
 * reference-set check of a draft). Also in 2.0.0: a site's type and basis are enums ({@code SiteType},
 * {@link ionmark.speciation.api.Basis}); {@code curve} returns a {@link ionmark.speciation.api.CurveResult} instead
 * of throwing; an unreadable structure says where ({@link ionmark.speciation.api.ErrorPosition}); species, logP,
 * logD, windows and the isoelectric point moved from {@code Analysis} into its optional
 * {@link ionmark.speciation.api.Profile}; the 1.1 and 1.2 constructors of {@code Analysis} are gone.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("2.0.0")
package ionmark.speciation.api;
