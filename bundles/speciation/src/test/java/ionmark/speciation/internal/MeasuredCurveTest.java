package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;

/**
 * A measured compound's curve follows its measured macroscopic constants, as its analysis at one pH does. Carbonic
 * acid (pKa 6.35 and 10.33 at 25 °C, CRC Handbook of Chemistry and Physics, dissociation constants of inorganic
 * acids; from memory) has two equivalent O-H sites: the curve used to follow the site model's statistical factors
 * (about 5.7 and 10.9) while the card's numbers said 6.35 and 10.33.
 */
class MeasuredCurveTest {
    static final Engine ENGINE = new Engine(TableSnapshotService.shipped(), 300);

    @Test
    void carbonicAcidIsHalfTitratedAtEachMeasuredConstant() throws Exception {
        Analysis a = ENGINE.analyse("OC(=O)O", Conditions.noPh(), false);
        assertEquals(6.35, a.macroPka().get(0), 0.05, a.macroPka().toString());
        Curve c = ENGINE.curve("OC(=O)O", Conditions.noPh(), 0, 14, 0.01);
        assertEquals(-0.5, at(c, 6.35), 0.03, "mean charge at the first constant");
        assertEquals(-1.5, at(c, 10.33), 0.03, "mean charge at the second constant");
    }

    @Test
    void theCurveAgreesWithTheAnalysisAtEveryPh() throws Exception {
        Curve c = ENGINE.curve("OC(=O)O", Conditions.noPh(), 0, 14, 0.5);
        for (int k = 0; k < c.ph().length; k++) {
            Analysis a = ENGINE.analyse("OC(=O)O", Conditions.atPh(c.ph()[k]), false);
            assertEquals(a.netCharge(), c.meanCharge()[k], 0.01, "pH " + c.ph()[k]);
        }
    }

    static double at(Curve c, double ph) {
        int k = (int) Math.round(ph / (c.ph()[1] - c.ph()[0]));
        return c.meanCharge()[k];
    }
}
