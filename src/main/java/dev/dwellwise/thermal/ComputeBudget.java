package dev.dwellwise.thermal;

/**
 * Limits on the work of one solve, so that no input can run unbounded.
 *
 * @param maxSteps       accepted steps over the whole history
 * @param maxEvaluations right-hand-side evaluations (lumped) or linear solves (slab) over the whole history
 * @param maxSamples     output samples over the whole history
 */
public record ComputeBudget(long maxSteps, long maxEvaluations, int maxSamples) {

    public static ComputeBudget standard() {
        return new ComputeBudget(200_000, 5_000_000, 100_000);
    }
}
