package ionmark.speciation.internal.structure;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;

import ionmark.speciation.api.ErrorPosition;

/** Rejects atoms with more bonds than their element allows at their charge. */
final class Valences {
    private Valences() {
    }

    static void check(IAtomContainer mol) throws StructureException {
        // bond orders summed per atom in one pass over the bonds (an unset order counts 1)
        int[] bonded = new int[mol.getAtomCount()];
        for (IBond b : mol.bonds()) {
            int o = b.getOrder() == null || b.getOrder() == IBond.Order.UNSET ? 1 : b.getOrder().numeric();
            bonded[b.getBegin().getIndex()] += o;
            bonded[b.getEnd().getIndex()] += o;
        }
        for (int i = 0; i < bonded.length; i++) {
            IAtom a = mol.getAtom(i);
            int h = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
            if (h < 0) {
                throw new StructureException("impossible valence at atom " + (i + 1) + " (" + a.getSymbol() + ")",
                        ErrorPosition.atom(i));
            }
            int order = h + bonded[i];
            int charge = a.getFormalCharge() == null ? 0 : a.getFormalCharge();
            int max = maxValence(a.getAtomicNumber(), charge);
            if (max > 0 && order > max) {
                throw new StructureException("impossible valence at atom " + (i + 1) + " (" + a.getSymbol()
                        + (charge != 0 ? String.format("%+d", charge) : "") + " with " + order + " bonds)", ErrorPosition.atom(i));
            }
        }
    }

    private static int maxValence(int z, int charge) {
        return switch (z) {
            case 1 -> 1;
            case 5 -> 4;
            case 6 -> 4;
            case 7 -> charge > 0 ? 4 : charge < 0 ? 2 : 3;
            case 8 -> charge > 0 ? 3 : charge < 0 ? 1 : 2;
            case 9 -> charge > 0 ? 2 : 1;
            case 15 -> 6;
            case 16 -> 6;
            case 17, 35 -> 1 + (charge > 0 ? 1 : 0) + 6;
            case 53 -> 7;
            default -> 0;
        };
    }
}
