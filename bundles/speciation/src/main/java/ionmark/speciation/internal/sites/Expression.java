package ionmark.speciation.internal.sites;

import org.openscience.cdk.isomorphism.matchers.Expr;

/**
 * A SMARTS atom or bond expression compiled to a tree that is evaluated over a {@link MatchTarget}'s
 * precomputed atom and bond invariants, so that matching reads int arrays instead of asking CDK's atom
 * and bond objects for each primitive.
 *
 * <p>The primitives below mean exactly what CDK's {@link Expr#matches} makes them mean (including its
 * treatment of unset values and explicit hydrogens); any other primitive is a leaf that CDK evaluates.
 * {@code RootedPatternTest} holds the two to the same answers over every table pattern and reference
 * molecule. Expressions with stereo primitives are not compiled (CDK's negation has a stereo special
 * case), nor are atoms and bonds that are not expression-backed.
 */
final class Expression {
    // logic
    static final int AND = 0;
    static final int OR = 1;
    static final int NOT = 2;
    static final int RECURSIVE = 3;
    /** Evaluated by CDK. */
    static final int OTHER = 4;
    // atom and bond predicates
    static final int TRUE = 5;
    static final int FALSE = 6;
    static final int IS_AROMATIC = 7;
    static final int IS_ALIPHATIC = 8;
    static final int IS_IN_RING = 9;
    static final int IS_IN_CHAIN = 10;
    // atom primitives
    static final int IS_HETERO = 11;
    static final int HAS_IMPLICIT_HYDROGEN = 12;
    static final int UNSATURATED = 13;
    static final int ELEMENT = 14;
    static final int ALIPHATIC_ELEMENT = 15;
    static final int AROMATIC_ELEMENT = 16;
    static final int IMPL_H_COUNT = 17;
    static final int TOTAL_H_COUNT = 18;
    static final int DEGREE = 19;
    static final int TOTAL_DEGREE = 20;
    static final int VALENCE = 21;
    static final int FORMAL_CHARGE = 22;
    static final int RING_BOND_COUNT = 23;
    static final int HETERO_SUBSTITUENT_COUNT = 24;
    static final int INSATURATION = 25;
    // bond primitives
    static final int ORDER = 26;
    static final int ALIPHATIC_ORDER = 27;
    static final int SINGLE_OR_AROMATIC = 28;
    static final int DOUBLE_OR_AROMATIC = 29;
    static final int SINGLE_OR_DOUBLE = 30;
    // atom primitive over the molecule's rings, not the atom alone
    static final int RING_COUNT = 31;

    final int op;
    final int value;
    final Expression left;
    final Expression right;
    /** The CDK expression, for {@link #OTHER} and {@link #RECURSIVE} leaves. */
    final Expr cdk;
    /** Memo slot of a recursive SMARTS, shared by equal ones. */
    final int recursion;
    /** A recursive SMARTS compiled as a rooted pattern, or null when CDK matches it. */
    final RootedPattern sub;

    private Expression(int op, int value, Expression left, Expression right, Expr cdk, int recursion,
            RootedPattern sub) {
        this.op = op;
        this.value = value;
        this.left = left;
        this.right = right;
        this.cdk = cdk;
        this.recursion = recursion;
        this.sub = sub;
    }

    /** An atom expression, or null when it must be matched by CDK as a whole. */
    static Expression atom(Expr e, RootedPattern.Recursions r) {
        return e == null || !plain(e) ? null : build(e, r, true);
    }

    /** A bond expression, or null when it must be matched by CDK as a whole. */
    static Expression bond(Expr e) {
        return e == null || !plain(e) ? null : build(e, null, false);
    }

    private static boolean plain(Expr e) {
        if (e == null) {
            return true;
        }
        if (e.type() == Expr.Type.STEREOCHEMISTRY) {
            return false;
        }
        return e.type() == Expr.Type.RECURSIVE || plain(e.left()) && plain(e.right());
    }

