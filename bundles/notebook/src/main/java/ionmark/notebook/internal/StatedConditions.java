package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Conditions stated in words: "pH 7.4", "pH = 2.5", "pH of 9", "at pH 5–6", "pH 5 to 6" (a range),
 * "37 °C", "0.15 M NaCl", "I = 0.1 M". Each finding keeps the words it came from.
 */
public final class StatedConditions {
    /** One stated pH (a range when low < high) and the words it was read from. */
    public record PhStatement(double low, double high, String words) {
        public boolean isRange() {
            return high > low;
        }
    }

    public record Value(double value, String words) {
    }

    private static final String NUM = "(-?\\d{1,2}(?:\\.\\d+)?)";
    private static final Pattern PH = Pattern.compile("(?<![A-Za-z])pH(?![A-Za-z])\\s*(?:=|:|≈|~|of|is|at|was|to)?\\s*"
            + NUM + "(?:\\s*(?:–|—|-|to|and)\\s*" + NUM + "(?!\\d|\\.\\d|\\s*(?:°|℃|deg|M\\b|mM\\b|%)))?"
            + "(?![\\d.]*\\s*(?:M\\b|mM\\b|%))");
    private static final Pattern TEMP = Pattern.compile("(-?\\d{1,3}(?:\\.\\d+)?)\\s*(?:°\\s*C|℃|deg(?:rees)?\\s*C\\b)");
    private static final Pattern IONIC = Pattern.compile("(?<![A-Za-z])I\\s*=\\s*(\\d+(?:\\.\\d+)?)\\s*(m?M)\\b");
    private static final Pattern SALT = Pattern.compile("(\\d+(?:\\.\\d+)?)\\s*(m?M)\\s+(?:NaCl|KCl|NaNO3|KNO3)\\b");

    private StatedConditions() {
    }

    public static List<PhStatement> ph(String text) {
        List<PhStatement> out = new ArrayList<>();
        Matcher m = PH.matcher(text);
        while (m.find()) {
            double a = Double.parseDouble(m.group(1));
            double b = m.group(2) == null ? a : Double.parseDouble(m.group(2));
            if (a < -2 || a > 16 || b < -2 || b > 16) {
                continue;
            }
            out.add(new PhStatement(Math.min(a, b), Math.max(a, b), m.group().strip()));
        }
        return out;
    }

    public static List<Value> temperature(String text) {
        List<Value> out = new ArrayList<>();
        Matcher m = TEMP.matcher(text);
        while (m.find()) {
            double t = Double.parseDouble(m.group(1));
            if (t >= 0 && t <= 100) {
                out.add(new Value(t, m.group().strip()));
            }
        }
        return out;
    }

    public static List<Value> ionicStrength(String text) {
        List<Value> out = new ArrayList<>();
        for (Pattern p : List.of(IONIC, SALT)) {
            Matcher m = p.matcher(text);
            while (m.find()) {
                double v = Double.parseDouble(m.group(1));
                if ("mM".equals(m.group(2))) {
                    v /= 1000;
                }
                out.add(new Value(v, m.group().strip()));
            }
        }
        return out;
    }

    static String format(double v) {
        return String.format(Locale.ROOT, "%.2f", v).replaceAll("0+$", "").replaceAll("\\.$", "");
    }
}
