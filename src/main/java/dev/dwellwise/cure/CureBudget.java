package dev.dwellwise.cure;

/**
 * The most work one cure calculation (one figure along one path) may do, so that no input runs
 * unbounded: {@code maxEvaluations} counts evaluations of the path's temperature by the
 * integrators, root finders and scans together.
 *
 * @param maxEvaluations the limit, at least 1
 */
public record CureBudget(long maxEvaluations) {

    public CureBudget {
        if (maxEvaluations < 1) {
            throw new IllegalArgumentException("maxEvaluations must be at least 1: " + maxEvaluations);
        }
    }

    /**
     * Ten million evaluations: a few tens per piece of a history with the thermal solve's largest
     * step count (200,000) fits with room, and it is still only seconds of work.
     */
    public static CureBudget standard() {
        return new CureBudget(10_000_000);
    }
}
