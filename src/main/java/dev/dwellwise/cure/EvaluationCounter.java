package dev.dwellwise.cure;

/** Counts the evaluations of one calculation against its {@link CureBudget}. Not thread-safe. */
final class EvaluationCounter {

    private final long limit;
    private final String calculation;
    private long used;

    EvaluationCounter(CureBudget budget, String calculation) {
        this.limit = budget.maxEvaluations();
        this.calculation = calculation;
    }

    /** What is left, as the {@code int} that Commons Math's evaluation limits take. */
    int remaining() {
        return (int) Math.min(Integer.MAX_VALUE, limit - used);
    }

    void add(long evaluations) {
        used += evaluations;
        if (used > limit) {
            throw exceeded();
        }
    }

    CureComputationException exceeded() {
        return new CureComputationException("the " + calculation + " needed more than " + limit + " evaluations");
    }
}
