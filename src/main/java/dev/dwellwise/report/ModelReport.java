package dev.dwellwise.report;

/** Which model computed the history, which was asked for, and why. */
public record ModelReport(String used, String requested, String reason) {
}
