package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The numbers in answer sentences read as {@code String.format} wrote them before: the JDK's
 * formatter is the reference (java.util.Formatter, conversions 'f' and 'g'), ties included.
 */
class DecimalTextTest {

    private static final double[] TIES_AND_EDGES = {0, 0.05, 0.15, 0.25, 0.45, 1.005, 2.675, 180.05, 179.95,
        -0.05, -0.15, -180.05, 0.00005, 0.00015, 1.0005, 99.995, 999.95, 1e-5, 1.25e-5, 123456.789, 0.1, 0.9999,
        9999.95, 12345.5, 1e14 + 0.5, 0.001900, 0.0019, 7.30236, 14.0};

    @Test
    void powersOfTenAreExactUpToTheLastExactDouble() {
        // IEEE 754 binary64: 10^n = 2^n * 5^n is exact while 5^n fits the 53-bit significand, so up to
        // 10^22 (5^22 < 2^53 < 5^23); BigDecimal's exact expansion of the double is the reference
        for (int n = 0; n <= DecimalText.MAX_EXACT_POWER; n++) {
            assertEquals(0, new BigDecimal(DecimalText.powerOfTen(n)).compareTo(BigDecimal.TEN.pow(n)), "10^" + n);
        }
        assertEquals(22, DecimalText.MAX_EXACT_POWER);
        assertNotEquals(0, new BigDecimal(1e23).compareTo(BigDecimal.TEN.pow(23)), "10^23 is not a double");
    }

    @Test
    void fixedMatchesTheFormatterOnTiesAndRandomValues() {
        SplittableRandom random = new SplittableRandom(7);
        for (int decimals : new int[] {1, 4}) {
            for (double v : TIES_AND_EDGES) {
                assertFixed(v, decimals);
            }
            for (int i = 0; i < 20_000; i++) {
                double v = (random.nextDouble() - 0.3) * Math.pow(10, random.nextInt(-3, 6));
                assertFixed(v, decimals);
                assertFixed(Math.rint(v * 1e4) / 1e4, decimals); // as Rounding leaves reported figures
            }
        }
    }

    @Test
    void significantMatchesTheFormatterInPlainAndScientificRanges() {
        SplittableRandom random = new SplittableRandom(11);
        for (int digits : new int[] {3, 4, 6}) {
            for (double v : TIES_AND_EDGES) {
                assertSignificant(v, digits);
                if (v != 0) {
                    assertSignificant(-v, digits); // -0 is the one intended difference, as in fixed
                }
            }
            for (int i = 0; i < 100_000; i++) {
                double v = random.nextDouble() * Math.pow(10, random.nextInt(-8, 9));
                assertSignificant(v, digits);
                assertSignificant(Math.rint(v * 1e6) / 1e6, digits); // short decimals, ties among them
            }
        }
    }

    @Test
    void significantCarriesIntoTheNextPowerOfTenAsTheFormatterDoes() {
        // just below a power of ten, the rounded value has one more digit before the point
        for (double v : new double[] {9.9996, 99.996, 999.96, 0.00099996, 0.099996, 9.99949, 9.9995, 0.000099996,
            0.00009999, 9999.6, 999.94}) {
            assertSignificant(v, 4);
        }
    }

    private static void assertSignificant(double v, int digits) {
        assertEquals(String.format(Locale.ROOT, "%." + digits + "g", v), DecimalText.significant(v, digits),
                "value " + v + " to " + digits + " digits");
    }

    @Test
    void trimmedWritesWholeNumbersWithoutAPoint() {
        assertEquals("300", DecimalText.trimmed(300));
        assertEquals("0.1", DecimalText.trimmed(0.1));
        assertEquals("2000000000000000", DecimalText.trimmed(2e15));
        assertEquals("-40", DecimalText.trimmed(-40));
    }

    private static void assertFixed(double v, int decimals) {
        String expected = String.format(Locale.ROOT, "%." + decimals + "f", v);
        if (expected.startsWith("-") && expected.matches("-0\\.0+")) {
            expected = expected.substring(1); // the one intended difference: no "-0.0"
        }
        assertEquals(expected, DecimalText.fixed(v, decimals), "value " + v + " to " + decimals + " places");
    }
}
