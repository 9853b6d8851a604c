package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The pH a stated reagent solution implies: "washed with sat. NaHCO3", "1 M HCl", "0.1 N NaOH", "2 M Na2CO3",
 * "sat. NH4Cl", "0.1 % TFA", "0.1 % formic acid", "10 mM ammonium acetate", "0.1 M NaH2PO4", "1 M NH3", "PBS",
 * "simulated gastric fluid". Where the composition is known the pH comes from the charge balance computed with
 * Ionmark's own solver and the table's constants ({@link SolutionPh}); where it is a formulation, from the
 * formulation's stated pH with its source.
 */
final class ReagentSolutions {
    /** An implied pH, the words it was read from, where they stand and how it was obtained. */
    record Implied(double ph, String words, int start, String how) {
        Implied {
            ph = Math.round(ph * 100) / 100.0 + 0.0; // two decimals, and never a negative zero
        }
    }

    // The reagents' acid systems as the table holds them (its measured compounds)
    private static final String CARBONIC = "OC(=O)O";
    private static final String AMMONIA = "N";
    private static final String ACETIC = "CC(=O)O";
    private static final String FORMIC = "OC=O";
    private static final String TFA = "OC(=O)C(F)(F)F";
    private static final String PHOSPHORIC = "OP(=O)(O)O";
    private static final String CITRIC = "OC(=O)CC(O)(CC(=O)O)C(=O)O";
    private static final String TRIS = "NC(CO)(CO)CO";
    /** Sulfuric acid: the table has no measured value; first step strong, HSO4⁻ pKa 1.99 (CRC Handbook, from memory). */
    private static final SolutionPh.Constants SULFURIC = new SolutionPh.Constants(new double[] {-3, 1.99}, 0,
            "HSO4⁻ 1.99, CRC Handbook, from memory; first step strong");

    /** Saturated solutions at 20–25 °C (solubility from the CRC Handbook, from memory). */
    private static final double SAT_NAHCO3 = 1.1;
    private static final double SAT_NH4CL = 5.4;

