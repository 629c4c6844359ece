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

    /**
     * Whether alpha = 1 is reached in finite time: with (1 − alpha)^n, only for an order n below 1;
     * from n = 1 up, full cure is approached but never reached (a computed alpha of 1 is rounding).
     */
    boolean reachesFullCure();
}
