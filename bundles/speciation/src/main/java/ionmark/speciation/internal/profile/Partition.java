package ionmark.speciation.internal.profile;

import java.util.Map;

import ionmark.speciation.internal.microstates.SiteModel;

/**
 * Octanol/water distribution over all species. Rule (common practice, from memory: the "diff 3–4"
 * rule for octanol/water with 0.15 M background salt, where an ion goes over as an ion pair): the
 * uncharged species (no charged site at all) partitions with logP, every other species (ions of any
 * charge and zwitterions) with logP − {@link #ION_DROP}:
 * logD = logP + log10(f_uncharged + (1 − f_uncharged)·10^−3.5), so logD never falls more than 3.5 below
 * logP. With the uncharged species alone a permanent ion or a biguanide came out near −11; a further drop
 * per extra charge is not applied for want of a source.
 */
public final class Partition {
    public static final double ION_DROP = 3.5;

    private Partition() {
    }

    /** logD at the charge-state distribution; null when logP is unknown. */
    public static Double logD(double logP, Map<Integer, Double> chargeStates, double fractionUncharged) {
        if (Double.isNaN(logP)) {
            return null;
        }
        double total = 0;
        for (double f : chargeStates.values()) {
            total += f;
        }
        double sum = fractionUncharged + Math.max(0, total - fractionUncharged) * Math.pow(10, -ION_DROP);
        return logP + Math.log10(Math.max(sum, 1e-300));
    }

    /**
     * {@link #unchargedShareOfNeutral(double[], boolean[], double[], int)} for a solver model that carries the
     * whole-species ionic-strength term {@code k} (see {@code SpeciesActivity}): the term is taken back out of
     * the site values first, since the uncharged species has none.
     */
    public static double unchargedShareOfNeutral(SiteModel model, double[] poly, int permanentCharge, double k) {
        double[] pka = model.pka().clone();
        for (int i = 0; i < pka.length; i++) {
            pka[i] += model.base()[i] ? -k : k;
        }
        return unchargedShareOfNeutral(pka, model.base(), poly, permanentCharge);
    }

    /**
     * The share of the net-charge-zero population that carries no charged site at all: the one
     * microstate with every acid protonated and every base free, against all microstates that have lost
     * as many protons as there are base sites. Its log weight at pH 0 is −Σ_base pKa (no charge, so no
     * interaction); {@code poly} is the proton-binding polynomial (log10, pH 0) of the same model. A
     * permanent charge leaves no uncharged species (0). Independent of pH.
     *
     * @param pka  site pKa values of the model without ionic-strength terms (an uncharged species has none)
     * @param base base sites
     * @param poly log10 coefficients at the stated conditions, index = protons lost
     */
    public static double unchargedShareOfNeutral(double[] pka, boolean[] base, double[] poly, int permanentCharge) {
        if (permanentCharge != 0) {
            return 0;
        }
        int nBase = 0;
        double log = 0;
        for (int i = 0; i < pka.length; i++) {
            if (base[i]) {
                nBase++;
                log -= pka[i];
            }
        }
        if (nBase >= poly.length || poly[nBase] == Double.NEGATIVE_INFINITY) {
            return 0;
        }
        return Math.min(1, Math.pow(10, log - poly[nBase]));
    }
}
