package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

import ionmark.host.api.Block;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.notebook.api.AnnotatedStructure;
import ionmark.acidity.api.SiteType;

/** Chemical names in prose become structures; words that are not a compound to annotate stay text. */
class ChemicalNamesTest {
    // Systematic names and their structures as the handbooks give them (The Merck Index and the CRC Handbook's
    // table of organic compounds, from memory; the esters and acids are the IUPAC 2013 recommendations' own
    // naming style, P-65): each sentence is what a write-up says.
    @ParameterizedTest(name = "\"{0}\"")
    @CsvSource(delimiter = '|', value = {
        "The 4-aminobenzoic acid was filtered off. | 4-aminobenzoic acid | Nc1ccc(cc1)C(=O)O",
        "2-(4-isobutylphenyl)propanoic acid (1.0 g) was dissolved. | 2-(4-isobutylphenyl)propanoic acid | CC(C)Cc1ccc(cc1)C(C)C(=O)O",
        "Then 4-(aminomethyl)benzoic acid was added. | 4-(aminomethyl)benzoic acid | NCc1ccc(cc1)C(=O)O",
        "2-Chloropyridine was added dropwise. | 2-Chloropyridine | Clc1ccccn1",
        "with N-methylmorpholine (2 eq.) | N-methylmorpholine | CN1CCOCC1",
        "Crude 2-acetoxybenzoic acid, | 2-acetoxybenzoic acid | CC(=O)Oc1ccccc1C(=O)O",
        "ethyl 4-aminobenzoate was recrystallised | ethyl 4-aminobenzoate | CCOC(=O)c1ccc(N)cc1",
        "the aniline was distilled | aniline | Nc1ccccc1",
        "1H-imidazole-4-carboxylic acid | 1H-imidazole-4-carboxylic acid | OC(=O)c1c[nH]cn1",
    })
    void aNameInProseBecomesItsStructure(String text, String words, String smiles) {
        List<ChemicalNames.Name> found = ChemicalNames.find(text);
        assertEquals(1, found.size(), found.toString());
        assertEquals(words, found.get(0).words());
        assertTrue(ChemicalNames.same(smiles, found.get(0).smiles()), found.get(0).smiles());
    }

    @ParameterizedTest(name = "\"{0}\"")
    @ValueSource(strings = {
        "The mixture was extracted with ethyl acetate and dried over sodium sulfate.",
        "Dissolved in dichloromethane, washed with water and brine, concentrated.",
        "Pyridine and triethylamine were added to the THF solution; DMSO was removed.",
        "A 3-fold excess was used over 2-3 h; the methyl and benzoic parts of the name alone are no compound.",
        "Sodium, potassium and iron were weighed; the N-terminal residue was determined.",
        "Separate the layers, combine the filtrate and concentrate; none of this is a structure.",
    })
    void solventsReagentsFragmentsAndEnglishAreNotNames(String text) {
        assertEquals(List.of(), ChemicalNames.find(text));
    }

    @Test
    void aNameWithLocantsThatDoesNotParseIsReportedNotGuessed() {
        List<ChemicalNames.Name> found = ChemicalNames.find("Then 4-aminobenzoick acid was added.");
        assertEquals(1, found.size(), found.toString());
        assertNull(found.get(0).smiles());
        assertTrue(found.get(0).error().contains("'4-aminobenzoick acid' could not be turned into a structure"),
                found.get(0).error());
    }

    @Test
    void theCardSaysTheStructureCameFromTheName() {
        AnnotatedEntry a = ReadingTest.annotate(new Block(Block.Kind.TEXT,
                "4-Aminobenzoic acid was stirred in buffer at pH 7.4.", null, 0));
        assertEquals(1, a.structures().size(), a.structures().toString());
        AnnotatedStructure s = a.structures().get(0);
        assertEquals("name", s.source());
        assertEquals("4-Aminobenzoic acid", s.words());
        assertTrue(s.ok(), String.valueOf(s.error()));
        assertEquals(7.4, s.conditions().ph(), 1e-9);
        // the carboxylic acid (pKa 4.85–4.87 for 4-aminobenzoic acid, CRC, from memory) is ionised at pH 7.4
        assertTrue(s.analyses().get(0).sites().stream().anyMatch(x -> x.type() == SiteType.ACID && x.pka() < 6),
                s.analyses().get(0).sites().toString());
        String html = new Card(s).html();
        assertTrue(html.contains("structure from the name"), html);
        assertTrue(html.contains("Structure read from the chemical name"), html);
    }

    @Test
    void anUnreadableNameIsAnErrorOnItsOwnCard() {
        AnnotatedEntry a = ReadingTest.annotate(new Block(Block.Kind.TEXT,
                "2-(4-isobutylphenyl)propanoik acid and CC(C)C(=O)O at pH 3.", null, 0));
        assertEquals(2, a.structures().size(), a.structures().toString());
        AnnotatedStructure bad = a.structures().get(0);
        assertNotNull(bad.error());
        assertTrue(new Card(bad).html().contains("could not be turned into a structure"));
        assertTrue(a.structures().get(1).ok());
    }

    @Test
    void aCompoundNamedAndDrawnInOneSentenceHasOneCard() {
        AnnotatedEntry a = ReadingTest.annotate(new Block(Block.Kind.TEXT,
                "4-aminobenzoic acid, Nc1ccc(cc1)C(=O)O, at pH 7.", null, 0));
        assertEquals(1, a.structures().size(), a.structures().toString());
        assertEquals("smiles", a.structures().get(0).source());
    }

    @Test
    void aCompoundTheEntryDrawsOrNamedAgainInItsSectionHasNoSecondCard() {
        AnnotatedEntry a = ReadingTest.annotate(
                new Block(Block.Kind.TEXT, "Phenylacetic acid was washed out with sat. NaHCO3.", null, 1),
                new Block(Block.Kind.STRUCTURE, "OC(=O)Cc1ccccc1", null, 1),
                new Block(Block.Kind.TEXT, "2-Chloropyridine was added; the 2-chloropyridine layer was kept.", null, 1),
                new Block(Block.Kind.TEXT, "Later, 2-chloropyridine at pH 1.", null, 2));
        assertEquals(List.of("smiles", "name", "name"), a.structures().stream().map(AnnotatedStructure::source).toList());
        assertEquals(List.of(1, 2, 3), a.structures().stream().map(AnnotatedStructure::block).toList());
    }

    @Test
    void theQuickCheckTakesANameWhereAStructureGoes() {
        // ibuprofen by its systematic name: a carboxylic acid (pKa 4.4–4.9, Merck Index / CRC, from memory)
        String html = QuickCheckForm.html(CardTest.ANNOTATOR, java.util.Map.of("structure",
                "2-(4-isobutylphenyl)propanoic acid", "ph", "7.4"));
        assertTrue(html.contains("structure from the name") && html.contains("Structure read from the chemical name"),
                html);
        assertTrue(html.contains("acid"), html);
        String bad = QuickCheckForm.html(CardTest.ANNOTATOR, java.util.Map.of("structure", "4-aminobenzoick acid",
                "ph", "7.4"));
        assertTrue(bad.contains("is neither a SMILES nor a chemical name"), bad);
    }

    @Test
    void aSmilesInAStructureFieldIsNeverReadAsAName() {
        assertNull(ChemicalNames.whole("CC(=O)O"));
        assertNull(ChemicalNames.whole("c1ccccc1O"));
    }
}
