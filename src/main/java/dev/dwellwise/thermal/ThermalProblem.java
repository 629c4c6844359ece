package dev.dwellwise.thermal;

import java.util.List;

/**
 * Everything a back end needs to compute a temperature history, in SI units and kelvin.
 *
 * @param part           the part
 * @param stages         the stages in order; one clock from 0 at the start of the first
 * @param sampleSeconds  spacing of the output samples (absolute multiples of it)
 * @param budget         compute limits for this solve
 * @param profileTimes   times (seconds) at which through-thickness profiles are wanted; may be empty
 */
public record ThermalProblem(ThermalPart part, List<StageConditions> stages, double sampleSeconds,
                             ComputeBudget budget, List<Double> profileTimes) {

    public ThermalProblem {
        stages = List.copyOf(stages);
        profileTimes = List.copyOf(profileTimes);
    }
}
