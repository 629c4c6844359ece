package dev.dwellwise.cure;

import dev.dwellwise.thermal.Physics;

/** Temperature paths with known formulas for the cure tests. */
final class Paths {

    private Paths() {
    }

    static double kelvin(double celsius) {
        return Physics.toKelvin(celsius);
    }

    /** A constant temperature for {@code seconds}. */
    static TemperaturePath constant(double kelvin, double seconds) {
        return TemperaturePath.of(t -> kelvin, 0, seconds);
    }

    /**
     * A step profile: {@code kelvins[i]} for {@code durations[i]} seconds, one after another, with a
     * knot at every step (the temperature jumps there).
     */
    static TemperaturePath steps(double[] kelvins, double[] durations) {
        double[] knots = new double[durations.length + 1];
        for (int i = 0; i < durations.length; i++) {
            knots[i + 1] = knots[i] + durations[i];
        }
        return TemperaturePath.of(t -> {
            int i = 0;
            while (i < durations.length - 1 && t >= knots[i + 1]) {
                i++;
            }
            return kelvins[i];
        }, knots);
    }

    /**
     * Lumped convection heating T(t) = T_air − (T_air − T_i) e^(−t/tau) over [0, end], with knots
     * every {@code knotSpacing} seconds, as a computed history would have.
     */
    static TemperaturePath exponential(double airK, double initialK, double tau, double end, double knotSpacing) {
        return TemperaturePath.of(t -> exponentialAt(airK, initialK, tau, t), knotsEvery(knotSpacing, end));
    }

    static double exponentialAt(double airK, double initialK, double tau, double t) {
        return airK - (airK - initialK) * Math.exp(-t / tau);
    }

    /** A linear ramp from {@code fromK} to {@code toK} over {@code rampSeconds}, then a hold to {@code end}. */
    static TemperaturePath rampAndHold(double fromK, double toK, double rampSeconds, double end) {
        return TemperaturePath.of(t -> rampAndHoldAt(fromK, toK, rampSeconds, t), 0, rampSeconds, end);
    }

    static double rampAndHoldAt(double fromK, double toK, double rampSeconds, double t) {
        return t < rampSeconds ? fromK + (toK - fromK) * t / rampSeconds : toK;
    }

    static double[] knotsEvery(double spacing, double end) {
        int n = (int) Math.ceil(end / spacing - 1e-9);
        double[] knots = new double[n + 1];
        for (int i = 0; i < n; i++) {
            knots[i] = i * spacing;
        }
        knots[n] = end;
        return knots;
    }
}
