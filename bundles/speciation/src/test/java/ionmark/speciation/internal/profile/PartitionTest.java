package ionmark.speciation.internal.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;

import org.junit.jupiter.api.Test;

/** The partition rule and the uncharged share, against hand-computed closed forms. */
class PartitionTest {

    @Test
    void anUnchargedSpeciesAloneGivesLogP() {
        assertEquals(2.0, Partition.logD(2.0, Map.of(0, 1.0), 1.0), 1e-12);
    }

    @Test
    void halfIonisedGivesLogPMinusLogTwoPlusTheIonPairTerm() {
        // acetic acid at its pKa: log(0.5 + 0.5·10^−3.5)
        assertEquals(0.17 + Math.log10(0.5 + 0.5 * Math.pow(10, -3.5)),
                Partition.logD(0.17, Map.of(0, 0.5, -1, 0.5), 0.5), 1e-12);
    }

    @Test
    void aPermanentIonOrAZwitterionGoesOverAsAnIonPair() {
        assertEquals(1.0 - 3.5, Partition.logD(1.0, Map.of(2, 1.0), 0.0), 1e-12);
        assertEquals(1.0 - 3.5, Partition.logD(1.0, Map.of(0, 1.0), 0.0), 1e-12);
    }

    @Test
    void withoutLogPThereIsNoLogD() {
        assertEquals(null, Partition.logD(Double.NaN, Map.of(0, 1.0), 1.0));
    }

    @Test
    void unchargedShareOfTwoIndependentSitesIsTheMicroconstantRatio() {
        // acid pKa 4 and base pKa 9, no interaction: neutral-charge states after one proton lost (d = 1 base site):
        // uncharged (acid on, base off) weight 10^−9, zwitterion (acid off, base on) 10^−4 → share 10^−9/(10^−9 + 10^−4)
        double[] poly = {0, Math.log10(Math.pow(10, -4) + Math.pow(10, -9)), -13};
        double share = Partition.unchargedShareOfNeutral(new double[] {4, 9}, new boolean[] {false, true}, poly, 0);
        assertEquals(1e-9 / (1e-9 + 1e-4), share, 1e-12);
    }

    @Test
    void aPermanentChargeLeavesNothingUncharged() {
        assertEquals(0, Partition.unchargedShareOfNeutral(new double[] {4}, new boolean[] {false}, new double[] {0, -4}, 1));
    }
}
