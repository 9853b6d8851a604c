package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.spi.CalibrationPoint;

/**
 * The one-site calibration stage takes a compound with one experimental value only when that value
 * belongs to the step the first-titrating site gives. Values: methyl phosphate 1.54 and 6.31,
 * diethylmalonic acid 2.21 and 7.29, acetic acid 4.76 (CRC Handbook, dissociation constants of
 * organic acids, 25 °C; from memory).
 */
class CalibrationPointTest {
    static final Engine ENGINE = new Engine(TableSnapshotService.shipped(), 300);

    static Optional<CalibrationPoint> point(String smiles, double value) {
        return ENGINE.calibrationPoint(smiles, List.of(value));
    }

    @Test
    void aLoneSecondStepOfAnAlkylPhosphateIsNotGivenToTheFirstSite() {
        assertTrue(point("COP(=O)(O)O", 6.31).isEmpty(), "second step alone");
        Optional<CalibrationPoint> first = point("COP(=O)(O)O", 1.54);
        assertTrue(first.isPresent(), "first step alone");
        assertEquals("phosphate-oh", first.get().group());
        assertEquals(1.54, first.get().pka(), 1e-9);
    }

    @Test
    void aLoneSecondStepOfADialkylmalonicAcidIsNotGivenToTheFirstSite() {
        assertTrue(point("CCC(CC)(C(=O)O)C(=O)O", 7.29).isEmpty(), "second step alone");
        assertTrue(point("CCC(CC)(C(=O)O)C(=O)O", 2.21).isPresent(), "first step alone");
    }

    @Test
    void aCompoundWithOneSiteIsAlwaysUsed() {
        Optional<CalibrationPoint> p = point("CC(=O)O", 4.76);
        assertTrue(p.isPresent());
        assertEquals("carboxylic-aliphatic", p.get().group());
    }
}
