/**
 * Calibration and scoring: fitting a table's class values to compounds with experimental pKa values, and the
 * truth files both read. Provided by the calibration bundle, which the notebook runtime does not need.
 *
 * <pre>{@code
 * List<Observation> data = TruthFile.read(Path.of("truth.tsv")).stream()
 *         .filter(o -> !TruthFile.inFold(o.id(), 1, 5)).toList();
 * TableCalibration.Result r = calibration.calibrate(tables.current(), data, "calib-dept-2026",
 *         "Department measurements 2026, potentiometric, 25 °C");
 * tables.validate(tables.toJson(r.table()));   // then publish through the admin workflow
 * }</pre>
 *
 * 1.0.0: {@code TableCalibration}, {@code ClassFit} and {@code Observation} as they were in
 * {@code ionmark.speciation.api} 1.3, and {@code TruthFile}.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package ionmark.calibration.api;
