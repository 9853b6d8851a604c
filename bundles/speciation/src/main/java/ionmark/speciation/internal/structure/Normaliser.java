package ionmark.speciation.internal.structure;

import java.util.List;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;

/**
 * Takes ionised forms back to the reference protonation (acids protonated, bases neutral), writes
 * pentavalent nitro groups in their charge-separated form, and takes non-aromatic imidic acids
 * (lactims, {@code HO-C=N}) to their amide (lactam) tautomer, the form that dominates in water and
 * the one the table's classes describe. An anion bonded to a cation
 * (nitro, N-oxide, ylide) is a formal charge pair and stays; a cation without hydrogens is a
 * permanent charge and stays.
 */
final class Normaliser {
    private Normaliser() {
    }

    static void toReferenceForm(IAtomContainer mol, List<String> notes) {
        int neutralised = 0;
        for (IAtom a : mol.atoms()) {
            int q = charge(a);
            int h = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
            if (q < 0 && !bondedToCharge(mol, a, +1) && isProtonatable(a)) {
                a.setFormalCharge(q + 1);
                a.setImplicitHydrogenCount(h + 1);
                neutralised++;
            } else if (q > 0 && h > 0 && !bondedToCharge(mol, a, -1)) {
                a.setFormalCharge(q - 1);
                a.setImplicitHydrogenCount(h - 1);
                neutralised++;
            }
        }
        fixNitro(mol);
        if (neutralised > 0) {
            notes.add("input had " + neutralised + " ionised site(s); analysed from the neutral reference form");
        }
        int lactims = toLactam(mol);
        if (lactims > 0) {
            notes.add("input had " + lactims + " imidic acid (lactim) group(s), HO-C=N; analysed as the amide "
                    + "(lactam) tautomer");
        }
    }

    private static boolean isProtonatable(IAtom a) {
        int z = a.getAtomicNumber();
        return z == 8 || z == 16 || z == 7 || z == 6 || z == 34;
    }

    private static int charge(IAtom a) {
        return a.getFormalCharge() == null ? 0 : a.getFormalCharge();
    }

    private static boolean bondedToCharge(IAtomContainer mol, IAtom a, int sign) {
        for (IAtom n : mol.getConnectedAtomsList(a)) {
            if (Integer.signum(charge(n)) == sign) {
                return true;
            }
        }
        return false;
    }

    /**
     * HO-C=N → O=C-NH where none of the three atoms is aromatic, all are uncharged, and the nitrogen
     * carries no hydrogen: an imidic acid written in place of its amide, as barbiturates, hydantoins
     * and ureas often are. One group per carbon; returns how many were moved.
     */
    static int toLactam(IAtomContainer mol) {
        int moved = 0;
        for (IAtom o : mol.atoms()) {
            if (o.getAtomicNumber() != 8 || charge(o) != 0 || o.isAromatic() || hydrogens(o) != 1
                    || mol.getConnectedBondsCount(o) != 1) {
                continue;
            }
            IBond co = mol.getConnectedBondsList(o).get(0);
            IAtom c = co.getOther(o);
            if (co.getOrder() != IBond.Order.SINGLE || c.getAtomicNumber() != 6 || charge(c) != 0 || c.isAromatic()) {
                continue;
            }
            for (IBond cn : mol.getConnectedBondsList(c)) {
                IAtom n = cn.getOther(c);
                if (cn.getOrder() == IBond.Order.DOUBLE && !cn.isAromatic() && n.getAtomicNumber() == 7
                        && charge(n) == 0 && !n.isAromatic() && hydrogens(n) == 0) {
                    co.setOrder(IBond.Order.DOUBLE);
                    cn.setOrder(IBond.Order.SINGLE);
                    dropDoubleBondStereo(mol, cn);
                    o.setImplicitHydrogenCount(0);
                    n.setImplicitHydrogenCount(1);
                    moved++;
                    break;
                }
            }
        }
        return moved;
    }

