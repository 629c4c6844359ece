package dev.dwellwise.cure;

import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * The records refuse only what would make the mathematics meaningless; judging a job's values is
 * the job validator's work.
 */
class CureInvariantsTest {

    @Test
    void knotsMustAscendStrictly() {
        assertThrows(IllegalArgumentException.class, () -> TemperaturePath.of(t -> 450, 0, 10, 10));
        assertThrows(IllegalArgumentException.class, () -> TemperaturePath.of(t -> 450, 0, Double.NaN));
    }

    @Test
    void aDegreeLiesBetweenZeroAndOne() {
        assertThrows(IllegalArgumentException.class, () -> new NthOrderKinetics(1e7, 80e3, 1, 1.2));
        assertThrows(IllegalArgumentException.class,
                () -> new KamalSourourKinetics(1e6, 89e3, 1e5, 69e3, 0.5, 1.5, -0.1));
        assertThrows(IllegalArgumentException.class,
                () -> new KineticsSpec(new NthOrderKinetics(1e7, 80e3, 1, 0), 1.01, Optional.empty()));
    }

    @Test
    void rateLawParametersAreNotNegative() {
        assertThrows(IllegalArgumentException.class, () -> new NthOrderKinetics(1e7, 80e3, -0.5, 0));
        assertThrows(IllegalArgumentException.class,
                () -> new KamalSourourKinetics(-1, 89e3, 1e5, 69e3, 0.5, 1.5, 0));
    }

    @Test
    void theReferenceTemperatureAndLambdaArePositive() {
        assertThrows(IllegalArgumentException.class,
                () -> new EquivalentTimeSpec(0, 80e3, 420, OptionalDouble.empty()));
        assertThrows(IllegalArgumentException.class,
                () -> new GlassTransitionSpec(258.15, 453.15, 0, OptionalDouble.empty()));
    }
}
