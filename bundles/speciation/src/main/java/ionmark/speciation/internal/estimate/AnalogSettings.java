package ionmark.speciation.internal.estimate;

import java.util.Locale;

/**
 * How far measured analogs move a site ({@link AnalogCorrection}).
 *
 * @param radius       bonds around the site atom that its environment covers ({@link SiteEnvironment})
 * @param threshold    similarity (local, or blended with the whole molecule's, see {@code global}) at and below which
 *                     an analog has no weight
 * @param prior        prior count: the weight of the model's own estimate against the analogs' summed
 *                     weights (one identical analog with prior 1 moves a site half of its residual)
 * @param familyWeight weight factor of an analog whose site is of another class of the same family
 * @param maxAnalogs   the nearest analogs used for one site
 * @param kernel       how the weight rises from the threshold to identity
 * @param huber        residuals further than this from the analogs' weighted median keep only huber/|r − median| of
 *                     their weight (0: off); applied when a site has three or more analogs
 * @param nearPrior    the prior count when the nearest analog is identical (weight 1); {@code prior} is then the
 *                     prior count when the nearest analog sits at the threshold (weight 0), and in between the prior
 *                     falls geometrically with the nearest analog's weight ({@link #prior(double)}), so a lone
 *                     distant analog moves a site less than a close one; equal to {@code prior}: one prior for all
 * @param assignment   which site of a measured compound takes each measured value's residual
 * @param annular      whether an azole's ring nitrogens that pass its N-H between them count alike in the site
 *                     environment ({@link SiteEnvironment#prepare}), so that the annular tautomer a structure was
 *                     read in does not decide its analogs
 * @param global       the whole molecules' share of an analog's similarity: (1 − global) · local + global · whole
 *                     molecule (ECFP4-like Tanimoto, {@link SiteEnvironment#molecule}); 0 compares sites only
 */
