package ionmark.speciation.internal.structure;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IDoubleBondStereochemistry;
import org.openscience.cdk.interfaces.IStereoElement;

/**
 * What the tautomer step perceives once per molecule and shares between its stages: the mobile positions
 * (uncharged N, O, S that carry a hydrogen next to a conjugated atom, or one double bond and room for a
 * hydrogen), the conjugated systems they sit in, neighbour tables with bond indices, and, only when a
 * ranking needs them, the smallest set of rings and the skeleton invariants. Nothing is kept beyond the
 * molecule: one instance per call.
 */
final class MobileSites {
    final IAtomContainer mol;
    final int n;
    /** Extra bond order (double 1, triple 2) summed per atom. */
    final int[] pi;
    /** Implicit hydrogens per atom as drawn. */
    final int[] hyd;
    /** Mobile positions. */
    final boolean[] pool;
    /** 1 where a mobile position carries its hydrogen in the drawing. */
    final int[] mobile;
    /** Atoms with a triple bond: never part of a moving system. */
    final boolean[] triple;
    final int[][] nbr;
    /** Bond index of the bond to each neighbour, and whether that bond is triple. */
    final int[][] nbrBondIndex;
    final boolean[][] nbrTriple;
    final IBond[] bonds;
    private long[] ringMask;
    private int[][] ringPaths;
    private long carbocyclic;
    private long[] invariant;

    private MobileSites(IAtomContainer mol, int[] pi, int[] hyd) {
        this.mol = mol;
        this.n = mol.getAtomCount();
        this.pi = pi;
        this.hyd = hyd;
        this.pool = new boolean[n];
        this.mobile = new int[n];
        this.triple = new boolean[n];
        this.nbr = new int[n][];
        this.nbrBondIndex = new int[n][];
        this.nbrTriple = new boolean[n][];
        this.bonds = new IBond[mol.getBondCount()];
        for (int b = 0; b < bonds.length; b++) {
            bonds[b] = mol.getBond(b);
        }
        for (int i = 0; i < n; i++) {
            IAtom a = mol.getAtom(i);
            List<IBond> list = mol.getConnectedBondsList(a);
            nbr[i] = new int[list.size()];
            nbrBondIndex[i] = new int[list.size()];
            nbrTriple[i] = new boolean[list.size()];
            for (int k = 0; k < list.size(); k++) {
                IBond b = list.get(k);
                nbr[i][k] = mol.indexOf(b.getOther(a));
                nbrBondIndex[i][k] = mol.indexOf(b);
                nbrTriple[i][k] = b.getOrder() == IBond.Order.TRIPLE;
                triple[i] |= nbrTriple[i][k];
            }
        }
    }

    /**
     * The cheap screen: null when no hydrogen could go anywhere else (no donor or no acceptor, or fewer
     * than two mobile positions), which is where most structures stop, before any ring or Kekulé work.
     */
    static MobileSites of(IAtomContainer mol) {
        int n = mol.getAtomCount();
        int[] pi = new int[n];
        int[] hyd = new int[n];
        for (IBond b : mol.bonds()) {
            IBond.Order o = b.getOrder();
            if (o == null || o == IBond.Order.UNSET) {
                return null;
            }
            int extra = o.numeric() - 1;
            pi[mol.indexOf(b.getBegin())] += extra;
            pi[mol.indexOf(b.getEnd())] += extra;
        }
        int donors = 0;
        int acceptors = 0;
        byte[] kinds = new byte[n];
        for (int i = 0; i < n; i++) {
            IAtom a = mol.getAtom(i);
            hyd[i] = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
            kinds[i] = (byte) kind(mol, a, pi[i], hyd[i]);
            donors += kinds[i] == 1 ? 1 : 0;
            acceptors += kinds[i] == 2 ? 1 : 0;
        }
        if (donors == 0 || acceptors == 0) {
            return null; // most structures stop here: no hydrogen could go anywhere else
        }
        MobileSites t = new MobileSites(mol, pi, hyd);
        int poolSize = 0;
        for (int i = 0; i < n; i++) {
            if (kinds[i] == 0) {
                continue;
            }
            boolean conjugated = false;
            for (int j : t.nbr[i]) {
                conjugated |= pi[j] > 0 && !t.triple[j];
            }
            if (kinds[i] == 2 || conjugated) {
                t.pool[i] = true;
                t.mobile[i] = kinds[i] == 1 ? 1 : 0;
                poolSize++;
            }
        }
        return poolSize < 2 ? null : t;
    }

