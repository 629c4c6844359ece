package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/** The slope and integral of a property table, which the slab's Newton iteration and enthalpy use. */
class PropertyCurveTest {

    /** AISI 1010 specific heat at 300, 400, 600, 800 K: REFERENCES.md section 4 (Incropera Table A.1 [M]). */
    private static final PropertyCurve CP = PropertyCurve.table(new double[] {300, 400, 600, 800},
            new double[] {434, 487, 559, 685});

    @Test
    void slopeIsThatOfThePieceAboveAndZeroBeyondTheTable() {
        assertEquals(0.53, CP.slopeAt(350), 1e-12);
        assertEquals(0.36, CP.slopeAt(400), 1e-12, "at a table point: the piece above");
        assertEquals(0.63, CP.slopeAt(799.9), 1e-12);
        assertEquals(0, CP.slopeAt(250));
        assertEquals(0, CP.slopeAt(800));
        assertEquals(0, PropertyCurve.constant(434).slopeAt(500));
    }

    @Test
    void integralIsExactForThePiecewiseLinearCurve() {
        // By hand: 50 K flat at 434 below the table, then trapezoids 300-400 K (100 * (434 + 487) / 2)
        // and 400-500 K (100 * (487 + 523) / 2, c(500 K) = 487 + 0.36 * 100).
        assertEquals(50 * 434 + 46050 + 50500, CP.integral(250, 500), 1e-9);
        assertEquals(-CP.integral(250, 500), CP.integral(500, 250), 1e-9);
        assertEquals(434 * 12.5, PropertyCurve.constant(434).integral(300, 312.5), 1e-12);
        // Against Gauss-Legendre quadrature piece by piece (exact for linear pieces).
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(2, 1e-14, 1e-12);
        double[] cuts = {280, 300, 400, 600, 800, 900};
        double sum = 0;
        for (int i = 0; i + 1 < cuts.length; i++) {
            sum += gauss.integrate(100, CP::at, cuts[i], cuts[i + 1]);
        }
        assertEquals(sum, CP.integral(280, 900), 1e-8);
    }

    @Test
    void aWeightedSumIsTheSumOfTheWeightedCurvesEverywhere() {
        // two tables on different points, one sharing a point, and a constant: the sum must be exact
        // at and between every table point and flat beyond (the definition, evaluated term by term).
        // The inputs only need to differ: steel's c from Incropera Table A.1, AISI 1010 [M]; the
        // coating's and the constant invented.
        PropertyCurve steel = PropertyCurve.table(new double[] {300, 400, 600}, new double[] {434, 487, 559});
        PropertyCurve coating = PropertyCurve.table(new double[] {250, 400, 500}, new double[] {1100, 1500, 1700});
        PropertyCurve constant = PropertyCurve.constant(900);
        PropertyCurve[] curves = {steel, coating, constant};
        double[] weights = {9.4, 0.12, 0.5};
        PropertyCurve sum = PropertyCurve.weightedSum(curves, weights);
        for (double t = 100; t <= 800; t += 2.5) {
            double expected = 9.4 * steel.at(t) + 0.12 * coating.at(t) + 0.5 * constant.at(t);
            assertEquals(expected, sum.at(t), 1e-9 * expected, "at " + t + " K");
        }
        PropertyCurve constants = PropertyCurve.weightedSum(new PropertyCurve[] {constant, constant}, new double[] {1, 2});
        assertEquals(2700, constants.at(123), 1e-9);
        assertEquals(true, constants.isConstant());
    }
}
