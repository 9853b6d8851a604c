package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The pH a stated reagent solution implies: "washed with sat. NaHCO3", "1 M HCl", "0.1 N NaOH", "2 M Na2CO3",
 * "sat. NH4Cl", "0.1 % TFA", "0.1 % formic acid", "10 mM ammonium acetate", "PBS", "simulated gastric fluid".
 * Where the composition is known the pH comes from the charge balance ({@link ChargeBalance}, ideal solution,
 * 25 °C) with the constants below; where it is a formulation, from the formulation's stated pH with its source.
 */
final class ReagentSolutions {
    /** An implied pH, the words it was read from, where they stand and how it was obtained. */
    record Implied(double ph, String words, int start, String how) {
        Implied {
            ph = Math.round(ph * 100) / 100.0 + 0.0; // two decimals, and never a negative zero
        }
    }

    // pKa values at 25 °C, I = 0 (CRC Handbook of Chemistry and Physics, dissociation constants of inorganic and
    // organic acids in aqueous solution; from memory)
    private static final double[] CARBONIC = {6.35, 10.33};
    private static final double[] AMMONIUM = {9.25};
    private static final double[] ACETIC = {4.76};
    private static final double[] FORMIC = {3.75};
    private static final double[] TFA = {0.23};

    /** Saturated solutions at 20–25 °C (solubility from the CRC Handbook, from memory). */
    private static final double SAT_NAHCO3 = 1.1;
    private static final double SAT_NH4CL = 5.4;

    private static final String CONC = "(\\d+(?:[.,]\\d+)?)\\s*(M|N|mM|mol/L)";
    private static final Pattern MOLAR = Pattern.compile("(?<![\\w.])" + CONC + "\\s+(?:aq(?:ueous|\\.)?\\s+)?"
            + "(HCl|hydrochloric acid|H2SO4|sulfuric acid|NaOH|sodium hydroxide|KOH|potassium hydroxide|LiOH|"
            + "Na2CO3|sodium carbonate|K2CO3|potassium carbonate|NaHCO3|sodium bicarbonate|NH4Cl|ammonium chloride|"
            + "ammonium acetate|NH4OAc|ammonium formate|acetic acid|AcOH|formic acid)(?![\\w])");
    private static final Pattern SATURATED = Pattern.compile("(?<![\\w])(?:sat(?:urated|\\.|d\\.?)?)\\s+(?:aq(?:ueous|\\.)?"
            + "\\s+)?(NaHCO3|sodium bicarbonate|sodium hydrogen carbonate|NH4Cl|ammonium chloride)(?![\\w])",
            Pattern.CASE_INSENSITIVE);
    private static final Pattern PERCENT = Pattern.compile("(?<![\\w.])(\\d+(?:[.,]\\d+)?)\\s*%\\s*(?:\\(v/v\\)\\s*|v/v\\s*)?"
            + "(TFA|trifluoroacetic acid|formic acid|HCOOH|FA|acetic acid|AcOH)(?![\\w])");
    private static final Pattern FORMULATION = Pattern.compile("(?<![\\w])(PBS|phosphate[- ]buffered saline|simulated "
            + "gastric fluid|SGF|simulated intestinal fluid|SIF)(?![\\w])", Pattern.CASE_INSENSITIVE);

    private ReagentSolutions() {
    }

