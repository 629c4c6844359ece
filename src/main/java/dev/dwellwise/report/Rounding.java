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

    /** Dimensionless and derived figures: 6 significant digits. */
    static double significant(double value) {
        if (value == 0 || !Double.isFinite(value)) {
            return value;
        }
        return new BigDecimal(value).round(new MathContext(6, RoundingMode.HALF_EVEN)).doubleValue();
    }

    private static final double[] SCALE = {1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6};

    /** Rounds half-even to {@code decimals} places (IEEE arithmetic only: cheap and the same on every JVM). */
    static double fixed(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return value;
        }
        double scale = SCALE[decimals];
        return Math.rint(value * scale) / scale;
    }
}
