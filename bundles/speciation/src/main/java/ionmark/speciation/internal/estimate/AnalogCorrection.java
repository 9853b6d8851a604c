package ionmark.speciation.internal.estimate;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.regex.Pattern;

import ionmark.speciation.api.Term;
import ionmark.speciation.internal.sites.MatchTarget;

/**
 * Moves each estimated site toward its measured analogs: sites of the same class (or, with less weight,
 * the same family) whose local environment resembles the query site's, in molecules that resemble the query (the
 * settings' whole-molecule share of the similarity, {@link AnalogSettings#global()}: members of one series).
 * The shift is a kernel-weighted, shrunk mean of the analogs' residuals, Σ wᵢrᵢ / (prior + Σ wᵢ): an analog below
 * the threshold moves a site not at all, several close ones most of the way. The prior count can fall with the
 * nearest analog's weight ({@link AnalogSettings#prior(double)}). The sd shrinks a little with the evidence and widens with the
 * analogs' disagreement. Every analog used is one line of the derivation (name, similarity, residual, weight,
 * source), and the lines add up to the shift. A site without an analog above the threshold is returned
 * as it was, the same object.
 */
public final class AnalogCorrection {
    private static final double MIN_SD = 0.15;

    private AnalogCorrection() {
    }

    /**
     * An analog used: its site's local similarity, its whole molecule's (NaN when not compared), its weight, and whether
     * that weight was cut for a residual far from the others'.
     */
    record Used(SiteAnalogIndex.MeasuredSite site, double similarity, double whole, double weight, boolean damped) {
        Used(SiteAnalogIndex.MeasuredSite site, double similarity, double weight, boolean damped) {
            this(site, similarity, Double.NaN, weight, damped);
        }
    }

    public static List<EstimatedSite> apply(SiteAnalogIndex index, MatchTarget mol, List<EstimatedSite> est) {
        if (index.size() == 0) {
            return est;
        }
        List<EstimatedSite> out = new ArrayList<>(est.size());
        SiteEnvironment.Prepared ids = null; // the molecule's circular identifiers, shared by its sites' environments
        int[] whole = null; // the whole molecule's features, when the settings compare whole molecules
        for (EstimatedSite s : est) {
            if (s.site().group().permanent()) {
                out.add(s);
                continue;
            }
            String held = heldBy(s);
            List<SiteAnalogIndex.MeasuredSite> cands = index.candidates(s.site().group(), held);
            if (cands.isEmpty()) {
                out.add(s);
                continue;
            }
            if (ids == null) {
                ids = SiteEnvironment.prepare(mol, index.settings().radius(), index.settings().annular());
                whole = index.settings().global() > 0 ? SiteEnvironment.molecule(ids) : new int[0];
            }
            out.add(correct(index, SiteEnvironment.of(mol, ids, s.site(), index.settings().radius()), whole, s, cands));
        }
        return out;
    }

    /**
     * {@code cands}: the index's candidates for the site's class and pair rules; {@code env}: its environment;
     * {@code whole}: its molecule's features (empty when the settings compare sites only).
     */
    private static EstimatedSite correct(SiteAnalogIndex index, int[] env, int[] whole, EstimatedSite s,
            List<SiteAnalogIndex.MeasuredSite> cands) {
        AnalogSettings cfg = index.settings();
        // one site per measured compound, its most similar: symmetric sites (citric acid's two CH2COOH) count once
        java.util.Map<String, Used> best = new java.util.HashMap<>();
        for (SiteAnalogIndex.MeasuredSite m : cands) {
            // a site stored without its molecule's features (an index built for sites only) is compared by its site
            boolean compared = cfg.global() > 0 && m.molecule().length > 0;
            double mol = compared ? SiteEnvironment.tanimoto(whole, m.molecule()) : Double.NaN;
            if (compared && (1 - cfg.global()) + cfg.global() * mol <= cfg.threshold()) {
                continue; // even an identical site environment cannot lift this molecule above the threshold
            }
            double sim = SiteEnvironment.tanimoto(env, m.env());
            // a sum of two similarity kernels: a member of the query's series counts more, a site of the same local
            // environment in an unrelated molecule less (taking only the larger of the two lost the series gain)
            double blend = compared ? (1 - cfg.global()) * sim + cfg.global() * mol : sim;
            double w = cfg.weight(blend) * (m.group().equals(s.site().group().id()) ? 1 : cfg.familyWeight())
                    * m.share();
            if (w > 0) {
                best.merge(m.compound().id(), new Used(m, sim, mol, w, false), (a, b) -> a.weight() >= b.weight() ? a : b);
            }
        }
        if (best.isEmpty()) {
            return s;
        }
        List<Used> used = new ArrayList<>(best.values());
        used.sort(Comparator.comparingDouble(Used::weight).reversed()
                .thenComparing(u -> u.site().compound().id()));
        if (used.size() > cfg.maxAnalogs()) {
            used = used.subList(0, cfg.maxAnalogs());
        }
        double prior = cfg.prior(used.get(0).weight()); // the nearest analog's weight, before the robust cut
        if (cfg.huber() > 0 && used.size() > 2) {
            used = robust(used, cfg.huber());
        }
        double sumW = used.stream().mapToDouble(Used::weight).sum();
        double mean = used.stream().mapToDouble(u -> u.weight() * u.site().residual()).sum() / sumW;
        double spread = used.stream().mapToDouble(u -> u.weight() * sq(u.site().residual() - mean)).sum() / sumW;
        double denom = prior + sumW;
        // the class sd shrinks by at most √0.75 however many analogs agree: a residual carries the
        // measurement's own error and the model's error at the analog, not only the shared part (with full
        // shrinkage, prior/(prior + Σw), within-1-sd on the development set fell from 0.725 to 0.705)
        double sd = Math.max(MIN_SD, Math.sqrt(sq(s.sd()) * (prior + 0.75 * sumW) / denom + spread * sumW / denom));
        EstimatedSite now = s;
        for (int i = 0; i < used.size(); i++) {
            Used u = used.get(i);
            double part = u.weight() * u.site().residual() / denom;
            now = now.shifted(part, term(u, part, denom, prior, cfg, s.site().group().id()),
                    ionmark.speciation.api.Basis.ANALOG, i == used.size() - 1 ? sd : now.sd());
        }
        return now;
    }

