package dev.dwellwise.thermal;

import static dev.dwellwise.thermal.ScalarDormandPrince.*;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54FieldIntegrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.util.Decimal64;
import org.apache.commons.math3.util.Decimal64Field;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * The lumped model's own Dormand–Prince 5(4): its tableau against Commons Math's, its embedded
 * weights and dense output against the order conditions, and its solutions against closed forms and
 * Commons Math's Dormand–Prince 8(5,3) as an independent reference integration.
 */
@Timeout(10)
class ScalarDormandPrinceTest {

    private static final java.util.function.LongConsumer NO_BUDGET = taken -> { };

    @Test
    void tableauIsCommonsMathsDormandPrince54() {
        DormandPrince54FieldIntegrator<Decimal64> reference =
                new DormandPrince54FieldIntegrator<>(Decimal64Field.getInstance(), 1e-9, 1, 1e-9, 1e-9);
        double[] c = {C2, C3, C4, C5, 1, 1};
        double[][] a = {{A21}, {A31, A32}, {A41, A42, A43}, {A51, A52, A53, A54}, {A61, A62, A63, A64, A65},
                {A71, 0, A73, A74, A75, A76}};
        Decimal64[] refC = reference.getC();
        Decimal64[][] refA = reference.getA();
        Decimal64[] refB = reference.getB();
        for (int i = 0; i < c.length; i++) {
            assertEquals(refC[i].doubleValue(), c[i], 1e-16, "c" + (i + 2));
            for (int j = 0; j < a[i].length; j++) {
                assertEquals(refA[i][j].doubleValue(), a[i][j], 1e-15, "a" + (i + 2) + (j + 1));
            }
        }
        for (int j = 0; j < 6; j++) {
            assertEquals(refB[j].doubleValue(), a[5][j], 1e-16, "b" + (j + 1) + " is the last stage's row");
        }
    }

    @Test
    void embeddedWeightsMeetTheFourthOrderQuadratureConditions() {
        // b* = b − e; quadrature conditions sum b*_i c_i^(q−1) = 1/q for q = 1..4 (Hairer, Nørsett
        // & Wanner I, §II.2, order conditions), and the error weights sum to zero
        double[] c = {0, C2, C3, C4, C5, 1, 1};
        double[] b = {A71, 0, A73, A74, A75, A76, 0};
        double[] e = {E1, 0, E3, E4, E5, E6, E7};
        double sumE = 0;
        for (double v : e) {
            sumE += v;
        }
        assertEquals(0, sumE, 1e-16);
        for (int q = 1; q <= 4; q++) {
            double sum = 0;
            for (int i = 0; i < 7; i++) {
                sum += (b[i] - e[i]) * Math.pow(c[i], q - 1);
            }
            assertEquals(1.0 / q, sum, 1e-14, "embedded weights, condition q=" + q);
        }
    }

    @Test
    void denseOutputIsExactForAQuarticSolution() {
        // y' = 4t³, y(0) = 0: y = t⁴, which the order-4 continuous extension reproduces exactly
        Pieces pieces = new Pieces();
        ScalarDormandPrince dp = new ScalarDormandPrince(1e-12, 1e-12);
        double end = dp.integrate((t, y) -> 4 * t * t * t, 0, 0, 3, (t, y) -> false, pieces, NO_BUDGET);
        assertEquals(3, end, 0);
        for (int i = 0; i <= 300; i++) {
            double t = 0.01 * i;
            assertEquals(Math.pow(t, 4), pieces.valueAt(t), 1e-12 * Math.max(1, Math.pow(t, 4)), "t=" + t);
        }
    }

    @Test
    void followsTheExponentialBetweenAndAtItsSteps() {
        // y' = (T_air − y)/tau: y = T_air − (T_air − y0) exp(−t/tau), the lumped convection closed form
        double tau = 113.3;
        Pieces pieces = new Pieces();
        ScalarDormandPrince dp = new ScalarDormandPrince(LumpedModel.ABSOLUTE_TOLERANCE, LumpedModel.RELATIVE_TOLERANCE);
        dp.integrate((t, y) -> (473.15 - y) / tau, 0, 293.15, 1200, (t, y) -> false, pieces, NO_BUDGET);
        assertTrue(pieces.size() > 5, "takes several steps");
        for (int i = 0; i <= 1200; i++) {
            assertEquals(473.15 - 180 * Math.exp(-i / tau), pieces.valueAt(i), 1e-5, "t=" + i);
        }
    }

    @Test
    void agreesWithCommonsMathsEightOrderIntegratorOnConvectionAndRadiation() {
        // a 1 mm steel sheet, both faces, h = 25, eps = 0.85, air and walls at 220 °C: the lumped balance
        double capacity = 7832 * 434 * 0.001;
        ScalarDormandPrince.Equation f = (t, y) ->
                2 * Physics.surfaceFlux(25, 493.15, 0.85, 493.15, y) / capacity;
        Pieces pieces = new Pieces();
        new ScalarDormandPrince(LumpedModel.ABSOLUTE_TOLERANCE, LumpedModel.RELATIVE_TOLERANCE)
                .integrate(f, 0, 293.15, 600, (t, y) -> false, pieces, NO_BUDGET);
        DormandPrince853Integrator reference = new DormandPrince853Integrator(1e-9, 100, 1e-12, 1e-13);
        FirstOrderDifferentialEquations ode = ScalarOde.of(f::rate);
        double[] y = {293.15};
        double t = 0;
        for (double next = 7.5; next <= 600; next += 7.5) { // off the step ends
            reference.integrate(ode, t, y, next, y);
            t = next;
            assertEquals(y[0], pieces.valueAt(t), 1e-5, "t=" + t);
        }
    }

    @Test
    void endsAtTheFirstStepTheCheckAccepts() {
        Pieces pieces = new Pieces();
        double end = new ScalarDormandPrince(1e-7, 1e-9)
                .integrate((t, y) -> (473.15 - y) / 100, 0, 293.15, 10_000, (t, y) -> y >= 400, pieces, NO_BUDGET);
        assertTrue(pieces.lastValue() >= 400, "the step end passed the threshold");
        assertTrue(pieces.valueAt(pieces.knots()[pieces.size() - 1]) < 400, "and the step before did not");
        assertEquals(end, pieces.end(), 0);
        assertTrue(end < 10_000);
    }

    @Test
    void refusesALimitThatIsNotAFiniteTimeAhead() {
        ScalarDormandPrince dp = new ScalarDormandPrince(1e-7, 1e-9);
        for (double limit : new double[] {Double.POSITIVE_INFINITY, Double.NaN, 100, 50}) {
            assertThrows(IllegalArgumentException.class, () -> dp.integrate((t, y) -> -y, 100, 300, limit,
                    (t, y) -> false, new Pieces(), NO_BUDGET), "limit " + limit);
        }
    }

    @Test
    void refusesAHistoryItCannotResolve() {
        ComputeLimitExceededException e = assertThrows(ComputeLimitExceededException.class,
                () -> new ScalarDormandPrince(1e-7, 1e-9).integrate((t, y) -> Double.NaN, 0, 300, 100,
                        (t, y) -> false, new Pieces(), NO_BUDGET));
        assertEquals(ComputeLimitExceededException.Limit.UNRESOLVED, e.limit());
    }
}
