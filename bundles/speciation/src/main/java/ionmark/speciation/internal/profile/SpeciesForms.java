package ionmark.speciation.internal.profile;

import java.util.ArrayList;
import java.util.List;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;

import ionmark.speciation.internal.structure.Tautomers;

/**
 * How a microstate is written for the reader. A protonated base and a deprotonated acid in one ring
 * ({@code [nH+]} and {@code [n-]} of an imidazole, a pyrazole or a triazole) are not a zwitterion but the
 * uncharged compound with its hydrogen moved: the pair is written uncharged and taken to the reference
 * tautomer, so that the microstate merges with the uncharged species instead of being listed as a
 * second, charged-looking one.
 */
public final class SpeciesForms {
    private SpeciesForms() {
    }

    /**
     * Cancels each cation/anion pair of {@code copy} (hydrogens suppressed, Kekulé bonds) whose two atoms share
     * a ring, then takes the result to the reference tautomer; returns how many pairs were cancelled.
     */
    public static int cancelRingPairs(IAtomContainer copy, List<Integer> cations, List<Integer> anions) {
        int cancelled = 0;
        List<Integer> free = new ArrayList<>(anions);
        for (int c : cations) {
            IAtom plus = copy.getAtom(c);
            for (int k = 0; k < free.size(); k++) {
                IAtom minus = copy.getAtom(free.get(k));
                int hPlus = h(plus);
                if (hPlus > 0 && minus.getAtomicNumber() == 7 && plus.getAtomicNumber() == 7
                        && sameRing(copy, plus, minus)) {
                    plus.setFormalCharge(charge(plus) - 1);
                    plus.setImplicitHydrogenCount(hPlus - 1);
                    minus.setFormalCharge(charge(minus) + 1);
                    minus.setImplicitHydrogenCount(h(minus) + 1);
                    free.remove(k);
                    cancelled++;
                    break;
                }
            }
        }
        if (cancelled > 0) {
            Tautomers.toReferenceTautomer(copy);
        }
        return cancelled;
    }

    /** Both atoms in one ring of at most six atoms (CDK's ring flags are set on the prepared molecule). */
    private static boolean sameRing(IAtomContainer mol, IAtom a, IAtom b) {
        if (!a.isInRing() || !b.isInRing()) {
            return false;
        }
        // a path of at most three ring bonds between them inside ring atoms
        for (IBond b1 : mol.getConnectedBondsList(a)) {
            IAtom x = b1.getOther(a);
            if (!b1.isInRing()) {
                continue;
            }
            if (x.equals(b)) {
                return true;
            }
            for (IBond b2 : mol.getConnectedBondsList(x)) {
                IAtom y = b2.getOther(x);
                if (!b2.isInRing() || y.equals(a)) {
                    continue;
                }
                if (y.equals(b) || mol.getBond(y, b) != null && mol.getBond(y, b).isInRing()) {
                    return true;
                }
            }
        }
        return false;
    }

    private static int h(IAtom a) {
        return a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
    }

    private static int charge(IAtom a) {
        return a.getFormalCharge() == null ? 0 : a.getFormalCharge();
    }
}
