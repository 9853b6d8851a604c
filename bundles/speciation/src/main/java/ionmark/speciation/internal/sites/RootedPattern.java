package ionmark.speciation.internal.sites;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.isomorphism.matchers.Expr;
import org.openscience.cdk.isomorphism.matchers.IQueryAtom;
import org.openscience.cdk.isomorphism.matchers.IQueryBond;
import org.openscience.cdk.isomorphism.matchers.QueryAtom;
import org.openscience.cdk.isomorphism.matchers.QueryAtomContainer;
import org.openscience.cdk.smarts.Smarts;

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
 * <p>Every SMARTS primitive is evaluated by CDK ({@link Expr#matches}), so it means what it means
 * in CDK's matcher; only the and/or/not logic above the primitives is walked here, so that a
 * recursive SMARTS shared by several patterns is matched once per molecule atom (a memo in
 * {@link Target}). The molecule must have been prepared once ({@code SmartsPattern.prepare});
 * nothing is prepared here. The pattern is immutable and thread-safe; a {@link Target} belongs to
 * one thread.
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
    /** Per query atom: its expression with recursive parts numbered for the per-molecule memo, or null. */
    private final Node[] trees;

    public RootedPattern(QueryAtomContainer q, int root) {
        this(q, root, new Recursions());
    }

    /**
     * {@code recursions} is shared by every pattern of one table, so that a recursive SMARTS written
     * in several classes (say "not an amide nitrogen") is evaluated once per molecule atom.
     */
    public RootedPattern(QueryAtomContainer q, int root, Recursions recursions) {
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
        trees = new Node[n];
        for (int i = 0; i < n; i++) {
            trees[i] = atoms[i] instanceof QueryAtom qa ? Node.of(qa.getExpression(), recursions) : null;
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
        return trees[q] != null ? trees[q].matches(t, atom) : atoms[q].matches(t.atoms[atom]);
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

    /** Numbers recursive SMARTS by their text, so equal ones share one memo slot per molecule. */
    public static final class Recursions {
        private final Map<String, Integer> ids = new HashMap<>();

        synchronized int id(Expr recursive) {
            String text;
            try {
                text = Smarts.generate(recursive.subquery());
            } catch (RuntimeException e) {
                text = "#" + System.identityHashCode(recursive);
            }
            return ids.computeIfAbsent(text, k -> ids.size());
        }
    }

    /**
     * An atom expression as a tree whose logic is evaluated here and whose leaves are CDK's: a
     * recursive leaf is looked up in the molecule's memo before it is matched.
     */
    private record Node(Expr.Type op, Expr leaf, Node left, Node right, int recursion) {
        static Node of(Expr e, Recursions r) {
            if (e == null || !plain(e)) {
                return null;
            }
            return build(e, r);
        }

        private static Node build(Expr e, Recursions r) {
            switch (e.type()) {
                case AND:
                case OR:
                    return new Node(e.type(), null, build(e.left(), r), build(e.right(), r), -1);
                case NOT:
                    return new Node(e.type(), null, build(e.left(), r), null, -1);
                case RECURSIVE:
                    return new Node(e.type(), e, null, null, r.id(e));
                default:
                    return new Node(e.type(), e, null, null, -1);
            }
        }

        /** No stereo primitives: CDK's NOT has a special case for them that this tree does not copy. */
        private static boolean plain(Expr e) {
            if (e == null) {
                return true;
            }
            if (e.type() == Expr.Type.STEREOCHEMISTRY) {
                return false;
            }
            return e.type() == Expr.Type.RECURSIVE || plain(e.left()) && plain(e.right());
        }

        boolean matches(Target t, int atom) {
            switch (op) {
                case AND:
                    return left.matches(t, atom) && right.matches(t, atom);
                case OR:
                    return left.matches(t, atom) || right.matches(t, atom);
                case NOT:
                    return !left.matches(t, atom);
                case RECURSIVE:
                    return t.recursive(recursion, atom, leaf);
                default:
                    return leaf.matches(t.atoms[atom]);
            }
        }
    }

    /** A prepared molecule as arrays: atoms, neighbour lists and the bond to each neighbour. */
    public static final class Target {
        final IAtom[] atoms;
        final int[][] adj;
        final IBond[][] bonds;
        /** Outcomes of recursive SMARTS by recursion number and atom: 0 not yet known, 1 no, 2 yes. */
        private byte[][] memo = new byte[16][];

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
        }

        boolean recursive(int id, int atom, Expr e) {
            if (id >= memo.length) {
                memo = Arrays.copyOf(memo, Math.max(id + 1, memo.length * 2));
            }
            byte[] m = memo[id];
            if (m == null) {
                m = memo[id] = new byte[atoms.length];
            }
            if (m[atom] == 0) {
                m[atom] = (byte) (e.matches(atoms[atom]) ? 2 : 1);
            }
            return m[atom] == 2;
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