    /** Every reagent solution the text names whose pH is known, in text order. */
    static List<Implied> find(String text) {
        List<Implied> out = new ArrayList<>();
        Matcher m = MOLAR.matcher(text);
        while (m.find()) {
            double c = StatedConditions.num(m.group(1)) / (m.group(2).equals("mM") ? 1000 : 1);
            Double ph = molar(m.group(3), c, m.group(2).equals("N"));
            if (ph != null) {
                out.add(new Implied(ph, m.group().strip(), m.start(), "charge balance, ideal solution, 25 °C"));
            }
        }
        Matcher s = SATURATED.matcher(text);
        while (s.find()) {
            String r = s.group(1).toLowerCase(Locale.ROOT);
            boolean bicarb = r.contains("hco3") || r.contains("bicarbonate") || r.contains("hydrogen carbonate");
            double c = bicarb ? SAT_NAHCO3 : SAT_NH4CL;
            double ph = bicarb ? ChargeBalance.ph(c, List.of(new ChargeBalance.Weak(c, CARBONIC, 0)))
                    : ChargeBalance.ph(-c, List.of(new ChargeBalance.Weak(c, AMMONIUM, 1)));
            out.add(new Implied(ph, s.group().strip(), s.start(), String.format(Locale.ROOT, "charge balance of a "
                    + "saturated solution taken as %.1f M, ideal, 25 °C", c)));
        }
        Matcher p = PERCENT.matcher(text);
        while (p.find()) {
            double pct = StatedConditions.num(p.group(1));
            String acid = p.group(2).toLowerCase(Locale.ROOT);
            // v/v: density (g/mL) and molar mass (g/mol), CRC Handbook (from memory)
            double[] pka;
            double molar;
            if (acid.equals("tfa") || acid.startsWith("trifluoro")) {
                pka = TFA;
                molar = pct / 100 * 1.489 * 1000 / 114.02;
            } else if (acid.startsWith("formic") || acid.equals("hcooh") || acid.equals("fa")) {
                pka = FORMIC;
                molar = pct / 100 * 1.220 * 1000 / 46.03;
            } else {
                pka = ACETIC;
                molar = pct / 100 * 1.049 * 1000 / 60.05;
            }
            double ph = ChargeBalance.ph(0, List.of(new ChargeBalance.Weak(molar, pka, 0)));
            out.add(new Implied(ph, p.group().strip(), p.start(), String.format(Locale.ROOT, "charge balance of "
                    + "%.3g M (v/v in water), ideal, 25 °C", molar)));
        }
        Matcher f = FORMULATION.matcher(text);
        while (f.find()) {
            String r = f.group(1).toLowerCase(Locale.ROOT);
            if (r.equals("pbs") || r.startsWith("phosphate")) {
                out.add(new Implied(7.4, f.group(), f.start(), "the usual formulation's stated pH (Dulbecco's "
                        + "phosphate-buffered saline, pH 7.4; common practice)"));
            } else if (r.contains("gastric") || r.equals("sgf")) {
                out.add(new Implied(1.2, f.group(), f.start(), "the formulation's stated pH (USP simulated gastric "
                        + "fluid, pH 1.2)"));
            } else {
                out.add(new Implied(6.8, f.group(), f.start(), "the formulation's stated pH (USP simulated intestinal "
                        + "fluid, pH 6.8)"));
            }
        }
        out.sort(java.util.Comparator.comparingInt(Implied::start));
        return out;
    }

    /** pH of a stated molar solution, or null for a reagent whose pH the text alone does not fix. */
    private static Double molar(String reagent, double c, boolean normal) {
        String r = reagent.toLowerCase(Locale.ROOT);
        if (r.equals("hcl") || r.startsWith("hydrochloric")) {
            return ChargeBalance.ph(-c, List.of());
        }
        if (r.equals("h2so4") || r.startsWith("sulfuric")) {
            double molar = normal ? c / 2 : c; // 1 N sulfuric acid is 0.5 M; HSO4⁻ pKa 1.99
            return ChargeBalance.ph(0, List.of(new ChargeBalance.Weak(molar, new double[] {-3, 1.99}, 0)));
        }
        if (r.matches("naoh|koh|lioh|sodium hydroxide|potassium hydroxide")) {
            return ChargeBalance.ph(c, List.of());
        }
        if (r.matches("na2co3|k2co3|sodium carbonate|potassium carbonate")) {
            double molar = normal ? c / 2 : c;
            return ChargeBalance.ph(2 * molar, List.of(new ChargeBalance.Weak(molar, CARBONIC, 0)));
        }
        if (r.matches("nahco3|sodium bicarbonate")) {
            return ChargeBalance.ph(c, List.of(new ChargeBalance.Weak(c, CARBONIC, 0)));
        }
        if (r.matches("nh4cl|ammonium chloride")) {
            return ChargeBalance.ph(-c, List.of(new ChargeBalance.Weak(c, AMMONIUM, 1)));
        }
        if (r.matches("ammonium acetate|nh4oac")) {
            return ChargeBalance.ph(0, List.of(new ChargeBalance.Weak(c, AMMONIUM, 1), new ChargeBalance.Weak(c, ACETIC, 0)));
        }
        if (r.equals("ammonium formate")) {
            return ChargeBalance.ph(0, List.of(new ChargeBalance.Weak(c, AMMONIUM, 1), new ChargeBalance.Weak(c, FORMIC, 0)));
        }
        if (r.matches("acetic acid|acoh")) {
            return ChargeBalance.ph(0, List.of(new ChargeBalance.Weak(c, ACETIC, 0)));
        }
        if (r.equals("formic acid")) {
            return ChargeBalance.ph(0, List.of(new ChargeBalance.Weak(c, FORMIC, 0)));
        }
        return null;
    }
}
