package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.notebook.api.AnnotatedStructure;

/** What chemists write: reagent solutions, other phrasings of conditions, reactions, mixtures, work-ups. */
class ReadingTest {
    static AnnotatedEntry annotate(Block... blocks) {
        return CardTest.ANNOTATOR.annotate(new Entry("t", "t", List.of(blocks), 0));
    }

    static final SolutionPh SOLVER = new SolutionPh(CardTest.SPECIATION);

    // Check values: the strong acid and base are −log c and 14 + log c (ideal; any general chemistry text). Sat.
    // NaHCO3 ≈ 8.3 is (pKa1 + pKa2)/2 of carbonic acid, the usual figure (common practice). 0.1 % TFA near pH 2 and
    // 0.1 % formic acid near 2.7 are the figures quoted for LC-MS mobile phases (common practice). 10 mM ammonium
    // acetate near 7.0 is (4.76 + 9.25)/2 (common practice). 2 M Na2CO3: [OH⁻] = √(Kb·c), Kb = 10^−3.67 → pH 12.3
    // (worked by hand). Sat. NH4Cl 5.4 M: ½(9.25 − log 5.4) = 4.3, ideal; measured values read higher
    // (activities). 0.1 M acetic acid 2.88 and 0.1 M sodium acetate 8.88 are the classic worked examples of
    // analytical chemistry texts (from memory); 1 M ammonia 11.6 likewise (pKb 4.75, from memory). NaH2PO4 and
    // Na2HPO4 at 0.1 M: (pKa1 + pKa2)/2 = 4.7 and (pKa2 + pKa3)/2 = 9.8 (the amphiprotic-salt rule, common
    // practice; measured values read lower by about 0.2–0.3 because of activities). 0.1 M citric acid 2.1
    // (first dissociation, √(Ka1·c), worked by hand). 0.1 M TRIS base 10.5 (½(14 + 8.07 − 1), worked by hand).
    // PBS 7.4 and simulated gastric fluid 1.2 are their formulations' stated pH (USP for SGF).
    @ParameterizedTest(name = "\"{0}\" → pH {1}")
    @CsvSource(delimiter = '|', value = {
        "washed with sat. NaHCO3 | 8.34 | 0.05",
        "washed with saturated NaHCO3 | 8.34 | 0.05",
        "acidified with 1 M HCl | 0.0 | 0.01",
        "0.1 M HCl | 1.0 | 0.01",
        "basified with 0.1 N NaOH | 13.0 | 0.01",
        "2 M Na2CO3 | 12.3 | 0.1",
        "quenched with sat. NH4Cl | 4.3 | 0.1",
        "water with 0.1 % TFA | 1.9 | 0.15",
        "0.1 % formic acid | 2.67 | 0.1",
        "10 mM ammonium acetate | 7.0 | 0.05",
        "0.1 M acetic acid | 2.88 | 0.03",
        "0.1 M sodium acetate | 8.88 | 0.03",
        "1 M aq. NH3 | 11.63 | 0.05",
        "0.1 M NaH2PO4 | 4.68 | 0.1",
        "0.1 M Na2HPO4 | 9.78 | 0.1",
        "0.1 M citric acid | 2.1 | 0.05",
        "0.1 M Tris | 10.5 | 0.05",
        "dissolved in PBS | 7.4 | 0.001",
        "in simulated gastric fluid | 1.2 | 0.001",
    })
    void reagentSolutionsImplyTheirPh(String text, double ph, double tol) {
        List<ReagentSolutions.Implied> found = ReagentSolutions.find(text, SOLVER);
        assertEquals(1, found.size(), found.toString());
        assertEquals(ph, found.get(0).ph(), tol);
    }

    @Test
    void theImpliedPhNamesTheSolverAndTheTableConstants() {
        ReagentSolutions.Implied p = ReagentSolutions.find("washed with sat. NaHCO3", SOLVER).get(0);
        assertTrue(p.how().contains("Ionmark's solver") && p.how().contains("carbonic acid pKa 6.35, 10.33")
                && p.how().contains("measured") && p.how().contains("1.1 M"), p.how());
        ReagentSolutions.Implied s = ReagentSolutions.find("0.5 M H2SO4", SOLVER).get(0);
        assertTrue(s.how().contains("not in the table") && s.how().contains("from memory"), s.how());
    }

