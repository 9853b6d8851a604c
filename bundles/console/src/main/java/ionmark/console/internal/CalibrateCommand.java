package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.calibration.api.Observation;
import ionmark.calibration.api.TableCalibration;
import ionmark.calibration.api.TruthFile;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableRegression;

/**
 * {@code table calibrate --truth FILE --out FILE}: class values fitted on a truth file, guarded by the
 * reference set ({@link CalibrationGuard}) when a regression report is available, written as a draft.
 */
final class CalibrateCommand implements Command {
    private final Speciation speciation;
    private final TableService tables;
    private final TableCalibration calibration;
    private final TableRegression regression;
    private final PrintStream out;
    private final PrintStream err;

    /** {@code regression} may be null: the draft is then written without the guard. */
    CalibrateCommand(Speciation speciation, TableService tables, TableCalibration calibration,
            TableRegression regression, PrintStream out, PrintStream err) {
        this.speciation = speciation;
        this.tables = tables;
        this.calibration = calibration;
        this.regression = regression;
        this.out = out;
        this.err = err;
    }

    @Override
    public int run(List<String> raw) {
        Cli.Args a = Cli.Args.parse(raw, Set.of("--truth", "--out", "--ref", "--citation", "--fold", "--margin"));
        if (!a.flags().containsKey("--out")) {
            throw new Cli.UsageException("table calibrate needs --out FILE");
        }
        int[] f = AccuracyCommand.fold(a.flags().get("--fold"));
        List<Observation> data = AccuracyCommand.truth(a).stream()
                .filter(o -> f == null || !TruthFile.inFold(o.id(), f[0], f[1])).toList();
        String ref = a.flags().getOrDefault("--ref", "calibration");
        String citation = a.flags().getOrDefault("--citation", "Calibration data " + a.flags().get("--truth") + ".");
        TableCalibration.Result r = calibration.calibrate(tables.current(), data, ref, citation);
        for (var fit : r.fits()) {
            if (fit.group().startsWith("pair ")) { // a pair rule: its two values, fitted on the whole model only
                out.println(String.format(Locale.ROOT, "%-32s singly %.2f -> %.2f  doubly %.2f -> %.2f  (whole model on %d)",
                        fit.group(), fit.pkaBefore(), fit.pkaAfter(), fit.rhoBefore(), fit.rhoAfter(), fit.wholeModelN()));
                continue;
            }
            out.println(String.format(Locale.ROOT, "%-32s n=%4d trimmed=%3d pKa %6.2f -> %6.2f  rho %6.2f -> %6.2f  "
                    + "RMSE %.2f%s", fit.group(), fit.n(), fit.trimmed(), fit.pkaBefore(), fit.pkaAfter(), fit.rhoBefore(),
                    fit.rhoAfter(), fit.rmse(), fit.rejected() ? "  REJECTED (moves too far; class unchanged)"
                            : fit.wholeModelN() > 0 ? String.format(Locale.ROOT, "  (one-site %.2f, whole model on %d)",
                                    fit.pkaSingleSite(), fit.wholeModelN()) : ""));
        }
        if (regression != null && !CalibrationGuard.report(speciation, regression, tables.current(), r.table(), data,
                a.flags().containsKey("--margin") ? a.number("--margin") : CalibrationGuard.MARGIN, out, err).accepted()) {
            return 1;
        }
        try {
            Files.writeString(Path.of(a.flags().get("--out")), tables.toJson(r.table()), StandardCharsets.UTF_8);
        } catch (IOException e) {
            err.println("ionmark: cannot write: " + e.getMessage());
            return 1;
        }
        ValidationReport v = tables.validate(tables.toJson(r.table()));
        out.println(r.fits().size() + " classes fitted on " + data.size() + " compounds; " + v.errors().size()
                + " validation errors");
        return v.ok() ? 0 : 1;
    }
}
