package dev.dwellwise.cure;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The cure window as Arrhenius equivalent time: the history must be worth at least
 * {@code minSeconds} (and at most {@code maxSeconds}, the over-bake side) at the reference
 * temperature, t_eq = ∫ exp[(E/R)(1/T_ref − 1/T)] dt.
 *
 * @param referenceK              the reference temperature, kelvin (above 0)
 * @param activationEnergyJPerMol apparent activation energy E, J/mol
 * @param minSeconds              least equivalent time for a full cure, seconds
 * @param maxSeconds              most equivalent time before over-bake, seconds, if limited
 */
public record EquivalentTimeSpec(double referenceK, double activationEnergyJPerMol, double minSeconds,
                                 OptionalDouble maxSeconds) {

    public EquivalentTimeSpec {
        if (!(referenceK > 0)) {
            throw new IllegalArgumentException("referenceK must be above 0 K: " + referenceK);
        }
        Objects.requireNonNull(maxSeconds, "maxSeconds");
    }
}