    /**
     * 2- and 4-hydroxypyridines to their pyridone tautomer, and 2- and 4-mercaptopyridines to their
     * pyridinethione tautomer: a hydroxy or mercapto group on a carbon of a
     * six-membered aromatic ring whose only ring nitrogen is pyridine-type (uncharged, two
     * neighbours, no hydrogen) and sits ortho or para to it gives its hydrogen to that nitrogen, as
     * 2-pyridone, 4-pyridone, 2-quinolone, 4-quinolone and the pyridinethiones (even more
     * strongly) show in water. The double bonds move along
     * an alternating path from the carbon to the nitrogen, so the structure stays a valid Kekulé
     * form. 3-Hydroxypyridines, hydroxy groups on the benzo ring of a quinoline, and rings with two or
     * more nitrogens (hydroxypyrimidines, hydroxypteridines) stay as drawn: see the contributor guide
     * for what was measured. A hydroxy group between the two nitrogens of an imidazole-type ring is
     * moved to the imidazolone ({@link #toImidazolone}). Needs rings and aromaticity perceived; the
     * aromatic flags are stale afterwards. Returns how many groups moved, by kind: pyridones,
     * pyridinethiones, imidazolones.
     */
    static int[] toAromaticLactam(IAtomContainer mol) {
        int[] moved = new int[3];
        if (!hasPyridineNitrogen(mol)) {
            return moved; // most structures (every plain phenol) stop here, before any ring search
        }
        int[][] sixRings = null; // found when the first candidate asks
        for (IAtom o : mol.atoms()) {
            int z = o.getAtomicNumber();
            if (z != 8 && z != 16 || charge(o) != 0 || hydrogens(o) != 1 || mol.getConnectedBondsCount(o) != 1) {
                continue;
            }
            IBond co = mol.getConnectedBondsList(o).get(0);
            IAtom c = co.getOther(o);
            if (co.getOrder() != IBond.Order.SINGLE || c.getAtomicNumber() != 6 || charge(c) != 0 || !c.isAromatic()) {
                continue;
            }
            if (sixRings == null) {
                sixRings = sixMemberedRings(mol);
            }
            for (IAtom n : ringNitrogens(mol, sixRings, mol.indexOf(c))) {
                List<IBond> path = new java.util.ArrayList<>();
                if (alternatingPath(mol, c, n, true, path, new java.util.HashSet<>(List.of(c)))) {
                    for (IBond b : path) {
                        b.setOrder(b.getOrder() == IBond.Order.DOUBLE ? IBond.Order.SINGLE : IBond.Order.DOUBLE);
                        dropDoubleBondStereo(mol, b);
                    }
                    co.setOrder(IBond.Order.DOUBLE);
                    o.setImplicitHydrogenCount(0);
                    n.setImplicitHydrogenCount(1);
                    moved[z == 8 ? 0 : 1]++;
                    break;
                }
            }
            if (z == 8 && hydrogens(o) == 1 && toImidazolone(mol, o, c, co)) {
                moved[2]++;
            }
        }
        return moved;
    }

    /**
     * A hydroxy group on the carbon between the two nitrogens of an aromatic five-membered ring, one
     * pyridine-type (the C=N partner) and one pyrrole-type, is the cyclic urea drawn as its lactim
     * (2-hydroxybenzimidazole is 2-benzimidazolone in water): the hydrogen goes to the pyridine-type
     * nitrogen and the C=N becomes C=O.
     */
    private static boolean toImidazolone(IAtomContainer mol, IAtom o, IAtom c, IBond co) {
        IBond toPyridineType = null;
        IAtom pyrroleType = null;
        for (IBond b : mol.getConnectedBondsList(c)) {
            IAtom n = b.getOther(c);
            if (n == o || n.getAtomicNumber() != 7 || !n.isAromatic() || charge(n) != 0) {
                continue;
            }
            int degree = mol.getConnectedBondsCount(n);
            if (degree == 2 && hydrogens(n) == 0 && b.getOrder() == IBond.Order.DOUBLE) {
                toPyridineType = b;
            } else if (degree == 3 || degree == 2 && hydrogens(n) == 1) {
                pyrroleType = n;
            }
        }
        if (toPyridineType == null || pyrroleType == null
                || !fiveRing(mol, c, toPyridineType.getOther(c), pyrroleType)) {
            return false;
        }
        IAtom n = toPyridineType.getOther(c);
        toPyridineType.setOrder(IBond.Order.SINGLE);
        dropDoubleBondStereo(mol, toPyridineType);
        co.setOrder(IBond.Order.DOUBLE);
        o.setImplicitHydrogenCount(0);
        n.setImplicitHydrogenCount(1);
        return true;
    }

