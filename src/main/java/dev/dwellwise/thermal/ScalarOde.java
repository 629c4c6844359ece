package dev.dwellwise.thermal;

import java.util.function.DoubleBinaryOperator;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;

/**
 * One equation dy/dt = f(t, y) in the form Commons Math's integrators take: the degree-of-cure
 * kinetics, and the tests' reference runs of the thermal balance.
 */
public final class ScalarOde {

    private ScalarOde() {
    }

    /** {@code rate} applied as (t, y). */
    public static FirstOrderDifferentialEquations of(DoubleBinaryOperator rate) {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] yDot) {
                yDot[0] = rate.applyAsDouble(t, y[0]);
            }
        };
    }
}