    /** 1 for a donor (X-H, single bonds), 2 for an acceptor (one double bond, room for H), 0 otherwise. */
    private static int kind(IAtomContainer mol, IAtom a, int pi, int h) {
        int z = a.getAtomicNumber();
        if (z != 7 && z != 8 && z != 16 || a.getFormalCharge() != null && a.getFormalCharge() != 0 || pi > 1) {
            return 0;
        }
        List<IBond> bonds = mol.getConnectedBondsList(a);
        int degree = bonds.size();
        if (z == 7) {
            if (degree + h + pi != 3 || degree == 0 || degree > 2) {
                return 0;
            }
            for (IBond b : bonds) {
                IAtom x = b.getOther(a);
                if (x.getAtomicNumber() == 8 && b.getOrder() != IBond.Order.SINGLE || b.getOrder().numeric() > 2
                        || x.getFormalCharge() != null && x.getFormalCharge() != 0) {
                    return 0; // nitroso, nitrile, next to a charge
                }
            }
        } else {
            // O and S: only on carbon (hydroxy, mercapto, C=O, C=S), never on S, P or N
            if (degree != 1 || bonds.get(0).getOther(a).getAtomicNumber() != 6 || degree + h + pi != 2) {
                return 0;
            }
        }
        if (pi == 0 && h > 0) {
            return 1;
        }
        return pi == 1 ? 2 : 0;
    }

    /** Whether atom i can carry a pi bond that moves: a conjugated atom or a mobile position. */
    boolean inSystem(int i) {
        return pool[i] || pi[i] > 0 && !triple[i];
    }

    int z(int i) {
        return mol.getAtom(i).getAtomicNumber();
    }

    /** The conjugated systems with at least two mobile positions and a mobile hydrogen, atoms sorted. */
    List<int[]> systems() {
        int[] comp = new int[n];
        Arrays.fill(comp, -1);
        List<int[]> out = new ArrayList<>();
        int[] stack = new int[n];
        int[] members = new int[n];
        for (int s = 0; s < n; s++) {
            if (comp[s] >= 0 || !inSystem(s)) {
                continue;
            }
            int count = 0;
            int top = 0;
            stack[top++] = s;
            comp[s] = s;
            int positions = 0;
            int hydrogens = 0;
            while (top > 0) {
                int u = stack[--top];
                members[count++] = u;
                positions += pool[u] ? 1 : 0;
                hydrogens += mobile[u];
                for (int k = 0; k < nbr[u].length; k++) {
                    int v = nbr[u][k];
                    if (comp[v] < 0 && inSystem(v) && !nbrTriple[u][k]) {
                        comp[v] = s;
                        stack[top++] = v;
                    }
                }
            }
            if (positions >= 2 && hydrogens > 0 && hydrogens < positions) {
                int[] atoms = Arrays.copyOf(members, count);
                Arrays.sort(atoms);
                out.add(atoms);
            }
        }
        return out;
    }

    /** The mobile positions of a system, in order of their skeleton invariants. */
    int[] positions(int[] atoms) {
        long[] inv = invariants();
        return Arrays.stream(atoms).filter(i -> pool[i]).boxed()
                .sorted((a, b) -> Long.compare(inv[a], inv[b])).mapToInt(Integer::intValue).toArray();
    }

    /** The mobile positions of a system in atom order, without invariants: for the screens. */
    int[] positionsUnordered(int[] atoms) {
        return Arrays.stream(atoms).filter(i -> pool[i]).toArray();
    }

    static boolean contains(int[] a, int x) {
        for (int v : a) {
            if (v == x) {
                return true;
            }
        }
        return false;
    }

    /** Whether any atom of the system lies in a ring (CDK's ring search; no ring set is built). */
    boolean anyInRing(int[] atoms) {
        org.openscience.cdk.ringsearch.RingSearch rs = new org.openscience.cdk.ringsearch.RingSearch(mol);
        for (int i : atoms) {
            if (rs.cyclic(i)) {
                return true;
            }
        }
        return false;
    }

