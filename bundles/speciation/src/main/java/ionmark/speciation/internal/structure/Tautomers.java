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
 * One reference tautomer per compound: the hydrogens that can move between the nitrogen, oxygen and
 * sulfur atoms of a conjugated system (1,3-, 1,5- and longer shifts at once) are placed by one stated
 * rule, whatever drawing came in.
 *
 * <p>The mobile positions of a conjugated system are its uncharged N, O and S atoms that either carry
 * a hydrogen and only single bonds next to a conjugated atom (donors: N-H, O-H on carbon, S-H on
 * carbon) or carry one double bond and room for a hydrogen (acceptors: C=O, C=S, C=N, ring N). Taking
 * the mobile hydrogens off gives a skeleton that every drawing of the compound shares; each way of
 * putting them back on the mobile positions for which a Kekulé structure exists is a tautomer. Of
 * those the reference is the one that, in this order:
 * <ol>
 * <li>breaks the fewest carbocyclic rings: fewest ring carbons of all-carbon rings with a double bond
 * out of their rings (a benzene ring stays benzenoid: phenol over cyclohexadienone, azo-phenol over
 * quinone hydrazone, hydroxy groups on a benzo ring stay);
 * <li>has the most C=O and C=S (amide over iminol, lactam over lactim, keto over enol between
 * heteroatoms, thione over thiol; 2-pyridone, uracil, barbiturates);
 * <li>has the most aromatic rings (six-membered: a double bond on every atom; five-membered: on four, and
 * one N, O or S lone pair): amino over imino (2-aminopyridine, a sulfonamide on a ring N over the
 * sulfonylimine), the imidazole N-H of purines over pyrimidine-ring N-H;
 * <li>has the fewest ring atoms with a double bond out of their rings (cytosine's amino-oxo form);
 * <li>has the most N-H next to a C=O or C=S (amide resonance: 4(3H)- over 4(1H)-pyrimidinone);
 * <li>puts an open-chain imine on the unsubstituted nitrogen rather than on an alkyl-bearing one
 * (HN=C(NH2)NHR), and on an aryl-bearing one rather than on an unsubstituted one (Ar-N=C(R)NH2);
 * <li>ties (ring N-H of 4(5)-substituted imidazoles, 1H/2H-tetrazoles, amidine and guanidine N-H) go
 * to the structure with the smallest hash of atom invariants refined over the whole graph, which does
 * not depend on the input's atom order.
 * </ol>
 * Hydrogens on carbon do not move (keto/enol tautomers over carbon stay as drawn). A conjugated system
 * with fewer than two mobile positions, or no mobile hydrogen, is skipped before any search; one with
 * more than {@value #MAX_CANDIDATES} placements is left as drawn.
 */
public final class Tautomers {
    /** Placements tried per conjugated system; beyond it the system is left as drawn. */
    static final int MAX_CANDIDATES = 256;
    /** Steps of one Kekulé search; beyond it the placement counts as impossible. */
    private static final int MAX_STEPS = 4000;

    /** What the move did, for the reader's note. */
    record Moved(int oxo, int thione, int nitrogen, int hydroxy, int capped) {
        boolean any() {
            return oxo + thione + nitrogen + hydroxy > 0;
        }

        /** For the note: which hydrogens moved, in a chemist's words. */
        String describe() {
            List<String> parts = new ArrayList<>();
            if (oxo > 0) {
                parts.add(oxo + " hydroxy group(s) to C=O: lactim or iminol to lactam or amide");
            }
            if (thione > 0) {
                parts.add(thione + " mercapto group(s) to C=S: thiol to thione");
            }
            if (hydroxy > 0) {
                parts.add(hydroxy + " C=O to hydroxy: a benzene ring kept");
            }
            if (nitrogen > 0) {
                parts.add(nitrogen + " N-H moved to another nitrogen");
            }
            return String.join("; ", parts);
        }
    }

    private final IAtomContainer mol;
    private final int n;
    private final int[] pi;
    private final int[] hyd;
    private final boolean[] pool;
    private final int[] mobile;
    private final int[][] nbr;
    private final IBond[][] nbrBond;
    private long[] ringMask;
    private int[][] ringPaths;
    private long carbocyclic;
    private long[] invariant;

    private Tautomers(IAtomContainer mol, int[] pi, int[] hyd) {
        this.mol = mol;
        this.n = mol.getAtomCount();
        this.pi = pi;
        this.hyd = hyd;
        this.pool = new boolean[n];
        this.mobile = new int[n];
        this.nbr = new int[n][];
        this.nbrBond = new IBond[n][];
        for (int i = 0; i < n; i++) {
            List<IBond> bonds = mol.getConnectedBondsList(mol.getAtom(i));
            nbr[i] = new int[bonds.size()];
            nbrBond[i] = bonds.toArray(new IBond[0]);
            for (int k = 0; k < bonds.size(); k++) {
                nbr[i][k] = mol.indexOf(bonds.get(k).getOther(mol.getAtom(i)));
            }
        }
    }

    /**
     * Moves {@code mol} (hydrogens suppressed, Kekulé bond orders, rings perceived) to its reference
     * tautomer in place; aromatic flags are stale afterwards.
     */
    static Moved toReference(IAtomContainer mol) {
        Tautomers t = prepare(mol);
        if (t == null) {
            return new Moved(0, 0, 0, 0, 0);
        }
        return t.apply();
    }

    /** {@link #toReference} for the other stages: a charged pair cancelled in a microstate's structure. */
    public static void toReferenceTautomer(IAtomContainer mol) {
        toReference(mol);
    }

    /**
     * Every tautomer this rule set generates for {@code mol} (the drawing included), as new
     * containers: what the reference choice is tested against.
     */
    static List<IAtomContainer> enumerate(IAtomContainer mol) throws CloneNotSupportedException {
        List<IAtomContainer> out = new ArrayList<>();
        Tautomers t = prepare(mol);
        if (t == null) {
            out.add(mol.clone());
            return out;
        }
        List<int[]> systems = t.systems();
        List<List<int[]>> perSystem = new ArrayList<>();
        for (int[] atoms : systems) {
            perSystem.add(t.feasible(atoms));
        }
        // the product over systems, capped
        List<int[]> choice = new ArrayList<>();
        choice.add(new int[systems.size()]);
        for (int s = 0; s < systems.size(); s++) {
            List<int[]> next = new ArrayList<>();
            for (int[] c : choice) {
                for (int k = 0; k < Math.max(1, perSystem.get(s).size()) && next.size() < 64; k++) {
                    int[] d = c.clone();
                    d[s] = k;
                    next.add(d);
                }
            }
            choice = next;
        }
        for (int[] c : choice) {
            IAtomContainer copy = mol.clone();
            Tautomers tc = prepare(copy);
            for (int s = 0; s < systems.size(); s++) {
                if (!perSystem.get(s).isEmpty()) {
                    int[] placement = perSystem.get(s).get(c[s]);
                    tc.place(systems.get(s), placement, tc.kekule(systems.get(s), placement));
                }
            }
            out.add(copy);
        }
        return out;
    }

    /**
     * The tautomers this rule set generates for a neutral drawing, as Kekulé SMILES (the drawing
     * included): every other way the same compound can be drawn, for checking that all get one answer.
     */
    public static List<String> drawings(String smiles) throws StructureException {
        try {
            IAtomContainer mol = new org.openscience.cdk.smiles.SmilesParser(
                    org.openscience.cdk.silent.SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
            org.openscience.cdk.tools.manipulator.AtomContainerManipulator.suppressHydrogens(mol);
            org.openscience.cdk.smiles.SmilesGenerator gen = new org.openscience.cdk.smiles.SmilesGenerator(
                    org.openscience.cdk.smiles.SmiFlavor.Stereo);
            List<String> out = new ArrayList<>();
            for (IAtomContainer t : enumerate(mol)) {
                String s = gen.create(t);
                if (!out.contains(s)) {
                    out.add(s);
                }
            }
            return out;
        } catch (org.openscience.cdk.exception.CDKException | CloneNotSupportedException e) {
            throw new StructureException("cannot enumerate tautomers of '" + smiles + "': " + e.getMessage());
        }
    }

    /** The cheap screen: null when no conjugated system has two mobile positions and a mobile hydrogen. */
    private static Tautomers prepare(IAtomContainer mol) {
        int n = mol.getAtomCount();
        int[] pi = new int[n];
        int[] hyd = new int[n];
        boolean triple = false;
        for (IBond b : mol.bonds()) {
            IBond.Order o = b.getOrder();
            if (o == null || o == IBond.Order.UNSET) {
                return null;
            }
            int extra = o.numeric() - 1;
            pi[mol.indexOf(b.getBegin())] += extra;
            pi[mol.indexOf(b.getEnd())] += extra;
            triple |= extra > 1;
        }
        int donors = 0;
        int acceptors = 0;
        for (int i = 0; i < n; i++) {
            IAtom a = mol.getAtom(i);
            hyd[i] = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
            int kind = kind(mol, a, pi[i], hyd[i]);
            donors += kind == 1 ? 1 : 0;
            acceptors += kind == 2 ? 1 : 0;
        }
        if (donors == 0 || acceptors == 0) {
            return null; // most structures stop here: no hydrogen could go anywhere else
        }
        Tautomers t = new Tautomers(mol, pi, hyd);
        int poolSize = 0;
        for (int i = 0; i < n; i++) {
            IAtom a = mol.getAtom(i);
            int kind = kind(mol, a, pi[i], hyd[i]);
            if (kind == 0) {
                continue;
            }
            boolean conjugated = false;
            for (int j : t.nbr[i]) {
                conjugated |= pi[j] > 0 && !hasTriple(mol, mol.getAtom(j));
            }
            if (kind == 2 || conjugated) {
                t.pool[i] = true;
                t.mobile[i] = kind == 1 ? 1 : 0;
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
        List<IAtom> nb = mol.getConnectedAtomsList(a);
        int degree = nb.size();
        if (z == 7) {
            if (degree + h + pi != 3 || degree == 0 || degree > 2) {
                return 0;
            }
            for (IAtom x : nb) {
                IBond b = mol.getBond(a, x);
                if (x.getAtomicNumber() == 8 && b.getOrder() != IBond.Order.SINGLE || b.getOrder().numeric() > 2
                        || x.getFormalCharge() != null && x.getFormalCharge() != 0) {
                    return 0; // nitroso, nitrile, next to a charge
                }
            }
        } else {
            // O and S: only on carbon (hydroxy, mercapto, C=O, C=S), never on S, P or N
            if (degree != 1 || nb.get(0).getAtomicNumber() != 6 || degree + h + pi != 2) {
                return 0;
            }
        }
        if (pi == 0 && h > 0) {
            return 1;
        }
        return pi == 1 ? 2 : 0;
    }

    private static boolean hasTriple(IAtomContainer mol, IAtom a) {
        for (IBond b : mol.getConnectedBondsList(a)) {
            if (b.getOrder() == IBond.Order.TRIPLE) {
                return true;
            }
        }
        return false;
    }

    /** Whether atom i can carry a pi bond that moves: a conjugated atom or a mobile position. */
    private boolean inSystem(int i) {
        return pool[i] || pi[i] > 0 && !hasTriple(mol, mol.getAtom(i));
    }

    /** The conjugated systems with at least two mobile positions and a mobile hydrogen, atoms sorted. */
    private List<int[]> systems() {
        int[] comp = new int[n];
        Arrays.fill(comp, -1);
        List<int[]> out = new ArrayList<>();
        for (int s = 0; s < n; s++) {
            if (comp[s] >= 0 || !inSystem(s)) {
                continue;
            }
            List<Integer> members = new ArrayList<>();
            int[] stack = new int[n];
            int top = 0;
            stack[top++] = s;
            comp[s] = s;
            int positions = 0;
            int hydrogens = 0;
            while (top > 0) {
                int u = stack[--top];
                members.add(u);
                positions += pool[u] ? 1 : 0;
                hydrogens += mobile[u];
                for (int k = 0; k < nbr[u].length; k++) {
                    int v = nbr[u][k];
                    if (comp[v] < 0 && inSystem(v) && nbrBond[u][k].getOrder() != IBond.Order.TRIPLE) {
                        comp[v] = s;
                        stack[top++] = v;
                    }
                }
            }
            if (positions >= 2 && hydrogens > 0 && hydrogens < positions) {
                out.add(members.stream().mapToInt(Integer::intValue).sorted().toArray());
            }
        }
        return out;
    }

    private Moved apply() {
        List<int[]> systems = systems();
        if (systems.isEmpty()) {
            return new Moved(0, 0, 0, 0, 0);
        }
        int oxo = 0;
        int thione = 0;
        int nitrogen = 0;
        int hydroxy = 0;
        int capped = 0;
        for (int[] atoms : systems) {
            int[] positions = positions(atoms);
            int h = 0;
            for (int p : positions) {
                h += mobile[p];
            }
            if (binomial(positions.length, h) > MAX_CANDIDATES) {
                capped++;
                continue;
            }
            Choice best = null;
            for (int[] placement : placements(positions, h)) {
                ionmark.speciation.internal.work.Budget.check();
                boolean[] bonds = kekule(atoms, placement);
                if (bonds == null) {
                    continue;
                }
                Choice c = score(atoms, placement, bonds);
                if (best == null || c.compareTo(best) < 0) {
                    best = c;
                }
            }
            if (best == null || Arrays.equals(best.key, drawnKey(positions))) {
                continue; // the drawing is the reference form (or one equivalent to it)
            }
            for (int p : positions) {
                int now = contains(best.placement, p) ? 1 : 0;
                if (now == mobile[p]) {
                    continue;
                }
                int z = mol.getAtom(p).getAtomicNumber();
                if (z == 7) {
                    nitrogen += now == 1 ? 1 : 0;
                } else if (now == 0) {
                    oxo += z == 8 ? 1 : 0;
                    thione += z == 16 ? 1 : 0;
                } else {
                    hydroxy++;
                }
            }
            place(atoms, best.placement, best.bonds);
        }
        return new Moved(oxo, thione, nitrogen, hydroxy, capped);
    }

    /** The mobile positions of a system, in order of their skeleton invariants. */
    private int[] positions(int[] atoms) {
        long[] inv = invariants();
        return Arrays.stream(atoms).filter(i -> pool[i]).boxed()
                .sorted((a, b) -> Long.compare(inv[a], inv[b])).mapToInt(Integer::intValue).toArray();
    }

    private static boolean contains(int[] a, int x) {
        for (int v : a) {
            if (v == x) {
                return true;
            }
        }
        return false;
    }

    /** Every way of putting h hydrogens on the positions (each at most one). */
    private static List<int[]> placements(int[] positions, int h) {
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

    private static long binomial(int m, int k) {
        long r = 1;
        for (int i = 1; i <= k; i++) {
            r = r * (m - k + i) / i;
            if (r > 1_000_000) {
                return r;
            }
        }
        return r;
    }

    private List<int[]> feasible(int[] atoms) {
        int[] positions = positions(atoms);
        int h = 0;
        for (int p : positions) {
            h += mobile[p];
        }
        List<int[]> out = new ArrayList<>();
        if (binomial(positions.length, h) > MAX_CANDIDATES) {
            return out;
        }
        for (int[] placement : placements(positions, h)) {
            ionmark.speciation.internal.work.Budget.check();
            if (kekule(atoms, placement) != null) {
                out.add(placement);
            }
        }
        return out;
    }

    /** Sets the hydrogens and bond orders of one placement. */
    private void place(int[] atoms, int[] placement, boolean[] doubleBond) {
        boolean[] member = new boolean[n];
        for (int i : atoms) {
            member[i] = true;
            if (pool[i]) {
                int now = contains(placement, i) ? 1 : 0;
                mol.getAtom(i).setImplicitHydrogenCount(hyd[i] - mobile[i] + now);
            }
        }
        List<IBond> lost = new ArrayList<>();
        for (IBond b : mol.bonds()) {
            int u = mol.indexOf(b.getBegin());
            int v = mol.indexOf(b.getEnd());
            if (!member[u] || !member[v] || b.getOrder() == IBond.Order.TRIPLE) {
                continue;
            }
            IBond.Order want = doubleBond[mol.indexOf(b)] ? IBond.Order.DOUBLE : IBond.Order.SINGLE;
            if (b.getOrder() != want) {
                if (b.getOrder() == IBond.Order.DOUBLE) {
                    lost.add(b);
                }
                b.setOrder(want);
            }
        }
        if (!lost.isEmpty()) {
            List<IStereoElement> keep = new ArrayList<>();
            for (IStereoElement se : mol.stereoElements()) {
                if (!(se instanceof IDoubleBondStereochemistry db && lost.contains(db.getStereoBond()))) {
                    keep.add(se);
                }
            }
            mol.setStereoElements(keep);
        }
    }

    /**
     * A Kekulé structure of the system for one placement, as a flag per bond index, or null when none
     * exists. Atoms are satisfied in skeleton-invariant order, each trying bonds inside its rings first,
     * so the structure found does not depend on the input's atom order.
     */
    boolean[] kekule(int[] atoms, int[] placement) {
        int[] need = new int[n];
        int total = 0;
        for (int i : atoms) {
            need[i] = pool[i] ? 1 - (contains(placement, i) ? 1 : 0) : pi[i];
            total += need[i];
        }
        if (total % 2 != 0) {
            return null;
        }
        long[] inv = invariants();
        rings();
        Integer[] order = Arrays.stream(atoms).boxed().toArray(Integer[]::new);
        Arrays.sort(order, (x, y) -> Long.compare(inv[x], inv[y]));
        int[][] tryOrder = new int[n][];
        for (int i : atoms) {
            final int u = i;
            tryOrder[i] = java.util.stream.IntStream.range(0, nbr[i].length).boxed().sorted((x, y) -> {
                int rx = (ringMask[u] & ringMask[nbr[u][x]]) != 0 ? 0 : 1;
                int ry = (ringMask[u] & ringMask[nbr[u][y]]) != 0 ? 0 : 1;
                return rx != ry ? Integer.compare(rx, ry) : Long.compare(inv[nbr[u][x]], inv[nbr[u][y]]);
            }).mapToInt(Integer::intValue).toArray();
        }
        boolean[] used = new boolean[mol.getBondCount()];
        int[] steps = {0};
        return match(order, tryOrder, need, used, steps) ? used : null;
    }

    /** Bonds atom u could still make double: partner needs one, bond free, not triple. */
    private int open(int u, int[] need, boolean[] used) {
        int open = 0;
        for (int k = 0; k < nbr[u].length; k++) {
            if (need[nbr[u][k]] > 0 && !used[mol.indexOf(nbrBond[u][k])]
                    && nbrBond[u][k].getOrder() != IBond.Order.TRIPLE) {
                open++;
            }
        }
        return open;
    }

    private boolean match(Integer[] order, int[][] tryOrder, int[] need, boolean[] used, int[] steps) {
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
            int v = nbr[u][k];
            int bi = mol.indexOf(nbrBond[u][k]);
            if (need[v] <= 0 || used[bi] || nbrBond[u][k].getOrder() == IBond.Order.TRIPLE) {
                continue;
            }
            used[bi] = true;
            need[u]--;
            need[v]--;
            if (match(order, tryOrder, need, used, steps)) {
                return true;
            }
            used[bi] = false;
            need[u]++;
            need[v]++;
        }
        return false;
    }

    /** A placement's rank: smaller is the reference. */
    private record Choice(int[] placement, boolean[] bonds, long[] key) implements Comparable<Choice> {
        @Override
        public int compareTo(Choice o) {
            return Arrays.compare(key, o.key);
        }
    }

    private Choice score(int[] atoms, int[] placement, boolean[] bonds) {
        int brokenCarbocycle = 0;
        int exocyclic = 0;
        int oxo = 0;
        int imine = 0;
        int amideNh = 0;
        boolean[] piBonded = new boolean[n];
        for (int i = 0; i < n; i++) {
            piBonded[i] = pool[i] ? !contains(placement, i) : pi[i] > 0;
        }
        for (int i : atoms) {
            IAtom a = mol.getAtom(i);
            if (pool[i] && !contains(placement, i)) {
                if (a.getAtomicNumber() != 7) {
                    oxo++;
                } else if (nbr[i].length == 2 && ringMask[i] == 0) {
                    imine += imineOn(i);
                }
            } else if (pool[i] && a.getAtomicNumber() == 7 && nextToOxo(i, placement)) {
                amideNh++;
            }
            if (ringMask[i] == 0) {
                continue;
            }
            for (int k = 0; k < nbr[i].length; k++) {
                if (bonds[mol.indexOf(nbrBond[i][k])] && (ringMask[i] & ringMask[nbr[i][k]]) == 0) {
                    exocyclic++;
                    if ((ringMask[i] & ~carbocyclic) == 0) {
                        brokenCarbocycle++;
                    }
                }
            }
        }
        long[] key = {brokenCarbocycle, -oxo, -aromaticRings(piBonded), exocyclic, -amideNh, imine,
                structureHash(placement)};
        return new Choice(placement, bonds, key);
    }

    /** Whether N-H atom i sits on a carbon that carries C=O or C=S in this placement (an amide N-H). */
    private boolean nextToOxo(int i, int[] placement) {
        for (int c : nbr[i]) {
            for (int o : nbr[c]) {
                if (o != i && pool[o] && mol.getAtom(o).getAtomicNumber() != 7 && !contains(placement, o)) {
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
    private int imineOn(int i) {
        int score = 0;
        for (int j : nbr[i]) {
            int z = mol.getAtom(j).getAtomicNumber();
            if (z == 7 && !pool[j] || z == 8 || ringMask[j] != 0 && !pool[j]) {
                return -1;
            }
            if (!inSystem(j) && z == 6) {
                score = 1;
            }
        }
        return score;
    }

    /**
     * Rings of the smallest set that are aromatic for this placement: a six-membered ring whose atoms
     * all carry a double bond, a five-membered one with four such atoms and one lone-pair atom (N, O, S
     * without a double bond).
     */
    private int aromaticRings(boolean[] piBonded) {
        int count = 0;
        for (int[] ring : ringPaths) {
            int size = ring.length - 1;
            if (size != 5 && size != 6) {
                continue;
            }
            int bonded = 0;
            int lonePair = 0;
            for (int k = 0; k < size; k++) {
                int a = ring[k];
                int z = mol.getAtom(a).getAtomicNumber();
                if (piBonded[a]) {
                    bonded++;
                } else if ((z == 7 || z == 8 || z == 16) && (mol.getAtom(a).getFormalCharge() == null
                        || mol.getAtom(a).getFormalCharge() == 0)) {
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
     * otherwise, and independent of the input's atom order.
     */
    private long structureHash(int[] placement) {
        long[] inv = invariants().clone();
        for (int p : placement) {
            inv[p] = inv[p] * 7919 + 1;
        }
        for (int round = 0; round < Math.min(n, 12); round++) {
            long[] next = new long[n];
            for (int i = 0; i < n; i++) {
                long[] around = new long[nbr[i].length];
                for (int k = 0; k < around.length; k++) {
                    around[k] = inv[nbr[i][k]];
                }
                Arrays.sort(around);
                long h = inv[i] * 1_000_003L;
                for (long x : around) {
                    h = h * 0x9E3779B97F4A7C15L + x;
                    h ^= h >>> 31;
                }
                next[i] = h;
            }
            inv = next;
        }
        Arrays.sort(inv);
        long h = 17;
        for (long x : inv) {
            h = h * 0x100000001B3L ^ x;
        }
        return h;
    }

    /** The key the drawing's own placement would have in the last place (its invariants), for "no move". */
    private long[] drawnKey(int[] positions) {
        List<Integer> drawn = new ArrayList<>();
        for (int p : positions) {
            if (mobile[p] == 1) {
                drawn.add(p);
            }
        }
        int[] placement = drawn.stream().mapToInt(Integer::intValue).toArray();
        int[] atoms = systemOf(positions);
        boolean[] bonds = kekule(atoms, placement);
        return bonds == null ? new long[0] : score(atoms, placement, bonds).key;
    }

    private int[] systemOf(int[] positions) {
        for (int[] s : systems()) {
            if (contains(s, positions[0])) {
                return s;
            }
        }
        return positions;
    }

    /**
     * Invariants of the skeleton (mobile hydrogens off, bond orders ignored), refined over neighbours
     * until the number of classes stops growing: equal for every drawing of one compound, and equal
     * for atoms that symmetry makes equivalent.
     */
    private long[] invariants() {
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
        int classes = distinct(inv);
        for (int round = 0; round < n; round++) {
            long[] next = new long[n];
            for (int i = 0; i < n; i++) {
                long[] around = new long[nbr[i].length];
                for (int k = 0; k < around.length; k++) {
                    IBond b = nbrBond[i][k];
                    boolean fixed = !inSystem(i) || !inSystem(nbr[i][k]) || b.getOrder() == IBond.Order.TRIPLE;
                    around[k] = inv[nbr[i][k]] * 31 + (fixed ? b.getOrder().numeric() : 0);
                }
                Arrays.sort(around);
                long h = inv[i] * 1_000_003L;
                for (long x : around) {
                    h = h * 0x9E3779B97F4A7C15L + x;
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

    private static int distinct(long[] v) {
        return (int) Arrays.stream(v).distinct().count();
    }

    /** Ring membership by smallest set of smallest rings, as bit masks, and which rings are all carbon. */
    private void rings() {
        if (ringMask != null) {
            return;
        }
        ringMask = new long[n];
        int[][] paths = Cycles.sssr(mol).paths();
        ringPaths = paths;
        for (int r = 0; r < paths.length && r < 64; r++) {
            boolean allCarbon = true;
            for (int k = 0; k < paths[r].length - 1; k++) {
                ringMask[paths[r][k]] |= 1L << r;
                allCarbon &= mol.getAtom(paths[r][k]).getAtomicNumber() == 6;
            }
            if (allCarbon) {
                carbocyclic |= 1L << r;
            }
        }
    }
}
