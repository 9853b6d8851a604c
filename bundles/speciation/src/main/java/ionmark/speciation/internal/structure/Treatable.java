package ionmark.speciation.internal.structure;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;

import ionmark.speciation.api.ErrorPosition;

/**
 * Refuses, with the reason, structures whose numbers would be wrong rather than uncertain: metal atoms in the
 * parent (complexes, organometallics, salts drawn with a covalent metal bond), radicals and carbenes, and charges
 * the normaliser cannot take to a neutral reference form (a carbocation would lose a proton and become a
 * carbene; two charges on one atom). Run on the parent, as read, before normalisation.
 */
final class Treatable {
    private Treatable() {
    }

    static void check(IAtomContainer mol) throws StructureException {
        if (mol.getSingleElectronCount() > 0) {
            IAtom a = mol.getSingleElectron(0).getAtom();
            throw new StructureException(where(mol, a) + " carries an unpaired electron: radicals are outside what "
                    + "Ionmark estimates (its classes describe closed-shell molecules)", at(mol, a));
        }
        for (IAtom a : mol.atoms()) {
            int z = a.getAtomicNumber();
            if (metal(z)) {
                throw new StructureException(where(mol, a) + " is a metal: metal complexes and organometallic compounds "
                        + "are outside what Ionmark estimates" + (saltMetal(z) ? "; a salt drawn with a bond to the "
                                + "metal can be written as ions, for example CC(=O)[O-].[Na+]" : ""), at(mol, a));
            }
            int q = a.getFormalCharge() == null ? 0 : a.getFormalCharge();
            if (Math.abs(q) > 1) {
                throw new StructureException(where(mol, a) + " carries a charge of " + String.format("%+d", q)
                        + ": Ionmark cannot take it to a neutral reference form", at(mol, a));
            }
            if (z == 6 && q > 0 && !pairedWith(mol, a, -1)) {
                throw new StructureException(where(mol, a) + " is a carbocation: Ionmark cannot take it to a neutral "
                        + "reference form (it treats charges on N, O, S and P and charge pairs such as nitro)", at(mol, a));
            }
            int expected = lowestValence(z) - Math.abs(q);
            if (expected > 0 && !unsetBond(mol, a) && bonded(mol, a) < expected) {
                throw new StructureException(where(mol, a) + " has " + bonded(mol, a) + " bonds and hydrogens where "
                        + expected + " are needed: a radical or carbene (or hydrogens missing from the drawing); "
                        + "Ionmark estimates closed-shell molecules only", at(mol, a));
            }
        }
    }

    private static ErrorPosition at(IAtomContainer mol, IAtom a) {
        return ErrorPosition.atom(mol.indexOf(a));
    }

    private static String where(IAtomContainer mol, IAtom a) {
        return "atom " + (mol.indexOf(a) + 1) + " (" + a.getSymbol() + ")";
    }

    /** Alkali, alkaline-earth, transition, post-transition metals, lanthanides and actinides. */
    static boolean metal(int z) {
        return z == 3 || z == 4 || z == 11 || z == 12 || z == 13 || (z >= 19 && z <= 31) || (z >= 37 && z <= 50)
                || (z >= 55 && z <= 84) || z >= 87;
    }

    private static boolean saltMetal(int z) {
        return z == 3 || z == 11 || z == 19 || z == 37 || z == 55 || z == 4 || z == 12 || z == 20 || z == 38 || z == 56;
    }

    /** The usual valence of a neutral atom (C 4, N 3, O and S 2); 0 where any count is possible. */
    private static int lowestValence(int z) {
        return switch (z) {
            case 6 -> 4;
            case 7 -> 3;
            case 8, 16 -> 2;
            default -> 0;
        };
    }

    private static boolean pairedWith(IAtomContainer mol, IAtom a, int sign) {
        for (IAtom n : mol.getConnectedAtomsList(a)) {
            if (Integer.signum(n.getFormalCharge() == null ? 0 : n.getFormalCharge()) == sign) {
                return true;
            }
        }
        return false;
    }

    /** A molfile's aromatic bond type leaves the order unset; the count is then not known. */
    private static boolean unsetBond(IAtomContainer mol, IAtom a) {
        for (IBond b : mol.getConnectedBondsList(a)) {
            if (b.getOrder() == null || b.getOrder() == IBond.Order.UNSET) {
                return true;
            }
        }
        return a.getImplicitHydrogenCount() == null;
    }

    private static int bonded(IAtomContainer mol, IAtom a) {
        int n = a.getImplicitHydrogenCount();
        for (IBond b : mol.getConnectedBondsList(a)) {
            n += b.getOrder().numeric();
        }
        return n;
    }
}
