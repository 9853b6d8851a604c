package ionmark.speciation.internal.estimate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

import ionmark.speciation.internal.sites.MatchTarget;
import ionmark.speciation.internal.sites.PerceivedSite;

/**
 * 4-Methylimidazole and 5-methylimidazole are one compound: the ring N-H passes between the two ring nitrogens
 * faster than any titration (annular tautomerism; Katritzky, Handbook of Heterocyclic Chemistry, from memory). Its
 * basic nitrogen is next to the methyl-bearing carbon in one drawing and next to the ring CH in the other, so an
 * environment rooted at the drawn basic N alone tells the two apart; with the ring nitrogens counted alike, a measured
 * imidazole finds its analog whichever tautomer either structure was read in.
 */
class AnnularTautomerEnvironmentTest {
    private static final SmilesParser SMILES = new SmilesParser(SilentChemObjectBuilder.getInstance());

    @Test
    void bothDrawingsOfMethylimidazoleGiveTheBasicNitrogenOneEnvironment() throws InvalidSmilesException {
        MatchTarget fourMethyl = target("Cc1c[nH]cn1"); // basic N next to C-CH3
        MatchTarget fiveMethyl = target("Cc1cnc[nH]1"); // basic N next to C-H
        PerceivedSite a = basicNitrogen(fourMethyl);
        PerceivedSite b = basicNitrogen(fiveMethyl);

        double drawn = SiteEnvironment.tanimoto(SiteEnvironment.of(fourMethyl, a, 4, false),
                SiteEnvironment.of(fiveMethyl, b, 4, false));
        assertTrue(drawn < 0.8, "as drawn the two compare at " + drawn);
        assertEquals(1.0, SiteEnvironment.tanimoto(SiteEnvironment.of(fourMethyl, a, 4, true),
                SiteEnvironment.of(fiveMethyl, b, 4, true)), 1e-12);
    }

    @Test
    void anNSubstitutedImidazoleHasNoAnnularTautomer() throws InvalidSmilesException {
        // 1-methylimidazole: the methyl fixes the ring N-substituent, nothing moves
        assertNull(SiteEnvironment.annularNitrogens(target("Cn1ccnc1")));
        boolean[] pyrazole = SiteEnvironment.annularNitrogens(target("c1cc[nH]n1"));
        assertEquals(2, countTrue(pyrazole));
    }

    private static MatchTarget target(String smi) throws InvalidSmilesException {
        IAtomContainer mol = SMILES.parseSmiles(smi);
        return new MatchTarget(mol);
    }

    /** The ring N without a hydrogen, as a site whose class does not matter here. */
    private static PerceivedSite basicNitrogen(MatchTarget t) {
        for (int i = 0; i < t.atomCount(); i++) {
            if (t.atomicNumber(i) == 7 && t.implicitHydrogens(i) == 0) {
                return new PerceivedSite(i, null, new int[] {i}, new int[] {i});
            }
        }
        throw new AssertionError("no basic N");
    }

    private static int countTrue(boolean[] b) {
        int n = 0;
        for (boolean x : b) {
            n += x ? 1 : 0;
        }
        return n;
    }
}