    private static final String CONC = "(\\d+(?:[.,]\\d+)?)\\s*(M|N|mM|mol/L)";
    private static final Pattern MOLAR = Pattern.compile("(?<![\\w.])" + CONC + "\\s+(?:aq(?:ueous|\\.)?\\s+)?"
            + "(HCl|hydrochloric acid|H2SO4|sulfuric acid|NaOH|sodium hydroxide|KOH|potassium hydroxide|LiOH|"
            + "Na2CO3|sodium carbonate|K2CO3|potassium carbonate|NaHCO3|sodium bicarbonate|NH4Cl|ammonium chloride|"
            + "ammonium acetate|NH4OAc|ammonium formate|acetic acid|AcOH|formic acid|sodium acetate|NaOAc|"
            + "NH3|ammonia|NH4OH|ammonium hydroxide|NaH2PO4|KH2PO4|sodium dihydrogen phosphate|"
            + "potassium dihydrogen phosphate|Na2HPO4|K2HPO4|disodium hydrogen phosphate|dipotassium hydrogen phosphate|"
            + "citric acid|Tris base|Tris|TRIS)(?![\\w])(?!\\s*[-·]\\s*HCl|\\s+hydrochloride|\\s+buffer)");
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
    static List<Implied> find(String text, SolutionPh solver) {
        List<Implied> out = new ArrayList<>();
        Matcher m = MOLAR.matcher(text);
        while (m.find()) {
            double c = StatedConditions.num(m.group(1)) / (m.group(2).equals("mM") ? 1000 : 1);
            SolutionPh.Result r = molar(solver, m.group(3), c, m.group(2).equals("N"));
            if (r != null) {
                out.add(new Implied(r.ph(), m.group().strip(), m.start(), r.how()));
            }
        }
        Matcher s = SATURATED.matcher(text);
        while (s.find()) {
            String r = s.group(1).toLowerCase(Locale.ROOT);
            boolean bicarb = r.contains("hco3") || r.contains("bicarbonate") || r.contains("hydrogen carbonate");
            double c = bicarb ? SAT_NAHCO3 : SAT_NH4CL;
            String basis = String.format(Locale.ROOT, "saturated solution taken as %.1f M (solubility, CRC Handbook, "
                    + "from memory)", c);
            SolutionPh.Result res = bicarb
                    ? solver.ph(c, List.of(SolutionPh.Part.table("carbonic acid", CARBONIC, c)), basis)
                    : solver.ph(-c, List.of(SolutionPh.Part.table("ammonium", AMMONIA, c)), basis);
            add(out, res, s.group().strip(), s.start());
        }
        Matcher p = PERCENT.matcher(text);
        while (p.find()) {
            double pct = StatedConditions.num(p.group(1));
            String acid = p.group(2).toLowerCase(Locale.ROOT);
            // v/v: density (g/mL) and molar mass (g/mol), CRC Handbook (from memory)
            String name;
            String smiles;
            double molar;
            if (acid.equals("tfa") || acid.startsWith("trifluoro")) {
                name = "trifluoroacetic acid";
                smiles = TFA;
                molar = pct / 100 * 1.489 * 1000 / 114.02;
            } else if (acid.startsWith("formic") || acid.equals("hcooh") || acid.equals("fa")) {
                name = "formic acid";
                smiles = FORMIC;
                molar = pct / 100 * 1.220 * 1000 / 46.03;
            } else {
                name = "acetic acid";
                smiles = ACETIC;
                molar = pct / 100 * 1.049 * 1000 / 60.05;
            }
            add(out, solver.ph(0, List.of(SolutionPh.Part.table(name, smiles, molar)), String.format(Locale.ROOT,
                    "%.3g M (v/v in water; density and molar mass from the CRC Handbook, from memory)", molar)),
                    p.group().strip(), p.start());
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

    private static void add(List<Implied> out, SolutionPh.Result r, String words, int start) {
        if (r != null) {
            out.add(new Implied(r.ph(), words, start, r.how()));
        }
    }

    /** pH of a stated molar solution, or null for a reagent whose pH the text alone does not fix. */
    private static SolutionPh.Result molar(SolutionPh solver, String reagent, double c, boolean normal) {
        String r = reagent.toLowerCase(Locale.ROOT);
        if (r.equals("hcl") || r.startsWith("hydrochloric")) {
            return solver.ph(-c, List.of(), null);
        }
        if (r.equals("h2so4") || r.startsWith("sulfuric")) {
            double molar = normal ? c / 2 : c; // 1 N sulfuric acid is 0.5 M
            return solver.ph(0, List.of(new SolutionPh.Part("sulfuric acid", molar, null, SULFURIC)), null);
        }
        if (r.matches("naoh|koh|lioh|sodium hydroxide|potassium hydroxide")) {
            return solver.ph(c, List.of(), null);
        }
        if (r.matches("na2co3|k2co3|sodium carbonate|potassium carbonate")) {
            double molar = normal ? c / 2 : c;
            return solver.ph(2 * molar, List.of(SolutionPh.Part.table("carbonic acid", CARBONIC, molar)), null);
        }
        if (r.matches("nahco3|sodium bicarbonate")) {
            return solver.ph(c, List.of(SolutionPh.Part.table("carbonic acid", CARBONIC, c)), null);
        }
        if (r.matches("nh4cl|ammonium chloride")) {
            return solver.ph(-c, List.of(SolutionPh.Part.table("ammonium", AMMONIA, c)), null);
        }
        if (r.matches("nh3|ammonia|nh4oh|ammonium hydroxide")) {
            return solver.ph(0, List.of(SolutionPh.Part.table("ammonium", AMMONIA, c)), null);
        }
        if (r.matches("ammonium acetate|nh4oac")) {
            return solver.ph(0, List.of(SolutionPh.Part.table("ammonium", AMMONIA, c),
                    SolutionPh.Part.table("acetic acid", ACETIC, c)), null);
        }
        if (r.equals("ammonium formate")) {
            return solver.ph(0, List.of(SolutionPh.Part.table("ammonium", AMMONIA, c),
                    SolutionPh.Part.table("formic acid", FORMIC, c)), null);
        }
        if (r.matches("acetic acid|acoh")) {
            return solver.ph(0, List.of(SolutionPh.Part.table("acetic acid", ACETIC, c)), null);
        }
        if (r.matches("sodium acetate|naoac")) {
            return solver.ph(c, List.of(SolutionPh.Part.table("acetic acid", ACETIC, c)), null);
        }
        if (r.equals("formic acid")) {
            return solver.ph(0, List.of(SolutionPh.Part.table("formic acid", FORMIC, c)), null);
        }
        if (r.matches("nah2po4|kh2po4|sodium dihydrogen phosphate|potassium dihydrogen phosphate")) {
            return solver.ph(c, List.of(SolutionPh.Part.table("phosphoric acid", PHOSPHORIC, c)), null);
        }
        if (r.matches("na2hpo4|k2hpo4|disodium hydrogen phosphate|dipotassium hydrogen phosphate")) {
            return solver.ph(2 * c, List.of(SolutionPh.Part.table("phosphoric acid", PHOSPHORIC, c)), null);
        }
        if (r.equals("citric acid")) {
            return solver.ph(0, List.of(SolutionPh.Part.table("citric acid", CITRIC, c)), null);
        }
        if (r.startsWith("tris")) {
            return solver.ph(0, List.of(SolutionPh.Part.table("TRIS", TRIS, c)), null);
        }
        return null;
    }
}
