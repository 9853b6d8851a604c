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
 * in CDK's matcher; only the and/or/not logic above the primitives is walked here. A recursive
 * SMARTS is compiled into a rooted pattern of its own (CDK's meaning: a mapping with the
 * subquery's first atom on the atom) and, shared by several patterns, matched once per molecule
 * atom (a memo in {@link Target}). The molecule must have been prepared once ({@code SmartsPattern.prepare});
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
    /** Per query atom: its compiled expression, or null when CDK matches the atom. */
    private final Expression[] trees;
    /** Compiled {@link #parentBond} and {@link #closeBond} expressions, or null where CDK matches. */
    private final Expression[] parentTest;
    private final Expression[][] closeTest;
    /** {@link Expression#screen()} of the root's expression; null when any atom may be the root. */
    private final Expression rootScreen;
    /**
     * For each query atom bonded to the root: the {@link Expression#screen()} of its atom expression and
     * of the bond to the root (null where anything passes).
     */
    private final Expression[] neighbourScreen;
    private final Expression[] neighbourBondScreen;
    /**
     * Double-bond geometry the pattern asks for ({@code /} and {@code \} bonds): per double bond, the query
     * atoms {begin, end, ligand on begin, ligand on end} and 1 when the two ligands are cis (together).
     * A mapping holds only where the molecule states that geometry for the mapped bond; a molecule
     * drawn without it does not match.
     */
    private final int[][] geometry;

    public RootedPattern(IAtomContainer q, int root) {
        this(q, root, new Recursions());
    }

    /**
     * {@code recursions} is shared by every pattern of one table, so that a recursive SMARTS written
     * in several classes (say "not an amide nitrogen") is evaluated once per molecule atom.
     */
    public RootedPattern(IAtomContainer q, int root, Recursions recursions) {
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
        trees = new Expression[n];
        parentTest = new Expression[n];
        closeTest = new Expression[n][];
        for (int i = 0; i < n; i++) {
            trees[i] = atoms[i] instanceof QueryAtom qa ? Expression.atom(qa.getExpression(), recursions) : null;
            parentTest[i] = bondTest(parentBond[i]);
            closeTest[i] = new Expression[closeBond[i].length];
            for (int c = 0; c < closeBond[i].length; c++) {
                closeTest[i][c] = bondTest(closeBond[i][c]);
            }
        }
        rootScreen = trees[root] == null ? null : trees[root].screen();
        geometry = geometry(q);
        // every query atom bonded to the root is reached from it: the root has the lowest rank
        int k = 0;
        for (int i = 1; i < n; i++) {
            k += parent[i] == root ? 1 : 0;
        }
        neighbourScreen = new Expression[k];
        neighbourBondScreen = new Expression[k];
        k = 0;
        for (int i = 1; i < n; i++) {
            if (parent[i] == root) {
                neighbourScreen[k] = trees[order[i]] == null ? null : trees[order[i]].screen();
                neighbourBondScreen[k++] = parentTest[i] == null ? null : parentTest[i].screen();
            }
        }
    }

    private static int[][] geometry(IAtomContainer q) {
        List<int[]> out = new ArrayList<>();
        for (IStereoElement<?, ?> se : q.stereoElements()) {
            if (!(se instanceof IDoubleBondStereochemistry db)) {
                continue;
            }
            IBond focus = db.getStereoBond();
            IBond[] lig = db.getBonds();
            int cis = focus instanceof QueryBond qb ? stereoValue(qb.getExpression()) : 0;
            if (cis == 0) {
                continue;
            }
            IAtom begin = focus.getBegin();
            IBond atBegin = lig[0].contains(begin) ? lig[0] : lig[1];
            IBond atEnd = atBegin == lig[0] ? lig[1] : lig[0];
            out.add(new int[] {q.indexOf(begin), q.indexOf(focus.getEnd()), q.indexOf(atBegin.getOther(begin)),
                    q.indexOf(atEnd.getOther(focus.getEnd())), cis == IStereoElement.TOGETHER ? 1 : 0});
        }
        return out.toArray(new int[0][]);
    }

    /** The value of the STEREOCHEMISTRY primitive in a bond expression (CDK's TOGETHER or OPPOSITE), 0 when none. */
    private static int stereoValue(Expr e) {
        if (e == null) {
            return 0;
        }
        if (e.type() == Expr.Type.STEREOCHEMISTRY) {
            return e.value();
        }
        int l = stereoValue(e.left());
        return l != 0 ? l : stereoValue(e.right());
    }

    /** Whether the molecule states, for every double bond the pattern gives a geometry, that geometry. */
    private boolean geometryHolds(MatchTarget t, int[] map) {
        for (int[] g : geometry) {
            IDoubleBondStereochemistry s = t.doubleBondStereo(map[g[0]], map[g[1]]);
            if (s == null) {
                return false;
            }
            IBond sb = s.getStereoBond();
            IBond[] lig = s.getBonds();
            IBond atBegin = lig[0].contains(sb.getBegin()) ? lig[0] : lig[1];
            IBond atEnd = atBegin == lig[0] ? lig[1] : lig[0];
            int ligBegin = atBegin.getOther(sb.getBegin()).getIndex();
            int ligEnd = atEnd.getOther(sb.getEnd()).getIndex();
            boolean together = s.getStereo() == IDoubleBondStereochemistry.Conformation.TOGETHER;
            boolean sameWay = sb.getBegin().getIndex() == map[g[0]];
            together ^= (sameWay ? ligBegin : ligEnd) != map[g[2]];
            together ^= (sameWay ? ligEnd : ligBegin) != map[g[3]];
            if (together != (g[4] == 1)) {
                return false;
            }
        }
        return true;
    }

    /**
     * A necessary condition on the root atom that reads only that atom's own invariants: atoms with
     * the same {@link Expression#signature} get the same answer. False means no mapping can put the
     * root there; true means there may be one.
     */
    boolean rootMayMatch(MatchTarget t, int atom) {
        return rootScreen == null || rootScreen.matchesAtom(t, atom);
    }

    /**
     * A necessary condition over the root's neighbourhood: every query atom bonded to the root finds
     * some neighbour of {@code atom} that passes its screen, across a bond that passes the bond's. It
     * reads only the atom's and its neighbours' signatures ({@link Expression#signature}) and the
     * order, aromaticity and ring membership of the bonds between them, so atoms alike in all of those
     * get the same answer.
     */
    boolean neighboursMayMatch(MatchTarget t, int atom) {
        int[] nbrs = t.adj[atom];
        int[] bonds = t.bondIndex[atom];
        for (int j = 0; j < neighbourScreen.length; j++) {
            Expression a = neighbourScreen[j];
            Expression b = neighbourBondScreen[j];
            boolean found = false;
            for (int k = 0; k < nbrs.length && !found; k++) {
                found = (b == null || b.matchesBond(t, bonds[k])) && (a == null || a.matchesAtom(t, nbrs[k]));
            }
            if (!found) {
                return false;
            }
        }
        return true;
    }

    private static Expression bondTest(IQueryBond b) {
        return b instanceof QueryBond qb ? Expression.bond(qb.getExpression()) : null;
    }

    /**
     * The atomic numbers the root can match, or null when the expression does not confine the element
     * (then every atom is a candidate). Used to index patterns by root element.
     */
    public Set<Integer> rootElements() {
        return rootElements;
    }

    /** The first mapping with the root on {@code atom}, or null. */
    public int[] first(MatchTarget t, int atom) {
        if (!atomMatches(order[0], t, atom)) {
            return null;
        }
        int[] map = new int[atoms.length];
        map[order[0]] = atom;
        // the search stops at the first whole mapping and leaves it in map
        return order.length == 1 || !extend(t, 1, map, STOP) ? map : null;
    }

    /** Every mapping with the root on {@code atom}, in search order, until the visitor says stop. */
    public void forEach(MatchTarget t, int atom, Visitor v) {
        if (!atomMatches(order[0], t, atom)) {
            return;
        }
        int[] map = new int[atoms.length];
        map[order[0]] = atom;
        extend(t, 1, map, v);
    }

    private static final Visitor STOP = m -> false;

    /** Whether some mapping puts the root on {@code atom}. */
    public boolean matchesAt(MatchTarget t, int atom) {
        if (!atomMatches(order[0], t, atom)) {
            return false;
        }
        if (order.length == 1) {
            return true;
        }
        int[] map = new int[atoms.length];
        map[order[0]] = atom;
        return !extend(t, 1, map, STOP);
    }

    /** Returns false when the visitor asked to stop. */
    private boolean extend(MatchTarget t, int i, int[] map, Visitor v) {
        if (i == order.length) {
            return geometry.length > 0 && !geometryHolds(t, map) || v.visit(map);
        }
        int qa = order[i];
        int from = map[parent[i]];
        int[] nbrs = t.adj[from];
        int[] bonds = t.bondIndex[from];
        for (int k = 0; k < nbrs.length; k++) {
            int x = nbrs[k];
            if (placed(map, i, x) || !bondMatches(parentTest[i], parentBond[i], t, bonds[k]) || !atomMatches(qa, t, x)
                    || !closes(t, i, map, x)) {
                continue;
            }
            map[qa] = x;
            if (!extend(t, i + 1, map, v)) {
                return false;
            }
        }
        return true;
    }

    /** Whether molecule atom {@code x} already holds one of the first {@code i} query atoms. */
    private boolean placed(int[] map, int i, int x) {
        for (int j = 0; j < i; j++) {
            if (map[order[j]] == x) {
                return true;
            }
        }
        return false;
    }

    private boolean atomMatches(int q, MatchTarget t, int atom) {
        return trees[q] != null ? trees[q].matchesAtom(t, atom) : atoms[q].matches(t.atoms[atom]);
    }

    private static boolean bondMatches(Expression test, IQueryBond query, MatchTarget t, int bond) {
        return test != null ? test.matchesBond(t, bond) : query.matches(t.bondObjects[bond]);
    }

    private boolean closes(MatchTarget t, int i, int[] map, int x) {
        for (int c = 0; c < closeTo[i].length; c++) {
            int b = t.bond(x, map[closeTo[i][c]]);
            if (b < 0 || !bondMatches(closeTest[i][c], closeBond[i][c], t, b)) {
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

    /**
     * Numbers recursive SMARTS by their text, so equal ones share one memo slot per molecule, and
     * holds each one compiled as a pattern rooted at its first atom.
     */
    public static final class Recursions {
        private final Map<String, Integer> ids = new HashMap<>();
        private final Map<Integer, RootedPattern> compiled = new HashMap<>();

        synchronized int id(Expr recursive) {
            String text;
            try {
                text = Smarts.generate(recursive.subquery());
            } catch (RuntimeException e) {
                text = "#" + System.identityHashCode(recursive);
            }
            Integer known = ids.get(text);
            if (known != null) {
                return known;
            }
            int id = ids.size();
            ids.put(text, id);
            return id;
        }

        /**
         * {@code $(...)} holds on an atom when its query has a mapping with the query's first atom on
         * that atom: CDK's meaning, found here by the same rooted search. Null when the subquery cannot
         * be compiled (not connected); then CDK matches it.
         */
        synchronized RootedPattern pattern(int id, Expr recursive) {
            if (!compiled.containsKey(id)) {
                RootedPattern p;
                try {
                    p = recursive.subquery() == null || recursive.subquery().getAtomCount() == 0 ? null
                            : new RootedPattern(recursive.subquery(), 0, this);
                } catch (IllegalArgumentException e) {
                    p = null;
                }
                compiled.put(id, p);
            }
            return compiled.get(id);
        }
    }
}