    /** Whether {@code a} and {@code b}, both bonded to {@code c}, close a five-membered ring through two more atoms. */
    private static boolean fiveRing(IAtomContainer mol, IAtom c, IAtom a, IAtom b) {
        for (IAtom x : mol.getConnectedAtomsList(a)) {
            if (x == c) {
                continue;
            }
            for (IAtom y : mol.getConnectedAtomsList(x)) {
                if (y != a && y != c && mol.getBond(y, b) != null) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Whether some aromatic nitrogen could take the hydrogen: uncharged, two neighbours, no hydrogen. */
    private static boolean hasPyridineNitrogen(IAtomContainer mol) {
        for (IAtom a : mol.atoms()) {
            if (a.getAtomicNumber() == 7 && a.isAromatic() && charge(a) == 0 && hydrogens(a) == 0
                    && mol.getConnectedBondsCount(a) == 2) {
                return true;
            }
        }
        return false;
    }

    /** The six-membered cycles of the molecule (CDK's cycle finder), as closed paths of atom indices. */
    private static int[][] sixMemberedRings(IAtomContainer mol) {
        try {
            int[][] all = org.openscience.cdk.graph.Cycles.all(6).find(mol).paths();
            return java.util.Arrays.stream(all).filter(p -> p.length == 7).toArray(int[][]::new);
        } catch (org.openscience.cdk.exception.CDKException e) { // too many cycles to list: leave as drawn
            return new int[0][];
        }
    }

    /**
     * Pyridine-type nitrogens ortho, then para, to atom {@code c} in the aromatic six-membered rings
     * through it that hold no other nitrogen.
     */
    private static List<IAtom> ringNitrogens(IAtomContainer mol, int[][] rings, int c) {
        List<IAtom> ortho = new java.util.ArrayList<>();
        List<IAtom> para = new java.util.ArrayList<>();
        for (int[] ring : rings) {
            int at = -1;
            int nitrogens = 0;
            boolean aromatic = true;
            for (int i = 0; i < 6; i++) {
                IAtom a = mol.getAtom(ring[i]);
                at = ring[i] == c ? i : at;
                nitrogens += a.getAtomicNumber() == 7 ? 1 : 0;
                aromatic &= a.isAromatic();
            }
            if (at < 0 || nitrogens != 1 || !aromatic) {
                continue;
            }
            for (int step : new int[] {1, 5, 3}) {
                IAtom n = mol.getAtom(ring[(at + step) % 6]);
                if (n.getAtomicNumber() == 7 && charge(n) == 0 && hydrogens(n) == 0
                        && mol.getConnectedBondsCount(n) == 2) {
                    List<IAtom> into = step == 3 ? para : ortho;
                    if (!into.contains(n)) {
                        into.add(n);
                    }
                }
            }
        }
        ortho.addAll(para);
        return ortho;
    }

    /**
     * A path from {@code u} to {@code target} over bonds that alternate double and single, the first
     * double when {@code wantDouble}, the last double; bonds collected in {@code path}.
     */
    private static boolean alternatingPath(IAtomContainer mol, IAtom u, IAtom target, boolean wantDouble,
            List<IBond> path, java.util.Set<IAtom> seen) {
        if (path.size() >= 12) {
            return false;
        }
        for (IBond b : mol.getConnectedBondsList(u)) {
            IAtom v = b.getOther(u);
            IBond.Order want = wantDouble ? IBond.Order.DOUBLE : IBond.Order.SINGLE;
            if (b.getOrder() != want || !v.isAromatic() || !b.isAromatic() || seen.contains(v)) {
                continue;
            }
            path.add(b);
            if (v == target && wantDouble) {
                return true;
            }
            if (v != target) {
                seen.add(v);
                if (alternatingPath(mol, v, target, !wantDouble, path, seen)) {
                    return true;
                }
                seen.remove(v);
            }
            path.remove(path.size() - 1);
        }
        return false;
    }

    /** A C=N that became single can no longer carry E/Z configuration. */
    private static void dropDoubleBondStereo(IAtomContainer mol, IBond bond) {
        List<org.openscience.cdk.interfaces.IStereoElement> keep = new java.util.ArrayList<>();
        boolean dropped = false;
        for (var se : mol.stereoElements()) {
            if (se instanceof org.openscience.cdk.interfaces.IDoubleBondStereochemistry db && db.getStereoBond() == bond) {
                dropped = true;
            } else {
                keep.add(se);
            }
        }
        if (dropped) {
            mol.setStereoElements(keep);
        }
    }

    private static int hydrogens(IAtom a) {
        return a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
    }

    /** N(=O)=O → [N+](=O)[O-], the form the table's patterns use. */
    private static void fixNitro(IAtomContainer mol) {
        for (IAtom n : mol.atoms()) {
            if (n.getAtomicNumber() != 7 || charge(n) != 0) {
                continue;
            }
            int doubleO = 0;
            IBond second = null;
            for (IBond b : mol.getConnectedBondsList(n)) {
                IAtom o = b.getOther(n);
                if (o.getAtomicNumber() == 8 && b.getOrder() == IBond.Order.DOUBLE) {
                    doubleO++;
                    second = b;
                }
            }
            if (doubleO == 2 && second != null) {
                second.setOrder(IBond.Order.SINGLE);
                n.setFormalCharge(1);
                second.getOther(n).setFormalCharge(-1);
            }
        }
    }
}
