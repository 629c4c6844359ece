package dev.dwellwise.cure;

import java.util.Objects;
import java.util.Optional;

/**
 * What a coating needs to count as cured, and not over-baked, in SI units: each part is optional
 * and only the parts given are computed and judged.
 *
 * @param timeAbove      cumulative time at or above a temperature
 * @param equivalentTime Arrhenius equivalent time at a reference temperature (the cure window)
 * @param kinetics       a kinetic model with the degree of cure it must reach, and optionally the
 *                       glass transition that follows from the degree
 */
public record CureSpec(Optional<TimeAboveSpec> timeAbove, Optional<EquivalentTimeSpec> equivalentTime,
                       Optional<KineticsSpec> kinetics) {

    public CureSpec {
        Objects.requireNonNull(timeAbove, "timeAbove");
        Objects.requireNonNull(equivalentTime, "equivalentTime");
        Objects.requireNonNull(kinetics, "kinetics");
    }
}
