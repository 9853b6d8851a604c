package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;

/**
 * Ionic strength on whole species, against the closed form of the Davies equation (Davies 1962, "Ion
 * Association"; A = 0.509 at 25 °C, common practice): log γ(z) = −A z² (√I/(1+√I) − 0.3 I), and a step
 * from a species of charge z to one of charge z − 1 moves by log γ(z − 1) − log γ(z).
 */
class IonicStrengthTest {
    static final Engine ENGINE = new Engine(TableSnapshotService.shipped(), 300);
    static final double I = 0.15;

    /** −log γ(±1) at 0.15 M, 25 °C, written out here rather than taken from the code under test. */
    static double k() {
        double s = Math.sqrt(I);
        return 0.509 * (s / (1 + s) - 0.3 * I);
    }

    static List<Double> macro(String smiles, double ionic) {
        return ENGINE.analyse(smiles, new Conditions(null, 25, ionic)).macroPka();
    }

    @Test
    void phosphateSecondConstantFallsByThreeDaviesUnits() {
        // H2PO4− → HPO4²−: log γ(−2) − log γ(−1) = −3k ≈ −0.36 at 0.15 M (handbook apparent values fall ~0.3–0.4)
        List<Double> zero = macro("OP(O)(O)=O", 0);
        List<Double> salt = macro("OP(O)(O)=O", I);
        assertEquals(-3 * k(), salt.get(1) - zero.get(1), 0.011);
        assertTrue(salt.get(1) - zero.get(1) < -0.33 && salt.get(1) - zero.get(1) > -0.40);
        // first (0 → −1) by −k, third (−2 → −3) by −5k
        assertEquals(-k(), salt.get(0) - zero.get(0), 0.011);
        assertEquals(-5 * k(), salt.get(2) - zero.get(2), 0.011);
    }

    @Test
    void glycineAmineConstantFallsWithSaltAndCarboxylRises() {
        // cation (+1) → zwitterion (0) → anion (−1): the first step rises by k, the amine's step falls by k;
        // a site-by-site treatment moved the amine up (its own charge +1 → 0), the wrong way
        List<Double> zero = macro("NCC(=O)O", 0);
        List<Double> salt = macro("NCC(=O)O", I);
        assertEquals(k(), salt.get(0) - zero.get(0), 0.011);
        assertEquals(-k(), salt.get(1) - zero.get(1), 0.011);
    }

    @Test
    void aSingleAcidKeepsTheOneSiteShift() {
        List<Double> zero = macro("CCCC(=O)O", 0);
        List<Double> salt = macro("CCCC(=O)O", I);
        assertEquals(-k(), salt.get(0) - zero.get(0), 0.011);
    }

    @Test
    void netChargeFromMicrostatesAgreesWithTheMacroscopicConstantsAtIonicStrength() {
        // the solver's site model and the polynomial carry the same term: the mean charge at a pH follows
        // from the reported constants by sequential deprotonation
        for (String smi : new String[] {"OP(O)(O)=O", "NCC(=O)O", "NCCCCC(N)C(=O)O", "OC(=O)CC(O)(CC(=O)O)C(=O)O"}) {
            for (double ph : new double[] {3, 6.5, 9.5}) {
                Analysis a = ENGINE.analyse(smi, new Conditions(ph, 25, I));
                List<Double> pk = a.macroPka();
                int top = smi.startsWith("N") ? (smi.equals("NCC(=O)O") ? 1 : 2) : 0;
                double[] l = new double[pk.size() + 1];
                double sum = 1;
                double lost = 0;
                for (int d = 1; d <= pk.size(); d++) {
                    l[d] = l[d - 1] + ph - pk.get(d - 1);
                    sum += Math.pow(10, l[d]);
                    lost += d * Math.pow(10, l[d]);
                }
                assertEquals(top - lost / sum, a.netCharge(), 0.02, smi + " at pH " + ph);
            }
        }
    }
}
