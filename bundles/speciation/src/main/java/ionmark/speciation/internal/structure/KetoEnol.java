package ionmark.speciation.internal.structure;

import java.util.ArrayList;
import java.util.List;

import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IDoubleBondStereochemistry;
import org.openscience.cdk.interfaces.IStereoElement;

/**
 * The hydrogens that move between oxygen and carbon (keto/enol tautomers), which {@link Tautomers} leaves
 * alone: a 1,3-diketone drawn as its enol and drawn as the diketone is one compound. The reference form is
 * the keto form, the one the table's carbon-acid classes are written for (1,3-diketones, 3-keto esters and
 * amides, cyclic 1,3-diones: the proton leaves the carbon between the two C=O), with two exceptions where the
 * enol is the form found in water and the form the table's enol classes are written for:
 * <ul>
 * <li>a <em>ring vinylogous acid</em>: HO–C=C–C(=O)–O with all four of those carbons and oxygens in one ring
 * (tetronic acids, 4-hydroxy-2-pyrones and 4-hydroxycoumarins, ascorbic acid, the enol of Meldrum's acid).
 * A keto drawing of such a compound is moved to this enol;</li>
 * <li>the enol of a 1,3-ketoaldehyde, HO–CH=C–C=O (malondialdehyde, hydroxymethylene ketones), and the enol
 * of a cyclic 1,2-dione, O=C–C(OH)=C in one ring (hydroxyquinones, diosphenols). A keto drawing of such a
 * compound is moved to this enol too;</li>
 * <li>the enol of a ring ketone on an aromatic ring whose other carbon carries a carboxamide with an N-H,
 * HO–C(Ar)=C–C(=O)NH with the two enol carbons in one ring (the oxicams: the enol is held by its hydrogen bond to
 * the amide and conjugated with the arene; it is the form found in water and in the solid, from memory). A keto
 * drawing is moved to this enol too;</li>
 * <li>an enol whose C=C is aromatic (phenols, tropolone) or whose other carbon carries a heteroatom (the
 * enediol of ascorbic acid and other reductones, enaminols) stays as drawn.</li>
 * </ul>
 * Enol to keto: the O–H hydrogen goes to the carbon at the other end of the C=C (HO–C=C → O=C–CH).
 * Keto to enol (those exceptions only): a hydrogen of the carbon next to the carbonyl goes to its oxygen. The rule is chosen to be the drawing the table's classes are written for (common practice
 * for writing the neutral form of a 1,3-dicarbonyl compound; keto over enol except where the enol is the
 * stable, strongly acidic form: Albert and Serjeant, The Determination of Ionization Constants, from memory).
 *
 * <p>Not covered: an enol whose ring counts as aromatic only through its other C=O groups (barbituric acid drawn
 * as 6-hydroxyuracil, the enol of a 3,5-pyrazolidinedione) stays as drawn, because the same test would move
 * the hydroxypyrimidinones and 4-hydroxy-2-pyridones that the table's classes are written for.
 *
 * <p>Runs after {@link Tautomers} on the prepared molecule (Kekulé bond orders, aromaticity flags set), so
 * that a quinoid drawing of a phenol or an aromatic acid is benzenoid again before any enol is looked at; when
 * it moves a hydrogen, the heteroatom step runs once more on the new carbon skeleton. Most structures stop at the
 * first screen: no oxygen with one neighbour on carbon.
 */
final class KetoEnol {
    /** What the step did, for the reader's note. */
    record Moved(int toKeto, int toEnol) {
        boolean any() {
            return toKeto + toEnol > 0;
        }

        String describe() {
            List<String> parts = new ArrayList<>();
            if (toKeto > 0) {
                parts.add(toKeto + " enol group(s) to the keto form: the hydrogen on carbon");
            }
            if (toEnol > 0) {
                parts.add(toEnol + " keto group(s) to the stable enol (ring vinylogous acid, ketoaldehyde, cyclic 1,2-dione"
                        + " or oxicam type)");
            }
            return String.join("; ", parts);
        }
    }

    private final IAtomContainer mol;
    private int[][] rings;

    private KetoEnol(IAtomContainer mol) {
        this.mol = mol;
    }

    /** Moves {@code mol} to its reference keto/enol form in place; aromatic flags are stale afterwards. */
    static Moved toReference(IAtomContainer mol) {
        if (!anyTerminalOxygenOnCarbon(mol)) {
            return new Moved(0, 0);
        }
        KetoEnol k = new KetoEnol(mol);
        int toKeto = k.enolsToKeto();
        int toEnol = k.ketonesToRingVinylogousAcids();
        return new Moved(toKeto, toEnol);
    }

    private static boolean anyTerminalOxygenOnCarbon(IAtomContainer mol) {
        for (IAtom a : mol.atoms()) {
            if (a.getAtomicNumber() == 8 && mol.getConnectedBondsCount(a) == 1
                    && mol.getConnectedAtomsList(a).get(0).getAtomicNumber() == 6) {
                return true;
            }
        }
        return false;
    }

