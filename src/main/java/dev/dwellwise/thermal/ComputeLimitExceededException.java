package dev.dwellwise.thermal;

/** A solve would exceed its {@link ComputeBudget}; {@link #limit()} names which limit. */
public final class ComputeLimitExceededException extends RuntimeException {

    /**
     * Which limit was reached: a count (steps, evaluations, samples), the wall clock (time), or the
     * resolution of the numbers themselves (unresolved: no finite step could be taken).
     */
    public enum Limit { STEPS, EVALUATIONS, SAMPLES, UNRESOLVED, TIME }

    private final Limit limit;

    public ComputeLimitExceededException(Limit limit, String message) {
        super(message);
        this.limit = limit;
    }

    public Limit limit() {
        return limit;
    }
}
