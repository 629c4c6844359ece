package dev.dwellwise.cure;

import dev.dwellwise.thermal.ScalarOde;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * The degree of cure alpha along a path: d(alpha)/dt = r(T(t), alpha) from the kinetics' initial
 * degree, integrated by Commons Math's Dormand–Prince 8(5,3) with error control, restarted at
 * every knot so that no step straddles a change of the path's piece. State: y[0] = alpha.
 * The result is clamped to [0, 1] (an accepted step may overshoot full cure by its error).
 */
public final class DegreeOfCure {

    /** Absolute tolerance on alpha. */
    static final double ABSOLUTE_TOLERANCE = 1e-12;

    /** Relative tolerance on alpha: leaves about 1e-9 on the degree at the end of a long history. */
    static final double RELATIVE_TOLERANCE = 1e-11;

    /**
     * The longest isothermal hold that {@link #secondsToReach} looks for, seconds (about 32 years):
     * beyond any hold a line could give, so a target further away counts as never reached.
     */
    public static final double HOLD_HORIZON_SECONDS = 1e9;

    private DegreeOfCure() {
    }

    /** The degree of cure at the end of the path, 0..1. */
    public static double atEnd(TemperaturePath path, Kinetics kinetics, CureBudget budget) {
        EvaluationCounter counter = new EvaluationCounter(budget, "degree of cure");
        DormandPrince853Integrator integrator = newIntegrator();
        double[] y = {kinetics.initialDegree()};
        for (Piece piece : Piece.of(path)) {
            if (y[0] >= 1) {
                break; // full cure is final: every rate law returns 0 there
            }
            if (isTooShortToIntegrate(piece)) {
                // below Commons Math's smallest interval: one Euler step is exact to rounding there
                y[0] += kinetics.rate(piece.kelvinAt(piece.start()), y[0]) * piece.length();
                counter.add(1);
            } else {
                integrate(integrator, counter, equations(kinetics, piece::kelvinAt), piece.start(), y, piece.end());
            }
        }
        return clamp(y[0]);
    }

    /**
     * Seconds of an isothermal hold at {@code holdK} that take the degree from {@code fromDegree}
     * to {@code targetDegree}, located by an event on the integration; 0 when it is already there,
     * empty when the kinetics do not get there within {@link #HOLD_HORIZON_SECONDS} (for example
     * Kamal–Sourour with k1 = 0 from alpha = 0) or never can (a target of 1 with an order of 1 or
     * more). A target of 1 with an order n below 1 is met tangentially (the rate vanishes there), so
     * that arrival time carries about the degree's tolerance to the power 1 − n, relative.
     */
    public static OptionalDouble secondsToReach(Kinetics kinetics, double holdK, double fromDegree,
                                                double targetDegree, CureBudget budget) {
        if (fromDegree >= targetDegree) {
            return OptionalDouble.of(0);
        }
        if (targetDegree >= 1 && !kinetics.reachesFullCure()) {
            return OptionalDouble.empty(); // the integration would "arrive" where alpha rounds to 1
        }
        EvaluationCounter counter = new EvaluationCounter(budget, "hold estimate for the degree of cure");
        DormandPrince853Integrator integrator = newIntegrator();
        Arrival arrival = new Arrival(targetDegree);
        // alpha only rises, so one sign change of g is all there is: one check interval is enough
        integrator.addEventHandler(arrival, HOLD_HORIZON_SECONDS, 1e-9, 200);
        double[] y = {fromDegree};
        double end = integrate(integrator, counter, equations(kinetics, t -> holdK), 0, y, HOLD_HORIZON_SECONDS);
        return arrival.reached ? OptionalDouble.of(end) : OptionalDouble.empty();
    }

    /** Commons Math refuses an interval within 1e-12 relative of its start (a history cut at an event can leave one). */
    private static boolean isTooShortToIntegrate(Piece piece) {
        return piece.length() <= 1e-12 * Math.max(Math.abs(piece.start()), Math.abs(piece.end()));
    }

    private static DormandPrince853Integrator newIntegrator() {
        // no minimum step (0) and no maximum beyond the span: the evaluation budget bounds the work
        return new DormandPrince853Integrator(0, Double.MAX_VALUE, ABSOLUTE_TOLERANCE, RELATIVE_TOLERANCE);
    }

    private static double integrate(DormandPrince853Integrator integrator, EvaluationCounter counter,
                                    FirstOrderDifferentialEquations equations, double from, double[] y, double to) {
        integrator.setMaxEvaluations(counter.remaining());
        try {
            double end = integrator.integrate(equations, from, y, to, y);
            counter.add(integrator.getEvaluations());
            return end;
        } catch (MaxCountExceededException e) {
            throw counter.exceeded();
        }
    }

    private static FirstOrderDifferentialEquations equations(Kinetics kinetics, DoubleUnaryOperator kelvin) {
        return ScalarOde.of((t, alpha) -> kinetics.rate(kelvin.applyAsDouble(t), alpha));
    }

    private static double clamp(double degree) {
        return Math.max(0, Math.min(1, degree));
    }

    /** Stops the integration where alpha reaches the target. */
    private static final class Arrival implements EventHandler {
        private final double target;
        private boolean reached;

        Arrival(double target) {
            this.target = target;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            reached = false;
        }

        @Override
        public double g(double t, double[] y) {
            return y[0] - target;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            reached = true;
            return Action.STOP;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }
}