    private static Expression build(Expr e, RootedPattern.Recursions r, boolean atom) {
        switch (e.type()) {
            case AND:
                return new Expression(AND, 0, build(e.left(), r, atom), build(e.right(), r, atom), null, -1, null);
            case OR:
                return new Expression(OR, 0, build(e.left(), r, atom), build(e.right(), r, atom), null, -1, null);
            case NOT:
                return new Expression(NOT, 0, build(e.left(), r, atom), null, null, -1, null);
            case RECURSIVE: {
                int id = r.id(e);
                return new Expression(RECURSIVE, 0, null, null, e, id, r.pattern(id, e));
            }
            default:
                return new Expression(code(e.type(), atom), e.value(), null, null, e, -1, null);
        }
    }

    /** The code of a primitive; the predicates at the top mean the same for atoms and bonds. */
    private static int code(Expr.Type t, boolean atom) {
        switch (t) {
            case TRUE: return TRUE;
            case FALSE: return FALSE;
            case IS_AROMATIC: return IS_AROMATIC;
            case IS_ALIPHATIC: return IS_ALIPHATIC;
            case IS_IN_RING: return IS_IN_RING;
            case IS_IN_CHAIN: return IS_IN_CHAIN;
            default: return atom ? atomCode(t) : bondCode(t);
        }
    }

    private static int atomCode(Expr.Type t) {
        switch (t) {
            case IS_HETERO: return IS_HETERO;
            case HAS_IMPLICIT_HYDROGEN: return HAS_IMPLICIT_HYDROGEN;
            case UNSATURATED: return UNSATURATED;
            case ELEMENT: return ELEMENT;
            case ALIPHATIC_ELEMENT: return ALIPHATIC_ELEMENT;
            case AROMATIC_ELEMENT: return AROMATIC_ELEMENT;
            case IMPL_H_COUNT: return IMPL_H_COUNT;
            case TOTAL_H_COUNT: return TOTAL_H_COUNT;
            case DEGREE: return DEGREE;
            case TOTAL_DEGREE: return TOTAL_DEGREE;
            case VALENCE: return VALENCE;
            case FORMAL_CHARGE: return FORMAL_CHARGE;
            case RING_BOND_COUNT: return RING_BOND_COUNT;
            case HETERO_SUBSTITUENT_COUNT: return HETERO_SUBSTITUENT_COUNT;
            case INSATURATION: return INSATURATION;
            case RING_COUNT: return RING_COUNT;
            default: return OTHER;
        }
    }

    private static int bondCode(Expr.Type t) {
        switch (t) {
            case ORDER: return ORDER;
            case ALIPHATIC_ORDER: return ALIPHATIC_ORDER;
            case SINGLE_OR_AROMATIC: return SINGLE_OR_AROMATIC;
            case DOUBLE_OR_AROMATIC: return DOUBLE_OR_AROMATIC;
            case SINGLE_OR_DOUBLE: return SINGLE_OR_DOUBLE;
            default: return OTHER;
        }
    }

    /**
     * A necessary condition for this atom expression that reads only the atom's own invariants (the
     * ones {@link #signature} packs), or null when nothing is necessary beyond "any atom". Recursive
     * and CDK-evaluated leaves are dropped from conjunctions; a disjunction or negation that needs one
     * of them gives no condition.
     */
    Expression screen() {
        switch (op) {
            case AND: {
                Expression l = left.screen();
                Expression r = right.screen();
                return l == null ? r : r == null ? l : new Expression(AND, 0, l, r, null, -1, null);
            }
            case OR: {
                Expression l = left.screen();
                Expression r = right.screen();
                return l == null || r == null ? null : new Expression(OR, 0, l, r, null, -1, null);
            }
            case NOT:
                return left.local() ? this : null;
            case RECURSIVE:
            case OTHER:
            case RING_COUNT:
                return null;
            default:
                return this;
        }
    }

    /** Whether the whole expression reads only the atom's own invariants. */
    private boolean local() {
        switch (op) {
            case AND:
            case OR:
                return left.local() && right.local();
            case NOT:
                return left.local();
            case RECURSIVE:
            case OTHER:
            case RING_COUNT:
                return false;
            default:
                return true;
        }
    }

