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
 * Steric inhibition of resonance: a nitro, alkoxy, dialkylamino or carbonyl group between two ortho neighbours is
 * turned out of the ring plane and acts by σm, not σp. The classic case (March's Advanced Organic Chemistry, acids
 * and bases chapter, values from memory): 4-nitrophenol 7.15, 2,6-dimethyl-4-nitrophenol 7.22 (the nitro group
 * free, the methyl groups beside the O-H), 3,5-dimethyl-4-nitrophenol 8.25 (the nitro group between the methyls).
 * Shipped classes and constants without measured compounds, so every number is the estimate's own.
 */
class TwistedSubstituentTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();
    static final Engine ENGINE = new Engine(new AcidityTable(SHIPPED.version(), SHIPPED.references(),
            SHIPPED.groups(), SHIPPED.substituents(), List.of(), SHIPPED.interaction(), SHIPPED.pairs()), 300);

    static Site site(String smiles, String element) {
        Analysis a = ENGINE.analyse(smiles, Conditions.noPh());
        assertTrue(a.ok(), a.error());
        return a.sites().stream().filter(s -> s.element().equals(element)).findFirst().orElseThrow();
    }

    static List<Term> nitroTerms(Site s) {
        return s.derivation().stream().filter(t -> t.label().contains(" nitro")).toList();
    }

    @Test
    void aNitroGroupBetweenTwoMethylsActsByItsMetaConstant() {
        Site twisted = site("Cc1cc(O)cc(C)c1[N+](=O)[O-]", "O");
        GroupClass phenol = SHIPPED.groups().stream().filter(g -> g.id().equals(twisted.group())).findFirst()
                .orElseThrow();
        Substituent nitro = SHIPPED.substituents().stream().filter(x -> x.id().equals("nitro")).findFirst()
                .orElseThrow();
        List<Term> terms = nitroTerms(twisted);
        assertEquals(1, terms.size(), twisted.derivation().toString());
        Term t = terms.get(0);
        assertTrue(t.label().contains("turned out of the ring plane") && t.label().contains("σm"), t.label());
        assertEquals(-phenol.rho() * nitro.sigmaMeta(), t.value(), 1e-9);
        assertTrue(t.source().contains("steric inhibition of resonance"), t.source());
        assertEquals(8.25, twisted.pka(), 0.5, "3,5-dimethyl-4-nitrophenol");

        Site free = site("Cc1cc([N+](=O)[O-])cc(C)c1O", "O");
        assertTrue(nitroTerms(free).stream().noneMatch(x -> x.label().contains("ring plane")), free.derivation()
                .toString());
        assertEquals(7.22, free.pka(), 0.5, "2,6-dimethyl-4-nitrophenol");
        // the measured order: the twisted isomer is the weaker acid by about one unit
        assertTrue(twisted.pka() - free.pka() > 0.7, twisted.pka() + " against " + free.pka());
    }

    @Test
    void smallOrAromaticNeighboursDoNotTwist() {
        for (String smiles : new String[] {"Cc1cc([N+](=O)[O-])ccc1O", // 3-methyl-4-nitrophenol: one neighbour
            "Oc1cc(C)c([N+](=O)[O-])c2ccccc12", // 3-methyl-4-nitro-1-naphthol: the other side is a fused aromatic ring
            "COc1cc(C(=O)O)cc(OC)c1OC", // 3,4,5-trimethoxybenzoic acid: methoxy neighbours are small
            "COc1ccc(C(=O)O)cc1"}) { // 4-methoxybenzoic acid
            Site s = site(smiles, "O");
            assertTrue(s.derivation().stream().noneMatch(t -> t.label().contains("ring plane")), smiles + ": "
                    + s.derivation());
        }
    }

    @Test
    void aSaturatedFusedRingOrTheSitesOwnGroupIsANeighbour() {
        // the CH2 of a fused saturated ring is a substituent of the site's ring like any other
        Site tetralin = site("Oc1cc(C)c([N+](=O)[O-])c2c1CCCC2", "O");
        assertTrue(tetralin.derivation().stream().anyMatch(t -> t.label().contains("para nitro (turned out")),
                tetralin.derivation().toString());
        // 3-methyl-2-nitrobenzoic acid: the nitro group sits between the carboxyl group and the methyl group
        Site acid = site("Cc1cccc(C(=O)O)c1[N+](=O)[O-]", "O");
        assertTrue(acid.derivation().stream().anyMatch(t -> t.label().contains("ortho nitro (turned out")
                && t.label().contains("σm + σI")), acid.derivation().toString());
    }

    @Test
    void theMethoxyGroupOfAProtonPumpInhibitorPyridineIsTwisted() {
        // omeprazole: the 4-methoxy group sits between the 3- and 5-methyl groups; its pyridine N 4.0 (Avdeef,
        // Absorption and Drug Development, 2nd ed. 2012, from memory); with σp for the methoxy group it read 5.9
        Analysis a = ENGINE.analyse("COc1ccc2[nH]c(nc2c1)S(=O)Cc1ncc(C)c(OC)c1C", Conditions.noPh());
        Site pyridine = a.sites().stream().filter(s -> s.group().equals("pyridine")).findFirst().orElseThrow();
        assertTrue(pyridine.derivation().stream().anyMatch(t -> t.label().contains("methoxy (turned out")),
                pyridine.derivation().toString());
        assertEquals(4.0, pyridine.pka(), 0.6, pyridine.derivation().toString());
    }
}
