package dev.dwellwise.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Six significant digits by IEEE arithmetic against the exact decimal rounding of
 * {@link BigDecimal} (java.math's HALF_EVEN, which is IEEE 754's roundTiesToEven in decimal).
 */
class RoundingTest {

    private static double exact(double value) {
        return new BigDecimal(value).round(new MathContext(6, RoundingMode.HALF_EVEN)).doubleValue();
    }

    @Test
    void randomValuesOverFortyDecadesRoundAsTheExactDecimalRoundingDoes() {
        SplittableRandom random = new SplittableRandom(20261201);
        for (int i = 0; i < 200_000; i++) {
            double value = (random.nextBoolean() ? 1 : -1) * Math.pow(10, random.nextDouble(-20, 30));
            assertEquals(exact(value), Rounding.significant(value), "value " + value);
        }
    }

    @Test
    void exactTiesGoToTheEvenDigitAndDecadeEdgesKeepTheirDigits() {
        // ties that are exact doubles: the sixth digit is kept even
        assertEquals(123456, Rounding.significant(123456.5));
        assertEquals(123458, Rounding.significant(123457.5));
        assertEquals(1234560, Rounding.significant(1234565));
        assertEquals(-0.250000, Rounding.significant(-0.25));
        // a value that rounds up into the next decade, and the powers of ten themselves
        assertEquals(1000, Rounding.significant(999.9996));
        assertEquals(1e-3, Rounding.significant(1e-3));
        assertEquals(1e20, Rounding.significant(1e20));
        assertEquals(0.0, Rounding.significant(0.0));
        assertEquals(Double.POSITIVE_INFINITY, Rounding.significant(Double.POSITIVE_INFINITY));
        // beyond the exact powers of ten, the exact path
        assertEquals(exact(6.02214076e29), Rounding.significant(6.02214076e29));
        assertEquals(exact(1.602176634e-19), Rounding.significant(1.602176634e-19));
    }
}