    /**
     * Huber weights around the weighted median of the residuals: an analog whose residual lies more than
     * {@code c} units from the others' centre keeps only c/|r − median| of its weight. One misassigned
     * measurement (a constant of another site fitted to this one) then cannot drag a series' correction.
     */
    static List<Used> robust(List<Used> used, double c) {
        List<Used> byResidual = new ArrayList<>(used);
        byResidual.sort(Comparator.comparingDouble(u -> u.site().residual()));
        double total = used.stream().mapToDouble(Used::weight).sum();
        double acc = 0;
        double median = byResidual.get(0).site().residual();
        for (Used u : byResidual) {
            acc += u.weight();
            if (acc >= total / 2) {
                median = u.site().residual();
                break;
            }
        }
        List<Used> out = new ArrayList<>(used.size());
        for (Used u : used) {
            double d = Math.abs(u.site().residual() - median);
            out.add(d <= c ? u : new Used(u.site(), u.similarity(), u.whole(), u.weight() * c / d, true));
        }
        return out;
    }

    /**
     * The pair rules that hold this site (an intramolecular hydrogen bond, groups pressed together, the ring
     * nitrogens of a diazine), as one text: each rule's derivation line without the partner's atom number;
     * empty when no rule holds it. A rule is fitted for its geometry, and the residuals of sites held by a
     * rule are of another kind than those of free sites, so a site takes analogs only from measured sites
     * held by the same rules (otherwise 3,3-dimethylglutaric acid took +0.2 from citric acid and left its
     * reference-set tolerance). Skipping held sites altogether left every pyrimidine, pyrazine and
     * pyridazine without analogs: the diazine ring rules hold all of them.
     */
    public static String heldBy(EstimatedSite s) {
        List<String> rules = null;
        for (Term t : s.terms()) {
            if (t.label().startsWith(PAIR_RULE)) {
                if (rules == null) {
                    rules = new ArrayList<>(2);
                }
                rules.add(ON_ATOM.matcher(t.label()).replaceFirst(""));
            }
        }
        if (rules == null) {
            return "";
        }
        rules.sort(null);
        return String.join(" | ", rules);
    }

    private static final Pattern ON_ATOM = Pattern.compile(" on atom \\d+");

    /** How {@link PairRules} starts the derivation line of a pair rule. */
    static final String PAIR_RULE = "pair rule ";

    private static Term term(Used u, double part, double denom, double prior, AnalogSettings cfg, String query) {
        SiteAnalogIndex.MeasuredSite m = u.site();
        // "measured analog %s (%s, measured pKa %s at %.0f °C, %s): residual %+.2f against the model's constant
        // %.2f, local similarity %.2f[, whole-molecule similarity %.2f], weight %.2f of %.2f (prior %.2f)[; the prior
        // falls from %.2f to %.2f as the nearest analog nears identity][; another class of the family: weight × %.2f]",
        // written without a Formatter (Decimals)
        StringBuilder label = new StringBuilder(200).append("measured analog ").append(m.compound().name())
                .append(" (").append(m.group()).append(", measured pKa ");
        List<Double> pka = m.compound().pka();
        for (int i = 0; i < pka.size(); i++) {
            Decimals.append(i == 0 ? label : label.append("; "), pka.get(i), 2, false);
        }
        Decimals.append(label.append(" at "), m.compound().temperature(), 0, false).append(" °C, ")
                .append(m.compound().method().isBlank() ? "method not stated" : m.compound().method());
        Decimals.append(label.append("): residual "), m.residual(), 2, true);
        Decimals.append(label.append(" against the model's constant "), m.model(), 2, false);
        Decimals.append(label.append(", local similarity "), u.similarity(), 2, false);
        if (!Double.isNaN(u.whole())) {
            Decimals.append(label.append(", whole-molecule similarity "), u.whole(), 2, false);
        }
        Decimals.append(label.append(", weight "), u.weight(), 2, false);
        Decimals.append(label.append(" of "), denom, 2, false);
        Decimals.append(label.append(" (prior "), prior, 2, false).append(')');
        if (cfg.nearPrior() != cfg.prior()) {
            // one line a chemist reads: why the prior is not the same for every site
            Decimals.append(Decimals.append(label.append("; the prior falls from "), cfg.prior(), 2, false)
                    .append(" to "), cfg.nearPrior(), 2, false).append(" as the nearest analog nears identity");
        }
        if (!m.group().equals(query) && cfg.familyWeight() < 1) {
            // a family analog: the chemist sees the other class in the line's head, and here why it weighs less
            Decimals.append(label.append("; another class of the family: weight × "), cfg.familyWeight(), 2, false);
        }
        if (m.share() < 1) {
            Decimals.append(label.append("; its site gives off "), m.share(), 2, false)
                    .append(" of that step's proton in the model");
        }
        if (u.damped()) {
            label.append("; weight cut: residual far from the other analogs'");
        }
        return new Term(label.toString(), part, "measured value in the shared table: " + m.citation());
    }

    private static double sq(double x) {
        return x * x;
    }
}
