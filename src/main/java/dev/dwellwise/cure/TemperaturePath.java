package dev.dwellwise.cure;

import dev.dwellwise.thermal.DenseHistory;
import dev.dwellwise.thermal.Observation;
import java.util.function.DoubleUnaryOperator;

/**
 * A temperature history at one point of the part, the input of every cure calculation: a function
 * of time over [first knot, last knot] that is smooth between its knots.
 *
 * <p>The calculators work piece by piece between consecutive knots, so no quadrature rule or
 * integration step straddles a knot, and they read each piece from inside it: a path may change
 * its formula at a knot, or even jump there (a step profile), and each side is used for its own
 * piece.
 */
public interface TemperaturePath {

    /**
     * The times where the path changes piece, strictly ascending; the first is the start and the
     * last the end. Fewer than two knots make a path of no duration.
     */
    double[] knots();

    /** The temperature at time {@code t}, kelvin. */
    double kelvinAt(double t);

    /** The coldest point of a computed history: under-cure is judged here. */
    static TemperaturePath coldestOf(DenseHistory history) {
        return new HistoryPath(history, Observation::coldestK);
    }

    /** The hottest point of a computed history: over-bake is judged here. */
    static TemperaturePath hottestOf(DenseHistory history) {
        return new HistoryPath(history, Observation::hottestK);
    }

    /** A path given by a function of time (kelvin) and its knots (strictly ascending). */
    static TemperaturePath of(DoubleUnaryOperator kelvin, double... knots) {
        return new FunctionPath(kelvin, knots);
    }
}
