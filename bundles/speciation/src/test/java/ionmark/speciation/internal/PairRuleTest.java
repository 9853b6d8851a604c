package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.PairRule;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;

/**
 * Pair rules in the site model. The shipped classes, without measured compounds (an exact match
 * would refit the sites and hide the rule), with test rules whose values are chosen here.
 *
 * <p>For two acids the macroscopic constants obey K1·K2 = Ka·Kb·10^−w, so pKa1 + pKa2 = pKa_a +
 * pKa_b + w; a rule lowers both site values by {@code singly} and adds {@code 2·singly + doubly} to
 * w, so the sum moves by exactly {@code doubly}. For two bases the sum moves by −{@code doubly}.
 */
class PairRuleTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();
    static final String REF = SHIPPED.references().get(0).id();
    static final PairRule ACIDS = new PairRule("t-malonic", "test acid pair",
            "[OX2H1:1][CX3](=O)[CX4H0][CX3](=O)[OX2H1:2]", 1.3, 0.7, REF, "", List.of());
    static final PairRule BASES = new PairRule("t-diamine", "test base pair", "[NX3H2:1][CX4][CX4][NX3H2:2]", 0.9,
            0.4, REF, "", List.of());
    static final PairRule MIXED = new PairRule("t-mixed", "test acid-base pair", "[NX3H2:1][CX4][CX3](=O)[OX2H1:2]",
            2.0, 2.0, REF, "", List.of());

    static Engine engine(PairRule... rules) {
        return new Engine(new AcidityTable(SHIPPED.version(), SHIPPED.references(), SHIPPED.groups(),
                SHIPPED.substituents(), List.of(), SHIPPED.interaction(), List.of(rules)), 300);
    }

    static List<Double> macro(Engine e, String smiles) {
        Analysis a = e.analyse(smiles, Conditions.noPh());
        assertTrue(a.ok(), a.error());
        return a.macroPka();
    }

    static double sum(List<Double> l) {
        return l.stream().mapToDouble(Double::doubleValue).sum();
    }

    @Test
    void twoAcidsSplitWiderAndTheSumMovesByTheDoublyTerm() {
        String diethylmalonic = "CCC(CC)(C(=O)O)C(=O)O";
        List<Double> without = macro(engine(), diethylmalonic);
        List<Double> with = macro(engine(ACIDS), diethylmalonic);
        assertEquals(2, without.size());
        assertEquals(2, with.size());
        assertTrue(with.get(0) < without.get(0) - 0.8, with + " against " + without);
        assertTrue(with.get(1) > without.get(1) + 1.2, with + " against " + without);
        assertEquals(sum(without) + 0.7, sum(with), 1e-6);
    }

    @Test
    void twoBasesSplitWiderAndTheSumMovesBackByTheDoublyTerm() {
        String diamine = "CC(N)C(C)N";
        List<Double> without = macro(engine(), diamine);
        List<Double> with = macro(engine(BASES), diamine);
        assertEquals(2, with.size());
        assertTrue(with.get(1) > without.get(1) + 0.5, with + " against " + without);
        assertTrue(with.get(0) < without.get(0) - 0.8, with + " against " + without);
        assertEquals(sum(without) - 0.4, sum(with), 1e-6);
    }

    @Test
    void eachSiteOfThePairShowsTheRuleInItsDerivation() {
        Analysis a = engine(ACIDS).analyse("CCC(CC)(C(=O)O)C(=O)O", Conditions.noPh());
        List<Site> sites = a.sites();
        assertEquals(2, sites.size());
        for (Site s : sites) {
            assertTrue(s.derivation().stream().anyMatch(t -> t.label().startsWith("pair rule") && t.value() == -1.3),
                    s.derivation().toString());
        }
    }

    @Test
    void aStructureTheRuleDoesNotFitIsUnchanged() {
        // malonic acid's central carbon carries two hydrogens: no pair
        assertEquals(macro(engine(), "OC(=O)CC(=O)O"), macro(engine(ACIDS), "OC(=O)CC(=O)O"));
    }

    @Test
    void anAcidAndABaseAreNeverJoined() {
        assertEquals(macro(engine(), "NCC(=O)O"), macro(engine(MIXED), "NCC(=O)O"));
    }
}
