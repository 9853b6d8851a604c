package ionmark.speciation.internal.sites;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.HashSet;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.isomorphism.matchers.Expr;
import org.openscience.cdk.isomorphism.matchers.IQueryAtom;
import org.openscience.cdk.isomorphism.matchers.IQueryBond;
import org.openscience.cdk.isomorphism.matchers.QueryAtom;
import org.openscience.cdk.isomorphism.matchers.QueryAtomContainer;

/**
 * A connected SMARTS query matched with one query atom held on one given molecule atom.
 *
 * <p>Site perception asks, atom by atom, "which is the most specific class whose site is here?",
 * and the estimator asks "which substituent is attached by this atom?". Both are rooted questions;
 * matching the whole pattern over the whole molecule and filtering afterwards costs one full
 * subgraph search per pattern per molecule. Here the root is bound first, so a pattern that cannot
 * sit on that atom fails on its first atom expression, and the search grows only outward from the
 * root, in breadth-first order over the query.
 *
 * <p>Atom and bond expressions are CDK's own ({@link IQueryAtom#matches}), so every SMARTS
 * primitive, including recursive ones, means what it means in CDK's matcher. The molecule must have
 * been prepared once ({@code SmartsPattern.prepare}); nothing is prepared here. Immutable and
 * thread-safe.
 */
public final class RootedPattern {
    /** Visits one mapping (query atom index → molecule atom index); return false to stop. */
    @FunctionalInterface
    public interface Visitor {
        boolean visit(int[] mapping);
    }

    private final IQueryAtom[] atoms;
    /** Query atoms in search order; order[0] is the root. */
    private final int[] order;
    /** For order[i], i > 0: the query atom (already placed) it is reached from, and the bond. */
    private final int[] parent;
    private final IQueryBond[] parentBond;
    /** For order[i]: further bonds to already placed query atoms (ring closures in the query). */
    private final int[][] closeTo;
    private final IQueryBond[][] closeBond;
    private final Set<Integer> rootElements;
    /**
     * Per query atom: whether its expression reads only what {@link Target#key} holds, and then the
     * outcomes by key. The expression is still CDK's; it is only not evaluated twice for atoms that
     * look alike to it.
     */
    private final boolean[] byKey;
    private final ConcurrentHashMap<Long, Boolean>[] outcomes;
    static final int MAX_KEYS = 4096;

    public RootedPattern(QueryAtomContainer q, int root) {
        int n = q.getAtomCount();
        if (root < 0 || root >= n) {
            throw new IllegalArgumentException("root " + root + " is not a query atom");
        }
        atoms = new IQueryAtom[n];
        for (int i = 0; i < n; i++) {
            atoms[i] = (IQueryAtom) q.getAtom(i);
        }
        order = new int[n];
        parent = new int[n];
        parentBond = new IQueryBond[n];
        closeTo = new int[n][];
        closeBond = new IQueryBond[n][];
        int[] rank = new int[n];
        Arrays.fill(rank, -1);
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        queue.add(root);
        rank[root] = 0;
        int placed = 0;
        while (!queue.isEmpty()) {
            int a = queue.poll();
            order[placed++] = a;
            for (IBond b : q.getConnectedBondsList(q.getAtom(a))) {
                int o = q.indexOf(b.getOther(q.getAtom(a)));
                if (rank[o] < 0) {
                    rank[o] = placed + queue.size();
                    queue.add(o);
                }
            }
        }
        if (placed != n) {
            throw new IllegalArgumentException("pattern is not connected");
        }
        for (int i = 0; i < n; i++) {
            int a = order[i];
            int[] to = new int[0];
            IQueryBond[] tb = new IQueryBond[0];
            parent[i] = -1;
            for (IBond b : q.getConnectedBondsList(q.getAtom(a))) {
                int o = q.indexOf(b.getOther(q.getAtom(a)));
                if (rank[o] >= i) {
                    continue; // placed later; that atom checks this bond
                }
                if (parent[i] < 0 || rank[o] < rank[parent[i]]) {
                    if (parent[i] >= 0) {
                        to = append(to, parent[i]);
                        tb = append(tb, parentBond[i]);
                    }
                    parent[i] = o;
                    parentBond[i] = (IQueryBond) b;
                } else {
                    to = append(to, o);
                    tb = append(tb, (IQueryBond) b);
                }
            }
            closeTo[i] = to;
            closeBond[i] = tb;
        }
        rootElements = atoms[root] instanceof QueryAtom qa ? elements(qa.getExpression()) : null;
        byKey = new boolean[n];
        @SuppressWarnings("unchecked")
        ConcurrentHashMap<Long, Boolean>[] o = new ConcurrentHashMap[n];
        outcomes = o;
        for (int i = 0; i < n; i++) {
            byKey[i] = atoms[i] instanceof QueryAtom qa && local(qa.getExpression());
            outcomes[i] = byKey[i] ? new ConcurrentHashMap<>() : null;
        }
    }