    @Test
    void aBufferWhoseRatioIsNotStatedImpliesNoPh() {
        assertEquals(List.of(), ReagentSolutions.find("in 50 mM Tris-HCl and 0.1 M sodium acetate buffer", SOLVER));
    }

    @Test
    void theCardSaysTheImpliedPhAndMarksIt() {
        AnnotatedEntry a = annotate(new Block(Block.Kind.TEXT, "The organic layer was washed with sat. NaHCO3.", null, 0),
                new Block(Block.Kind.STRUCTURE, "CC(=O)O", null, 0));
        AnnotatedStructure s = a.structures().get(0);
        assertTrue(s.conditions().implied());
        String html = new Card(s).html();
        assertTrue(html.contains("pH ≈ 8.3</b>, implied by <q>sat. NaHCO3</q>"), html);
        assertTrue(html.contains("im-implied"), html);
    }

    @Test
    void aStatedPhInTheSentenceBeatsAReagent() {
        AnnotatedEntry a = annotate(new Block(Block.Kind.TEXT, "Washed with sat. NaHCO3 (pH 8.0) and the acid "
                + "CC(C)C(=O)O stayed in water.", null, 0));
        assertEquals(8.0, a.structures().get(0).conditions().ph(), 1e-9);
    }

    @Test
    void aReagentUsedToReachAStatedPhDoesNotOverrideIt() {
        AnnotatedEntry a = annotate(new Block(Block.Kind.TEXT, "Acidified to pH 2.5 with 1 M HCl and the layers "
                + "separated.", null, 1), new Block(Block.Kind.STRUCTURE, "CCN", null, 1));
        assertEquals(2.5, a.structures().get(0).conditions().ph(), 1e-9);
    }

    @ParameterizedTest(name = "\"{0}\" → pH {1}")
    @CsvSource(delimiter = '|', value = {"pH 7,4 | 7.4", "pH > 10 | 10", "pH < 2 | 2", "pH above 12 | 12"})
    void otherPhWritings(String text, double ph) {
        var found = StatedConditions.ph(text);
        assertEquals(1, found.size(), found.toString());
        assertEquals(ph, found.get(0).low(), 1e-9);
        if (text.matches(".*[<>]|.*above.*")) {
            assertTrue(found.get(0).note().contains("bound"));
        }
    }

    @ParameterizedTest(name = "\"{0}\" → {1} °C")
    @CsvSource(delimiter = '|', value = {"held at 37 C | 37", "stirred at rt | 25", "at room temperature | 25",
        "at 310 K | 36.85"})
    void otherTemperatureWritings(String text, double t) {
        assertEquals(t, StatedConditions.temperature(text).get(0).value(), 1e-9);
    }

    @Test
    void roomTemperatureIsSaidToBeARange() {
        assertTrue(StatedConditions.temperature("stirred at rt").get(0).note().contains("20–25 °C"));
    }

    @Test
    void ionicStrengthInWords() {
        assertEquals(0.5, StatedConditions.ionicStrength("ionic strength 0.5 M").get(0).value(), 1e-9);
    }

    @Test
    void outOfRangeStatementsAreFlaggedNotDropped() {
        AnnotatedEntry a = annotate(new Block(Block.Kind.TEXT, "Adjusted to pH 18 and heated to 120 °C.", null, 0),
                new Block(Block.Kind.STRUCTURE, "CCN", null, 0));
        List<String> notes = a.structures().get(0).conditions().notes();
        assertTrue(notes.stream().anyMatch(n -> n.contains("'pH 18' is outside")), notes.toString());
        assertTrue(notes.stream().anyMatch(n -> n.contains("120 °C")), notes.toString());
    }

    @Test
    void aReactionSmilesAnnotatesEachComponent() {
        AnnotatedEntry a = annotate(new Block(Block.Kind.TEXT, "at pH 7", null, 0),
                new Block(Block.Kind.STRUCTURE, "CC(=O)O.NCc1ccccc1>>CC(=O)NCc1ccccc1", null, 0));
        assertEquals(3, a.structures().size());
        assertTrue(a.structures().stream().allMatch(s -> s.source().equals("reaction") && s.ok()));
    }

