package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.List;

/**
 * One-to-one pairing, first come first served: candidates {@code {score, a, b}} already in order of preference are
 * taken while neither their {@code a} nor their {@code b} is taken yet. What the greedy pairing of predicted with
 * experimental constants ({@code spi.MacroPairing}) and the pairing of model steps with titrating sites
 * ({@link TitratingSites}) share; each orders its own candidates.
 */
public final class GreedyPairs {
    private GreedyPairs() {
    }

    /** The pairs {@code {a, b}} taken, in the candidates' order; {@code as} and {@code bs} bound the indices. */
    public static List<int[]> take(List<double[]> ordered, int as, int bs) {
        boolean[] usedA = new boolean[as];
        boolean[] usedB = new boolean[bs];
        List<int[]> out = new ArrayList<>();
        for (double[] c : ordered) {
            int a = (int) c[1];
            int b = (int) c[2];
            if (!usedA[a] && !usedB[b]) {
                usedA[a] = true;
                usedB[b] = true;
                out.add(new int[] {a, b});
            }
        }
        return out;
    }
}
