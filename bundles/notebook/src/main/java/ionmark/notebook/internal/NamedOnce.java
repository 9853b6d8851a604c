package ionmark.notebook.internal;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.io.MDLV2000Reader;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;
import org.openscience.cdk.smiles.SmilesParser;

import ionmark.host.api.Block;

/**
 * Which names of an entry get a card of their own. A compound that the entry also draws (a structure block,
 * inline SMILES, a reaction component, a molfile) is annotated from the drawing only; a compound named again in
 * the same section gets no second card. Write-ups name their compounds many times; one card per compound and
 * section is what a reader can use.
 */
final class NamedOnce {
    private NamedOnce() {
    }

    static List<EntryReader.Found> filter(List<EntryReader.Found> names, List<EntryReader.Found> drawn, List<Block> blocks) {
        Set<String> seen = new HashSet<>();
        for (EntryReader.Found f : drawn) {
            String u = unique(f.structure());
            if (u != null) {
                seen.add(u);
            }
        }
        Set<String> perSection = new HashSet<>();
        List<EntryReader.Found> out = new ArrayList<>();
        for (EntryReader.Found n : names) {
            int section = blocks.get(n.block()).section();
            if (n.error() != null) {
                if (perSection.add(section + " " + n.words())) {
                    out.add(n);
                }
                continue;
            }
            String u = unique(n.structure());
            if (u == null || !seen.contains(u) && perSection.add(section + " " + u)) {
                out.add(n);
            }
        }
        return out;
    }

    /** CDK's unique SMILES of a SMILES or molfile, or null when it cannot be read (the solver will say why). */
    static String unique(String structure) {
        try {
            IAtomContainer mol;
            if (EntryReader.looksLikeMolfile(structure)) {
                try (MDLV2000Reader r = new MDLV2000Reader(new StringReader(structure))) {
                    mol = r.read(SilentChemObjectBuilder.getInstance().newAtomContainer());
                }
            } else {
                mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(structure);
            }
            return new SmilesGenerator(SmiFlavor.Unique).create(mol);
        } catch (CDKException | java.io.IOException | RuntimeException e) {
            return null;
        }
    }
}
