package dev.dwellwise.cure;

import java.util.Objects;
import java.util.Optional;

/**
 * A kinetic model of the cure with the degree it must reach.
 *
 * @param model           the rate law
 * @param minDegree       least degree of cure at the end of the history, 0..1
 * @param glassTransition the glass transition that follows from the degree, if wanted
 */
public record KineticsSpec(Kinetics model, double minDegree, Optional<GlassTransitionSpec> glassTransition) {

    public KineticsSpec {
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(glassTransition, "glassTransition");
        if (!(minDegree >= 0 && minDegree <= 1)) {
            throw new IllegalArgumentException("minDegree must lie in [0, 1]: " + minDegree);
        }
    }
}
