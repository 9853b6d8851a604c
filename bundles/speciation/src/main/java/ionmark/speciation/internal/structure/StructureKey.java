package ionmark.speciation.internal.structure;

import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;

/**
 * The identity of an input structure for the result cache: CDK's canonical SMILES (isotopes, charges) of the
 * structure as read, plus the position each input atom takes in it, plus its stereo and isotopes, plus any unpaired
 * electrons. Two
 * inputs with the same key are the same structure numbered the same way, so a cached result's site numbers and
 * curve keys (input atom indices) hold for both: {@code C1CC1O} and {@code C2CC2O} with any title or spacing
 * share a key, a molfile shares one whatever its header and coordinates; {@code OC1CC1} (another numbering) does
 * not. Input that cannot be read gets no key (it is not cached).
 */
public final class StructureKey {
    private StructureKey() {
    }

    /** The key, or null when the text cannot be read. */
    public static String of(String text) {
        if (text == null || text.isBlank()) {
            return null;
        }
        try {
            boolean molfile = StructureReader.looksLikeMolfile(text);
            IAtomContainer mol = molfile ? StructureReader.readMolfile(text) : StructureReader.readSmiles(text.strip());
            int[] order = new int[mol.getAtomCount()];
            // canonical labels with stereo or isotopes need CDK's InChI module, which the product does not ship: those
            // are added as a SMILES written in input order, which the numbering part fixes anyway
            String smiles = new SmilesGenerator(SmiFlavor.Canonical).create(mol, order);
            StringBuilder sb = new StringBuilder(smiles.length() + 4 * order.length).append(smiles).append('|');
            for (int o : order) {
                sb.append(o).append(',');
            }
            sb.append('|').append(new SmilesGenerator(SmiFlavor.Stereo | SmiFlavor.AtomicMass).create(mol));
            if (mol.getSingleElectronCount() > 0) {
                sb.append("|rad");
                mol.singleElectrons().forEach(e -> sb.append(',').append(mol.indexOf(e.getAtom())));
            }
            return sb.toString();
        } catch (StructureException | CDKException | RuntimeException e) {
            return null;
        }
    }
}
