package ionmark.speciation.internal.profile;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import ionmark.acidity.api.SiteType;
import ionmark.speciation.api.Basis;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.microstates.MacroConstants;
import ionmark.speciation.internal.microstates.Problem;
import ionmark.speciation.internal.microstates.SiteModel;

/**
 * Charge over pH for a prepared problem: from the measured macroscopic constants when the structure
 * is a measured compound whose values all found a site, else from the model's proton-binding polynomial.
 */
public final class ChargeProfile {
    private ChargeProfile() {
    }

    /** Whether every measured value of the problem's measured compound was given to a site. */
    public static boolean measuredFit(Problem p) {
        return p.sites().stream().filter(s -> s.basis() == Basis.MEASURED).count() == p.measured().get().pka().size();
    }

    public static double meanCharge(Problem p, double ph) {
        if (p.measured().isPresent() && measuredFit(p)) {
            double m = 0;
            for (var e : fromMeasured(p, ph).entrySet()) {
                m += e.getKey() * e.getValue();
            }
            return m;
        }
        double[] f = MacroConstants.fractions(p.polynomial(), ph);
        double m = p.topCharge();
        for (int d = 0; d < f.length; d++) {
            m -= d * f[d];
        }
        return m;
    }

    /** Fraction with net charge 0 at a pH, without building a map (used by the window scan). */
    static double neutralAt(Problem p, double ph) {
        if (p.measured().isPresent() && measuredFit(p)) {
            return fromMeasured(p, ph).getOrDefault(0, 0.0);
        }
        int d = p.topCharge();
        if (d < 0 || d >= p.polynomial().length) {
            return 0;
        }
        return MacroConstants.fractions(p.polynomial(), ph)[d];
    }

    /**
     * Charge-state fractions from measured macroscopic constants: the state that has lost d protons
     * has weight 10^(Σ_(j≤d) (pH − pK_j)). Sites without measured values stay in their dominant form,
     * judged by their pKa in the field of the measured sites and the permanent charges
     * ({@link #unmeasuredDeprotonated}): barbital's second N-H (site value 8.2) is not ionised at pH 10
     * once the first N-H, two bonds away, carries its charge (second constant 12.7).
     */
    public static Map<Integer, Double> fromMeasured(Problem p, double ph) {
        List<Double> pk = p.measuredHere();
        int z0 = p.permanentCharge();
        int i = -1;
        for (EstimatedSite s : p.sites()) {
            if (s.site().group().permanent()) {
                continue;
            }
            i++;
            boolean base = s.site().group().type() == SiteType.BASE;
            if (s.basis() == Basis.MEASURED) {
                z0 += base ? 1 : 0;
            } else {
                boolean dep = unmeasuredDeprotonated(p, i, ph);
                z0 += base ? (dep ? 0 : 1) : (dep ? -1 : 0);
            }
        }
        double[] logw = new double[pk.size() + 1];
        double max = 0;
        for (int d = 1; d <= pk.size(); d++) {
            logw[d] = logw[d - 1] + ph - pk.get(d - 1);
            max = Math.max(max, logw[d]);
        }
        double sum = 0;
        for (double l : logw) {
            sum += Math.pow(10, l - max);
        }
        Map<Integer, Double> out = new TreeMap<>();
        for (int d = 0; d < logw.length; d++) {
            out.merge(z0 - d, Math.pow(10, logw[d] - max) / sum, Double::sum);
        }
        return out;
    }

    /** Whether a titratable site of the problem has no measured value (it then takes its dominant form). */
    public static boolean hasUnmeasuredSite(Problem p) {
        return p.sites().stream().anyMatch(s -> !s.site().group().permanent() && s.basis() != Basis.MEASURED);
    }

    /**
     * Whether titratable site {@code i} (model order) without a measured value is deprotonated at a pH:
     * its model pKa moved by the interaction with the mean charge of each measured site (from that
     * site's value in the model, the one fitted to the measured constants) and by the permanent
     * charges: pKa' = pKa − Σ W_ij·q_j − Φ_i (an anion nearby raises an acid's or a base's constant).
     */
    static boolean unmeasuredDeprotonated(Problem p, int i, double ph) {
        SiteModel m = p.model();
        double shift = -m.background()[i];
        int j = -1;
        for (EstimatedSite s : p.sites()) {
            if (s.site().group().permanent()) {
                continue;
            }
            j++;
            if (j == i || s.basis() != Basis.MEASURED) {
                continue;
            }
            double dep = 1 / (1 + Math.pow(10, m.pka()[j] - ph));
            double q = m.base()[j] ? 1 - dep : -dep;
            shift -= m.w()[i][j] * q;
        }
        return ph > m.pka()[i] + shift;
    }

    /** The solver's charge states (titratable sites only) moved by the permanent charge. */
    public static Map<Integer, Double> shift(Map<Integer, Double> states, int by) {
        Map<Integer, Double> out = new TreeMap<>();
        states.forEach((z, f) -> out.put(z + by, f));
        return out;
    }
}
