package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;

import ionmark.speciation.api.Curve;

/** A curve is a value: nobody who holds one can change it, and two curves with the same points are equal. */
class CurveValueTest {

    /** Henderson–Hasselbalch for one acid of pKa 4.76 (acetic acid, CRC Handbook) at pH 3.76, 4.76, 5.76. */
    private static Curve acetic() {
        double[] ph = {3.76, 4.76, 5.76};
        double[] protonated = {10.0 / 11, 0.5, 1.0 / 11};
        double[] charge = {-1.0 / 11, -0.5, -10.0 / 11};
        Map<Integer, double[]> sites = new LinkedHashMap<>(Map.of(3, protonated));
        Map<Integer, double[]> states = new TreeMap<>(Map.of(0, protonated, -1, charge.clone()));
        return new Curve(ph, charge, sites, states);
    }

    @Test
    void theMakersArraysAndTheCallersCopiesCannotChangeIt() {
        double[] ph = {1, 2};
        double[] charge = {0, 0};
        Map<Integer, double[]> sites = new LinkedHashMap<>(Map.of(0, new double[] {1, 1}));
        Curve c = new Curve(ph, charge, sites, Map.of());
        ph[0] = 99;
        sites.get(0)[0] = 99;
        sites.put(5, new double[] {0, 0});
        c.ph()[1] = 99;
        c.siteProtonated().get(0)[1] = 99;
        assertEquals(1, c.phAt(0));
        assertEquals(2, c.phAt(1));
        assertEquals(1, c.protonatedAt(0, 0));
        assertEquals(1, c.protonatedAt(0, 1));
        assertEquals(1, c.siteAtoms().size());
        assertThrows(UnsupportedOperationException.class, () -> c.chargeStates().put(1, new double[] {0, 0}));
    }

    @Test
    void curvesWithTheSamePointsAreEqual() {
        assertEquals(acetic(), acetic());
        assertEquals(acetic().hashCode(), acetic().hashCode());
        Curve other = new Curve(acetic().ph(), acetic().meanCharge(), Map.of(3, new double[] {0.9, 0.5, 0.1}),
                acetic().chargeStates());
        assertNotEquals(acetic(), other);
        assertEquals(0.5, acetic().protonatedAt(3, 1), 1e-12);
        assertEquals(Double.NaN, acetic().protonatedAt(4, 1));
        assertEquals(-0.5, acetic().meanChargeAt(1), 1e-12);
    }

    @Test
    void aCurveWhoseSeriesDoNotMatchItsGridIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Curve(new double[] {1, 2}, new double[] {0}, Map.of(),
                Map.of()));
        assertThrows(IllegalArgumentException.class, () -> new Curve(new double[] {1, 2}, new double[] {0, 0},
                Map.of(0, new double[] {1}), Map.of()));
    }

    @Test
    void chargeStatesAreInAscendingChargeAndSitesInTheirOwnOrder() {
        Map<Integer, double[]> sites = new LinkedHashMap<>();
        sites.put(7, new double[] {1});
        sites.put(2, new double[] {1});
        Map<Integer, double[]> states = new LinkedHashMap<>();
        states.put(1, new double[] {0.5});
        states.put(-1, new double[] {0.5});
        Curve c = new Curve(new double[] {7}, new double[] {0}, sites, states);
        assertEquals(java.util.List.of(7, 2), c.siteAtoms());
        assertEquals(java.util.List.of(-1, 1), java.util.List.copyOf(c.chargeStates().keySet()));
    }
}
