package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
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
import ionmark.speciation.internal.microstates.SitePaths;
import ionmark.speciation.internal.sites.MatchTarget;
import ionmark.speciation.internal.structure.StructureReader;

/**
 * Sites joined by more than one path through a saturated ring couple more strongly than the shortest
 * path says: the rule at the shortest path plus {@link SitePaths#EXTRA_PATH} times the rule at each
 * further atom-disjoint saturated path. Handbook macro constants (from memory, CRC and Perrin 1965):
 * ethylenediamine 9.93 / 6.85, piperazine 9.73 / 5.35, DABCO 8.82 / 2.97. Two equivalent sites spread by
 * W + log 4, whatever their micro constant, so the spread checks the coupling alone.
 */
class RingCouplingTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();
    static final double LOG4 = Math.log10(4);

    static int[] paths(String smiles, int a, int b) throws Exception {
        var mol = new StructureReader(300).read(smiles).molecule();
        var target = new MatchTarget(mol);
        boolean[] sat = new boolean[mol.getAtomCount()];
        for (int i = 0; i < sat.length; i++) {
            sat[i] = !target.aromatic(i);
            for (int n = 0; n < target.adjacency()[i].length; n++) {
                sat[i] &= target.bondCode(i, n) == 1;
            }
        }
        return SitePaths.between(target.adjacency(), sat, a, b);
    }

    /** The shipped classes and rule, no measured compounds and no reach factors: the bare coupling. */
    static Engine bare() {
        SiteInteraction si = SHIPPED.interaction();
        SiteInteraction plain = new SiteInteraction(si.shifts(), si.decay(), si.cutoff(), si.source(), si.exempt(),
                Map.of());
        return new Engine(new AcidityTable(SHIPPED.version(), SHIPPED.references(), SHIPPED.groups(),
                SHIPPED.substituents(), List.of(), plain, SHIPPED.pairs()), 300);
    }

    static double spread(String smiles) {
        Analysis a = bare().analyse(smiles, Conditions.noPh());
        assertTrue(a.ok(), a.error());
        assertEquals(2, a.macroPka().size(), a.macroPka().toString());
        return a.macroPka().get(1) - a.macroPka().get(0);
    }

    @Test
    void pathsAreCountedShortestFirstAndShareNoAtom() throws Exception {
        assertArrayEquals(new int[] {3}, paths("NCCN", 0, 3));
        assertArrayEquals(new int[] {3, 3}, paths("N1CCNCC1", 0, 3));
        // DABCO: three ethano bridges
        assertArrayEquals(new int[] {3, 3, 3}, paths("N12CCN(CC1)CC2", 0, 3));
        // 1,4-diazepane: an ethano and a propano bridge
        assertArrayEquals(new int[] {3, 4}, paths("N1CCNCCC1", 0, 3));
        // pyrazine: aromatic ring atoms carry no further path (the azine pair rules hold that case)
        assertArrayEquals(new int[] {3}, paths("n1ccncc1", 0, 3));
        // 1,2,3,4-tetrahydroquinoxaline: the shortest path runs through the benzene ring, which already holds
        // the two N at a fixed separation
        assertArrayEquals(new int[] {3}, paths("C1CNc2ccccc2N1", 2, 9));
        // barbital: the second ring path runs through the carbonyl carbons
        assertArrayEquals(new int[] {2}, paths("CCC1(CC)C(=O)NC(=O)NC1=O", 7, 10));
        // 4-aminopiperidine: every path runs through C4, so one path only
        assertArrayEquals(new int[] {4}, paths("N1CCC(N)CC1", 0, 4));
    }

    @Test
    void theRingDiaminesSpreadAsTheirHandbookConstants() {
        double w3 = SHIPPED.interaction().at(3);
        // open chain: the rule alone (ethylenediamine 9.93 − 6.85 = 3.08)
        assertEquals(w3 + LOG4, spread("NCCN"), 0.02);
        assertEquals(3.08, spread("NCCN"), 0.15);
        // piperazine 9.73 − 5.35 = 4.38: two paths of three bonds
        assertEquals(w3 * (1 + SitePaths.EXTRA_PATH) + LOG4, spread("C1CNCCN1"), 0.02);
        assertEquals(4.38, spread("C1CNCCN1"), 0.15);
        // DABCO 8.82 − 2.97 = 5.85: three paths
        assertEquals(5.85, spread("C1CN2CCN1CC2"), 0.25);
    }

    @Test
    void theDerivationNamesTheFurtherPaths() {
        Analysis a = new Engine(SHIPPED, 300).analyse("CN1CCNCC1", Conditions.noPh());
        assertTrue(a.ok(), a.error());
        var line = a.sites().get(0).derivation().stream().filter(x -> x.label().startsWith("coupling")).findFirst()
                .orElseThrow();
        assertTrue(line.label().contains("3 bonds, and 0.54 × the rule for 1 more path through saturated atoms of 3 bonds"),
                line.label());
    }
}
