package ionmark.speciation.internal.sites;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.openscience.cdk.exception.Intractable;
import org.openscience.cdk.graph.CycleFinder;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IDoubleBondStereochemistry;
import org.openscience.cdk.interfaces.IStereoElement;
import org.openscience.cdk.isomorphism.matchers.Expr;
import org.openscience.cdk.isomorphism.matchers.IQueryAtom;
import org.openscience.cdk.isomorphism.matchers.IQueryBond;
import org.openscience.cdk.isomorphism.matchers.QueryAtom;
import org.openscience.cdk.isomorphism.matchers.QueryBond;
import org.openscience.cdk.smarts.Smarts;

/**
 * A prepared molecule as arrays: atoms, neighbour lists, the bond to each neighbour, and the atom and
 * bond invariants that compiled expressions read.
 */
public final class MatchTarget {
    final IAtom[] atoms;
    final int[][] adj;
    /** For adj[u][k]: the index of that bond. */
    final int[][] bondIndex;
    final IBond[] bondObjects;
    /** Atomic number, -1 when unset. */
    final int[] z;
    final boolean[] aromatic;
    final boolean[] inRing;
    /** Implicit hydrogens, -1 when unset. */
    final int[] implicitH;
    /** Implicit plus explicit hydrogens. */
    final int[] totalH;
    /** Formal charge, {@link Integer#MIN_VALUE} when unset. */
    final int[] charge;
    /** Implicit hydrogens plus the bond orders. */
    final int[] valence;
    final int[] ringBonds;
    final int[] doubleBonds;
    final int[] heteroNeighbours;
    /** Bond order as a number, 0 when unset. */
    final int[] order;
    final boolean[] bondAromatic;
    final boolean[] bondInRing;
    /** Outcomes of recursive SMARTS by recursion number and atom: 0 not yet known, 1 no, 2 yes. */
    private byte[][] memo = new byte[128][];
    private final IAtomContainer mol;
    /** The smallest set of smallest rings (CDK's minimum cycle basis) and ring counts, when first asked. */
    private int[][] rings;
    private int[] ringCounts;
    /** Signatures by atom, {@link #UNKNOWN} until asked for; -1 stays -1 (does not fit). */
    private long[] signatures;
    /** The molecule's double-bond geometry by bond index, when first asked. */
    private IDoubleBondStereochemistry[] dbStereo;
    private static final long UNKNOWN = Long.MIN_VALUE;
    /** CDK's minimum cycle basis, the same rings as {@code Cycles.sssr}. */
    private static final CycleFinder SSSR = Cycles.mcb();

    public MatchTarget(IAtomContainer mol) {
        this.mol = mol;
        int n = mol.getAtomCount();
        int nb = mol.getBondCount();
        atoms = new IAtom[n];
        z = new int[n];
        aromatic = new boolean[n];
        inRing = new boolean[n];
        implicitH = new int[n];
        totalH = new int[n];
        charge = new int[n];
        valence = new int[n];
        ringBonds = new int[n];
        doubleBonds = new int[n];
        heteroNeighbours = new int[n];
        int[] deg = new int[n];
        for (int i = 0; i < n; i++) {
            IAtom a = mol.getAtom(i);
            atoms[i] = a;
            Integer zi = a.getAtomicNumber();
            z[i] = zi == null ? -1 : zi;
            aromatic[i] = a.isAromatic();
            inRing[i] = a.isInRing();
            Integer h = a.getImplicitHydrogenCount();
            implicitH[i] = h == null ? -1 : h;
            totalH[i] = h == null ? 0 : h;
            valence[i] = h == null ? 0 : h;
            Integer q = a.getFormalCharge();
            charge[i] = q == null ? Integer.MIN_VALUE : q;
        }
        bondObjects = new IBond[nb];
        order = new int[nb];
        bondAromatic = new boolean[nb];
        bondInRing = new boolean[nb];
        int[] begin = new int[nb];
        int[] end = new int[nb];
        for (int j = 0; j < nb; j++) {
            IBond b = mol.getBond(j);
            bondObjects[j] = b;
            order[j] = b.getOrder() == null ? 0 : b.getOrder().numeric();
            bondAromatic[j] = b.isAromatic();
            bondInRing[j] = b.isInRing();
            int u = b.getBegin().getIndex();
            int w = b.getEnd().getIndex();
            begin[j] = u;
            end[j] = w;
            deg[u]++;
            deg[w]++;
            boolean dbl = b.getOrder() == IBond.Order.DOUBLE;
            tally(u, w, order[j], bondInRing[j], dbl);
            tally(w, u, order[j], bondInRing[j], dbl);
        }
        adj = new int[n][];
        bondIndex = new int[n][];
        for (int i = 0; i < n; i++) {
            adj[i] = new int[deg[i]];
            bondIndex[i] = new int[deg[i]];
            deg[i] = 0;
        }
        for (int j = 0; j < nb; j++) {
            int u = begin[j];
            int w = end[j];
            adj[u][deg[u]] = w;
            bondIndex[u][deg[u]++] = j;
            adj[w][deg[w]] = u;
            bondIndex[w][deg[w]++] = j;
        }
    }

    private void tally(int end, int other, int bondOrder, boolean ringBond, boolean dbl) {
        valence[end] += bondOrder;
        ringBonds[end] += ringBond ? 1 : 0;
        doubleBonds[end] += dbl ? 1 : 0;
        totalH[end] += z[other] == 1 ? 1 : 0;
        heteroNeighbours[end] += z[other] != 6 && z[other] != 1 ? 1 : 0;
    }

