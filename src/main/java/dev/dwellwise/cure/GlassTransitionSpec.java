package dev.dwellwise.cure;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The glass transition temperature as a function of the degree of cure, by the DiBenedetto
 * equation in the form of Pascault and Williams (J. Polym. Sci. B 28 (1990) 85):
 * (Tg − Tg0)/(Tg∞ − Tg0) = λ alpha / [1 − (1 − λ) alpha], λ = ΔCp∞/ΔCp0. The normalised form
 * does not depend on the temperature scale's offset, so kelvin in gives kelvin out.
 *
 * @param tg0K    Tg of the uncured resin, kelvin
 * @param tgFullK Tg of the fully cured network (Tg∞), kelvin
 * @param lambda  λ, above 0
 * @param minK    the least Tg the coating must reach, kelvin, if specified
 */
public record GlassTransitionSpec(double tg0K, double tgFullK, double lambda, OptionalDouble minK) {

    public GlassTransitionSpec {
        if (!(lambda > 0)) {
            // lambda <= 0 makes the denominator vanish or change sign inside [0, 1]
            throw new IllegalArgumentException("lambda must be above 0: " + lambda);
        }
        Objects.requireNonNull(minK, "minK");
    }

    /** Tg at degree of cure {@code degree} (0..1), kelvin: Tg0 at 0, Tg∞ at 1. */
    public double kelvinAt(double degree) {
        double fraction = lambda * degree / (1 - (1 - lambda) * degree);
        return tg0K + (tgFullK - tg0K) * fraction;
    }

    /**
     * The degree of cure at which Tg reaches {@code kelvin}, the inverse of {@link #kelvinAt}: with
     * F = (Tg − Tg0)/(Tg∞ − Tg0), alpha = F / [λ + (1 − λ) F]; clamped to [0, 1], since Tg0 is
     * reached at once and Tg∞ bounds every Tg.
     */
    public double degreeAt(double kelvin) {
        double fraction = Math.max(0, Math.min(1, (kelvin - tg0K) / (tgFullK - tg0K)));
        return fraction / (lambda + (1 - lambda) * fraction);
    }
}
