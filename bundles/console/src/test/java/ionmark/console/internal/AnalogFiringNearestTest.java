package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.speciation.api.Term;

/**
 * The series summary's nearest analog is the one of largest weight, not the one of largest local similarity: with a
 * whole-molecule share the weight comes from the blend of both similarities (labels as the analog step writes them).
 */
class AnalogFiringNearestTest {
    private static Term line(String name, double local, double whole, double weight) {
        return new Term(String.format(java.util.Locale.ROOT, "measured analog %s (pyridine, measured pKa 6.72 at 25 °C,"
                + " compilation value): residual +0.20 against the model's constant 6.52, local similarity %.2f, "
                + "whole-molecule similarity %.2f, weight %.2f of 0.70 (prior 0.05)", name, local, whole, weight), 0.1,
                "measured value in the shared table: test");
    }

    @Test
    void theNearestAnalogIsTheHeaviestOne() {
        // a site of the same local environment in an unrelated molecule, and a series member a bond further away
        AnalogFiring.Nearest n = AnalogFiring.nearest(List.of(line("unrelated", 0.90, 0.20, 0.05),
                line("series member", 0.55, 0.80, 0.60)));
        assertEquals(0.55, n.local(), 0);
        assertEquals(0.80, n.whole(), 0);
        assertEquals(0.65, n.summed(), 1e-12);
    }

    @Test
    void aLineWithoutTheWholeMoleculeGivesNoWholeMoleculeSimilarity() {
        Term local = new Term("measured analog x (pyridine, measured pKa 6.72 at 25 °C, compilation value): residual "
                + "+0.20 against the model's constant 6.52, local similarity 0.70, weight 0.57 of 0.72 (prior 0.15)",
                0.1, "measured value in the shared table: test");
        AnalogFiring.Nearest n = AnalogFiring.nearest(List.of(local));
        assertEquals(0.70, n.local(), 0);
        assertTrue(Double.isNaN(n.whole()));
    }
}
