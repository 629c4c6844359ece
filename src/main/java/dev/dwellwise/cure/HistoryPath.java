package dev.dwellwise.cure;

import dev.dwellwise.thermal.DenseHistory;
import dev.dwellwise.thermal.Observation;
import java.util.function.ToDoubleFunction;

/** One point of a {@link DenseHistory} (its coldest or its hottest) as a {@link TemperaturePath}. */
final class HistoryPath implements TemperaturePath {

    private final DenseHistory history;
    private final ToDoubleFunction<Observation> point;
    private final double[] knots;

    HistoryPath(DenseHistory history, ToDoubleFunction<Observation> point) {
        this.history = history;
        this.point = point;
        this.knots = history.knots();
    }

    @Override
    public double[] knots() {
        return knots.clone();
    }

    @Override
    public double kelvinAt(double t) {
        return point.applyAsDouble(history.at(t));
    }
}
