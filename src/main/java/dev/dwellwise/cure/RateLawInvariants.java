package dev.dwellwise.cure;

/** The invariants every {@link Kinetics} shares: a degree in [0, 1] and no negative parameter. */
final class RateLawInvariants {

    private RateLawInvariants() {
    }

    /** A negative pre-exponential, energy or exponent would make the rate law meaningless. */
    static void require(double initialDegree, double... nonNegative) {
        if (!(initialDegree >= 0 && initialDegree <= 1)) {
            throw new IllegalArgumentException("initialDegree must lie in [0, 1]: " + initialDegree);
        }
        for (double p : nonNegative) {
            if (!(p >= 0)) {
                throw new IllegalArgumentException("rate-law parameters must be non-negative: " + p);
            }
        }
    }
}
