package ionmark.speciation.internal.estimate;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * Fixed-point text of a number, the same characters as {@code String.format(Locale.ROOT, "%.Nf")} (and
 * {@code "%+.Nf"}) without a {@link java.util.Formatter}: the formatter looks up the locale's decimal symbols on
 * every number, and the analog lines of a derivation (about fifteen per molecule) were a sixth of the brief
 * path's time. Same rule as the formatter: the shortest decimal digits that identify the double
 * ({@link Double#toString}), rounded half up at the requested digit; the sign of negative zero kept.
 * {@code DecimalsTest} holds it to the formatter.
 */
final class Decimals {
    private Decimals() {
    }

    /** {@code String.format(Locale.ROOT, "%.{digits}f", v)}. */
    static String fixed(double v, int digits) {
        return append(new StringBuilder(12), v, digits, false).toString();
    }

    /**
     * Appends {@code v} with {@code digits} decimals; {@code plus}: a '+' before a number that is not negative
     * (the formatter's '+' flag).
     */
    static StringBuilder append(StringBuilder sb, double v, int digits, boolean plus) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return sb.append(String.format(Locale.ROOT, plus ? "%+." + digits + "f" : "%." + digits + "f", v));
        }
        if (Double.compare(v, 0.0) < 0) { // negative, -0.0 included, as the formatter decides the sign
            sb.append('-');
        } else if (plus) {
            sb.append('+');
        }
        String shortest = Double.toString(Math.abs(v));
        if (shortest.indexOf('E') >= 0) { // very large or small: rare here, BigDecimal reads the exponent
            return sb.append(new BigDecimal(shortest).setScale(digits, RoundingMode.HALF_UP).toPlainString());
        }
        return rounded(sb, shortest, digits);
    }

    /** {@code plain} ("123.4567", no sign or exponent) rounded half up to {@code digits} decimals, appended. */
    private static StringBuilder rounded(StringBuilder sb, String plain, int digits) {
        int dot = plain.indexOf('.');
        int end = dot + 1 + digits; // index of the first digit dropped
        char[] kept = new char[end];
        for (int i = 0; i < end; i++) {
            kept[i] = i < plain.length() ? plain.charAt(i) : '0';
        }
        boolean carry = end < plain.length() && plain.charAt(end) >= '5';
        for (int i = end - 1; carry && i >= 0; i--) {
            if (kept[i] == '.') {
                continue;
            }
            carry = kept[i] == '9';
            kept[i] = carry ? '0' : (char) (kept[i] + 1);
        }
        if (carry) {
            sb.append('1');
        }
        return sb.append(kept, 0, digits == 0 ? dot : end);
    }
}
