package dev.dwellwise.cure;

import java.util.Objects;
import java.util.function.DoubleUnaryOperator;

/** A {@link TemperaturePath} given as a function of time and its knots. */
record FunctionPath(DoubleUnaryOperator kelvin, double[] knots) implements TemperaturePath {

    FunctionPath {
        Objects.requireNonNull(kelvin, "kelvin");
        knots = knots.clone();
        for (int i = 1; i < knots.length; i++) {
            if (!(knots[i] > knots[i - 1])) {
                throw new IllegalArgumentException("knots must be strictly ascending: " + knots[i - 1]
                        + " then " + knots[i]);
            }
        }
    }

    @Override
    public double[] knots() {
        return knots.clone();
    }

    @Override
    public double kelvinAt(double t) {
        return kelvin.applyAsDouble(t);
    }
}