    /**
     * The invariants of atom {@code a} that {@link #screen() screens} read, packed into one number, or
     * -1 when one of them is outside the packed range: two atoms with the same signature pass the same
     * screens.
     */
    static long signature(MatchTarget t, int a) {
        long key = 0;
        key = pack(key, t.z[a] + 1, 8);
        key = pack(key, t.aromatic[a] ? 1 : 0, 1);
        key = pack(key, t.inRing[a] ? 1 : 0, 1);
        key = pack(key, t.implicitH[a] + 1, 4);
        key = pack(key, t.totalH[a], 4);
        key = pack(key, t.adj[a].length, 4);
        key = pack(key, t.charge[a] == Integer.MIN_VALUE ? 15 : t.charge[a] + 7, 4);
        key = pack(key, t.valence[a], 5);
        key = pack(key, t.ringBonds[a], 4);
        key = pack(key, t.doubleBonds[a], 3);
        key = pack(key, t.heteroNeighbours[a], 4);
        return key;
    }

    private static long pack(long key, int v, int bits) {
        if (key < 0 || v < 0 || v >= (1 << bits)) {
            return -1;
        }
        return key << bits | v;
    }

    /** Whether molecule atom {@code a} of {@code t} matches. */
    boolean matchesAtom(MatchTarget t, int a) {
        switch (op) {
            case AND: return left.matchesAtom(t, a) && right.matchesAtom(t, a);
            case OR: return left.matchesAtom(t, a) || right.matchesAtom(t, a);
            case NOT: return !left.matchesAtom(t, a);
            case RECURSIVE: return t.recursive(this, a);
            case TRUE: return true;
            case FALSE: return false;
            case IS_AROMATIC: return t.aromatic[a];
            case IS_ALIPHATIC: return !t.aromatic[a];
            case IS_IN_RING: return t.inRing[a];
            case IS_IN_CHAIN: return !t.inRing[a];
            case IS_HETERO: return t.z[a] != 6 && t.z[a] != 1;
            case HAS_IMPLICIT_HYDROGEN: return t.implicitH[a] > 0;
            case UNSATURATED: return t.doubleBonds[a] > 0;
            case ELEMENT: return t.z[a] == value;
            case ALIPHATIC_ELEMENT: return !t.aromatic[a] && t.z[a] == value;
            case AROMATIC_ELEMENT: return t.aromatic[a] && t.z[a] == value;
            case IMPL_H_COUNT: return t.implicitH[a] == value;
            case TOTAL_H_COUNT: return t.totalH[a] == value;
            case DEGREE: return t.adj[a].length == value;
            case TOTAL_DEGREE: return t.adj[a].length + Math.max(0, t.implicitH[a]) == value;
            case VALENCE: return t.valence[a] == value;
            case FORMAL_CHARGE: return t.charge[a] == value;
            case RING_BOND_COUNT: return t.inRing[a] && t.ringBonds[a] == value;
            case HETERO_SUBSTITUENT_COUNT: return t.heteroNeighbours[a] == value;
            case INSATURATION: return t.doubleBonds[a] == value;
            case RING_COUNT: return t.inRing[a] && t.ringCount(a) == value;
            default: return cdk.matches(t.atoms[a]);
        }
    }

    /** Whether molecule bond {@code b} of {@code t} matches. */
    boolean matchesBond(MatchTarget t, int b) {
        switch (op) {
            case AND: return left.matchesBond(t, b) && right.matchesBond(t, b);
            case OR: return left.matchesBond(t, b) || right.matchesBond(t, b);
            case NOT: return !left.matchesBond(t, b);
            case TRUE: return true;
            case FALSE: return false;
            case IS_AROMATIC: return t.bondAromatic[b];
            case IS_ALIPHATIC: return !t.bondAromatic[b];
            case IS_IN_RING: return t.bondInRing[b];
            case IS_IN_CHAIN: return !t.bondInRing[b];
            case ORDER: return t.order[b] == value;
            case ALIPHATIC_ORDER: return !t.bondAromatic[b] && t.order[b] == value;
            case SINGLE_OR_AROMATIC: return t.bondAromatic[b] || t.order[b] == 1;
            case DOUBLE_OR_AROMATIC: return t.bondAromatic[b] || t.order[b] == 2;
            case SINGLE_OR_DOUBLE: return t.order[b] == 1 || t.order[b] == 2;
            default: return cdk.matches(t.bondObjects[b]);
        }
    }
}
