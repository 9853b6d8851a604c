package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.SiteInteraction;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;

/**
 * A class's reach factor scales the distance rule for every pair its site takes part in, as the
 * product of both sites' factors. Checked against the exact two-site algebra: two equivalent
 * independent sites with micro constant p and interaction W have macroscopic constants
 * p + log 2 and p − W − log 2, so their spread is W + log 4 whatever p is. The shipped classes
 * and constants, without measured compounds (an exact match would set the constants itself).
 */
class InteractionReachTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();
    static final double LOG4 = Math.log10(4);

    static Engine engine(Map<String, Double> reach) {
        SiteInteraction si = SHIPPED.interaction();
        SiteInteraction changed = new SiteInteraction(si.shifts(), si.decay(), si.cutoff(), si.source(), si.exempt(),
                reach);
        return new Engine(new AcidityTable(SHIPPED.version(), SHIPPED.references(), SHIPPED.groups(),
                SHIPPED.substituents(), List.of(), changed, SHIPPED.pairs()), 300);
    }

    static double spread(Engine e, String smiles) {
        Analysis a = e.analyse(smiles, Conditions.noPh());
        assertTrue(a.ok(), a.error());
        List<Double> m = a.macroPka();
        assertEquals(2, m.size(), m.toString());
        return m.get(1) - m.get(0);
    }

    @Test
    void twoEquivalentAminesSpreadByTheScaledRulePlusTheStatisticalFactor() {
        // ethane-1,2-diamine: the two N are three bonds apart
        String diamine = "NCCN";
        double w3 = SHIPPED.interaction().at(3);
        assertEquals(w3 + LOG4, spread(engine(Map.of()), diamine), 0.02);
        assertEquals(w3 * 0.8 * 0.8 + LOG4, spread(engine(Map.of("amine-primary", 0.8)), diamine), 0.02);
        // a factor on a class the molecule does not have changes nothing
        assertEquals(w3 + LOG4, spread(engine(Map.of("thiol", 0.5)), diamine), 0.02);
    }

    @Test
    void aThiolWithShorterReachPullsAnAminothiolsConstantsTogether() {
        // 2-aminoethanethiol: the wider the rule, the wider the two constants; the factor enters once
        // for a thiol-amine pair
        String cysteamine = "NCCS";
        double full = spread(engine(Map.of()), cysteamine);
        double shorter = spread(engine(Map.of("thiol", 0.6)), cysteamine);
        assertTrue(shorter < full - 0.5, shorter + " against " + full);
    }

    @Test
    void theDerivationStatesEachCouplingAtZeroValueAndOnlyInTheFullAnalysis() {
        // the shipped table as it is: the stated coupling is the rule at three bonds times both factors
        Engine shipped = new Engine(SHIPPED, 300);
        Analysis full = shipped.analyse("NCCS", Conditions.noPh());
        SiteInteraction si = SHIPPED.interaction();
        double w = si.at(3) * si.reachOf("amine-primary") * si.reachOf("thiol");
        var amine = full.sites().stream().filter(s -> s.element().equals("N")).findFirst().orElseThrow();
        // the thiol S is index 3 of NCCS: the words count from 1, the structured index from 0
        var coupling = amine.derivation().stream().filter(x -> x.label().startsWith("coupling with the thiol site on "
                + "atom 4:")).toList();
        assertEquals(1, coupling.size(), amine.derivation().toString());
        assertEquals(java.util.List.of(3), coupling.get(0).atoms());
        assertEquals(0.0, coupling.get(0).value(), 0.0);
        assertTrue(coupling.get(0).label().contains(String.format(java.util.Locale.ROOT, "%.2f pKa units", w)),
                coupling.get(0).label());
        // the fitted thiol factor names where it comes from
        assertTrue(si.reachOf("thiol") != 1.0, "the shipped table fits a thiol factor");
        assertTrue(coupling.get(0).source().contains(String.format(java.util.Locale.ROOT, "reach factor %.2f of thiol",
                si.reachOf("thiol"))), coupling.get(0).source());
        double sum = amine.derivation().stream().mapToDouble(x -> x.value()).sum();
        assertEquals(amine.pka(), sum, 0.011);
        Analysis brief = shipped.analyse("NCCS", Conditions.noPh(), true);
        assertTrue(brief.sites().stream().flatMap(s -> s.derivation().stream())
                .noneMatch(x -> x.label().startsWith("coupling")));
    }

    @Test
    void aPermanentChargeIsStatedWithTheShiftTheMacroConstantShows() {
        // 4-hydroxyphenyltrimethylammonium: one titratable site, so its macroscopic constant is the site
        // value moved by the fixed cation's potential
        Analysis a = new Engine(SHIPPED, 300).analyse("C[N+](C)(C)c1ccc(O)cc1", Conditions.noPh());
        assertTrue(a.ok(), a.error());
        var phenol = a.sites().stream().filter(s -> s.element().equals("O")).findFirst().orElseThrow();
        var line = phenol.derivation().stream().filter(x -> x.label().startsWith("permanent charges")).findFirst()
                .orElseThrow();
        double shift = Double.parseDouble(line.label().replaceAll(".* by ([+-][0-9.]+) pKa units.*", "$1"));
        assertTrue(shift < -0.3, line.label());
        assertEquals(phenol.pka() + shift, a.macroPka().get(0), 0.02);
        // the potential includes the phenol's fitted reach factor, so the line names its source too
        double r = SHIPPED.interaction().reachOf("phenol");
        assertTrue(r != 1.0, "the shipped table fits a phenol factor");
        assertTrue(line.source().contains(String.format(java.util.Locale.ROOT, "reach factor %.2f of phenol", r)),
                line.source());
    }

    @Test
    void anExemptClassStaysOutWhateverItsFactor() {
        SiteInteraction si = SHIPPED.interaction();
        SiteInteraction both = new SiteInteraction(si.shifts(), si.decay(), si.cutoff(), si.source(),
                List.of("sulfonic"), Map.of("sulfonic", 1.5));
        assertEquals(0.0, both.reachOf("sulfonic"), 1e-12);
    }
}
