package dev.dwellwise.thermal;

/**
 * What happened in one stage, kelvin and seconds.
 *
 * @param conditions          the stage as given
 * @param startSeconds        stage start on the one clock
 * @param endSeconds          stage end on the one clock
 * @param ended               how it ended
 * @param start               temperatures at the start
 * @param end                 temperatures at the end
 * @param peakK               hottest point anywhere during the stage
 * @param largestRadiationCoefficient largest h_r over the stage, W/(m²·K)
 * @param biotNumber          (h + h_r,max) L/(faces k) for the stage
 * @param steadyK             the temperature the part approaches under the stage's (end) conditions
 * @param holdSecondsAccumulated time the coldest point spent at or above a hold temperature (hold stages; else 0)
 * @param largestHeatingRate  largest rate of rise of the mass-mean temperature in the stage, K/s
 */
public record StageOutcome(StageConditions conditions, double startSeconds, double endSeconds, StageEnd ended,
                           Observation start, Observation end, double peakK,
                           double largestRadiationCoefficient, double biotNumber, double steadyK,
                           double holdSecondsAccumulated, double largestHeatingRate) {
}
