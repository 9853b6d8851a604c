package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.calibration.api.Observation;

/**
 * The summary line's counts worked by hand: pairing, misses, extra constants and the share of paired values
 * within one and two stated sd (the sd of the site nearest each predicted constant).
 */
class AccuracySummaryTest {

    private static Accuracy.Scored scored(List<Double> exp, List<Double> pred, List<Double> sds, List<int[]> pairs) {
        return new Accuracy.Scored(new Observation("x", "C", exp), pred, pairs, pred.stream().map(p -> "g").toList(),
                sds, null);
    }

    @Test
    void sharesWithinOneAndTwoSdAreCountedOverPairedValuesWithAnSd() {
        List<Accuracy.Scored> all = List.of(
                // error 0.3 at sd 0.5: inside one sd
                scored(List.of(4.0), List.of(4.3), List.of(0.5), List.of(new int[] {0, 0})),
                // error 0.8 at sd 0.5: outside one sd, inside two
                scored(List.of(9.0), List.of(8.2), List.of(0.5), List.of(new int[] {0, 0})),
                // error 1.5 at sd 0.5: outside both; the 7.0 constant has no partner (extra, between 2 and 12)
                scored(List.of(3.0), List.of(4.5, 7.0), List.of(0.5, 0.4), List.of(new int[] {0, 0})),
                // an experimental value without a partner: a miss, not counted in the sd shares
                scored(List.of(2.0, 10.0), List.of(10.1), List.of(Double.NaN), List.of(new int[] {1, 0})));
        Accuracy.Summary s = Accuracy.summarise(all, null);
        assertEquals(5, s.values());
        assertEquals(4, s.matched());
        assertEquals(1, s.extra());
        assertEquals(3.0 / 5, s.within1(), 1e-12, "0.3, 0.8 and 0.1 are within 1.0 of 5 values (the miss counts against)");
        assertEquals(1.0 / 3, s.within1sd(), 1e-12, "one of the three paired values with an sd");
        assertEquals(2.0 / 3, s.within2sd(), 1e-12, "two of the three paired values with an sd");
        assertTrue(s.line().endsWith("within_1sd=0.333 within_2sd=0.667"), s.line());
    }
}
