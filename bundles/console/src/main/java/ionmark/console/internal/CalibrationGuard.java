package ionmark.console.internal;

import java.io.PrintStream;
import java.util.List;
import java.util.Locale;

import ionmark.acidity.api.AcidityTable;
import ionmark.calibration.api.Observation;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableRegression;

/**
 * The before/after report of a calibration and its refusal: a fit that makes the reference set (the
 * handbook compounds shipped with the speciation bundle) worse than the head by more than the margin
 * is not written. A department's data fit only where they are; the reference set says whether the rest
 * of chemistry paid for it.
 */
final class CalibrationGuard {
    /** Default margin: MAE over the reference set may grow by at most this much, in pKa units. */
    static final double MARGIN = 0.02;

    /** The verdict on one fit. */
    record Verdict(boolean accepted, double maeHead, double maeFitted, double margin, String message) {
    }

    private CalibrationGuard() {
    }

    static Verdict decide(double maeHead, double maeFitted, double margin) {
        boolean ok = !(maeFitted > maeHead + margin) && !Double.isNaN(maeFitted);
        String msg = String.format(Locale.ROOT, "reference set MAE %.3f -> %.3f (margin %.3f): %s", maeHead, maeFitted,
                margin, ok ? "accepted" : "REFUSED: the fit makes the reference set worse than the margin allows; "
                        + "the table is not written (check the truth file, or pass --margin to accept a larger loss "
                        + "knowingly)");
        return new Verdict(ok, maeHead, maeFitted, margin, msg);
    }

    /** Prints the before/after figures on the truth data and the reference set, and returns the verdict. */
    static Verdict report(Speciation speciation, TableRegression regression, AcidityTable head, AcidityTable fitted,
            List<Observation> truth, double margin, PrintStream out, PrintStream err) {
        Accuracy.Summary before = Accuracy.summarise(Accuracy.run(speciation, truth, null, new Progress(err, truth.size())),
                speciation);
        var v0 = fitted.version();
        // a version of its own: the pinned service is cached by version hash and number
        Speciation after = speciation.pinned(fitted.withVersion(new ionmark.acidity.api.TableVersion(v0.number(),
                v0.author(), v0.time(), v0.comment(), SeriesExperiment.digest("calibrated|" + System.nanoTime()),
                v0.parent())));
        Accuracy.Summary now = Accuracy.summarise(Accuracy.run(after, truth, null, new Progress(err, truth.size())), after);
        out.println(String.format(Locale.ROOT, "truth file: within 1.0 %.3f -> %.3f, MAE %.3f -> %.3f (%d compounds; "
                + "in-sample: the fit has seen them)", before.within1(), now.within1(), before.mae(), now.mae(),
                truth.size()));
        TableRegression.Report rep = regression.compare(head, fitted);
        Verdict v = decide(rep.maeHead(), rep.maeDraft(), margin);
        out.println(v.message());
        return v;
    }
}
