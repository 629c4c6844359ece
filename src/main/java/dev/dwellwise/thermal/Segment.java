package dev.dwellwise.thermal;

/**
 * Dense output of a back end over one or more accepted steps, [{@link #start()}, {@link #end()}]:
 * the part's temperatures at any instant inside, to the accuracy of the integration.
 */
public interface Segment {

    double start();

    double end();

    /** Times inside the segment where the interpolant changes piece (step boundaries), ascending, ends included. */
    double[] knots();

    Observation at(double t);

    /** Rate of change of the mass-mean temperature, K/s, at {@code t}. */
    double meanRateAt(double t);

    /** As {@link #meanRateAt(double)}, for a caller that already holds the observation {@code at} t. */
    default double meanRateAt(double t, Observation at) {
        return meanRateAt(t);
    }

    /** Through-thickness temperatures at {@code t}, kelvin, at {@link Stepper#profilePositionsM()}. */
    double[] profileAt(double t);
}
