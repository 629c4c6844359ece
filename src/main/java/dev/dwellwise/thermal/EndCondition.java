package dev.dwellwise.thermal;

/** What ends a stage (besides its time bound). Temperatures in kelvin, times in seconds. */
public sealed interface EndCondition {

    /** The stage lasts a fixed time; nothing else ends it. */
    record AfterDuration(double seconds) implements EndCondition {
    }

    /** The coldest point of the part has reached the temperature. */
    record ColdestReaches(double kelvin) implements EndCondition {
    }

    /** The hottest point of the part has fallen to the temperature. */
    record HottestFallsTo(double kelvin) implements EndCondition {
    }

    /** The coldest point has spent {@code seconds} in all at or above the temperature within the stage. */
    record HoldAbove(double kelvin, double seconds) implements EndCondition {
    }
}
