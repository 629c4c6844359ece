package dev.dwellwise.job;

/**
 * What the coating needs to count as cured and not over-baked; each part is optional, only the
 * parts given are computed and judged, and at least one must be given. Minimums are judged at the
 * coldest point of the part, maximums (the over-bake side of the cure window) at the hottest.
 *
 * @param timeAbove      cumulative time at or above a temperature, over the whole history
 * @param equivalentTime Arrhenius equivalent time at a reference temperature, over the whole history
 * @param kinetics       a rate law with the degree of cure it must reach (and optionally the glass transition)
 */
public record Cure(TimeAbove timeAbove, EquivalentTime equivalentTime, CureKinetics kinetics) {

    Cure withDefaults() {
        return new Cure(timeAbove, equivalentTime, kinetics == null ? null : kinetics.withDefaults());
    }

    /**
     * Time at or above a temperature ("ten minutes at 180 °C metal temperature").
     *
     * @param temperatureC the temperature, °C
     * @param minSeconds   least time at or above it at the coldest point, s
     * @param maxSeconds   most time at or above it at the hottest point before over-bake, s (optional)
     */
    public record TimeAbove(Double temperatureC, Double minSeconds, Double maxSeconds) {
    }

    /**
     * The cure window as equivalent time at a reference temperature, t_eq = ∫ exp[(E/R)(1/T_ref − 1/T)] dt.
     *
     * @param referenceC               the reference temperature (the coating's nominal cure temperature), °C
     * @param activationEnergyKJPerMol apparent activation energy E, kJ/mol
     * @param minSeconds               least equivalent time at the coldest point, s
     * @param maxSeconds               most equivalent time at the hottest point before over-bake, s (optional)
     */
    public record EquivalentTime(Double referenceC, Double activationEnergyKJPerMol, Double minSeconds,
                                 Double maxSeconds) {
    }
}
