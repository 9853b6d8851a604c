package ionmark.speciation.internal.structure;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The reference placement of one conjugated system's mobile hydrogens, by the rule order of
 * {@link Tautomers}: fewest broken carbocycles, most C=O and C=S, most C=O on ester carbons, most aromatic
 * rings, fewest exocyclic
 * double bonds on ring atoms, most amide N-H, open-chain imine placement, and only on a tie after all
 * of these the order-independent structure hash.
 *
 * <p>Two screens find the drawing to be the reference before any other placement is tried: a carboxylic
 * (or dithio-) acid, whose two placements are the same structure, and a drawing that already has every
 * O and S of the system as C=O or C=S and every N with its hydrogen (amides, ureas, anilides, lactams):
 * no other placement has as many C=O and C=S, so it wins whenever it breaks no carbocycle.
 */
final class TautomerRanking {
    private final MobileSites m;
    private boolean[] cyclic;

    TautomerRanking(MobileSites m) {
        this.m = m;
    }

    /** The chosen placement and its double bonds; {@code capped} when there were too many to compare. */
    record Choice(int[] placement, boolean[] bonds, boolean capped) {
        static final Choice KEEP = new Choice(null, null, false);
        static final Choice CAPPED = new Choice(null, null, true);

        boolean keep() {
            return placement == null;
        }
    }

    /** A feasible placement with its key by rules 1-6 (the hash comes only on ties). */
    private record Candidate(int[] placement, boolean[] bonds, long[] key) {
    }

    /** The reference placement of a system, or {@link Choice#KEEP} when the drawing is it. */
    Choice choose(int[] atoms) {
        int[] unordered = m.positionsUnordered(atoms);
        int h = 0;
        int nitrogens = 0;
        int protonatedOxygens = 0;
        for (int p : unordered) {
            h += m.mobile[p];
            nitrogens += m.z(p) == 7 ? 1 : 0;
            protonatedOxygens += m.z(p) != 7 ? m.mobile[p] : 0;
        }
        if (binomial(unordered.length, h) > Tautomers.MAX_CANDIDATES) {
            return Choice.CAPPED;
        }
        if (symmetricAcid(unordered, h)) {
            return Choice.KEEP; // either oxygen of a carboxylic acid carrying the H is the same structure
        }
        boolean rings = touchesRing(atoms);
        KekuleSearch search = new KekuleSearch(m, atoms, rings);
        int[] drawn = drawnPlacement(unordered);
        if (protonatedOxygens == 0 && h == nitrogens) {
            // the only placement with every O and S as C=O or C=S: first on rule 2, so the reference
            // unless rule 1 (a broken carbocycle) speaks against it
            if (!rings) {
                return Choice.KEEP;
            }
            boolean[] bonds = search.solve(drawn);
            if (bonds != null && brokenCarbocycles(atoms, bonds) == 0) {
                return Choice.KEEP;
            }
        }
        int[] positions = m.positions(atoms);
        List<Candidate> tied = new ArrayList<>();
        long[] bestKey = null;
        Candidate drawnCandidate = null;
        for (int[] placement : placements(positions, h)) {
            ionmark.speciation.internal.work.Budget.check();
            boolean[] bonds = search.solve(placement);
            if (bonds == null) {
                continue;
            }
            Candidate c = new Candidate(placement, bonds, key(atoms, placement, bonds, rings));
            if (sameSet(placement, drawn)) {
                drawnCandidate = c;
            }
            int cmp = bestKey == null ? -1 : Arrays.compare(c.key, bestKey);
            if (cmp < 0) {
                tied.clear();
                bestKey = c.key;
            }
            if (cmp <= 0) {
                tied.add(c);
            }
        }
        if (tied.isEmpty()) {
            return Choice.KEEP;
        }
        boolean drawnTied = drawnCandidate != null && Arrays.equals(drawnCandidate.key, bestKey);
        if (tied.size() == 1) {
            Candidate best = tied.get(0);
            return drawnTied ? Choice.KEEP : new Choice(best.placement, best.bonds, false);
        }
        // a tie on every rule: the smallest structure hash, the first of equal hashes in enumeration order
        Candidate best = null;
        long bestHash = 0;
        for (Candidate c : tied) {
            long hash = structureHash(c.placement);
            if (best == null || hash < bestHash) {
                best = c;
                bestHash = hash;
            }
        }
        if (drawnTied && structureHash(drawnCandidate.placement) == bestHash) {
            return Choice.KEEP; // the drawing is the reference form (or one equivalent to it)
        }
        return new Choice(best.placement, best.bonds, false);
    }

    /** Two terminal O (or two terminal S) on one carbon sharing one hydrogen: both placements are one structure. */
    private boolean symmetricAcid(int[] positions, int h) {
        if (positions.length != 2 || h != 1) {
            return false;
        }
        int a = positions[0];
        int b = positions[1];
        return m.z(a) != 7 && m.z(a) == m.z(b) && m.nbr[a].length == 1 && m.nbr[b].length == 1
                && m.nbr[a][0] == m.nbr[b][0] && m.hyd[a] - m.mobile[a] == m.hyd[b] - m.mobile[b];
    }

