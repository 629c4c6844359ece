package dev.dwellwise.report;

/**
 * One stage of the answer, °C and seconds on the one clock.
 *
 * @param holdSeconds time the coldest point spent at or above the hold temperature (hold stages only)
 */
public record StageReport(String name, double startSeconds, double endSeconds, String ended,
                          double startTemperatureC, double endTemperatureC, double peakTemperatureC,
                          double endSurfaceTemperatureC, double endCoreTemperatureC,
                          double biotNumber, double radiationCoefficientWPerM2K, double steadyTemperatureC,
                          Double holdSeconds) {
}
