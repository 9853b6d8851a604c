package ionmark.console.internal;

import java.util.ArrayList;
import java.util.List;

import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;
import org.openscience.cdk.smiles.SmilesParser;

/**
 * The ring framework of a structure (Bemis, G. W.; Murcko, M. A. J. Med. Chem. 1996, 39, 2887–2893):
 * ring atoms and the chains that link rings, side chains removed, as a canonical SMILES with element
 * and aromaticity kept. Acyclic structures have the empty framework.
 */
final class Scaffolds {
    private Scaffolds() {
    }

    static String framework(String smiles) {
        try {
            IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
            Cycles.markRingAtomsAndBonds(mol);
            boolean pruned = true;
            while (pruned) {
                pruned = false;
                List<IAtom> tips = new ArrayList<>();
                for (IAtom a : mol.atoms()) {
                    if (!a.isInRing() && mol.getConnectedBondsCount(a) <= 1) {
                        tips.add(a);
                    }
                }
                for (IAtom a : tips) {
                    mol.removeAtom(a);
                    pruned = true;
                }
            }
            if (mol.getAtomCount() == 0) {
                return "";
            }
            for (IAtom a : mol.atoms()) {
                a.setImplicitHydrogenCount(0);
                a.setFormalCharge(0);
            }
            return new SmilesGenerator(SmiFlavor.Unique).create(mol);
        } catch (CDKException | RuntimeException e) {
            return "";
        }
    }
}
