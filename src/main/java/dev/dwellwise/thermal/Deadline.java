package dev.dwellwise.thermal;

/**
 * The wall-clock end of one solve: {@link ComputeBudget#maxMillis()} from the moment it is made.
 * Every model run of the solve shares it ({@link ModelSelector}: an {@code auto} job's lumped
 * trial and its slab solve), so the caller waits at most the budget, not once per model.
 * {@link StageRunner} checks it between segments; a back end that integrates a long window in one
 * call checks it at every step of the window too, so a stiff job stops on time.
 */
public final class Deadline {

    private final long maxMillis;
    private final long endNanos;

    private Deadline(long maxMillis) {
        this.maxMillis = maxMillis;
        this.endNanos = System.nanoTime() + maxMillis * 1_000_000;
    }

    static Deadline startingNow(ComputeBudget budget) {
        return new Deadline(budget.maxMillis());
    }

    /** Throws the TIME limit once the deadline has passed. */
    void check() {
        if (System.nanoTime() - endNanos >= 0) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.TIME,
                    "the solve ran longer than its budget of " + maxMillis + " ms");
        }
    }
}
