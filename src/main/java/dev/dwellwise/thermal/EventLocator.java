package dev.dwellwise.thermal;

import java.util.function.DoubleUnaryOperator;
import java.util.function.IntToDoubleFunction;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * Root finding and maximisation on dense output: events are placed where the interpolant crosses
 * the threshold, to {@link #TIME_ACCURACY} seconds, never rounded to a step end.
 */
final class EventLocator {

    /**
     * Absolute accuracy of an event time, seconds: far inside the 0.05 s target. The solvers also stop
     * where |g| is within 1e-14, which on a crossing as shallow as a settle-band entry (about 1e-7 K/s)
     * places it to about 1e-7 s instead.
     */
    static final double TIME_ACCURACY = 1e-9;

    private EventLocator() {
    }

    /** The root of g in [a, b], where g(a) and g(b) differ in sign (or one is zero). */
    static double root(DoubleUnaryOperator g, double a, double b) {
        double ga = g.applyAsDouble(a);
        double gb = g.applyAsDouble(b);
        if (ga == 0) {
            return a;
        }
        if (gb == 0) {
            return b;
        }
        return solver().solve(200, g::applyAsDouble, a, b);
    }

    /**
     * A root of g in [a, b], where g(a) > 0 >= g(b), on the side of b: g there is at most zero, so
     * the caller may rely on the condition that g &lt;= 0 describes.
     */
    static double rootAtOrAfter(DoubleUnaryOperator g, double a, double b) {
        if (g.applyAsDouble(b) == 0) {
            return b;
        }
        return solver().solve(200, g::applyAsDouble, a, b, AllowedSolution.RIGHT_SIDE);
    }

    /** A fresh solver per root: it counts its evaluations, and solves run in parallel. */
    private static BracketingNthOrderBrentSolver solver() {
        return new BracketingNthOrderBrentSolver(1e-15, TIME_ACCURACY, 1e-14, 5);
    }

    /**
     * The first time at which g rises from negative to zero or above, between consecutive scan
     * points; NaN when it stays negative. The first scan point is the segment start, where g is
     * known to be negative (the caller checked the condition there). {@code atScan} gives g at the
     * i-th scan point, already read; g itself is evaluated only to refine a crossing.
     */
    static double firstRise(DoubleUnaryOperator g, double[] scan, IntToDoubleFunction atScan) {
        double previous = atScan.applyAsDouble(0);
        for (int i = 1; i < scan.length; i++) {
            double current = atScan.applyAsDouble(i);
            if (previous < 0 && current >= 0) {
                return root(g, scan[i - 1], scan[i]);
            }
            if (previous >= 0) {
                return scan[i - 1];
            }
            previous = current;
        }
        return Double.NaN;
    }

    /** The largest value of f on [a, b]. */
    static double maximum(DoubleUnaryOperator f, double a, double b) {
        BrentOptimizer optimizer = new BrentOptimizer(1e-12, 1e-9);
        double best = optimizer.optimize(new MaxEval(200), new UnivariateObjectiveFunction(f::applyAsDouble),
                GoalType.MAXIMIZE, new SearchInterval(a, b)).getValue();
        return Math.max(best, Math.max(f.applyAsDouble(a), f.applyAsDouble(b)));
    }
}
