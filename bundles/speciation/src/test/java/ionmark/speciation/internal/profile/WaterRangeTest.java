package ionmark.speciation.internal.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The rule for what titrates in water between pH 0 and 14. */
class WaterRangeTest {
    static final WaterRange.Site AMINE = new WaterRange.Site("amine-secondary", true, 9.5, 0.4);
    static final WaterRange.Site ALCOHOL_13 = new WaterRange.Site(WaterRange.ALCOHOL, false, 13.1, 1.1);

    @Test
    void anAlcoholWithinOneSdOf14IsHeldOutOfTheListAndTheIsoelectricPoint() {
        assertEquals(List.of(9.5), WaterRange.reportable(List.of(9.5, 13.1), List.of(AMINE, ALCOHOL_13)));
        assertNull(WaterRange.isoelectricPoint(List.of(AMINE, ALCOHOL_13), false, List.of(9.5), ph -> 1 - ph / 10));
    }

    @Test
    void anActivatedAlcoholWellBelow14Stays() {
        WaterRange.Site tfe = new WaterRange.Site(WaterRange.ALCOHOL, false, 12.4, 0.5);
        assertEquals(List.of(12.4), WaterRange.reportable(List.of(12.4), List.of(tfe)));
    }

    @Test
    void theIsoelectricPointLiesBetweenTheLowestAndHighestConstant() {
        // two independent sites 2.35 and 9.78 (glycine, CRC, from memory): zero charge at the midpoint
        WaterRange.Site acid = new WaterRange.Site("carboxylic-alpha-amino", false, 2.35, 0.1);
        WaterRange.Site base = new WaterRange.Site("amine-alpha-amino-acid", true, 9.78, 0.1);
        Double pI = WaterRange.isoelectricPoint(List.of(acid, base), false, List.of(2.35, 9.78),
                ph -> 1 / (1 + Math.pow(10, ph - 9.78)) - 1 / (1 + Math.pow(10, 2.35 - ph)));
        assertEquals((2.35 + 9.78) / 2, pI, 0.001);
    }

    @Test
    void aPermanentCationWithAnAcidThatNeverGoesNegativeHasNoIsoelectricPoint() {
        // betaine: +1 → 0, the mean charge never crosses zero
        WaterRange.Site acid = new WaterRange.Site("carboxylic-aliphatic", false, 1.8, 0.3);
        assertNull(WaterRange.isoelectricPoint(List.of(acid), true, List.of(1.8),
                ph -> 1 - 1 / (1 + Math.pow(10, 1.8 - ph))));
    }
}