    /** Every enol O–H on a non-aromatic C=C (not a ring vinylogous acid, no enediol) to the keto form. */
    private int enolsToKeto() {
        int moved = 0;
        for (IAtom o : mol.atoms()) {
            IBond co = oxygenOnCarbon(o, 1, IBond.Order.SINGLE);
            if (co == null) {
                continue;
            }
            IAtom ca = co.getOther(o);
            IBond cc = doubleBondToCarbon(ca);
            if (cc == null || cc.isAromatic()) {
                continue;
            }
            IAtom cb = cc.getOther(ca);
            if (cb.isAromatic() || charge(cb) != 0 || carries(cb, true) || carries(ca, false)
                    || ringVinylogousAcid(ca, cb) != null || ketoAldehydeEnol(ca, cb) || ringDioneEnol(ca, cb)
                    || arylRingEnolOfAmide(ca, cb)) {
                continue;
            }
            o.setImplicitHydrogenCount(0);
            co.setOrder(IBond.Order.DOUBLE);
            cc.setOrder(IBond.Order.SINGLE);
            cb.setImplicitHydrogenCount(h(cb) + 1);
            dropStereo(cc);
            moved++;
        }
        return moved;
    }

    /** Every ketone next to a CH whose enol would be a ring vinylogous acid, to that enol. */
    private int ketonesToRingVinylogousAcids() {
        int moved = 0;
        for (IAtom o : mol.atoms()) {
            IBond co = oxygenOnCarbon(o, 0, IBond.Order.DOUBLE);
            if (co == null) {
                continue;
            }
            IAtom ca = co.getOther(o);
            for (IBond ab : mol.getConnectedBondsList(ca)) {
                IAtom cb = ab.getOther(ca);
                if (cb == o || cb.getAtomicNumber() != 6 || ab.getOrder() != IBond.Order.SINGLE || h(cb) == 0
                        || cb.isAromatic() || charge(cb) != 0 || !allSingle(cb)) {
                    continue;
                }
                if (ringVinylogousAcid(ca, cb) == null && !(h(ca) == 1 && ketoAldehydeEnol(ca, cb))
                        && !ringDioneEnol(ca, cb) && !arylRingEnolOfAmide(ca, cb)) {
                    continue;
                }
                o.setImplicitHydrogenCount(1);
                co.setOrder(IBond.Order.SINGLE);
                ab.setOrder(IBond.Order.DOUBLE);
                cb.setImplicitHydrogenCount(h(cb) - 1);
                moved++;
                break;
            }
        }
        return moved;
    }

    /**
     * The bond of an uncharged terminal oxygen with {@code hydrogens} hydrogens to an uncharged non-aromatic carbon,
     * when it has the given order (single: an enol O-H; double: a C=O); null otherwise.
     */
    private IBond oxygenOnCarbon(IAtom o, int hydrogens, IBond.Order order) {
        if (o.getAtomicNumber() != 8 || charge(o) != 0 || h(o) != hydrogens || mol.getConnectedBondsCount(o) != 1) {
            return null;
        }
        IBond co = mol.getConnectedBondsList(o).get(0);
        IAtom c = co.getOther(o);
        return c.getAtomicNumber() == 6 && co.getOrder() == order && !c.isAromatic() && charge(c) == 0 ? co : null;
    }

    /**
     * For the enol carbon {@code ca} and its partner {@code cb}: the lactone carbon Cc (a neighbour of Cb with
     * a C=O and a ring oxygen) when Ca, Cb, Cc and that oxygen lie in one ring; null otherwise.
     */
    private IAtom ringVinylogousAcid(IAtom ca, IAtom cb) {
        for (IBond bc : mol.getConnectedBondsList(cb)) {
            IAtom cc = bc.getOther(cb);
            if (cc == ca || cc.getAtomicNumber() != 6 || bc.getOrder() != IBond.Order.SINGLE || !hasCarbonylOxygen(cc)) {
                continue;
            }
            for (IAtom ring : mol.getConnectedAtomsList(cc)) {
                if (ring.getAtomicNumber() == 8 && mol.getConnectedBondsCount(ring) == 2
                        && inOneRing(ca, cb, cc, ring)) {
                    return cc;
                }
            }
        }
        return null;
    }

