package dev.dwellwise.cure;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The cure figures along one path; each is present exactly when the {@link CureSpec} asks for it.
 *
 * @param timeAboveSeconds  seconds at or above the time-above temperature
 * @param equivalentSeconds Arrhenius equivalent seconds at the reference temperature
 * @param degree            degree of cure at the end of the history, 0..1
 * @param glassTransitionK  glass transition at that degree, kelvin
 */
public record CureFigures(OptionalDouble timeAboveSeconds, OptionalDouble equivalentSeconds,
                          OptionalDouble degree, OptionalDouble glassTransitionK) {

    public CureFigures {
        Objects.requireNonNull(timeAboveSeconds, "timeAboveSeconds");
        Objects.requireNonNull(equivalentSeconds, "equivalentSeconds");
        Objects.requireNonNull(degree, "degree");
        Objects.requireNonNull(glassTransitionK, "glassTransitionK");
    }
}