public record AnalogSettings(int radius, double threshold, double prior, double familyWeight, int maxAnalogs,
        Kernel kernel, double huber, double nearPrior, Assignment assignment, boolean annular, double global) {
    /** Which site of a measured compound takes the residual of a measured value. */
    public enum Assignment {
        /** the site whose estimate lies nearest the measured value (as an exact match is fitted) */
        NEAREST,
        /** the site that titrates in the model's step paired with the value (its largest share of the step) */
        TITRATING,
        /** every site with a fair share of that step, its share a factor on the analog weight */
        SPLIT
    }

    /** The weight's shape between the threshold (0) and identity (1). */
    public enum Kernel {
        /** (T − t)/(1 − t) */
        LINEAR,
        /** ((T − t)/(1 − t))²: near analogs count much more than middling ones */
        QUADRATIC
    }

    /**
     * Similarity 0.1 · local + 0.9 · whole molecule, a prior count falling from 0.1 (nearest analog at the threshold)
     * to 0.01 (an identical one), robust weights (0.5 units), analogs of another class of the same family at half
     * weight. Before round 6 the
     * similarity was the local one alone and the prior 0.15, chosen on the series experiment's two series-wise folds,
     * each scored with a table calibrated without its series, against the five-fold cross-validated development figures (docs/analog-series.md): pooled ratio 0.82 (prior 1) → 0.75, CV within
     * 1.0 80.45 % → 80.43 %, MAE 0.627 → 0.630. Without the robust weights a low prior let one misassigned
     * measurement drag a series; with family analogs (weight 0.5) one weak analog of another class moved a site
     * most of the way (glutarimide +0.8 from succinimide). Residuals on the site that titrates in the model's paired
     * step: pooled ratio 0.746 → 0.739, biased series 0.707 → 0.703, CV 80.43 % → 80.47 %, MAE 0.6295 → 0.6291; with
     * azole ring nitrogens alike as well: 0.736, 0.692, 80.47 %, 0.6293 (docs/analog-series.md, round 4). Whole
     * molecules' share 0.9 of the similarity, prior 0.1 falling to 0.01 (round 6, series tables and fold tables of
     * table v37's code): pooled ratio 0.764 → 0.755, biased series' bias cut −43.5 % → −50.6 %, CV within 1.0
     * 81.29 % → 81.15 %, MAE 0.6138 → 0.6102, within 1 sd 0.703 → 0.713. A flat prior of 0.03 cut the bias further
     * (−52.8 %) but let one weak analog move a site most of its residual. Family analogs at weight 0.5 (round 7, series
     * and fold tables recalibrated by table v37's code): pooled ratio 0.748 → 0.742, bias cut −50.8 % → −51.2 %, CV
     * within 1.0 81.19 % → 81.21 %, MAE 0.6101 → 0.6109, drug-like file unchanged; with the whole molecule's share a
     * family analog counts in a molecule like the query (a series member whose site a substituent puts in another
     * class), and table v37's succinimide class took away the glutarimide failure that had kept them off.
     */
    public static final AnalogSettings DEFAULT = new AnalogSettings(4, 0.3, 0.1, 0.5, 8, Kernel.LINEAR, 0.5, 0.01,
            Assignment.TITRATING, true, 0.9);

    /** Sites compared by their local environments only (the settings before the whole-molecule share). */
    public AnalogSettings(int radius, double threshold, double prior, double familyWeight, int maxAnalogs,
            Kernel kernel, double huber, double nearPrior, Assignment assignment, boolean annular) {
        this(radius, threshold, prior, familyWeight, maxAnalogs, kernel, huber, nearPrior, assignment, annular, 0);
    }

    /** One prior count for every site, whatever its nearest analog (the settings before the nearest-analog prior). */
    public AnalogSettings(int radius, double threshold, double prior, double familyWeight, int maxAnalogs,
            Kernel kernel, double huber) {
        this(radius, threshold, prior, familyWeight, maxAnalogs, kernel, huber, prior);
    }

    /**
     * Residuals on the sites nearest the measured values, azoles compared in the tautomer read (the settings before
     * the titrating-site rule and the annular-tautomer environment).
     */
    public AnalogSettings(int radius, double threshold, double prior, double familyWeight, int maxAnalogs,
            Kernel kernel, double huber, double nearPrior) {
        this(radius, threshold, prior, familyWeight, maxAnalogs, kernel, huber, nearPrior, Assignment.NEAREST, false);
    }

    public AnalogSettings {
        if (radius < 1 || radius > 6 || threshold < 0 || threshold >= 1 || prior <= 0 || familyWeight < 0
                || familyWeight > 1 || maxAnalogs < 1 || kernel == null || huber < 0 || nearPrior <= 0
                || assignment == null || global < 0 || global > 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "analog settings out of range: radius %d, threshold %.2f, prior %.2f, family weight %.2f, max %d, "
                            + "near prior %.2f, whole-molecule share %.2f", radius, threshold, prior, familyWeight,
                    maxAnalogs, nearPrior, global));
        }
    }

    /**
     * The defaults, each overridable by a system property ({@code ionmark.analog.radius},
     * {@code .threshold}, {@code .prior}, {@code .family}, {@code .max}, {@code .kernel}, {@code .huber},
     * {@code .near-prior}, {@code .assign}, {@code .annular}, {@code .global}): the series experiment's parameter search sets them; a product installation leaves them
     * alone. A prior given without a near prior is one prior for all sites.
     */
    public static AnalogSettings current() {
        String prior = System.getProperty("ionmark.analog.prior");
        double far = prior == null ? DEFAULT.prior : Double.parseDouble(prior);
        return new AnalogSettings(Integer.getInteger("ionmark.analog.radius", DEFAULT.radius),
                number("ionmark.analog.threshold", DEFAULT.threshold), far,
                number("ionmark.analog.family", DEFAULT.familyWeight),
                Integer.getInteger("ionmark.analog.max", DEFAULT.maxAnalogs), Kernel.valueOf(System.getProperty(
                        "ionmark.analog.kernel", DEFAULT.kernel.name()).toUpperCase(java.util.Locale.ROOT)),
                number("ionmark.analog.huber", DEFAULT.huber),
                number("ionmark.analog.near-prior", prior == null ? DEFAULT.nearPrior : far),
                Assignment.valueOf(System.getProperty("ionmark.analog.assign", DEFAULT.assignment.name())
                        .toUpperCase(java.util.Locale.ROOT)),
                Boolean.parseBoolean(System.getProperty("ionmark.analog.annular", Boolean.toString(DEFAULT.annular))),
                number("ionmark.analog.global", DEFAULT.global));
    }

    /**
     * The prior count for a site whose nearest (heaviest) analog has weight {@code nearest} (0 at the threshold, 1 when
     * identical): prior · (nearPrior/prior)^nearest, falling by the same factor for each step of weight. (A linear
     * fall, measured first, took more of the trust from half-close analogs, which series members mostly are.)
     */
    public double prior(double nearest) {
        if (nearPrior == prior) {
            return prior;
        }
        return prior * Math.pow(nearPrior / prior, Math.max(0, Math.min(1, nearest)));
    }

    private static double number(String key, double fallback) {
        String v = System.getProperty(key);
        return v == null ? fallback : Double.parseDouble(v);
    }

    /** The weight of an analog at this similarity: 0 at and below the threshold, rising to 1 at identity. */
    public double weight(double similarity) {
        if (similarity <= threshold) {
            return 0;
        }
        double x = (similarity - threshold) / (1 - threshold);
        return kernel == Kernel.QUADRATIC ? x * x : x;
    }
}
