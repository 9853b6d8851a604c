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
