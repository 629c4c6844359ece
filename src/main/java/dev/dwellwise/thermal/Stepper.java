package dev.dwellwise.thermal;

/**
 * One back end's time integration of one part, step by step. Not thread-safe: one per solve.
 *
 * <p>The {@link StageRunner} drives it: {@link #enterStage} at every stage start, then
 * {@link #advance} until an end condition or the stage bound, and {@link #cutAt} when an event
 * ends the stage inside the last segment.
 */
public interface Stepper {

    /** Sets the surroundings of the stage that starts at the current time. */
    void enterStage(StageConditions stage);

    /** Current time, seconds on the one clock. */
    double time();

    /** The part's temperatures now. */
    Observation observe();

    /**
     * Takes at least one accepted step, never past {@code limit}, with error control, and returns the
     * dense output of what it covered.
     */
    Segment advance(double limit);

    /**
     * As {@link #advance(double)}, but the stepper may cover many steps in one segment and end it
     * where {@code stop} rises through zero, and may settle the part where {@code stop} allows it
     * ({@link SettledSegment#steadyK}): it then ends the segment inside its last step, where the part
     * came within the settle band ({@link SettledSegment#bandEntry}), and settles on the next call.
     * The segment always ends where the stepper's clock and state then are. The default ignores the
     * signal and steps as {@link #advance(double)}.
     */
    default Segment advance(double limit, StopSignal stop) {
        return advance(limit);
    }

    /** Moves the state back to {@code t} inside the last segment: an event ended the stage there. */
    void cutAt(double t);

    /** Accepted steps so far. */
    long steps();

    /** Right-hand-side evaluations (or linear solves) so far. */
    long evaluations();

    /** Positions of the profile points through the thickness, metres from the front face. */
    double[] profilePositionsM();
}
