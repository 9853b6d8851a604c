package ionmark.speciation.internal.estimate;

import java.util.Locale;

/**
 * How far measured analogs move a site ({@link AnalogCorrection}).
 *
 * @param radius       bonds around the site atom that its environment covers ({@link SiteEnvironment})
 * @param threshold    local similarity at and below which an analog has no weight
 * @param prior        prior count: the weight of the model's own estimate against the analogs' summed
 *                     weights (one identical analog with prior 1 moves a site half of its residual)
 * @param familyWeight weight factor of an analog whose site is of another class of the same family
 * @param maxAnalogs   the nearest analogs used for one site
 * @param kernel       how the weight rises from the threshold to identity
 */
public record AnalogSettings(int radius, double threshold, double prior, double familyWeight, int maxAnalogs,
        Kernel kernel) {
    /** The weight's shape between the threshold (0) and identity (1). */
    public enum Kernel {
        /** (T − t)/(1 − t) */
        LINEAR,
        /** ((T − t)/(1 − t))²: near analogs count much more than middling ones */
        QUADRATIC
    }

    /**
     * Prior 1: lower priors did better on the series experiment's series-wise folds (0.1: ratio 0.76 against 0.82),
     * but with a shrunk mean they let one weak analog move a site most of the way (glutarimide took +1.1 from
     * succinimide, another class of its family at similarity 0.50, weight 0.14), and the cross-validated figures
     * fell slightly; see docs/analog-series.md.
     */
    public static final AnalogSettings DEFAULT = new AnalogSettings(4, 0.3, 1.0, 0.5, 8, Kernel.LINEAR);

    public AnalogSettings {
        if (radius < 1 || radius > 6 || threshold < 0 || threshold >= 1 || prior <= 0 || familyWeight < 0
                || familyWeight > 1 || maxAnalogs < 1 || kernel == null) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "analog settings out of range: radius %d, threshold %.2f, prior %.2f, family weight %.2f, max %d",
                    radius, threshold, prior, familyWeight, maxAnalogs));
        }
    }

    /**
     * The defaults, each overridable by a system property ({@code ionmark.analog.radius},
     * {@code .threshold}, {@code .prior}, {@code .family}, {@code .max}, {@code .kernel}): the series experiment's
     * parameter search sets them; a product installation leaves them alone.
     */
    public static AnalogSettings current() {
        return new AnalogSettings(Integer.getInteger("ionmark.analog.radius", DEFAULT.radius),
                number("ionmark.analog.threshold", DEFAULT.threshold), number("ionmark.analog.prior", DEFAULT.prior),
                number("ionmark.analog.family", DEFAULT.familyWeight),
                Integer.getInteger("ionmark.analog.max", DEFAULT.maxAnalogs), Kernel.valueOf(System.getProperty(
                        "ionmark.analog.kernel", DEFAULT.kernel.name()).toUpperCase(java.util.Locale.ROOT)));
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
