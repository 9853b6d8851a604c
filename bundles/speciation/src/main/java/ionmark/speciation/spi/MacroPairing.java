package ionmark.speciation.spi;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Pairs predicted with experimental macroscopic pKa values one to one by least total absolute error
 * (exhaustive when small, greedy otherwise, as the team's reviewers score), counting experimental
 * values without a partner as misses. Shared by the accuracy report, by calibration and by the
 * measured-analog index, so that a table is fitted to the same pairing it is scored by.
 */
public final class MacroPairing {
    public static final long EXHAUSTIVE_LIMIT = 200_000;

    private MacroPairing() {
    }

    /** Index pairs [exp, pred]. */
    public static List<int[]> assign(List<Double> exp, List<Double> pred) {
        if (exp.isEmpty() || pred.isEmpty()) {
            return List.of();
        }
        int k = Math.min(exp.size(), pred.size());
        if (perm(Math.max(exp.size(), pred.size()), k) > EXHAUSTIVE_LIMIT) {
            return greedy(exp, pred);
        }
        List<int[]> best = new ArrayList<>();
        double[] bestCost = {Double.MAX_VALUE};
        boolean expSmaller = exp.size() <= pred.size();
        List<Double> small = expSmaller ? exp : pred;
        List<Double> large = expSmaller ? pred : exp;
        search(small, large, 0, new int[small.size()], new boolean[large.size()], 0, bestCost, best, expSmaller);
        return best;
    }

    private static void search(List<Double> small, List<Double> large, int i, int[] choice, boolean[] used, double cost,
            double[] bestCost, List<int[]> best, boolean expSmaller) {
        if (cost >= bestCost[0]) {
            return;
        }
        if (i == small.size()) {
            bestCost[0] = cost;
            best.clear();
            for (int a = 0; a < small.size(); a++) {
                best.add(expSmaller ? new int[] {a, choice[a]} : new int[] {choice[a], a});
            }
            return;
        }
        for (int j = 0; j < large.size(); j++) {
            if (!used[j]) {
                used[j] = true;
                choice[i] = j;
                search(small, large, i + 1, choice, used, cost + Math.abs(small.get(i) - large.get(j)), bestCost, best,
                        expSmaller);
                used[j] = false;
            }
        }
    }

    private static List<int[]> greedy(List<Double> exp, List<Double> pred) {
        List<double[]> cand = new ArrayList<>();
        for (int i = 0; i < exp.size(); i++) {
            for (int j = 0; j < pred.size(); j++) {
                cand.add(new double[] {Math.abs(exp.get(i) - pred.get(j)), i, j});
            }
        }
        cand.sort(Comparator.comparingDouble(c -> c[0]));
        return ionmark.speciation.internal.GreedyPairs.take(cand, exp.size(), pred.size());
    }

    private static long perm(int n, int k) {
        long p = 1;
        for (int i = 0; i < k; i++) {
            p *= n - i;
            if (p > EXHAUSTIVE_LIMIT) {
                return p;
            }
        }
        return p;
    }
}