    /**
     * Whether the enol HO–Ca=Cb (or the keto form of it) is that of a 1,3-ketoaldehyde: Ca carries a hydrogen
     * (the aldehyde carbon) and Cb a carbonyl carbon. Such compounds (malondialdehyde, hydroxymethylene
     * ketones) are enols in water (from memory), and the enol is their reference form.
     */
    private boolean ketoAldehydeEnol(IAtom ca, IAtom cb) {
        if (h(ca) != 1) {
            return false;
        }
        for (IBond b : mol.getConnectedBondsList(cb)) {
            IAtom c = b.getOther(cb);
            if (c != ca && c.getAtomicNumber() == 6 && b.getOrder() == IBond.Order.SINGLE && hasCarbonylOxygen(c)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether HO–Ca=Cb (or its keto form) is the enol of a cyclic 1,2-dione: Ca is bonded to another carbonyl
     * carbon, and Ca, Cb and that carbon lie in one ring (hydroxyquinones, diosphenols, cyclotene). Such
     * compounds are enols in water (from memory); open-chain 1,2-diones and 2-oxo acids stay keto.
     */
    private boolean ringDioneEnol(IAtom ca, IAtom cb) {
        for (IBond b : mol.getConnectedBondsList(ca)) {
            IAtom c = b.getOther(ca);
            if (c != cb && c.getAtomicNumber() == 6 && b.getOrder() == IBond.Order.SINGLE && hasCarbonylOxygen(c)
                    && inOneRing(ca, cb, c)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether HO–Ca=Cb (or its keto form) is the enol of an oxicam-type ring: Ca and Cb in one ring, Ca bonded to an
     * aromatic carbon, Cb bonded outside that ring to the carbonyl carbon of an amide whose N carries a hydrogen.
     */
    private boolean arylRingEnolOfAmide(IAtom ca, IAtom cb) {
        boolean onArene = false;
        for (IAtom x : mol.getConnectedAtomsList(ca)) {
            onArene |= x != cb && x.isAromatic() && x.getAtomicNumber() == 6;
        }
        if (!onArene || !inOneRing(ca, cb)) {
            return false;
        }
        for (IBond b : mol.getConnectedBondsList(cb)) {
            IAtom c = b.getOther(cb);
            if (c == ca || c.getAtomicNumber() != 6 || b.getOrder() != IBond.Order.SINGLE || !hasCarbonylOxygen(c)
                    || inOneRing(cb, c)) {
                continue;
            }
            for (IAtom n : mol.getConnectedAtomsList(c)) {
                if (n.getAtomicNumber() == 7 && h(n) >= 1 && charge(n) == 0) {
                    return true;
                }
            }
        }
        return false;
    }

    private boolean hasCarbonylOxygen(IAtom c) {
        for (IBond b : mol.getConnectedBondsList(c)) {
            IAtom x = b.getOther(c);
            if (x.getAtomicNumber() == 8 && b.getOrder() == IBond.Order.DOUBLE && mol.getConnectedBondsCount(x) == 1) {
                return true;
            }
        }
        return false;
    }

    private boolean inOneRing(IAtom... atoms) {
        if (rings == null) {
            rings = Cycles.sssr(mol).paths();
        }
        int[] idx = new int[atoms.length];
        for (int i = 0; i < atoms.length; i++) {
            idx[i] = mol.indexOf(atoms[i]);
        }
        for (int[] path : rings) {
            boolean all = true;
            for (int a : idx) {
                boolean found = false;
                for (int k = 0; k < path.length - 1 && !found; k++) {
                    found = path[k] == a;
                }
                all &= found;
            }
            if (all) {
                return true;
            }
        }
        return false;
    }

    private IBond doubleBondToCarbon(IAtom ca) {
        IBond found = null;
        for (IBond b : mol.getConnectedBondsList(ca)) {
            if (b.getOrder() == IBond.Order.DOUBLE) {
                if (b.getOther(ca).getAtomicNumber() != 6 || found != null) {
                    return null;
                }
                found = b;
            }
        }
        return found;
    }

    /** Whether carbon {@code c} carries N or S, and O too when {@code oxygen}. */
    private boolean carries(IAtom c, boolean oxygen) {
        for (IAtom x : mol.getConnectedAtomsList(c)) {
            int z = x.getAtomicNumber();
            if (z == 7 || z == 16 || oxygen && z == 8) {
                return true;
            }
        }
        return false;
    }

    private boolean allSingle(IAtom c) {
        for (IBond b : mol.getConnectedBondsList(c)) {
            if (b.getOrder() != IBond.Order.SINGLE) {
                return false;
            }
        }
        return true;
    }

    private void dropStereo(IBond lost) {
        @SuppressWarnings("rawtypes") // CDK's setStereoElements takes a raw List<IStereoElement>
        List<IStereoElement> keep = new ArrayList<>();
        boolean dropped = false;
        for (IStereoElement<?, ?> se : mol.stereoElements()) {
            if (se instanceof IDoubleBondStereochemistry db && db.getStereoBond() == lost) {
                dropped = true;
            } else {
                keep.add(se);
            }
        }
        if (dropped) {
            mol.setStereoElements(keep);
        }
    }

    private static int h(IAtom a) {
        return a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
    }

    private static int charge(IAtom a) {
        return a.getFormalCharge() == null ? 0 : a.getFormalCharge();
    }
}
