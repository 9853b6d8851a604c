package ionmark.calibration.api;

/**
 * The least-squares fit of one group class.
 *
 * @param group      class id
 * @param n          compounds used (monoprotic, after trimming)
 * @param trimmed    compounds dropped as outliers
 * @param pkaBefore  reference pKa before
 * @param pkaAfter   reference pKa after (shrunk toward the prior with weight {@link TableCalibration#PRIOR_WEIGHT})
 * @param rhoBefore  reaction constant before (NaN for classes without a relation)
 * @param rhoAfter   reaction constant after
 * @param rmse       root mean square residual after the fit
 * @param r2         coefficient of determination (NaN when only the intercept was fitted)
 * @param sdAfter    the class uncertainty written to the table
 * @param rejected   the fit moved the reference value too far to be trusted; the class was left unchanged
 * @param pkaSingleSite the reference pKa after the one-site fit, before the whole-model refinement
 * @param wholeModelN compounds with a site of the class used by the whole-model refinement (0: not refined)
 */
public record ClassFit(String group, int n, int trimmed, double pkaBefore, double pkaAfter, double rhoBefore,
        double rhoAfter, double rmse, double r2, double sdAfter, boolean rejected, double pkaSingleSite,
        int wholeModelN) {

    /** A one-site fit, not (yet) refined. */
    public ClassFit(String group, int n, int trimmed, double pkaBefore, double pkaAfter, double rhoBefore,
            double rhoAfter, double rmse, double r2, double sdAfter, boolean rejected) {
        this(group, n, trimmed, pkaBefore, pkaAfter, rhoBefore, rhoAfter, rmse, r2, sdAfter, rejected, pkaAfter, 0);
    }

    /** This fit with the values the whole-model refinement chose on {@code compounds} compounds. */
    public ClassFit refined(double pka, double rho, int compounds) {
        return new ClassFit(group, n, trimmed, pkaBefore, pka, rhoBefore, rho, rmse, r2, sdAfter, rejected,
                pkaAfter, compounds);
    }

    /** A class that only the whole-model refinement moved (no usable one-site compounds). */
    public static ClassFit refinedOnly(String group, int compounds, double before, double after, double rhoBefore,
            double rhoAfter) {
        return new ClassFit(group, 0, 0, before, after, rhoBefore, rhoAfter, Double.NaN, Double.NaN, Double.NaN,
                false, before, compounds);
    }
}
