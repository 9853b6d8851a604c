package ionmark.speciation.internal.estimate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.SiteType;

/**
 * Huber weights around the weighted median (Huber, Ann. Math. Statist. 35 (1964) 73–101): residuals within c of the
 * median keep their weight, a residual at distance d > c keeps c/d of it. Worked by hand: residuals +0.50, +0.60,
 * +0.55 and −4.00 at equal weight have the (lower) weighted median +0.50 (of the sorted −4.00, +0.50, +0.55, +0.60,
 * the first whose cumulative weight reaches half the total), so −4.00 (d = 4.50) keeps 0.5/4.50 = 0.111 of its
 * weight.
 */
class RobustAnalogWeightsTest {
    private static AnalogCorrection.Used used(String id, double residual) {
        MeasuredCompound c = new MeasuredCompound(id, id, "CC(=O)O", List.of(4.76), 25, 0, "", "test", List.of());
        SiteAnalogIndex.MeasuredSite s = new SiteAnalogIndex.MeasuredSite(c, "carboxylic", SiteType.ACID,
                new int[0], 4.76 - residual, residual, "test", "");
        return new AnalogCorrection.Used(s, 0.8, 0.6, false);
    }

    @Test
    void aResidualFarFromTheOthersKeepsOnlyPartOfItsWeightAndIsMarked() {
        List<AnalogCorrection.Used> in = List.of(used("a", 0.50), used("b", 0.60), used("c", 0.55), used("d", -4.00));
        List<AnalogCorrection.Used> out = AnalogCorrection.robust(in, 0.5);
        for (int i = 0; i < 3; i++) {
            assertEquals(0.6, out.get(i).weight(), 1e-12, out.get(i).site().compound().id());
            assertFalse(out.get(i).damped());
        }
        assertEquals(0.6 * 0.5 / 4.50, out.get(3).weight(), 1e-12);
        assertTrue(out.get(3).damped());
        double plain = in.stream().mapToDouble(u -> u.weight() * u.site().residual()).sum()
                / in.stream().mapToDouble(AnalogCorrection.Used::weight).sum();
        double robust = out.stream().mapToDouble(u -> u.weight() * u.site().residual()).sum()
                / out.stream().mapToDouble(AnalogCorrection.Used::weight).sum();
        assertEquals(-0.59, plain, 0.01); // the plain mean is dragged to the wrong sign by the one outlier
        assertTrue(robust > 0.3 && robust < 0.6, "robust mean " + robust);
    }

    @Test
    void residualsThatAgreeKeepTheirWeights() {
        List<AnalogCorrection.Used> in = List.of(used("a", 0.50), used("b", 0.90), used("c", 0.70));
        assertEquals(in, AnalogCorrection.robust(in, 0.5));
    }
}
