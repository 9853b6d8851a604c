package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import ionmark.notebook.api.Partition;
import ionmark.notebook.api.Separation;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Window;

/**
 * The work-up answer: for a step that mentions two phases (an extraction, a wash, a back-extraction, a
 * layer), the fraction of a structure in the organic phase at the step's pH, from its logD (octanol/water,
 * the only partition the solver estimates, used for the named solvent as well) and the stated or assumed
 * 1:1 phase ratio. And, over an entry, the pH ranges that separate two structures.
 */
final class WorkupPhases {
    private static final Pattern TWO_PHASES = Pattern.compile("(?i)\\b(extract\\w*|back-extract\\w*|wash(?:ed|ing)?|"
            + "partition\\w*|organic (?:layer|phase)|aqueous (?:layer|phase)|layers|separatory funnel)\\b");
    private static final Pattern SOLVENT = Pattern.compile("\\b(EtOAc|ethyl acetate|DCM|dichloromethane|CH2Cl2|"
            + "Et2O|diethyl ether|ether|MTBE|TBME|toluene|chloroform|CHCl3|hexanes?|heptane|2-MeTHF|n-butanol|"
            + "1-butanol|octanol|1-octanol|isopropyl acetate|iPrOAc|cyclohexane)\\b", Pattern.CASE_INSENSITIVE);
    private static final Pattern RATIO = Pattern.compile("(?<![\\d.:])(\\d+(?:[.,]\\d+)?)\\s*:\\s*(\\d+(?:[.,]\\d+)?)"
            + "(?![\\d:])");

    /** What a step says about its phases. */
    record Step(String solvent, double ratio, boolean ratioAssumed) {
    }

    private WorkupPhases() {
    }

    /** The step's phases, or null when its text mentions no two-phase operation. */
    static Step step(String text) {
        if (!TWO_PHASES.matcher(text).find()) {
            return null;
        }
        Matcher s = SOLVENT.matcher(text);
        String solvent = s.find() ? s.group(1) : "organic solvent";
        Matcher r = RATIO.matcher(text);
        if (r.find()) {
            double org = StatedConditions.num(r.group(1));
            double aq = StatedConditions.num(r.group(2));
            if (org > 0 && aq > 0) {
                return new Step(solvent, org / aq, false);
            }
        }
        return new Step(solvent, 1.0, true);
    }

    static List<Partition> partitions(Step step, List<Analysis> analyses) {
        List<Partition> out = new ArrayList<>();
        if (step == null) {
            return out;
        }
        for (Analysis a : analyses) {
            if (a.ok() && a.conditions().hasPh() && FullProfile.of(a).logD() != null && !FullProfile.of(a).logD().isNaN()) {
                double d = Math.pow(10, FullProfile.of(a).logD()) * step.ratio();
                out.add(new Partition(a.conditions().ph(), FullProfile.of(a).logD(), step.solvent(), step.ratio(), step.ratioAssumed(),
                        d / (1 + d)));
            }
        }
        return out;
    }

    /**
     * Whether the net-neutral population is at least 99 % the uncharged species. The share does not depend on pH
     * (it is fixed by the site constants), so the analysis at the stated pH gives it; without a pH, or with no
     * neutral population to take it from, the structure is not claimed extractable.
     */
    static boolean extractableWhenNeutral(Analysis a) {
        if (!a.ok() || a.fractionNeutral() == null || a.fractionUncharged() == null || !(a.fractionNeutral() > 1e-12)) {
            return false;
        }
        return a.fractionUncharged() / a.fractionNeutral() >= 0.99;
    }

    /** "at pH 2.5: 99.7 % in the aqueous layer (EtOAc/water 1:1, assumed)". */
    static String sentence(Partition p) {
        double org = 100 * p.fractionOrganic();
        boolean organic = org >= 50;
        String where = organic ? pct(org) + " in the organic layer" : pct(100 - org) + " in the aqueous layer";
        return "at pH " + StatedConditions.format(p.ph()) + ": " + where + " (" + p.solvent() + "/water "
                + StatedConditions.format(p.ratio()) + ":1" + (p.ratioAssumed() ? ", ratio assumed" : "")
                + "; logD " + String.format(Locale.ROOT, "%.2f", p.logD()) + ")";
    }

    private static String pct(double v) {
        return String.format(Locale.ROOT, v >= 99.95 ? "%.2f %%" : "%.1f %%", Math.min(v, 99.99));
    }

    /**
     * Where structure a is ≥ 99 % neutral while b is ≥ 99 % charged, each range at least 0.5 pH units wide. A
     * structure whose net-neutral form is mostly a zwitterion (an amino acid) never counts as going to the organic
     * phase: its windows are of net charge zero, and a zwitterion stays in water.
     */
    static List<Separation> separations(List<String> words, List<Analysis> analyses) {
        List<Separation> out = new ArrayList<>();
        for (int i = 0; i < analyses.size(); i++) {
            if (!extractableWhenNeutral(analyses.get(i))) {
                continue;
            }
            for (int j = 0; j < analyses.size(); j++) {
                if (i == j || words.get(i).equals(words.get(j))) {
                    continue;
                }
                for (Window n : FullProfile.of(analyses.get(i)).neutralWindows()) {
                    for (Window c : FullProfile.of(analyses.get(j)).chargedWindows()) {
                        double from = Math.max(n.from(), c.from());
                        double to = Math.min(n.to(), c.to());
                        Separation s = new Separation(words.get(i), words.get(j), from, to);
                        if (to - from >= 0.5 && !out.contains(s)) {
                            out.add(s);
                        }
                    }
                }
            }
        }
        return out;
    }
}
