package dev.dwellwise.thermal;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

/**
 * A part settled at its steady temperature under fixed surroundings: uniform at {@code kelvin} from
 * {@code start} to {@code end}, its mean changing at the (residual) {@code rate}. Read exactly at
 * that temperature, so that a condition at it is met on every reading.
 *
 * @param profilePoints how many points a profile has ({@link Stepper#profilePositionsM()})
 */
record SettledSegment(double start, double end, double kelvin, double rate, int profilePoints) implements Segment {

    /**
     * The temperature a part in {@code stage} may settle at under {@code stop}, or NaN where it may
     * not: under a ramp, or where the steady temperature strictly meets the stop condition (a hold
     * temperature a hair below the oven's), whose crossing must be found by integrating. A condition
     * at the steady temperature itself ("above 200 °C" in a 200 °C oven) is met only in the limit:
     * integrating on, the part would meet it wherever rounding first put it there, after as many
     * steps as a stiff part takes. So the part settles, and the condition is met where it does, for
     * the stage's check and the cure figures alike (both count "at or above").
     *
     * @param meanK the part's mean temperature now: the steady one where no heat is exchanged at all
     */
    static double steadyK(StageConditions stage, double emissivity, double meanK, StopSignal stop) {
        if (stage.airStartK() != stage.airEndK() || stage.surroundingsStartK() != stage.surroundingsEndK()) {
            return Double.NaN;
        }
        double steadyK = SteadyState.of(stage, emissivity, meanK);
        return stop == StopSignal.NONE || stop.value(Observation.uniform(steadyK)) <= 0 ? steadyK : Double.NaN;
    }

    /** Whether {@code kelvin} is within the settle band of {@code steadyK} (never for NaN). */
    static boolean within(double kelvin, double steadyK) {
        return Math.abs(kelvin - steadyK) <= LumpedModel.settleBandK(steadyK);
    }

    /** Whether every one of {@code cells} is within the settle band of {@code steadyK} (never for NaN). */
    static boolean within(double[] cells, double steadyK) {
        return deviationK(cells, steadyK) <= LumpedModel.settleBandK(steadyK);
    }

    /** The largest distance of {@code cells} from {@code steadyK}, kelvin; NaN for NaN. */
    static double deviationK(double[] cells, double steadyK) {
        double largest = 0;
        for (double k : cells) {
            largest = Math.max(largest, Math.abs(k - steadyK));
        }
        return largest;
    }

    /**
     * Where a part that is outside the settle band at {@code from} and within it at {@code to} comes
     * within it: a time in (from, to] at which {@code deviationK}, the largest distance of the part's
     * temperatures from {@code steadyK}, is at most the band. A stepper ends its step there and settles:
     * the part then settles where it enters the band, wherever its last step happened to end (a step
     * near the steady temperature can span several time constants).
     */
    static double bandEntry(DoubleUnaryOperator deviationK, double from, double to, double steadyK) {
        double band = LumpedModel.settleBandK(steadyK);
        return EventLocator.rootAtOrAfter(t -> deviationK.applyAsDouble(t) - band, from, to);
    }

    @Override
    public double[] knots() {
        return new double[] {start, end};
    }

    @Override
    public Observation at(double time) {
        return Observation.uniform(kelvin);
    }

    @Override
    public double meanRateAt(double time) {
        return rate;
    }

    @Override
    public double[] profileAt(double time) {
        double[] profile = new double[profilePoints];
        Arrays.fill(profile, kelvin);
        return profile;
    }
}