    /**
     * The atomic numbers the root can match, or null when the expression does not confine the element
     * (then every atom is a candidate). Used to index patterns by root element.
     */
    public Set<Integer> rootElements() {
        return rootElements;
    }

    /** The first mapping with the root on {@code atom}, or null. */
    public int[] first(Target t, int atom) {
        int[][] found = new int[1][];
        forEach(t, atom, m -> {
            found[0] = m.clone();
            return false;
        });
        return found[0];
    }

    /** Every mapping with the root on {@code atom}, in search order, until the visitor says stop. */
    public void forEach(Target t, int atom, Visitor v) {
        if (!atomMatches(order[0], t, atom)) {
            return;
        }
        int[] map = new int[atoms.length];
        boolean[] used = new boolean[t.atoms.length];
        map[order[0]] = atom;
        used[atom] = true;
        extend(t, 1, map, used, v);
    }

    /** Returns false when the visitor asked to stop. */
    private boolean extend(Target t, int i, int[] map, boolean[] used, Visitor v) {
        if (i == order.length) {
            return v.visit(map);
        }
        int qa = order[i];
        int from = map[parent[i]];
        int[] nbrs = t.adj[from];
        IBond[] bonds = t.bonds[from];
        for (int k = 0; k < nbrs.length; k++) {
            int x = nbrs[k];
            if (used[x] || !parentBond[i].matches(bonds[k]) || !atomMatches(qa, t, x) || !closes(t, i, map, x)) {
                continue;
            }
            map[qa] = x;
            used[x] = true;
            boolean go = extend(t, i + 1, map, used, v);
            used[x] = false;
            if (!go) {
                return false;
            }
        }
        return true;
    }

    private boolean atomMatches(int q, Target t, int atom) {
        long key = byKey[q] ? t.key[atom] : -1;
        if (key < 0) {
            return atoms[q].matches(t.atoms[atom]);
        }
        Boolean known = outcomes[q].get(key);
        if (known != null) {
            return known;
        }
        boolean m = atoms[q].matches(t.atoms[atom]);
        if (outcomes[q].size() < MAX_KEYS) {
            outcomes[q].put(key, m);
        }
        return m;
    }

    /**
     * True when every primitive in {@code e} depends only on the atom itself and its bond counts
     * (see {@link Target#key}); ring sizes, ring counts, recursive SMARTS and the like are not.
     */
    static boolean local(Expr e) {
        if (e == null) {
            return false;
        }
        switch (e.type()) {
            case AND:
            case OR:
                return local(e.left()) && local(e.right());
            case NOT:
                return local(e.left());
            case TRUE:
            case FALSE:
            case IS_AROMATIC:
            case IS_ALIPHATIC:
            case IS_IN_RING:
            case IS_IN_CHAIN:
            case IS_HETERO:
            case HAS_IMPLICIT_HYDROGEN:
            case HAS_ISOTOPE:
            case HAS_UNSPEC_ISOTOPE:
            case UNSATURATED:
            case ELEMENT:
            case ALIPHATIC_ELEMENT:
            case AROMATIC_ELEMENT:
            case IMPL_H_COUNT:
            case TOTAL_H_COUNT:
            case DEGREE:
            case HEAVY_DEGREE:
            case TOTAL_DEGREE:
            case VALENCE:
            case ISOTOPE:
            case FORMAL_CHARGE:
            case RING_BOND_COUNT:
            case INSATURATION:
            case PERIODIC_GROUP:
                return true;
            default:
                return false;
        }
    }

    private boolean closes(Target t, int i, int[] map, int x) {
        for (int c = 0; c < closeTo[i].length; c++) {
            IBond b = t.bond(x, map[closeTo[i][c]]);
            if (b == null || !closeBond[i][c].matches(b)) {
                return false;
            }
        }
        return true;
    }

