package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.Substituent;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Term;

/**
 * Substituents on an aromatic ring fused to the site's ring. The shipped classes and constants
 * without measured compounds, so that every number below is the estimate's own. In the quinoline
 * ring system C5 and C7 are three bonds from N1 and conjugated with it (σp), C6 four and C8 two
 * bonds away and not (σm).
 */
class FusedRingTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();
    static final Engine ENGINE = new Engine(new AcidityTable(SHIPPED.version(), SHIPPED.references(),
            SHIPPED.groups(), SHIPPED.substituents(), List.of(), SHIPPED.interaction(), SHIPPED.pairs()), 300);

    static Site quinolineN(String smiles) {
        Analysis a = ENGINE.analyse(smiles, Conditions.noPh());
        assertTrue(a.ok(), a.error());
        return a.sites().stream().filter(s -> s.group().equals("quinoline")).findFirst().orElseThrow();
    }

    static Term fusedTerm(Site s) {
        List<Term> fused = s.derivation().stream().filter(t -> t.label().contains("fused ring")).toList();
        assertEquals(1, fused.size(), s.derivation().toString());
        return fused.get(0);
    }

    @Test
    void nitroOnTheBenzoRingLowersTheQuinolineNByItsPositionsConstant() {
        GroupClass quinoline = SHIPPED.groups().stream().filter(g -> g.id().equals("quinoline")).findFirst()
                .orElseThrow();
        Substituent nitro = SHIPPED.substituents().stream().filter(x -> x.name().equals("nitro")).findFirst()
                .orElseThrow();
        double parent = quinolineN("c1ccc2ncccc2c1").pka();
        String[][] cases = { // SMILES, bonds from N1, the constant that applies
            {"O=[N+]([O-])c1cccc2ncccc12", "3", "p"}, // 5-nitro
            {"O=[N+]([O-])c1ccc2ncccc2c1", "4", "m"}, // 6-nitro
            {"O=[N+]([O-])c1ccc2cccnc2c1", "3", "p"}, // 7-nitro
            {"O=[N+]([O-])c1cccc2cccnc12", "2", "m"}, // 8-nitro
        };
        for (String[] c : cases) {
            Site s = quinolineN(c[0]);
            Term t = fusedTerm(s);
            double sigma = c[2].equals("p") ? nitro.sigmaPara(quinoline.resonance()) : nitro.sigmaMeta();
            double want = -quinoline.rho() * 0.3 * sigma;
            assertEquals(want, t.value(), 1e-9, c[0]);
            assertTrue(t.label().contains("(n=" + c[1] + ")"), t.label());
            assertEquals(parent + want, s.pka(), 0.011, c[0]); // site values are reported to two decimals
        }
    }

    @Test
    void aSubstituentOnTheSitesOwnRingIsNotCountedTwice() {
        Site s = quinolineN("Cc1ccc2ccccc2n1"); // 2-methylquinoline: methyl on the N ring
        assertTrue(s.derivation().stream().noneMatch(t -> t.label().contains("fused ring")), s.derivation().toString());
        assertEquals(1, s.derivation().stream().filter(t -> t.label().contains("methyl")).count(),
                s.derivation().toString());
    }

    @Test
    void aThirdRingIsPartOfTheSystemNotASubstituent() {
        Analysis a = ENGINE.analyse("c1ccc2nc3ccccc3cc2c1", Conditions.noPh()); // acridine
        assertTrue(a.ok(), a.error());
        assertTrue(a.sites().get(0).derivation().stream().noneMatch(t -> t.label().startsWith("Hammett")),
                a.sites().get(0).derivation().toString());
    }
}
