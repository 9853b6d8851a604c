package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;

/** Zwitterions, permanent ions and weak alcohol sites as the card reports them. */
class ChargedSpeciesTest {
    static final Engine ENGINE = new Engine(TableSnapshotService.shipped(), 300);

    static Analysis at(String smiles, double ph) {
        return ENGINE.analyse(smiles, Conditions.atPh(ph));
    }

    @Test
    void propranololHasOneConstantAndNoIsoelectricPoint() {
        // amine 9.5 (from memory); the secondary alcohol is not titrated in water
        Analysis a = at("CC(C)NCC(O)COc1cccc2ccccc12", 7.4);
        assertEquals(1, a.macroPka().size(), a.macroPka().toString());
        assertNull(a.profile().isoelectricPoint());
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("alcohol O-H")), a.warnings().toString());
    }

    @Test
    void aRibonucleosideDiolKeepsItsConstant() {
        // cytidine: 4.2 (N3) and 12.2-12.5 (ribose 2',3'-diol), from memory
        Analysis a = at("Nc1ccn(C2OC(CO)C(O)C2O)c(=O)n1", 7.0);
        assertTrue(a.macroPka().stream().anyMatch(v -> v > 11 && v < 14), a.macroPka().toString());
    }

    @Test
    void glycineIsNeutralButNotUncharged() {
        // at pH 6 nearly all glycine is the zwitterion (tautomer ratio about 10^5.6, Wada, from memory)
        Analysis a = at("NCC(=O)O", 6.0);
        assertTrue(a.fractionNeutral() > 0.99, "neutral " + a.fractionNeutral());
        assertTrue(a.fractionUncharged() < 1e-3, "uncharged " + a.fractionUncharged());
        // the partition rule in closed form: the uncharged tautomer partitions as the neutral compound, the
        // zwitterion (all the rest at pH 6) 3.5 log units lower; the ion term dominates
        double fu = a.fractionUncharged();
        assertEquals(a.profile().logP() + Math.log10(fu + (1 - fu) * Math.pow(10, -3.5)), a.profile().logD(), 0.01);
        assertEquals(a.profile().logP() - 3.5, a.profile().logD(), 0.05);
        assertEquals((2.35 + 9.78) / 2, a.profile().isoelectricPoint(), 0.01);
    }

    @Test
    void anAcidWithoutBaseIsUnchargedWhereverItIsNeutral() {
        Analysis a = at("CC(=O)O", 4.76);
        assertEquals(a.fractionNeutral(), a.fractionUncharged(), 1e-9);
    }

    @Test
    void aPermanentCationIsNeverUnchargedAndItsLogDStaysWithinTheIonPairDrop() {
        Analysis a = at("C[N+](C)(C)C", 7.4);
        assertEquals(0.0, a.fractionUncharged(), 0.0);
        assertEquals(a.profile().logP() - 3.5, a.profile().logD(), 0.01);
    }

    @Test
    void aBiguanideLogDIsNoLongerNearMinusEleven() {
        Analysis a = at("CN(C)C(=N)NC(N)=N", 7.4);
        assertTrue(a.profile().logD() >= a.profile().logP() - 3.5 - 1e-9 && a.profile().logD() > -6, "logD " + a.profile().logD() + ", logP " + a.profile().logP());
    }
}
