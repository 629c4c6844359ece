package dev.dwellwise.cure;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * Cumulative time at or above a temperature along a path: the measure of {t : T(t) ≥ T_c}.
 *
 * <p>Each piece between knots is scanned at {@link #SCAN_INTERVALS} equal sub-intervals; where the
 * sign of T − T_c changes between two scan points, the crossing is located by Commons Math's
 * {@link BracketingNthOrderBrentSolver} to {@link #TIME_ACCURACY}, never rounded to a scan point or
 * a knot. A dip below and back within one sub-interval (a fraction of one integration step of the
 * history) would go unseen; the thermal solver's step control keeps such spans far below the
 * accuracy of the history itself.
 */
public final class TimeAbove {

    /** Sub-intervals scanned per piece: twice the thermal solver's own event scan. */
    static final int SCAN_INTERVALS = 4;

    /** Absolute accuracy of a crossing time, seconds. */
    static final double TIME_ACCURACY = 1e-9;

    private TimeAbove() {
    }

    /** Seconds at or above {@code kelvin} along the path. */
    public static double seconds(TemperaturePath path, double kelvin, CureBudget budget) {
        EvaluationCounter counter = new EvaluationCounter(budget, "time above " + kelvin + " K");
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-14, TIME_ACCURACY, 0, 5);
        double total = 0;
        for (Piece piece : Piece.of(path)) {
            total += secondsAbove(piece, kelvin, solver, counter);
        }
        return total;
    }

    private static double secondsAbove(Piece piece, double kelvin, BracketingNthOrderBrentSolver solver,
                                       EvaluationCounter counter) {
        UnivariateFunction excess = t -> piece.kelvinAt(t) - kelvin;
        double total = 0;
        double p = piece.start();
        double gp = excess.value(p);
        counter.add(1);
        for (int i = 1; i <= SCAN_INTERVALS; i++) {
            double q = i == SCAN_INTERVALS ? piece.end() : piece.start() + piece.length() * i / SCAN_INTERVALS;
            double gq = excess.value(q);
            counter.add(1);
            if (gp >= 0 && gq >= 0) {
                total += q - p;
            } else if (gp >= 0) {
                total += crossing(solver, excess, p, q, counter) - p;
            } else if (gq >= 0) {
                total += q - crossing(solver, excess, p, q, counter);
            }
            p = q;
            gp = gq;
        }
        return total;
    }

    private static double crossing(BracketingNthOrderBrentSolver solver, UnivariateFunction excess,
                                   double p, double q, EvaluationCounter counter) {
        try {
            double root = solver.solve(counter.remaining(), excess, p, q);
            counter.add(solver.getEvaluations());
            return root;
        } catch (TooManyEvaluationsException e) {
            throw counter.exceeded();
        }
    }
}
