package dev.dwellwise.report;

import dev.dwellwise.thermal.DecimalText;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Rounding of reported figures: far finer than the accuracy targets (0.01 K, 0.05 s), coarse enough
 * that an answer carries no digits of integration noise, and deterministic.
 */
final class Rounding {

    private Rounding() {
    }

    /** Temperatures and rates: 4 decimals. */
    static double temperature(double value) {
        return fixed(value, 4);
    }

    /** Times: 3 decimals (a millisecond). */
    static double seconds(double value) {
        return fixed(value, 3);
    }

    /**
     * Dimensionless and derived figures: 6 significant digits, half-even. For magnitudes from 1e-17
     * to below 1e28, as {@link #fixed} does it, by IEEE arithmetic on an exact power of ten (BigDecimal's
     * exact expansion cost more than the rest of the write-up); beyond, exactly with BigDecimal.
     * Both are deterministic; they can differ only on a value within rounding of a tie.
     */
    static double significant(double value) {
        if (value == 0 || !Double.isFinite(value)) {
            return value;
        }
        int decimals = 5 - (int) Math.floor(Math.log10(Math.abs(value)));
        if (Math.abs(decimals) <= DecimalText.MAX_EXACT_POWER) {
            double scale = DecimalText.powerOfTen(Math.abs(decimals));
            return decimals >= 0 ? Math.rint(value * scale) / scale : Math.rint(value / scale) * scale;
        }
        return new BigDecimal(value).round(new MathContext(6, RoundingMode.HALF_EVEN)).doubleValue();
    }

    /** Rounds half-even to {@code decimals} places (IEEE arithmetic only: cheap and the same on every JVM). */
    static double fixed(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return value;
        }
        double scale = DecimalText.powerOfTen(decimals);
        return Math.rint(value * scale) / scale;
    }
}
