package ionmark.console.internal;

import ionmark.acidity.api.TableService;
import ionmark.calibration.api.TableCalibration;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableRegression;
import ionmark.speciation.measured.MeasuredImport;
import ionmark.store.api.TableStore;

/**
 * The one place that casts to a calibration type: loaded only when the calibration service was found, so that
 * {@link CommandLineRunner} itself never needs the (optionally imported) calibration API.
 */
final class CalibrationLink {
    private CalibrationLink() {
    }

    static Cli cli(Speciation speciation, TableRegression regression, TableService tables, Object calibration,
            TableStore store, MeasuredImport imports) {
        return new Cli(speciation, regression, tables, (TableCalibration) calibration, store, imports, System.out,
                System.err);
    }
}
