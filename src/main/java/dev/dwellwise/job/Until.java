package dev.dwellwise.job;

/**
 * A stage's end condition: exactly one of {@code seconds}; {@code partAboveC} (the coldest point
 * has reached it); {@code partBelowC} (the hottest point has fallen to it); {@code holdAboveC} with
 * {@code holdSeconds} (the coldest point has spent that long at or above it within the stage).
 */
public record Until(Double seconds, Double partAboveC, Double partBelowC, Double holdAboveC, Double holdSeconds) {

    /** How many of the four forms are given (a hold counts once, by either of its fields). */
    int formsGiven() {
        int n = 0;
        n += seconds != null ? 1 : 0;
        n += partAboveC != null ? 1 : 0;
        n += partBelowC != null ? 1 : 0;
        n += holdAboveC != null || holdSeconds != null ? 1 : 0;
        return n;
    }
}
