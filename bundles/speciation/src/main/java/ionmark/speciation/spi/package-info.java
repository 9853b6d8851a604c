/**
 * What the calibration bundle ({@code ionmark.calibration}) needs of the engine, and nothing a notebook host
 * calls: an engine bound to one table snapshot, with or without the measured-analog correction, its analyses,
 * the calibration point of an observed value, and the one-to-one pairing of predicted with experimental
 * constants that accuracy, calibration and the analog index all score by.
 *
 * <pre>{@code
 * ModelEngine e = engines.withoutAnalogs(draft);        // the model calibration fits class values on
 * Analysis a = e.analyse("CCN", Conditions.noPh(), true);
 * Optional<CalibrationPoint> p = e.calibrationPoint("CCN", List.of(10.7));
 * }</pre>
 *
 * The implementation stays private to the speciation bundle; the service is registered by the speciation
 * component beside {@code Speciation}. 1.0.0: the calibration types left {@code ionmark.speciation.api} 2.0.0
 * (MacroPairing moved here unchanged).
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package ionmark.speciation.spi;
