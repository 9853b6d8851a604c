package ionmark.speciation.internal.structure;

/**
 * A Kekulé structure of one conjugated system for a placement of its mobile hydrogens: every atom's
 * remaining double bond filled by a small search. Atoms are satisfied in skeleton-invariant order, each
 * trying bonds inside its rings first, so the structure found does not depend on the input's atom order.
 * The orders are worked out once per system and reused for every placement tried.
 */
final class KekuleSearch {
    /** Steps of one search; beyond it the placement counts as impossible. */
    static final int MAX_STEPS = 4000;

    private final MobileSites m;
    private final int[] atoms;
    private final int[] order;
    private final int[][] tryOrder;

    /**
     * @param rings whether ring membership orders the bonds tried; false only when no atom of the system
     *              lies in a ring, where the order is then the same without building the ring set
     */
    KekuleSearch(MobileSites m, int[] atoms, boolean rings) {
        this.m = m;
        this.atoms = atoms;
        long[] inv = m.invariants();
        long[] ringMask = rings ? m.ringMask() : new long[m.n];
        // stable insertion sorts on primitive arrays: systems are small, and ties keep atom (or bond) order
        this.order = atoms.clone();
        for (int a = 1; a < order.length; a++) {
            int x = order[a];
            int b = a - 1;
            while (b >= 0 && inv[order[b]] > inv[x]) {
                order[b + 1] = order[b];
                b--;
            }
            order[b + 1] = x;
        }
        this.tryOrder = new int[m.n][];
        for (int u : atoms) {
            int[] nb = m.nbr[u];
            int[] ks = new int[nb.length];
            for (int k = 0; k < ks.length; k++) {
                int y = k;
                int b = k - 1;
                while (b >= 0 && before(ringMask, inv, u, nb[y], nb[ks[b]])) {
                    ks[b + 1] = ks[b];
                    b--;
                }
                ks[b + 1] = y;
            }
            tryOrder[u] = ks;
        }
    }

    /** Whether neighbour x of u is tried strictly before neighbour y: bonds inside a ring of u first, then by invariant. */
    private static boolean before(long[] ringMask, long[] inv, int u, int x, int y) {
        int rx = (ringMask[u] & ringMask[x]) != 0 ? 0 : 1;
        int ry = (ringMask[u] & ringMask[y]) != 0 ? 0 : 1;
        return rx != ry ? rx < ry : inv[x] < inv[y];
    }

    /** The double bonds (a flag per bond index) for one placement, or null when no Kekulé structure exists. */
    boolean[] solve(int[] placement) {
        int[] need = new int[m.n];
        int total = 0;
        for (int i : atoms) {
            need[i] = m.pool[i] ? 1 - (MobileSites.contains(placement, i) ? 1 : 0) : m.pi[i];
            total += need[i];
        }
        if (total % 2 != 0) {
            return null;
        }
        boolean[] used = new boolean[m.bonds.length];
        int[] steps = {0};
        return match(need, used, steps) ? used : null;
    }

    /** Bonds atom u could still make double: partner needs one, bond free, not triple. */
    private int open(int u, int[] need, boolean[] used) {
        int open = 0;
        for (int k = 0; k < m.nbr[u].length; k++) {
            if (need[m.nbr[u][k]] > 0 && !used[m.nbrBondIndex[u][k]] && !m.nbrTriple[u][k]) {
                open++;
            }
        }
        return open;
    }

    private boolean match(int[] need, boolean[] used, int[] steps) {
        if (++steps[0] > MAX_STEPS) {
            return false;
        }
        // the most constrained atom first (fewest free bonds for what it needs); a dead end fails at once
        int u = -1;
        int slack = Integer.MAX_VALUE;
        for (int i : order) {
            if (need[i] > 0) {
                int s = open(i, need, used) - need[i];
                if (s < 0) {
                    return false;
                }
                if (s < slack) {
                    slack = s;
                    u = i;
                }
            }
        }
        if (u < 0) {
            return true;
        }
        for (int k : tryOrder[u]) {
            int v = m.nbr[u][k];
            int bi = m.nbrBondIndex[u][k];
            if (need[v] <= 0 || used[bi] || m.nbrTriple[u][k]) {
                continue;
            }
            used[bi] = true;
            need[u]--;
            need[v]--;
            if (match(need, used, steps)) {
                return true;
            }
            used[bi] = false;
            need[u]++;
            need[v]++;
        }
        return false;
    }
}
