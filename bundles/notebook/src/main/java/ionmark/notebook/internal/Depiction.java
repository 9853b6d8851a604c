package ionmark.notebook.internal;

import java.awt.Color;
import java.util.List;
import java.util.Locale;

import org.openscience.cdk.depict.DepictionGenerator;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.renderer.generators.standard.StandardGenerator;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Site;

/**
 * The structure as SVG with a badge at every site: pKa ± sd and percent protonated. Acid sites get
 * a square marker, base sites a round one (shape and text, not colour alone).
 */
final class Depiction {
    private Depiction() {
    }

    static String svg(Analysis a) {
        try {
            IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(a.smiles());
            for (Site s : a.sites()) {
                if (s.atom() >= mol.getAtomCount()) {
                    continue;
                }
                IAtom atom = mol.getAtom(s.atom());
                String mark = s.type().equals("acid") ? "■" : "●";
                String label = s.permanent() ? mark + " fixed +" : String.format(Locale.ROOT, "%s %.1f±%.1f%s", mark,
                        s.pka(), s.sd(), s.protonated() == null ? "" : String.format(Locale.ROOT, " · %.0f%% H⁺",
                                100 * s.protonated()));
                atom.setProperty(StandardGenerator.ANNOTATION_LABEL, label);
            }
            List<IAtom> acids = a.sites().stream().filter(s -> s.type().equals("acid") && s.atom() < mol.getAtomCount())
                    .map(s -> mol.getAtom(s.atom())).toList();
            List<IAtom> bases = a.sites().stream().filter(s -> s.type().equals("base") && s.atom() < mol.getAtomCount())
                    .map(s -> mol.getAtom(s.atom())).toList();
            String svg = new DepictionGenerator().withSize(360, 240).withAnnotationScale(0.6)
                    .withAnnotationColor(new Color(0x22, 0x22, 0x22))
                    .withHighlight(acids, new Color(0xE0, 0x8A, 0x00)).withHighlight(bases, new Color(0x1F, 0x6F, 0xB5))
                    .withOuterGlowHighlight(3.0).depict(mol).toSvgStr(org.openscience.cdk.depict.Depiction.UNITS_PX);
            int start = svg.indexOf("<svg");
            return start >= 0 ? svg.substring(start) : svg;
        } catch (Exception | LinkageError e) {
            return "<p class=\"im-nodepict\">(no drawing: " + Html.esc(String.valueOf(e.getMessage())) + ")</p>";
        }
    }
}
