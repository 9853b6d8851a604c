package ionmark.calibration.api;

import java.util.List;

import org.osgi.annotation.versioning.ProviderType;

import ionmark.acidity.api.AcidityTable;

/**
 * Fits each group class's reference pKa (and reaction constant, where the data span enough σ) by
 * least squares to compounds with one experimental value, paired with the site that titrates first;
 * then refines each class's reference pKa against every compound with a site of that class, through
 * the whole model and scored with {@link ionmark.speciation.spi.MacroPairing} (robust least squares, one class at a time).
 *
 * <pre>{@code
 * Result r = calibration.calibrate(tables.current(), observations, "calib-dept-2026",
 *         "Department measurements 2026, potentiometric, 25 °C");
 * tables.validate(tables.toJson(r.table()));   // then publish through the admin workflow
 * }</pre>
 */
@ProviderType
public interface TableCalibration {
    /** Weight, in compounds, of the prior (current) value when shrinking a fit. */
    int PRIOR_WEIGHT = 3;

    /** The calibrated table and one fit per class that had data. */
    record Result(AcidityTable table, List<ClassFit> fits) {
        public Result {
            fits = List.copyOf(fits);
        }
    }

    /**
     * @param referenceId id under which the fitted numbers are cited in the new table
     * @param citation    what the data are (written to the table's references with the fit date)
     */
    Result calibrate(AcidityTable base, List<Observation> data, String referenceId, String citation);
}
