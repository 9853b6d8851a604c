package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.DoubleFunction;

/**
 * Gives each measured value's residual to the site that titrates in the model's step paired with it, not to the site
 * whose estimate lies nearest the value. In a fused bicycle or a polyfunctional compound the model's step is often
 * another site's than the one nearest the measured number (the model has a thiazole N at 3.0 and a pyrimidine N at
 * 1.5; a measured 1.8 pairs with the step at 3.0, which is the thiazole N's), and a residual on the wrong site
 * moves the analogs of the wrong site type.
 */
final class TitratingSites {
    /** In the split form, sites with a smaller share of a step take no part of its residual. */
    static final double MIN_SHARE = 0.2;

    private TitratingSites() {
    }

    /**
     * One residual placed on a site.
     *
     * @param value    index of the measured value
     * @param constant the model's macroscopic constant paired with it
     * @param site     index of the site (in {@link ModelSites#sites()})
     * @param share    the site's share of the step (1 when the whole residual goes to it)
     */
    record Placed(int value, double constant, int site, double share) {
    }

    /**
     * One site per step, one step per site: the (step, site) pairs are taken by falling share, each step and each
     * site once, so two steps that one site dominates (close constants) go to it and to the runner-up. The residual
     * goes whole to its site (share 1).
     */
    static List<Placed> dominant(ModelSites model, List<int[]> pairs, List<Double> constants) {
        return dominant(model::shares, model.sites().size(), pairs, constants);
    }

    /** {@link #dominant(ModelSites, List, List)} with each step's site shares given ({@code sites} sites). */
    static List<Placed> dominant(DoubleFunction<double[]> shares, int sites, List<int[]> pairs, List<Double> constants) {
        List<double[]> cand = new ArrayList<>();
        for (int p = 0; p < pairs.size(); p++) {
            double[] share = shares.apply(constants.get(pairs.get(p)[1]));
            for (int s = 0; s < share.length; s++) {
                if (share[s] > 0) {
                    cand.add(new double[] {share[s], p, s});
                }
            }
        }
        cand.sort(Comparator.<double[]>comparingDouble(c -> -c[0]).thenComparingDouble(c -> c[1])
                .thenComparingDouble(c -> c[2]));
        List<Placed> out = new ArrayList<>();
        for (int[] taken : GreedyPairs.take(cand, pairs.size(), sites)) {
            int[] pair = pairs.get(taken[0]);
            out.add(new Placed(pair[0], constants.get(pair[1]), taken[1], 1));
        }
        out.sort(Comparator.comparingInt(Placed::value));
        return out;
    }

    /**
     * Every site with at least {@link #MIN_SHARE} of a step takes its residual, with its share of the step (the
     * kept shares renormalised to 1) as a factor on the analog weight: two ring nitrogens that give off one proton
     * together each count half.
     */
    static List<Placed> split(ModelSites model, List<int[]> pairs, List<Double> constants) {
        return split(model::shares, pairs, constants);
    }

    /** {@link #split(ModelSites, List, List)} with each step's site shares given. */
    static List<Placed> split(DoubleFunction<double[]> shares, List<int[]> pairs, List<Double> constants) {
        List<Placed> out = new ArrayList<>();
        for (int[] pair : pairs) {
            double pk = constants.get(pair[1]);
            double[] share = shares.apply(pk);
            double kept = 0;
            for (double x : share) {
                kept += x >= MIN_SHARE ? x : 0;
            }
            for (int s = 0; s < share.length; s++) {
                if (share[s] >= MIN_SHARE) {
                    out.add(new Placed(pair[0], pk, s, share[s] / kept));
                }
            }
        }
        return out;
    }
}