    /**
     * The smallest set of smallest rings as closed atom paths ({@code Cycles.sssr}), found once;
     * SMARTS ring counts ({@code R<n>}) and the Hammett step share it.
     */
    public int[][] rings() {
        if (rings == null) {
            // on the neighbour lists already built: Cycles.sssr(mol) would build them again with a
            // bond map, which costs more than the basis itself
            try {
                rings = SSSR.find(mol, adj, atoms.length).paths();
            } catch (Intractable e) {
                rings = Cycles.sssr(mol).paths(); // not reached: a minimum cycle basis is polynomial
            }
        }
        return rings;
    }

    /** Number of rings of {@link #rings()} through atom {@code a}: what CDK's {@code R<n>} counts. */
    int ringCount(int a) {
        if (ringCounts == null) {
            int[] counts = new int[atoms.length];
            for (int[] path : rings()) {
                for (int i = 1; i < path.length; i++) {
                    counts[path[i]]++;
                }
            }
            ringCounts = counts;
        }
        return ringCounts[a];
    }

    boolean recursive(Expression e, int atom) {
        int id = e.recursion;
        if (id >= memo.length) {
            memo = Arrays.copyOf(memo, Math.max(id + 1, memo.length * 2));
        }
        byte[] m = memo[id];
        if (m == null) {
            m = memo[id] = new byte[atoms.length];
        }
        if (m[atom] == 0) {
            boolean hit = e.sub != null ? e.sub.matchesAt(this, atom) : e.cdk.matches(atoms[atom]);
            m[atom] = (byte) (hit ? 2 : 1);
        }
        return m[atom] == 2;
    }

    public IAtom atom(int i) {
        return atoms[i];
    }

    /** Neighbour lists by atom index; shared, not to be changed. */
    public int[][] adjacency() {
        return adj;
    }

    /** The molecule these arrays describe. */
    public IAtomContainer molecule() {
        return mol;
    }

    /** Implicit hydrogens on atom {@code i}, 0 when unset. */
    public int implicitHydrogens(int i) {
        return Math.max(0, implicitH[i]);
    }

    /** Formal charge of atom {@code i}, 0 when unset. */
    public int formalCharge(int i) {
        return charge[i] == Integer.MIN_VALUE ? 0 : charge[i];
    }

    /** Whether atom {@code i} is in a ring. */
    public boolean inRing(int i) {
        return inRing[i];
    }

    /** The bond to the k-th neighbour of {@code u} as a code: its order, or 4 when aromatic. */
    public int bondCode(int u, int k) {
        int b = bondIndex[u][k];
        return bondAromatic[b] ? 4 : order[b];
    }

    /** Whether atom {@code i} is aromatic. */
    public boolean aromatic(int i) {
        return aromatic[i];
    }

    /** A carbon that is not aromatic and has only single bonds: what an inductive path runs through. */
    public boolean saturatedCarbon(int i) {
        if (z[i] != 6 || aromatic[i]) {
            return false;
        }
        for (int b : bondIndex[i]) {
            if (order[b] != 1) {
                return false;
            }
        }
        return true;
    }

    /** Atomic number of atom {@code i}, 0 when unset. */
    public int atomicNumber(int i) {
        return Math.max(0, z[i]);
    }

    public int atomCount() {
        return atoms.length;
    }

    /** {@link Expression#signature} of atom {@code i}, worked out once per atom. */
    long signature(int i) {
        if (signatures == null) {
            signatures = new long[atoms.length];
            Arrays.fill(signatures, UNKNOWN);
        }
        long s = signatures[i];
        if (s == UNKNOWN) {
            s = signatures[i] = Expression.signature(this, i);
        }
        return s;
    }

    /**
     * The bond to the k-th neighbour of {@code u} as what bond screens read: order (0 when unset),
     * aromaticity and ring membership in five bits; -1 when the order does not fit.
     */
    int bondInvariants(int u, int k) {
        int b = bondIndex[u][k];
        if (order[b] < 0 || order[b] > 7) {
            return -1;
        }
        return order[b] | (bondAromatic[b] ? 8 : 0) | (bondInRing[b] ? 16 : 0);
    }

    /** The molecule's stated geometry of the double bond between atoms u and w, or null. */
    IDoubleBondStereochemistry doubleBondStereo(int u, int w) {
        if (dbStereo == null) {
            IDoubleBondStereochemistry[] byBond = new IDoubleBondStereochemistry[bondObjects.length];
            for (IStereoElement<?, ?> se : mol.stereoElements()) {
                if (se instanceof IDoubleBondStereochemistry db) {
                    int b = bond(db.getStereoBond().getBegin().getIndex(), db.getStereoBond().getEnd().getIndex());
                    if (b >= 0) {
                        byBond[b] = db;
                    }
                }
            }
            dbStereo = byBond;
        }
        int b = bond(u, w);
        return b < 0 ? null : dbStereo[b];
    }

    /** The index of the bond between {@code u} and {@code w}, or -1. */
    int bond(int u, int w) {
        int[] nb = adj[u];
        for (int k = 0; k < nb.length; k++) {
            if (nb[k] == w) {
                return bondIndex[u][k];
            }
        }
        return -1;
    }
}
