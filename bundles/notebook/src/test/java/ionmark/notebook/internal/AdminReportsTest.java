package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.MeasuredCompound;

/** The regression report's per-compound verdicts and the records a structure rests on. */
class AdminReportsTest {
    static final MeasuredCompound PHENOL = new MeasuredCompound("phenol", "phenol", "Oc1ccccc1", List.of(9.99), 25, 0,
            "compilation value", "crc", List.of("phenol"));

    @Test
    void aSiteRestsOnAMeasuredCompoundOnlyWhenItsDerivationSaysSo() {
        assertTrue(AdminReports.cites("measured compound phenol: macroscopic pKa [9.99] at 25 °C", PHENOL));
        assertTrue(AdminReports.cites("analog phenol (measured 9.99, estimate off by +0.10), similarity 0.60", PHENOL));
        assertFalse(AdminReports.cites("class Phenol O-H ortho to a carboxylic acid (phenol-ortho-carboxy)", PHENOL));
    }

    @Test
    void theErrorIsAgainstTheNearestPredictedConstant() {
        // glycine 2.34 and 9.60 (CRC, from memory) against predictions 2.5 and 9.5
        assertEquals(0.13, AdminReports.error(List.of(2.34, 9.60), List.of(9.5, 2.5)), 1e-9);
        assertTrue(Double.isNaN(AdminReports.error(List.of(4.76), List.of())));
    }
}
