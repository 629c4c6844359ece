package dev.dwellwise.cure;

/**
 * A cure rate law d(alpha)/dt = r(T, alpha) for the degree of cure alpha in [0, 1].
 *
 * <p>Every law here carries the factor (1 − alpha)^n and returns 0 once alpha reaches 1, so full
 * cure is final: an order n &lt; 1 reaches it in finite time and then stays there, without the
 * NaN that a negative base raised to a fractional power would give.
 */
public sealed interface Kinetics permits NthOrderKinetics, KamalSourourKinetics {

    /** d(alpha)/dt at temperature {@code kelvin} and degree {@code degree}, 1/s; never negative. */
    double rate(double kelvin, double degree);

    /** The degree of cure at the start of the history, 0..1. */
    double initialDegree();

    /** Checks the invariants every rate law shares: the degree in [0, 1] and non-negative parameters. */
    static void requireValid(double initialDegree, double... nonNegative) {
        if (!(initialDegree >= 0 && initialDegree <= 1)) {
            throw new IllegalArgumentException("initialDegree must lie in [0, 1]: " + initialDegree);
        }
        for (double p : nonNegative) {
            if (!(p >= 0)) {
                throw new IllegalArgumentException("rate parameters must be finite and non-negative: " + p);
            }
        }
    }
}
