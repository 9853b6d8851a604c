package ionmark.speciation.internal.structure;

import java.util.List;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;

/**
 * Takes ionised forms back to the reference protonation (acids protonated, bases neutral), writes
 * pentavalent nitro groups in their charge-separated form. Tautomers are the next step
 * ({@link Tautomers}). An anion bonded to a cation
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