    private static Set<Integer> elements(Expr e) {
        if (e == null) {
            return null;
        }
        switch (e.type()) {
            case ELEMENT:
            case ALIPHATIC_ELEMENT:
            case AROMATIC_ELEMENT:
                return Set.of(e.value());
            case AND: {
                Set<Integer> l = elements(e.left());
                Set<Integer> r = elements(e.right());
                if (l == null) {
                    return r;
                }
                if (r == null) {
                    return l;
                }
                Set<Integer> both = new HashSet<>(l);
                both.retainAll(r);
                return Set.copyOf(both);
            }
            case OR: {
                Set<Integer> l = elements(e.left());
                Set<Integer> r = elements(e.right());
                if (l == null || r == null) {
                    return null;
                }
                Set<Integer> any = new HashSet<>(l);
                any.addAll(r);
                return Set.copyOf(any);
            }
            default:
                return null;
        }
    }

    private static int[] append(int[] a, int x) {
        int[] b = Arrays.copyOf(a, a.length + 1);
        b[a.length] = x;
        return b;
    }

    private static IQueryBond[] append(IQueryBond[] a, IQueryBond x) {
        IQueryBond[] b = Arrays.copyOf(a, a.length + 1);
        b[a.length] = x;
        return b;
    }

    /** A prepared molecule as arrays: atoms, neighbour lists and the bond to each neighbour. */
    public static final class Target {
        final IAtom[] atoms;
        final int[][] adj;
        final IBond[][] bonds;
        /**
         * Per atom, everything a local atom expression can read, packed: element, aromatic and ring
         * flags, implicit and explicit hydrogens, bond count, bond-order sum, formal charge, mass
         * number, ring bonds and double bonds. −1 when a value is out of the packed range.
         */
        final long[] key;

        public Target(IAtomContainer mol) {
            int n = mol.getAtomCount();
            atoms = new IAtom[n];
            int[] deg = new int[n];
            for (int i = 0; i < n; i++) {
                atoms[i] = mol.getAtom(i);
            }
            for (IBond b : mol.bonds()) {
                deg[b.getBegin().getIndex()]++;
                deg[b.getEnd().getIndex()]++;
            }
            adj = new int[n][];
            bonds = new IBond[n][];
            for (int i = 0; i < n; i++) {
                adj[i] = new int[deg[i]];
                bonds[i] = new IBond[deg[i]];
                deg[i] = 0;
            }
            for (IBond b : mol.bonds()) {
                int u = b.getBegin().getIndex();
                int w = b.getEnd().getIndex();
                adj[u][deg[u]] = w;
                bonds[u][deg[u]++] = b;
                adj[w][deg[w]] = u;
                bonds[w][deg[w]++] = b;
            }
            key = new long[n];
            for (int i = 0; i < n; i++) {
                key[i] = key(atoms[i], adj[i], bonds[i]);
            }
        }

        private long key(IAtom a, int[] nbrs, IBond[] bs) {
            Integer zz = a.getAtomicNumber();
            Integer hh = a.getImplicitHydrogenCount();
            Integer qq = a.getFormalCharge();
            Integer mm = a.getMassNumber();
            int z = zz == null ? 0 : zz;
            int implicitH = hh == null ? 7 : hh; // 7: unset
            int q = (qq == null ? 0 : qq) + 8;
            int mass = mm == null ? 0 : mm + 1;
            int explicitH = 0;
            int orders = 0;
            int ring = 0;
            int doubles = 0;
            for (int k = 0; k < nbrs.length; k++) {
                if (atoms[nbrs[k]].getAtomicNumber() != null && atoms[nbrs[k]].getAtomicNumber() == 1) {
                    explicitH++;
                }
                IBond.Order o = bs[k].getOrder();
                orders += o == null ? 0 : o.numeric();
                ring += bs[k].isInRing() ? 1 : 0;
                doubles += o == IBond.Order.DOUBLE ? 1 : 0;
            }
            if (z > 255 || implicitH > 7 || q < 0 || q > 15 || mass > 1023 || explicitH > 7 || nbrs.length > 15
                    || orders > 31 || ring > 7 || doubles > 7) {
                return -1;
            }
            long k = z;
            k = k << 1 | (a.isAromatic() ? 1 : 0);
            k = k << 1 | (a.isInRing() ? 1 : 0);
            k = k << 3 | implicitH;
            k = k << 3 | explicitH;
            k = k << 4 | nbrs.length;
            k = k << 5 | orders;
            k = k << 4 | q;
            k = k << 10 | mass;
            k = k << 3 | ring;
            k = k << 3 | doubles;
            return k;
        }

        public IAtom atom(int i) {
            return atoms[i];
        }

        public int atomCount() {
            return atoms.length;
        }

        IBond bond(int u, int w) {
            int[] nb = adj[u];
            for (int k = 0; k < nb.length; k++) {
                if (nb[k] == w) {
                    return bonds[u][k];
                }
            }
            return null;
        }
    }
}
