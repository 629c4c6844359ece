package dev.dwellwise.cure;

import static dev.dwellwise.cure.Paths.kelvin;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * Degree of cure with Kamal–Sourour kinetics, d(alpha)/dt = (k1 + k2 alpha^m)(1 − alpha)^n
 * (Sourour and Kamal, Thermochim. Acta 14 (1976) 41 [F]), against a classical fourth-order
 * Runge–Kutta integration with a fixed small step written here.
 *
 * <p>Invented parameters, with activation energies of the bisphenol-F/anhydride system quoted in
 * REFERENCES.md section 7 (E1 = 89.1, E2 = 68.8 kJ/mol [F]); pre-exponentials chosen so that the
 * path below cures to about 0.78.
 */
class KamalSourourKineticsTest {

    private static final CureBudget BUDGET = CureBudget.standard();

    /** A ramp from 300 K to 450 K over 600 s, then a hold to 1800 s; the ramp end is a knot. */
    private static final double FROM_K = 300;
    private static final double TO_K = 450;
    private static final double RAMP = 600;
    private static final double END = 1800;

    /**
     * The reference's step, 0.05 s: it divides the ramp length, so no step straddles the kink.
     * Halving it changes the reference by under 1e-13; the adaptive integrator is held to 1e-9.
     */
    private static final double RK4_STEP = 0.05;
    private static final double INTEGRATION = 1e-9;

    private static KamalSourourKinetics kinetics(double a1, double initialDegree) {
        return new KamalSourourKinetics(a1, 89.1e3, 3.0e5, 68.8e3, 0.5, 1.7, initialDegree);
    }

    @Test
    void theDegreeAlongARampAndHoldMatchesAFineStepRungeKuttaIntegration() {
        KamalSourourKinetics kinetics = kinetics(2.2e6, 0);
        double reference = rungeKutta4(kinetics, t -> Paths.rampAndHoldAt(FROM_K, TO_K, RAMP, t), END, RK4_STEP);
        double computed = DegreeOfCure.atEnd(Paths.rampAndHold(FROM_K, TO_K, RAMP, END), kinetics, BUDGET);
        assertEquals(reference, computed, INTEGRATION);
        // not a reference value: a guard that the invented case stays the partial cure it was chosen
        // to be, where both terms of the rate matter and a wrong exponent shows
        assertEquals(0.78, computed, 0.01);
    }

    @Test
    void withoutTheNonCatalyticTermAnUnseededResinStaysUncured() {
        // REFERENCES.md section 7, modelling note: with k1 = 0 the rate vanishes at alpha = 0, here
        // (0 + k2 0^m)(1 - 0)^n = 0 exactly, so alpha stays exactly 0.
        assertEquals(0.0, DegreeOfCure.atEnd(Paths.rampAndHold(FROM_K, TO_K, RAMP, END), kinetics(0, 0), BUDGET));
    }

    @Test
    void withoutTheNonCatalyticTermASeededResinCuresAsTheReferenceDoes() {
        // The caller's seed alpha0 = 1e-6 (REFERENCES.md section 7, modelling note) lets the autocatalysis start.
        KamalSourourKinetics kinetics = kinetics(0, 1e-6);
        double reference = rungeKutta4(kinetics, t -> Paths.rampAndHoldAt(FROM_K, TO_K, RAMP, t), END, RK4_STEP);
        assertEquals(reference, DegreeOfCure.atEnd(Paths.rampAndHold(FROM_K, TO_K, RAMP, END), kinetics, BUDGET),
                INTEGRATION);
    }

    @Test
    void withoutTheAutocatalyticTermItIsNthOrder() {
        // k2 = 0 leaves d(alpha)/dt = k1 (1 - alpha)^n: the isothermal closed form of REFERENCES.md section 7 [C].
        KamalSourourKinetics kinetics = new KamalSourourKinetics(2.2e6, 89.1e3, 0, 68.8e3, 0.5, 1.7, 0);
        double k1 = Arrhenius.rateConstant(2.2e6, 89.1e3, kelvin(190));
        double t = 2 / k1;
        double exact = 1 - Math.pow(1 + 0.7 * k1 * t, -1 / 0.7);
        assertEquals(exact, DegreeOfCure.atEnd(Paths.constant(kelvin(190), t), kinetics, BUDGET), INTEGRATION);
    }

    /** Classical RK4 with a fixed step from the kinetics' initial degree over [0, end]. */
    private static double rungeKutta4(Kinetics kinetics, DoubleUnaryOperator kelvin, double end, double h) {
        long steps = Math.round(end / h);
        double y = kinetics.initialDegree();
        for (long i = 0; i < steps; i++) {
            double t = i * h;
            double k1 = kinetics.rate(kelvin.applyAsDouble(t), y);
            double k2 = kinetics.rate(kelvin.applyAsDouble(t + h / 2), y + h / 2 * k1);
            double k3 = kinetics.rate(kelvin.applyAsDouble(t + h / 2), y + h / 2 * k2);
            double k4 = kinetics.rate(kelvin.applyAsDouble(t + h), y + h * k3);
            y += h / 6 * (k1 + 2 * k2 + 2 * k3 + k4);
        }
        return y;
    }
}