    /** Sets the hydrogens and bond orders of one placement. */
    void place(int[] atoms, int[] placement, boolean[] doubleBond) {
        boolean[] member = new boolean[n];
        for (int i : atoms) {
            member[i] = true;
            if (pool[i]) {
                int now = contains(placement, i) ? 1 : 0;
                mol.getAtom(i).setImplicitHydrogenCount(hyd[i] - mobile[i] + now);
            }
        }
        List<IBond> lost = new ArrayList<>();
        for (int bi = 0; bi < bonds.length; bi++) {
            IBond b = bonds[bi];
            int u = mol.indexOf(b.getBegin());
            int v = mol.indexOf(b.getEnd());
            if (!member[u] || !member[v] || b.getOrder() == IBond.Order.TRIPLE) {
                continue;
            }
            IBond.Order want = doubleBond[bi] ? IBond.Order.DOUBLE : IBond.Order.SINGLE;
            if (b.getOrder() != want) {
                if (b.getOrder() == IBond.Order.DOUBLE) {
                    lost.add(b);
                }
                b.setOrder(want);
            }
        }
        if (!lost.isEmpty()) {
            @SuppressWarnings("rawtypes") // CDK's setStereoElements takes a raw List<IStereoElement>
            List<IStereoElement> keep = new ArrayList<>();
            for (IStereoElement<?, ?> se : mol.stereoElements()) {
                if (!(se instanceof IDoubleBondStereochemistry db && lost.contains(db.getStereoBond()))) {
                    keep.add(se);
                }
            }
            mol.setStereoElements(keep);
        }
    }

    /** Ring bit masks per atom (smallest set of smallest rings), built on first use. */
    long[] ringMask() {
        rings();
        return ringMask;
    }

    int[][] ringPaths() {
        rings();
        return ringPaths;
    }

    long carbocyclic() {
        rings();
        return carbocyclic;
    }

    private void rings() {
        if (ringMask != null) {
            return;
        }
        long[] mask = new long[n];
        int[][] paths = Cycles.sssr(mol).paths();
        for (int r = 0; r < paths.length && r < 64; r++) {
            boolean allCarbon = true;
            for (int k = 0; k < paths[r].length - 1; k++) {
                mask[paths[r][k]] |= 1L << r;
                // a ring with a saturated carbon (the CH2 groups of a cyclohexanone) can never be benzenoid:
                // a C=O on it breaks nothing
                allCarbon &= z(paths[r][k]) == 6 && inSystem(paths[r][k]);
            }
            if (allCarbon) {
                carbocyclic |= 1L << r;
            }
        }
        ringPaths = paths;
        ringMask = mask;
    }

    /**
     * Invariants of the skeleton (mobile hydrogens off, bond orders ignored), refined over neighbours
     * until the number of classes stops growing: equal for every drawing of one compound, and equal
     * for atoms that symmetry makes equivalent. Built on first use.
     */
    long[] invariants() {
        if (invariant != null) {
            return invariant;
        }
        long[] inv = new long[n];
        for (int i = 0; i < n; i++) {
            IAtom a = mol.getAtom(i);
            int q = a.getFormalCharge() == null ? 0 : a.getFormalCharge();
            int fixedPi = pool[i] ? 0 : pi[i];
            inv[i] = ((((a.getAtomicNumber() * 16L + (q + 8)) * 8 + (hyd[i] - mobile[i])) * 8 + nbr[i].length) * 8
                    + fixedPi) * 2 + (pool[i] ? 1 : 0);
        }
        long[][] fixedOrder = new long[n][];
        for (int i = 0; i < n; i++) {
            fixedOrder[i] = new long[nbr[i].length];
            for (int k = 0; k < nbr[i].length; k++) {
                boolean fixed = !inSystem(i) || !inSystem(nbr[i][k]) || nbrTriple[i][k];
                fixedOrder[i][k] = fixed ? bonds[nbrBondIndex[i][k]].getOrder().numeric() : 0;
            }
        }
        int classes = distinct(inv);
        long[] around = new long[8];
        for (int round = 0; round < n; round++) {
            long[] next = new long[n];
            for (int i = 0; i < n; i++) {
                int d = nbr[i].length;
                if (around.length < d) {
                    around = new long[d];
                }
                for (int k = 0; k < d; k++) {
                    around[k] = inv[nbr[i][k]] * 31 + fixedOrder[i][k];
                }
                Arrays.sort(around, 0, d);
                long h = inv[i] * 1_000_003L;
                for (int k = 0; k < d; k++) {
                    h = h * 0x9E3779B97F4A7C15L + around[k];
                    h ^= h >>> 29;
                }
                next[i] = h;
            }
            int c = distinct(next);
            inv = next;
            if (c <= classes) {
                break;
            }
            classes = c;
        }
        invariant = inv;
        return inv;
    }

    static int distinct(long[] v) {
        long[] s = v.clone();
        Arrays.sort(s);
        int c = s.length == 0 ? 0 : 1;
        for (int i = 1; i < s.length; i++) {
            c += s[i] != s[i - 1] ? 1 : 0;
        }
        return c;
    }
}
