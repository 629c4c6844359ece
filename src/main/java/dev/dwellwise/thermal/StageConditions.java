package dev.dwellwise.thermal;

/**
 * The surroundings of the part during one stage. Air and radiant surroundings may ramp linearly
 * from their start to their end value over {@code boundSeconds}; for a stage without a ramp the
 * start and end values are equal.
 *
 * @param name             the stage's name, for reports
 * @param airStartK        air temperature at the stage start, kelvin
 * @param airEndK          air temperature at the stage bound, kelvin
 * @param surroundingsStartK radiant surroundings at the stage start, kelvin
 * @param surroundingsEndK radiant surroundings at the stage bound, kelvin
 * @param convection       convection coefficient h, W/(m²·K)
 * @param end              the end condition
 * @param boundSeconds     the longest the stage may last: its duration, or its maxSeconds
 */
public record StageConditions(String name, double airStartK, double airEndK, double surroundingsStartK,
                              double surroundingsEndK, double convection, EndCondition end,
                              double boundSeconds) {

    /** Air temperature at {@code elapsed} seconds into the stage, kelvin. */
    public double airK(double elapsed) {
        return ramp(airStartK, airEndK, elapsed);
    }

    /** Surroundings temperature at {@code elapsed} seconds into the stage, kelvin. */
    public double surroundingsK(double elapsed) {
        return ramp(surroundingsStartK, surroundingsEndK, elapsed);
    }

    private double ramp(double start, double end, double elapsed) {
        if (start == end || boundSeconds <= 0) {
            return start;
        }
        double f = Math.min(1.0, Math.max(0.0, elapsed / boundSeconds));
        return start + f * (end - start);
    }
}
