package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.speciation.internal.microstates.MacroConstants;
import ionmark.speciation.internal.microstates.MicrostateSolver;
import ionmark.speciation.internal.microstates.SiteModel;
import ionmark.speciation.internal.microstates.StepShares;
import ionmark.speciation.spi.MacroPairing;

/**
 * Which site of a measured compound takes a measured value's residual: the site that titrates in the model's paired
 * step, worked by hand for a compound where the nearest-value rule puts it on the other site.
 */
class TitratingSitesTest {
    private static final MicrostateSolver SOLVER = new MicrostateSolver(0.02);

    /** An acid (site 0) and a second site, acid or base, held together by {@code held} units while both are charged. */
    static SiteModel twoSites(double acid, double other, boolean otherIsBase, double held) {
        return new SiteModel(new double[] {acid, other}, new boolean[] {false, otherIsBase},
                new double[][] {{0, held}, {held, 0}}, new double[2]);
    }

    static List<Double> constants(SiteModel m) {
        return MacroConstants.of(MacroConstants.polynomial(m, 0.02));
    }

    /**
     * Nicotinic acid, measured pKa 2.07 and 4.81 (CRC Handbook, from memory). A model of it: site 0 the carboxylic
     * acid at 3.4, site 1 the ring N at 3.1 (each with the other neutral; values of the example, not measured), the
     * N⁺/COO⁻ pair held together by 1.5 units. By hand, microstate log weights relative to the cation (COOH, NH⁺):
     * (COO⁻, NH⁺) pH − 3.4 + 1.5; (COOH, N) pH − 3.1; (COO⁻, N) 2 pH − 6.5. So 10^−pK1 = 10^−1.9 + 10^−3.1,
     * pK1 = 1.9 − log(1 + 10^−1.2) = 1.873, pK2 = 6.5 − pK1 = 4.627. Paired: 2.07 with 1.873, 4.81 with 4.627.
     * Across pK1 ± 1 the acid's protonated fraction falls by 0.772 and the N's by 0.063: shares 0.924 and 0.076; the
     * second step mirrors it. The first step is the carboxylic acid's (the cation's COOH, next to N⁺, gives off the
     * first proton), so it takes 2.07 − 1.873 = +0.20 and the N takes 4.81 − 4.627 = +0.18. The nearest-value rule
     * sorts the sites by estimate (N 3.1, COOH 3.4) and gives 2.07 to the N and 4.81 to the acid: the wrong way round.
     */
    @Test
    void nicotinicAcidFirstStepIsTheCarboxylicAcids() {
        SiteModel m = twoSites(3.4, 3.1, true, 1.5);
        List<Double> constants = constants(m);
        assertEquals(1.873, constants.get(0), 0.002);
        assertEquals(4.627, constants.get(1), 0.002);
        assertArrayEquals(new double[] {0.924, 0.076}, StepShares.of(SOLVER, m, constants.get(0)), 0.002);

        List<Double> measured = List.of(2.07, 4.81);
        List<TitratingSites.Placed> placed = TitratingSites.dominant(pk -> StepShares.of(SOLVER, m, pk), 2,
                MacroPairing.assign(measured, constants), constants);
        assertEquals(2, placed.size());
        assertEquals(0, placed.get(0).site(), "2.07 goes to the carboxylic acid");
        assertEquals(0.20, measured.get(placed.get(0).value()) - placed.get(0).constant(), 0.005);
        assertEquals(1, placed.get(1).site(), "4.81 goes to the ring N");
        assertEquals(0.18, measured.get(placed.get(1).value()) - placed.get(1).constant(), 0.005);

        // split form: the N's 0.076 of the first step is below the 0.2 floor, so the acid takes it whole
        List<TitratingSites.Placed> split = TitratingSites.split(pk -> StepShares.of(SOLVER, m, pk),
                MacroPairing.assign(measured, constants), constants);
        assertEquals(List.of(0, 1), split.stream().map(TitratingSites.Placed::site).toList());
        assertEquals(1.0, split.get(0).share(), 1e-9);
    }

    /**
     * Succinic acid, measured 4.21 and 5.64 (CRC Handbook, from memory): two equal carboxylic acids (4.5 each in the
     * example's model, held 0.8 apart by charge). By symmetry each gives off half of each step's proton: the split
     * form gives each site each residual at share 0.5; the dominant form gives one step to each site, once.
     */
    @Test
    void succinicAcidsEqualSitesShareEachStep() {
        SiteModel m = twoSites(4.5, 4.5, false, 0.8);
        List<Double> constants = constants(m);
        // by hand: pK1 = 4.5 − log 2 = 4.199, pK2 = 4.5 + 0.8 + log 2 = 5.601
        assertEquals(4.199, constants.get(0), 0.002);
        assertEquals(5.601, constants.get(1), 0.002);
        List<Double> measured = List.of(4.21, 5.64);
        List<int[]> pairs = MacroPairing.assign(measured, constants);

        List<TitratingSites.Placed> split = TitratingSites.split(pk -> StepShares.of(SOLVER, m, pk), pairs, constants);
        assertEquals(4, split.size());
        split.forEach(p -> assertEquals(0.5, p.share(), 1e-6));

        List<TitratingSites.Placed> dominant = TitratingSites.dominant(pk -> StepShares.of(SOLVER, m, pk), 2, pairs,
                constants);
        assertEquals(2, dominant.size());
        assertEquals(1, Math.abs(dominant.get(0).site() - dominant.get(1).site()), "each site once");
    }
}
