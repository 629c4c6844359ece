package dev.dwellwise.report;

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
        if (decimals >= 0 && decimals < SCALE.length) {
            return Math.rint(value * SCALE[decimals]) / SCALE[decimals];
        }
        if (decimals < 0 && -decimals < SCALE.length) {
            return Math.rint(value / SCALE[-decimals]) * SCALE[-decimals];
        }
        return new BigDecimal(value).round(new MathContext(6, RoundingMode.HALF_EVEN)).doubleValue();
    }

    /** Powers of ten that are exact doubles. */
    private static final double[] SCALE = {1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13,
        1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    /** Rounds half-even to {@code decimals} places (IEEE arithmetic only: cheap and the same on every JVM). */
    static double fixed(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return value;
        }
        double scale = SCALE[decimals];
        return Math.rint(value * scale) / scale;
    }
}
