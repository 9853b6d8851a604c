package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.io.MDLV2000Writer;
import org.openscience.cdk.layout.StructureDiagramGenerator;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

import ionmark.host.api.Block;
import ionmark.host.api.Decoration;
import ionmark.host.api.Entry;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.acidity.api.SiteType;

/** Defects seen in the running notebook, each held here. */
class EntryDefectsTest {
    static Block text(String t, int section) {
        return CardTest.text(t, section);
    }

    static Block smiles(String s, int section) {
        return CardTest.smiles(s, section);
    }

    static AnnotatedEntry annotate(Block... blocks) {
        return CardTest.ANNOTATOR.annotate(new Entry("t", "t", List.of(blocks), 0));
    }

    /** 4-aminobenzoic acid as a molfile whose atoms run in the reverse of the SMILES order. */
    static String shuffledMolfile(String smi) throws Exception {
        IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smi);
        IAtom[] atoms = new IAtom[mol.getAtomCount()];
        for (int i = 0; i < atoms.length; i++) {
            atoms[i] = mol.getAtom(atoms.length - 1 - i);
        }
        mol.setAtoms(atoms);
        new StructureDiagramGenerator().generateCoordinates(mol);
        StringWriter w = new StringWriter();
        try (MDLV2000Writer mw = new MDLV2000Writer(w)) {
            mw.write(mol);
        }
        return w.toString();
    }

    @Test
    void molfileSitesAreDrawnOnTheirOwnAtoms() throws Exception {
        Analysis a = CardTest.SPECIATION.analyse(shuffledMolfile("Nc1ccc(cc1)C(=O)O"), Conditions.atPh(7));
        assertTrue(a.ok(), a.error());
        Depiction.Drawn d = Depiction.drawn(a);
        for (Site s : a.sites()) {
            IAtom atom = d.atom(s.atom());
            assertNotNull(atom);
            assertEquals(s.element(), atom.getSymbol(), "site on atom " + (s.atom() + 1));
            if (s.type() == SiteType.BASE) {
                assertEquals("N", atom.getSymbol(), "the amine is the base");
            } else {
                assertEquals(1, atom.getBondCount(), "the acid site is the carboxyl OH, not an aromatic atom");
            }
        }
    }

    @Test
    void smilesWrittenInAnotherOrderIsDrawnOnTheRightAtoms() throws Exception {
        Analysis a = CardTest.SPECIATION.analyse("C(=O)(O)c1ccc(N)cc1", Conditions.atPh(7));
        Depiction.Drawn d = Depiction.drawn(a);
        for (Site s : a.sites()) {
            assertEquals(s.element(), d.atom(s.atom()).getSymbol());
        }
    }

    @Test
    void atomNumbersStartAtOneInTheSiteTable() {
        // acetic acid CC(=O)O: the OH is the 4th heavy atom
        String html = CardTest.decorate(text("pH 7", 0), smiles("CC(=O)O", 0)).get(0).html();
        assertTrue(html.contains("<td data-label=\"atom\">O4</td>"), html);
    }

    @Test
    void aPinnedVersionTheStoreDoesNotHoldIsSaid() throws Exception {
        var tables = new ionmark.acidity.internal.TableSnapshotService(null);
        java.nio.file.Path dir = java.nio.file.Files.createTempDirectory("pin");
        try (var store = new ionmark.store.internal.JdbcTableStore(tables, "jdbc:h2:file:" + dir.resolve("s"), "sa", "")) {
            store.publish(tables.toJson(tables.current()), 0, "t", "v1");
            Annotator a = new Annotator(CardTest.SPECIATION, store, tables);
            List<Block> blocks = List.of(text("# T", 0), text("at pH 7", 0), smiles("CCCCCN", 0));
            List<Decoration> d = a.decorate(new Entry("e", "e", blocks, 9), CardTest.USER);
            assertTrue(d.get(0).html().contains("pinned to table v9, which the table store does not hold"),
                    d.get(0).html());
            assertEquals(2, d.size(), "the warning and the card");
        }
    }

    @Test
    void aBadBlockPhIsAnErrorOnItsCardOnly() {
        List<Decoration> d = CardTest.decorate(text("at pH 7", 0), new Block(Block.Kind.STRUCTURE, "CCN", 20.0, 0),
                smiles("CC(=O)O", 0));
        assertEquals(2, d.size());
        assertTrue(d.get(0).html().contains("outside pH −2…16"), d.get(0).html());
        assertTrue(d.get(1).html().contains("Sites at pH 7"), "the next card is annotated");
    }

    @Test
    void aLaterSectionsTemperatureDoesNotReachBack() {
        AnnotatedEntry a = annotate(text("Extracted at pH 2.5.", 1), smiles("CC(=O)O", 1), text("Heated to 60 °C.", 2),
                smiles("CCN", 2));
        assertEquals(25.0, a.structures().get(0).conditions().temperatureC(), 1e-9);
        assertEquals(60.0, a.structures().get(1).conditions().temperatureC(), 1e-9);
    }

    @Test
    void anEarlierSectionsPhIsNotTakenAndTheCardSaysSo() {
        AnnotatedEntry a = annotate(text("Extracted at pH 2.5.", 1), smiles("CC(=O)O", 1), text("Dried.", 2),
                smiles("CCN", 2));
        assertEquals(null, a.structures().get(1).conditions().ph());
        assertTrue(a.structures().get(1).conditions().notes().stream().anyMatch(n -> n.contains("not applied")),
                a.structures().get(1).conditions().notes().toString());
    }

    @Test
    void aStatementLaterInTheSameSentenceApplies() {
        AnnotatedEntry a = annotate(text("At pH 7 the solution was stirred. The amine CCN(CC)CC was extracted at pH 11.",
                0));
        assertEquals(11.0, a.structures().get(0).conditions().ph(), 1e-9);
    }

    @Test
    void theOpeningLinesApplyEverywhereButTheCardSaysWhere() {
        AnnotatedEntry a = annotate(text("All buffers at pH 7.4.", 0), text("## Step", 1), smiles("CCN", 1));
        assertEquals(7.4, a.structures().get(0).conditions().ph(), 1e-9);
        assertTrue(a.structures().get(0).conditions().notes().get(0).contains("opening lines"));
    }

    @Test
    void negativeZeroIsNeverShown() {
        assertEquals("0.00", Card.signed(-0.001));
        assertEquals("0.00", Card.fmt(-0.0001));
        String html = CardTest.decorate(text("pH 7", 0), smiles("CCCC", 0)).get(0).html();
        assertFalse(html.contains("-0.00"), html);
    }
}
