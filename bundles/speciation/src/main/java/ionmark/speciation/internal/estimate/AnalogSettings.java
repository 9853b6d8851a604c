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
 */
public record AnalogSettings(int radius, double threshold, double prior, double familyWeight, int maxAnalogs) {
    /** Chosen by the series experiment's series-wise cross-validation (docs/learning-from-measurements.md). */
    public static final AnalogSettings DEFAULT = new AnalogSettings(4, 0.3, 1.0, 0.5, 8);

    public AnalogSettings {
        if (radius < 1 || radius > 6 || threshold < 0 || threshold >= 1 || prior <= 0 || familyWeight < 0
                || familyWeight > 1 || maxAnalogs < 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "analog settings out of range: radius %d, threshold %.2f, prior %.2f, family weight %.2f, max %d",
                    radius, threshold, prior, familyWeight, maxAnalogs));
        }
    }

    /**
     * The defaults, each overridable by a system property ({@code ionmark.analog.radius},
     * {@code .threshold}, {@code .prior}, {@code .family}, {@code .max}): the series experiment's
     * parameter search sets them; a product installation leaves them alone.
     */
    public static AnalogSettings current() {
        return new AnalogSettings(Integer.getInteger("ionmark.analog.radius", DEFAULT.radius),
                number("ionmark.analog.threshold", DEFAULT.threshold), number("ionmark.analog.prior", DEFAULT.prior),
                number("ionmark.analog.family", DEFAULT.familyWeight),
                Integer.getInteger("ionmark.analog.max", DEFAULT.maxAnalogs));
    }

    private static double number(String key, double fallback) {
        String v = System.getProperty(key);
        return v == null ? fallback : Double.parseDouble(v);
    }

    /** The kernel: 0 at and below the threshold, rising linearly to 1 at identity. */
    public double kernel(double similarity) {
        return similarity <= threshold ? 0 : (similarity - threshold) / (1 - threshold);
    }
}