    private int[] drawnPlacement(int[] positions) {
        return Arrays.stream(positions).filter(p -> m.mobile[p] == 1).toArray();
    }

    private static boolean sameSet(int[] placement, int[] drawn) {
        if (placement.length != drawn.length) {
            return false;
        }
        for (int p : placement) {
            if (!MobileSites.contains(drawn, p)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Whether ring membership can change the ranking of this system: an atom of it, or a neighbour, lies in a
     * ring. Otherwise every ring term is the same for all its placements and no ring set is built.
     */
    private boolean touchesRing(int[] atoms) {
        if (cyclic == null) {
            org.openscience.cdk.ringsearch.RingSearch rs = new org.openscience.cdk.ringsearch.RingSearch(m.mol);
            cyclic = new boolean[m.n];
            for (int i : rs.cyclic()) {
                cyclic[i] = true;
            }
        }
        for (int i : atoms) {
            if (cyclic[i]) {
                return true;
            }
            for (int j : m.nbr[i]) {
                if (cyclic[j]) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Rule 1 alone: ring carbons of all-carbon rings with a double bond out of their rings. */
    private int brokenCarbocycles(int[] atoms, boolean[] bonds) {
        long[] ringMask = m.ringMask();
        long carbocyclic = m.carbocyclic();
        int broken = 0;
        for (int i : atoms) {
            if (ringMask[i] == 0 || (ringMask[i] & ~carbocyclic) != 0) {
                continue;
            }
            for (int k = 0; k < m.nbr[i].length; k++) {
                if (bonds[m.nbrBondIndex[i][k]] && (ringMask[i] & ringMask[m.nbr[i][k]]) == 0) {
                    broken++;
                }
            }
        }
        return broken;
    }

    /** Rules 1-6 (with 2b) as a key: smaller is the reference. Without rings every ring term is 0 for every placement. */
    private long[] key(int[] atoms, int[] placement, boolean[] bonds, boolean rings) {
        long[] ringMask = rings ? m.ringMask() : null;
        long carbocyclic = rings ? m.carbocyclic() : 0;
        int brokenCarbocycle = 0;
        int exocyclic = 0;
        int oxo = 0;
        int acylOxo = 0;
        int imine = 0;
        int amideNh = 0;
        for (int i : atoms) {
            boolean pooled = m.pool[i];
            boolean holds = pooled && MobileSites.contains(placement, i);
            if (pooled && !holds) {
                if (m.z(i) != 7) {
                    oxo++;
                    acylOxo += onEsterCarbon(i) ? 1 : 0;
                } else if (m.nbr[i].length == 2 && (ringMask == null || ringMask[i] == 0)) {
                    imine += imineOn(i, ringMask);
                }
            } else if (pooled && m.z(i) == 7 && nextToOxo(i, placement)) {
                amideNh++;
            }
            if (ringMask == null || ringMask[i] == 0) {
                continue;
            }
            for (int k = 0; k < m.nbr[i].length; k++) {
                if (bonds[m.nbrBondIndex[i][k]] && (ringMask[i] & ringMask[m.nbr[i][k]]) == 0) {
                    exocyclic++;
                    if ((ringMask[i] & ~carbocyclic) == 0) {
                        brokenCarbocycle++;
                    }
                }
            }
        }
        int aromatic = rings ? aromaticRings(placement) : 0;
        return new long[] {brokenCarbocycle, -oxo, -acylOxo, -aromatic, exocyclic, -amideNh, imine};
    }

    /**
     * Whether the O or S position i sits on a carbon that also carries an ether-type O or S (not a mobile
     * position): the carbonyl of an ester, lactone or carbonate. Rule 2b: of placements with as many C=O, the
     * one with the C=O on such a carbon (ester resonance), so that a tetronic acid or a 4-hydroxycoumarin is the
     * vinylogous acid HO-C=C-C(=O)-O and not the ketene acetal O=C-C=C(OH)-O.
     */
    private boolean onEsterCarbon(int i) {
        for (int c : m.nbr[i]) {
            if (m.z(c) != 6) {
                continue;
            }
            for (int x : m.nbr[c]) {
                int z = m.z(x);
                if (x != i && (z == 8 || z == 16) && !m.pool[x] && m.nbr[x].length == 2) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Whether N-H atom i sits on a carbon that carries C=O or C=S in this placement (an amide N-H). */
    private boolean nextToOxo(int i, int[] placement) {
        for (int c : m.nbr[i]) {
            for (int o : m.nbr[c]) {
                if (o != i && m.pool[o] && m.z(o) != 7 && !MobileSites.contains(placement, o)) {
                    return true;
                }
            }
        }
        return false;
    }

    /**
     * A C=N-R imine nitrogen outside rings: +1 when R is saturated (alkyl: the imine sits on the
     * unsubstituted nitrogen, HN=C(NH2)NHR, the form the guanidine and amidine classes are written for),
     * -1 when R is a ring atom (aryl: the imine conjugated with the ring, Ar-N=C(R)NH2) or a heteroatom
     * (oximes, amidoximes, hydrazones: C=N-OH, C=N-N), else 0.
     */
    private int imineOn(int i, long[] ringMask) {
        int score = 0;
        for (int j : m.nbr[i]) {
            int z = m.z(j);
            boolean ring = ringMask != null && ringMask[j] != 0;
            if (z == 7 && !m.pool[j] || z == 8 || ring && !m.pool[j]) {
                return -1;
            }
            if (!m.inSystem(j) && z == 6) {
                score = 1;
            }
        }
        return score;
    }

    /**
     * Rings of the smallest set that are aromatic for this placement: a six-membered ring whose atoms
     * all carry a double bond, a five-membered one with four such atoms and one lone-pair atom (N, O, S
     * without a double bond). A mobile position carries a double bond when it holds no hydrogen.
     */
    private int aromaticRings(int[] placement) {
        int count = 0;
        for (int[] ring : m.ringPaths()) {
            int size = ring.length - 1;
            if (size != 5 && size != 6) {
                continue;
            }
            int bonded = 0;
            int lonePair = 0;
            for (int k = 0; k < size; k++) {
                int a = ring[k];
                boolean piBonded = m.pool[a] ? !MobileSites.contains(placement, a) : m.pi[a] > 0;
                int z = m.z(a);
                if (piBonded) {
                    bonded++;
                } else if ((z == 7 || z == 8 || z == 16) && (m.mol.getAtom(a).getFormalCharge() == null
                        || m.mol.getAtom(a).getFormalCharge() == 0)) {
                    lonePair++;
                }
            }
            if (size == 6 && bonded == 6 || size == 5 && bonded == 4 && lonePair == 1) {
                count++;
            }
        }
        return count;
    }

    /**
     * A hash of the whole structure with this placement (skeleton invariants refined again with the
     * hydrogens on): equal for placements that give one structure, different (as good as always)
     * otherwise, and independent of the input's atom order. Computed only for placements tied on
     * every rule.
     */
    long structureHash(int[] placement) {
        int n = m.n;
        long[] inv = m.invariants().clone();
        for (int p : placement) {
            inv[p] = inv[p] * 7919 + 1;
        }
        long[] next = new long[n];
        long[] around = new long[8];
        for (int round = 0; round < Math.min(n, 12); round++) {
            for (int i = 0; i < n; i++) {
                int d = m.nbr[i].length;
                if (around.length < d) {
                    around = new long[d];
                }
                for (int k = 0; k < d; k++) {
                    around[k] = inv[m.nbr[i][k]];
                }
                Arrays.sort(around, 0, d);
                long h = inv[i] * 1_000_003L;
                for (int k = 0; k < d; k++) {
                    h = h * 0x9E3779B97F4A7C15L + around[k];
                    h ^= h >>> 31;
                }
                next[i] = h;
            }
            long[] t = inv;
            inv = next;
            next = t;
        }
        Arrays.sort(inv);
        long h = 17;
        for (long x : inv) {
            h = h * 0x100000001B3L ^ x;
        }
        return h;
    }

    /** Every way of putting h hydrogens on the positions (each at most one). */
    static List<int[]> placements(int[] positions, int h) {
        List<int[]> out = new ArrayList<>();
        int[] idx = new int[h];
        for (int i = 0; i < h; i++) {
            idx[i] = i;
        }
        while (true) {
            int[] p = new int[h];
            for (int i = 0; i < h; i++) {
                p[i] = positions[idx[i]];
            }
            out.add(p);
            int k = h - 1;
            while (k >= 0 && idx[k] == positions.length - h + k) {
                k--;
            }
            if (k < 0) {
                return out;
            }
            idx[k]++;
            for (int i = k + 1; i < h; i++) {
                idx[i] = idx[i - 1] + 1;
            }
        }
    }

    static long binomial(int m, int k) {
        long r = 1;
        for (int i = 1; i <= k; i++) {
            r = r * (m - k + i) / i;
            if (r > 1_000_000) {
                return r;
            }
        }
        return r;
    }

    /** Every placement of a system with a Kekulé structure, for enumeration; empty beyond the cap. */
    List<int[]> feasible(int[] atoms) {
        int[] positions = m.positions(atoms);
        int h = 0;
        for (int p : positions) {
            h += m.mobile[p];
        }
        List<int[]> out = new ArrayList<>();
        if (binomial(positions.length, h) > Tautomers.MAX_CANDIDATES) {
            return out;
        }
        KekuleSearch search = new KekuleSearch(m, atoms, true);
        for (int[] placement : placements(positions, h)) {
            ionmark.speciation.internal.work.Budget.check();
            if (search.solve(placement) != null) {
                out.add(placement);
            }
        }
        return out;
    }
}
