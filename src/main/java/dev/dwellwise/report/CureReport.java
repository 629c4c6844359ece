package dev.dwellwise.report;

import dev.dwellwise.cure.CureFigures;
import dev.dwellwise.cure.CureResult;
import dev.dwellwise.thermal.Physics;
import java.util.OptionalDouble;

/**
 * The cure figures of the answer at the coldest and the hottest point of the part (equal for the
 * lumped model), rounded as reported; the cure checks judge these same numbers.
 *
 * @param coldest where under-cure is judged
 * @param hottest where over-bake is judged
 */
public record CureReport(Point coldest, Point hottest) {

    static CureReport of(CureResult result) {
        return new CureReport(Point.of(result.coldest()), Point.of(result.hottest()));
    }

    /**
     * The figures along one point's history; each is present exactly when the cure spec asks for it.
     *
     * @param timeAboveSeconds  seconds at or above the time-above temperature, over the whole history
     * @param equivalentSeconds equivalent seconds at the reference temperature, over the whole history
     * @param degree            degree of cure at the end of the history, 0..1 (6 decimals)
     * @param glassTransitionC  glass transition at that degree, °C
     */
    public record Point(Double timeAboveSeconds, Double equivalentSeconds, Double degree, Double glassTransitionC) {

        static Point of(CureFigures f) {
            return new Point(seconds(f.timeAboveSeconds()), seconds(f.equivalentSeconds()),
                    f.degree().isPresent() ? Rounding.fixed(f.degree().getAsDouble(), 6) : null,
                    f.glassTransitionK().isPresent()
                            ? Rounding.temperature(Physics.toCelsius(f.glassTransitionK().getAsDouble())) : null);
        }

        private static Double seconds(OptionalDouble value) {
            return value.isPresent() ? Rounding.seconds(value.getAsDouble()) : null;
        }
    }
}
