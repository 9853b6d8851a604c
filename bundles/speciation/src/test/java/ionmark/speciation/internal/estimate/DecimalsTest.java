package ionmark.speciation.internal.estimate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/** {@link Decimals} must write exactly what {@code String.format(Locale.ROOT, ...)} writes. */
class DecimalsTest {
    private static void same(double v) {
        for (int digits = 0; digits <= 3; digits++) {
            assertEquals(String.format(Locale.ROOT, "%." + digits + "f", v), Decimals.fixed(v, digits), "value " + v);
            assertEquals(String.format(Locale.ROOT, "%+." + digits + "f", v),
                    Decimals.append(new StringBuilder(), v, digits, true).toString(), "value " + v);
        }
    }

    @Test
    void halfwayDecimalsRoundAsTheFormatterDoes() {
        // values written with a 5 just past the last kept digit, where half-up on the shortest digits and rounding
        // of the binary value part (0.125 is exact, 0.15 and 2.675 are not)
        for (double v : new double[] { 0.125, 0.15, 0.25, 0.35, 0.45, 1.005, 2.675, 4.755, 1.5, 2.5, -0.5, -1.5,
                -2.675, 0.005, 0.0049999, 99.995, 1e-7, 1e7, 123456789.125 }) {
            same(v);
        }
    }

    @Test
    void zerosAndSignsAsTheFormatter() {
        for (double v : new double[] { 0.0, -0.0, -0.001, 0.001, -0.004, -0.005, Double.NaN,
                Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.MIN_VALUE, -Double.MIN_VALUE }) {
            same(v);
        }
    }

    @Test
    void everyThousandthAndItsNeighbours() {
        for (int k = -5000; k <= 5000; k++) {
            double v = k / 1000.0;
            same(v);
            same(Math.nextUp(v));
            same(Math.nextDown(v));
            same(k / 200.0);
        }
    }

    @Test
    void randomValuesOfEveryScale() {
        SplittableRandom r = new SplittableRandom(31);
        for (int i = 0; i < 20_000; i++) {
            double v = (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(-6, 9));
            same(v);
        }
    }
}
