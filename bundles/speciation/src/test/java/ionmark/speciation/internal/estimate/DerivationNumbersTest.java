package ionmark.speciation.internal.estimate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.RoundingMode;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/**
 * Numbers in derivations are printed by a small fixed-decimal routine; it must agree with exact
 * decimal rounding (half away from zero, {@link BigDecimal}) wherever the double is not a tie.
 */
class DerivationNumbersTest {

    @Property(tries = 20_000)
    void fixedDecimalsAgreeWithBigDecimal(@ForAll @DoubleRange(min = -50, max = 50) double v,
            @ForAll @IntRange(min = 2, max = 3) int digits) {
        BigDecimal exact = new BigDecimal(v);
        BigDecimal scaled = exact.movePointRight(digits);
        BigDecimal frac = scaled.subtract(new BigDecimal(scaled.toBigInteger())).abs();
        if (frac.subtract(new BigDecimal("0.5")).abs().compareTo(new BigDecimal("1e-6")) < 0) {
            return; // a tie up to the last bits of the double: either neighbour is an honest print
        }
        String want = exact.setScale(digits, RoundingMode.HALF_UP).toPlainString();
        if (want.startsWith("-") && new BigDecimal(want).signum() == 0) {
            want = want.substring(1); // no "-0.00"
        }
        assertEquals(want, LferEstimator.fixed(v, digits), () -> "v = " + v);
    }
}
