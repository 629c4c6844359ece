package dev.dwellwise.thermal;

/**
 * Limits on the work of one solve, so that no input can run unbounded.
 *
 * <p>The step and evaluation limits bound the work; the wall-clock limit bounds the time the
 * caller waits, which the work limits alone do not (a stiff job can spend seconds inside them, and
 * a loaded machine makes every step slower).
 *
 * @param maxSteps       accepted steps over one model run's whole history
 * @param maxEvaluations right-hand-side evaluations (lumped) or linear solves (slab) over one model run
 * @param maxSamples     output samples over the whole history
 * @param maxMillis      wall-clock milliseconds for one solve, all its model runs together (an
 *                       {@code auto} job's lumped trial and its slab solve share one deadline)
 */
public record ComputeBudget(long maxSteps, long maxEvaluations, int maxSamples, long maxMillis) {

    /** The default wall-clock limit of one solve. */
    public static final long DEFAULT_MAX_MILLIS = 10_000;
    /** A day: far beyond any sensible solve, and small enough that the deadline in nanoseconds cannot overflow. */
    public static final long LONGEST_MAX_MILLIS = 86_400_000;

    public ComputeBudget {
        if (maxMillis < 0 || maxMillis > LONGEST_MAX_MILLIS) {
            throw new IllegalArgumentException("maxMillis must be from 0 to " + LONGEST_MAX_MILLIS + ", not " + maxMillis);
        }
    }

    /** The work limits with the default wall-clock limit. */
    public ComputeBudget(long maxSteps, long maxEvaluations, int maxSamples) {
        this(maxSteps, maxEvaluations, maxSamples, DEFAULT_MAX_MILLIS);
    }

    public static ComputeBudget standard() {
        return new ComputeBudget(200_000, 5_000_000, 100_000, DEFAULT_MAX_MILLIS);
    }

    /** This budget with another wall-clock limit. */
    public ComputeBudget withMaxMillis(long millis) {
        return new ComputeBudget(maxSteps, maxEvaluations, maxSamples, millis);
    }
}
