package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Conditions stated in words: "pH 7.4", "pH 7,4", "pH = 2.5", "pH of 9", "at pH 5–6", "pH > 10" (a bound),
 * "37 °C", "37 C", "310 K", "rt", "0.15 M NaCl", "I = 0.1 M", "ionic strength 0.5 M". Each finding keeps the
 * words it came from and where they stand in the text. Values outside what the solver computes are not
 * dropped: {@link #flagged(String)} lists them so the card can say so.
 */
public final class StatedConditions {
    /** One stated pH (a range when low &lt; high) and the words it was read from. */
    public record PhStatement(double low, double high, String words, int start, String note) {
        public PhStatement(double low, double high, String words) {
            this(low, high, words, 0, null);
        }

        public boolean isRange() {
            return high > low;
        }
    }

    /** A temperature (°C) or ionic strength (M), its words, where they stand and a note (or null). */
    public record Value(double value, String words, int start, String note) {
        public Value(double value, String words) {
            this(value, words, 0, null);
        }
    }

    private static final String NUM = "(-?\\d{1,2}(?:[.,]\\d+)?)";
    private static final Pattern PH = Pattern.compile("(?<![A-Za-z])pH(?![A-Za-z])\\s*(?:=|:|≈|~|of|is|at|was|to)?\\s*"
            + NUM + "(?:\\s*(?:–|—|-|to|and)\\s*" + NUM + "(?!\\d|[.,]\\d|\\s*(?:°|℃|deg|M\\b|mM\\b|%)))?"
            + "(?![\\d.,]*\\s*(?:M\\b|mM\\b|%))");
    private static final Pattern PH_BOUND = Pattern.compile("(?<![A-Za-z])pH\\s*(>|<|≥|≤|>=|<=|above|below|over|under)"
            + "\\s*" + NUM + "(?![\\d.,]*\\s*(?:M\\b|mM\\b|%))");
    private static final Pattern PH_ANY = Pattern.compile("(?<![A-Za-z])pH(?![A-Za-z])\\s*(?:=|:|of|is|at|was|to)?\\s*"
            + "(-?\\d{1,4}(?:[.,]\\d+)?)(?![\\d.,]*\\s*(?:M\\b|mM\\b|%))");
    private static final Pattern TEMP = Pattern.compile("(-?\\d{1,3}(?:[.,]\\d+)?)\\s*(?:°\\s*C|℃|deg(?:rees)?\\s*C\\b"
            + "|C\\b(?![-(]))");
    private static final Pattern KELVIN = Pattern.compile("(?<![\\w.])(\\d{3}(?:[.,]\\d+)?)\\s*K\\b");
    private static final Pattern ROOM = Pattern.compile("(?<![\\w.])(?:rt|r\\.t\\.|RT|room temperature|ambient "
            + "temperature)(?![\\w])");
    private static final Pattern IONIC = Pattern.compile("(?:(?<![A-Za-z])I|ionic strength(?: of)?)\\s*(?:=|:|of)?\\s*"
            + "(\\d+(?:[.,]\\d+)?)\\s*(m?M)\\b");
    private static final Pattern SALT = Pattern.compile("(\\d+(?:[.,]\\d+)?)\\s*(m?M)\\s+(?:NaCl|KCl|NaNO3|KNO3)\\b");

    /** Room temperature as annotated; the card says it was read as 20–25 °C. */
    static final double ROOM_TEMPERATURE = 25.0;

    private StatedConditions() {
    }

    static double num(String s) {
        return Double.parseDouble(s.replace(',', '.'));
    }

    /** pH statements the solver can use (−2 to 16), ranges and bounds included, in text order. */
    public static List<PhStatement> ph(String text) {
        List<PhStatement> out = new ArrayList<>();
        Matcher m = PH.matcher(text);
        while (m.find()) {
            double a = num(m.group(1));
            double b = m.group(2) == null ? a : num(m.group(2));
            if (a < -2 || a > 16 || b < -2 || b > 16) {
                continue;
            }
            out.add(new PhStatement(Math.min(a, b), Math.max(a, b), m.group().strip(), m.start(), null));
        }
        Matcher bm = PH_BOUND.matcher(text);
        while (bm.find()) {
            double a = num(bm.group(2));
            if (a >= -2 && a <= 16) {
                out.add(new PhStatement(a, a, bm.group().strip(), bm.start(), "stated as a bound ('" + bm.group().strip()
                        + "'): annotated at the bound"));
            }
        }
        out.sort(java.util.Comparator.comparingInt(PhStatement::start));
        return out;
    }

    /** Statements of pH, temperature or ionic strength outside what the solver computes, in words. */
    public static List<Value> flagged(String text) {
        List<Value> out = new ArrayList<>();
        Matcher m = PH_ANY.matcher(text);
        while (m.find()) {
            double v = num(m.group(1));
            if (v < -2 || v > 16) {
                out.add(new Value(v, m.group().strip(), m.start(), "'" + m.group().strip() + "' is outside pH −2…16, "
                        + "the range Ionmark computes: not used"));
            }
        }
        Matcher t = TEMP.matcher(text);
        while (t.find()) {
            double v = num(t.group(1));
            if (v < 0 || v > 100) {
                out.add(new Value(v, t.group().strip(), t.start(), "'" + t.group().strip() + "' is outside 0–100 °C, "
                        + "the range Ionmark computes: not used"));
            }
        }
        return out;
    }

    public static List<Value> temperature(String text) {
        List<Value> out = new ArrayList<>();
        Matcher m = TEMP.matcher(text);
        while (m.find()) {
            double t = num(m.group(1));
            if (t >= 0 && t <= 100) {
                out.add(new Value(t, m.group().strip(), m.start(), null));
            }
        }
        Matcher k = KELVIN.matcher(text);
        while (k.find()) {
            double t = num(k.group(1)) - 273.15;
            if (t >= 0 && t <= 100) {
                out.add(new Value(Math.round(t * 100) / 100.0, k.group().strip(), k.start(), null));
            }
        }
        Matcher r = ROOM.matcher(text);
        while (r.find()) {
            out.add(new Value(ROOM_TEMPERATURE, r.group().strip(), r.start(), "'" + r.group().strip()
                    + "' read as 20–25 °C; annotated at 25 °C"));
        }
        out.sort(java.util.Comparator.comparingInt(Value::start));
        return out;
    }

    public static List<Value> ionicStrength(String text) {
        List<Value> out = new ArrayList<>();
        for (Pattern p : List.of(IONIC, SALT)) {
            Matcher m = p.matcher(text);
            while (m.find()) {
                double v = num(m.group(1));
                if ("mM".equals(m.group(2))) {
                    v /= 1000;
                }
                out.add(new Value(v, m.group().strip(), m.start(), v > 0.5 ? "ionic strength above 0.5 M: the Davies "
                        + "correction is only a rough guide there" : null));
            }
        }
        out.sort(java.util.Comparator.comparingInt(Value::start));
        return out;
    }

    static String format(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v).replaceAll("0+$", "").replaceAll("\\.$", "");
        return s.equals("-0") ? "0" : s;
    }
}
