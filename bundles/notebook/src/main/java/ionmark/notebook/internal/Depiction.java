package ionmark.notebook.internal;

import java.awt.Color;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.openscience.cdk.depict.DepictionGenerator;
import org.openscience.cdk.graph.ConnectivityChecker;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.io.MDLV2000Reader;
import org.openscience.cdk.io.MDLV3000Reader;
import org.openscience.cdk.renderer.generators.standard.StandardGenerator;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;
import org.openscience.cdk.smiles.SmilesParser;
import org.openscience.cdk.tools.manipulator.AtomContainerManipulator;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Site;
import ionmark.acidity.api.SiteType;

/**
 * The analysed structure as SVG with a numbered mark at every site: a square for an acid, a circle for a
 * base, the number being the site's row in the card's table. The solver numbers site atoms in the order of
 * the parent structure's heavy atoms as read from the input; the analysed SMILES lists them in another order.
 * {@link #drawn(Analysis)} rebuilds that parent from the input and maps each of its atoms to the analysed
 * SMILES through the writer's output order, checking element and every bond; when the check fails it draws
 * the parent as read, whose atom order is the solver's own.
 */
final class Depiction {
    /** Acid and base marks: a purple and green pair told apart by colour-blind readers too (and by shape). */
    static final Color ACID = new Color(0x6A, 0x3D, 0x9A);
    static final Color BASE = new Color(0x1B, 0x78, 0x37);
    private static final int FLAVOR = SmiFlavor.Stereo | SmiFlavor.UseAromaticSymbols;

    private Depiction() {
    }

    /** The molecule to draw and, for each solver atom index, the index of that atom in it. */
    record Drawn(IAtomContainer molecule, int[] atomAt) {
        IAtom atom(int solverIndex) {
            return solverIndex >= 0 && solverIndex < atomAt.length ? molecule.getAtom(atomAt[solverIndex]) : null;
        }
    }

    static Drawn drawn(Analysis a) throws Exception {
        SmilesParser sp = new SmilesParser(SilentChemObjectBuilder.getInstance());
        IAtomContainer analysed = sp.parseSmiles(a.smiles());
        IAtomContainer parent = parentAsRead(a.input());
        int n = analysed.getAtomCount();
        if (parent != null && parent.getAtomCount() == n) {
            int[] order = new int[n];
            new SmilesGenerator(FLAVOR).create(parent, order);
            if (consistent(parent, analysed, order)) {
                return new Drawn(analysed, order);
            }
        }
        if (parent != null) {
            int[] identity = new int[parent.getAtomCount()];
            for (int i = 0; i < identity.length; i++) {
                identity[i] = i;
            }
            return new Drawn(parent, identity);
        }
        int[] identity = new int[n];
        for (int i = 0; i < n; i++) {
            identity[i] = i;
        }
        return new Drawn(analysed, identity);
    }

    /** The input's parent component with hydrogens suppressed, atoms in input order, as the solver reads it. */
    static IAtomContainer parentAsRead(String input) {
        try {
            IAtomContainer mol;
            if (EntryReader.looksLikeMolfile(input)) {
                String record = input.contains("$$$$") ? input.substring(0, input.indexOf("$$$$")) : input;
                IAtomContainer empty = SilentChemObjectBuilder.getInstance().newAtomContainer();
                if (record.contains("V3000")) {
                    try (MDLV3000Reader r = new MDLV3000Reader(new StringReader(record))) {
                        mol = r.read(empty);
                    }
                } else {
                    try (MDLV2000Reader r = new MDLV2000Reader(new StringReader(record))) {
                        mol = r.read(empty);
                    }
                }
            } else {
                String first = input.strip().split("\\s+")[0];
                mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(first);
            }
            if (mol == null) {
                return null;
            }
            AtomContainerManipulator.suppressHydrogens(mol);
            if (!ConnectivityChecker.isConnected(mol)) {
                List<IAtomContainer> parts = new ArrayList<>();
                ConnectivityChecker.partitionIntoMolecules(mol).atomContainers().forEach(parts::add);
                mol = parts.stream().max(Comparator.comparingInt((IAtomContainer c) -> hasCarbon(c) ? 1 : 0)
                        .thenComparingInt(IAtomContainer::getAtomCount)).orElseThrow();
            }
            return mol;
        } catch (Exception | LinkageError e) {
            return null;
        }
    }

