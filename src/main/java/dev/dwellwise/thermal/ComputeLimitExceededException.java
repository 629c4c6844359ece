package dev.dwellwise.thermal;

/** A solve would exceed its {@link ComputeBudget}; {@link #limit()} names which limit. */
public final class ComputeLimitExceededException extends RuntimeException {

    /** Which limit was reached. */
    public enum Limit { STEPS, EVALUATIONS, SAMPLES, TIME }

    private final Limit limit;

    public ComputeLimitExceededException(Limit limit, String message) {
        super(message);
        this.limit = limit;
    }

    public Limit limit() {
        return limit;
    }
}
