package dev.dwellwise.thermal;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;

/** One equation dy/dt = f(t, y) in the form Commons Math's integrators take: the tests' reference runs. */
final class ScalarOde {

    private ScalarOde() {
    }

    static FirstOrderDifferentialEquations of(ScalarDormandPrince.Equation f) {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] yDot) {
                yDot[0] = f.rate(t, y[0]);
            }
        };
    }
}
