package dev.dwellwise.report;

/** The sampled history, columnar: one array per quantity, °C and seconds. */
public record SeriesReport(double[] timeSeconds, double[] temperatureC, double[] surfaceTemperatureC,
                           double[] coreTemperatureC, int[] stageIndex) {
}
