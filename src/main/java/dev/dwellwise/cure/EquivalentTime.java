package dev.dwellwise.cure;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * Arrhenius equivalent time at a reference temperature along a path,
 * t_eq = ∫ exp[(E/R)(1/T_ref − 1/T(t))] dt: the equivalent-age form of ASTM C1074 (Freiesleben
 * Hansen and Pedersen, 1977), used for thermosets with T_ref the coating's nominal cure
 * temperature. For separable kinetics with one activation energy E the degree of cure is a
 * function of t_eq alone, whatever the shape of the history.
 *
 * <p>Each piece between knots is integrated by Commons Math's {@link IterativeLegendreGaussIntegrator}
 * ({@link #POINTS}-point Gauss–Legendre, sub-intervals multiplied until two successive estimates
 * agree to {@link #RELATIVE_ACCURACY}); inside a piece the history is one smooth interpolant, so a
 * few iterations suffice.
 */
public final class EquivalentTime {

    /** Gauss–Legendre points per sub-interval. */
    static final int POINTS = 5;

    /**
     * Relative agreement of successive estimates per piece: two orders inside the 1e-6 relative
     * the figure is quoted to, so the pieces' errors cannot add up to it.
     */
    static final double RELATIVE_ACCURACY = 1e-10;

    /** Absolute accuracy, seconds: only matters for pieces worth almost nothing at T_ref. */
    static final double ABSOLUTE_ACCURACY = 1e-12;

    /** Refinements per piece; a smooth piece needs three or four. */
    static final int MAX_ITERATIONS = 60;

    private EquivalentTime() {
    }

    /** Equivalent seconds at {@code referenceK} along the path, for activation energy E in J/mol. */
    public static double seconds(TemperaturePath path, double referenceK, double activationEnergyJPerMol,
                                 CureBudget budget) {
        EvaluationCounter counter = new EvaluationCounter(budget, "equivalent time");
        IterativeLegendreGaussIntegrator integrator =
                new IterativeLegendreGaussIntegrator(POINTS, RELATIVE_ACCURACY, ABSOLUTE_ACCURACY, 2, MAX_ITERATIONS);
        double total = 0;
        for (Piece piece : Piece.of(path)) {
            try {
                total += integrator.integrate(counter.remaining(),
                        t -> Arrhenius.equivalenceFactor(activationEnergyJPerMol, referenceK, piece.kelvinAt(t)),
                        piece.start(), piece.end());
            } catch (TooManyEvaluationsException e) {
                throw counter.exceeded();
            } catch (MaxCountExceededException e) {
                throw new CureComputationException("the equivalent time did not converge on the piece ["
                        + piece.start() + ", " + piece.end() + "] s");
            }
            counter.add(integrator.getEvaluations());
        }
        return total;
    }
}
