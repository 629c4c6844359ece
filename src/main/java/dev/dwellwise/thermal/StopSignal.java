package dev.dwellwise.thermal;

/**
 * A hint from the stage runner to a stepper: the stage's condition, as a function of the part's
 * temperatures that rises through zero where the condition becomes met. A stepper that can stop
 * there ends its segment at (or just after) that point instead of running on to its limit; the
 * runner still places the event itself on the dense output, so ending there saves work and changes
 * no answer. It also tells a stepper whether the part may settle ({@link SettledSegment#steadyK}):
 * never where the steady temperature strictly meets the condition, whose crossing must be found.
 * Where it may, a crossing that the dense output shows after the part came within the settle band
 * is an overshoot of the interpolant, and the stepper's cut at the band entry drops it.
 */
@FunctionalInterface
public interface StopSignal {

    /** No condition: run to the limit. */
    StopSignal NONE = o -> -1;

    /** Below zero while the condition is not met. */
    double value(Observation o);
}
