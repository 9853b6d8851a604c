package ionmark.speciation.api;

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
 */
public record ClassFit(String group, int n, int trimmed, double pkaBefore, double pkaAfter, double rhoBefore,
        double rhoAfter, double rmse, double r2, double sdAfter, boolean rejected) {
}