    @Test
    void aReactionSmilesInTextAnnotatesEachComponent() {
        assertEquals(List.of("CC(=O)O", "NCc1ccccc1", "CC(=O)NCc1ccccc1"),
                InlineStructures.find("coupled: CC(=O)O.NCc1ccccc1>>CC(=O)NCc1ccccc1 in DMF"));
    }

    @Test
    void aMixtureAnnotatesEachComponentWithCarbon() {
        AnnotatedEntry a = annotate(new Block(Block.Kind.STRUCTURE, "CC(=O)O.CCN.[Na+].[Cl-]", null, 0));
        assertEquals(2, a.structures().size());
    }

    @Test
    void anRxnBlockAnnotatesEachMolecule() {
        String mol = "\n  x\n\n  2  1  0  0  0  0  0  0  0  0999 V2000\n    0.0000    0.0000    0.0000 C   0  0\n"
                + "    1.0000    0.0000    0.0000 N   0  0\n  1  2  1  0\nM  END";
        String rxn = "$RXN\n\n  x\n\n  1  1\n$MOL\n" + mol + "\n$MOL\n" + mol + "\n";
        AnnotatedEntry a = annotate(new Block(Block.Kind.STRUCTURE, rxn, null, 0));
        assertEquals(2, a.structures().size());
        assertTrue(a.structures().get(0).ok(), String.valueOf(a.structures().get(0).error()));
    }

    @Test
    void anExtractionSaysWhereEachStructureGoes() {
        // benzoic acid, pKa 4.20 (CRC): at pH 10 it is charged and stays in water
        AnnotatedEntry a = annotate(new Block(Block.Kind.TEXT, "Extracted with EtOAc (1:1) at pH 10.", null, 1),
                new Block(Block.Kind.STRUCTURE, "OC(=O)c1ccccc1", null, 1));
        var p = a.structures().get(0).phases();
        assertEquals(1, p.size());
        assertEquals("EtOAc", p.get(0).solvent());
        assertTrue(p.get(0).fractionOrganic() < 0.01, p.toString());
        assertTrue(WorkupPhases.sentence(p.get(0)).contains("in the aqueous layer"));
    }

    @Test
    void withoutAStatedRatioOneToOneIsAssumedAndSaid() {
        var step = WorkupPhases.step("The organic layer was washed with brine.");
        assertTrue(step.ratioAssumed());
        assertEquals(1.0, step.ratio(), 1e-9);
    }

    @Test
    void anAcidAndABaseAreSeparatedByAPhRange() {
        // benzoic acid (4.2) and triethylamine (10.75, CRC): near pH 7 both are charged; below ~2 the acid is
        // neutral while the amine is charged
        AnnotatedEntry a = annotate(new Block(Block.Kind.TEXT, "pH 7", null, 0),
                new Block(Block.Kind.STRUCTURE, "OC(=O)c1ccccc1", null, 0),
                new Block(Block.Kind.STRUCTURE, "CCN(CC)CC", null, 0));
        assertTrue(a.separations().stream().anyMatch(s -> s.extracted().equals("OC(=O)c1ccccc1") && s.to() < 4),
                a.separations().toString());
    }

    @Test
    void aZwitterionIsNeverSentToTheOrganicPhase() {
        // 4-(aminomethyl)benzoic acid is an amino acid (carboxylic acid near 3.6, benzylamine-type base near 9.6;
        // from memory): between its constants its net-neutral form is the zwitterion, which stays in water.
        // Phenylacetic acid (4.31, CRC) is charged there, so a window claiming the amino acid extracts was wrong.
        AnnotatedEntry a = annotate(new Block(Block.Kind.TEXT, "pH 7.4", null, 0),
                new Block(Block.Kind.STRUCTURE, "NCc1ccc(cc1)C(=O)O", null, 0),
                new Block(Block.Kind.STRUCTURE, "OC(=O)Cc1ccccc1", null, 0),
                new Block(Block.Kind.STRUCTURE, "CCN(CC)CC", null, 0));
        assertTrue(a.separations().stream().noneMatch(s -> s.extracted().equals("NCc1ccc(cc1)C(=O)O")),
                a.separations().toString());
        assertTrue(a.separations().stream().anyMatch(s -> s.extracted().equals("OC(=O)Cc1ccccc1")),
                a.separations().toString());
    }
}