    private static boolean hasCarbon(IAtomContainer c) {
        for (IAtom a : c.atoms()) {
            if (a.getAtomicNumber() != null && a.getAtomicNumber() == 6) {
                return true;
            }
        }
        return false;
    }

    /** Same element at each mapped atom, and a bond in the analysed molecule for every bond of the parent. */
    static boolean consistent(IAtomContainer parent, IAtomContainer analysed, int[] order) {
        for (int i = 0; i < order.length; i++) {
            if (order[i] < 0 || order[i] >= analysed.getAtomCount()
                    || !parent.getAtom(i).getAtomicNumber().equals(analysed.getAtom(order[i]).getAtomicNumber())) {
                return false;
            }
        }
        for (IBond b : parent.bonds()) {
            if (analysed.getBond(analysed.getAtom(order[b.getBegin().getIndex()]),
                    analysed.getAtom(order[b.getEnd().getIndex()])) == null) {
                return false;
            }
        }
        return parent.getBondCount() == analysed.getBondCount();
    }

    /** The SVG, or a short note when the structure cannot be drawn. */
    static String svg(Analysis a) {
        try {
            Drawn d = drawn(a);
            IAtomContainer mol = d.molecule();
            List<IAtom> acids = new ArrayList<>();
            List<IAtom> bases = new ArrayList<>();
            List<Site> sites = a.sites();
            for (int row = 0; row < sites.size(); row++) {
                Site s = sites.get(row);
                IAtom atom = d.atom(s.atom());
                if (atom == null) {
                    continue;
                }
                boolean acid = s.type() == SiteType.ACID;
                String label = (acid ? "■" : "●") + (row + 1) + (s.permanent() ? " fixed"
                        : String.format(Locale.ROOT, " %.1f", s.pka()));
                atom.setProperty(StandardGenerator.ANNOTATION_LABEL, label);
                (acid ? acids : bases).add(atom);
            }
            // at the usual bond length, so a small molecule is drawn small and a large one is given room
            // (shrunk only when it would not fit)
            int heavy = mol.getAtomCount();
            int w = Math.max(260, Math.min(640, 140 + 30 * heavy));
            int h = Math.max(200, Math.min(440, 130 + 16 * heavy));
            String svg = new DepictionGenerator().withSize(w, h).withMargin(18).withZoom(1.9)
                    .withAnnotationScale(0.75).withAnnotationColor(new Color(0x1D, 0x24, 0x33))
                    .withHighlight(acids, ACID).withHighlight(bases, BASE)
                    .depict(mol).toSvgStr(org.openscience.cdk.depict.Depiction.UNITS_PX);
            return trim(svg);
        } catch (Exception | LinkageError e) {
            return noDrawing(String.valueOf(e.getMessage()), null);
        }
    }

    /** What stands in for a drawing: why there is none, or the species' SMILES. */
    private static String noDrawing(String reason, String smiles) {
        java.util.Map<String, Object> p = new java.util.HashMap<>();
        p.put("reason", reason);
        p.put("smiles", smiles);
        return Html.TEMPLATES.render("noDrawing", p).strip();
    }

    /** The SVG element alone, without the XML prolog and the generator's description. */
    private static String trim(String svg) {
        int start = svg.indexOf("<svg");
        return (start >= 0 ? svg.substring(start) : svg).replaceAll("(?s)<desc>.*?</desc>", "");
    }

    /** A small drawing of one species (charged forms as written by the solver). */
    static String species(String smiles) {
        try {
            IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
            String svg = new DepictionGenerator().withSize(190, 130).withZoom(1.3).depict(mol)
                    .toSvgStr(org.openscience.cdk.depict.Depiction.UNITS_PX);
            return trim(svg);
        } catch (Exception | LinkageError e) {
            return noDrawing(null, smiles);
        }
    }
}
