package dev.dwellwise.report;

/** Temperatures through the thickness at one time: positions in mm from the front face, °C. */
public record ProfileReport(double timeSeconds, double[] positionMm, double[] temperatureC) {
}
