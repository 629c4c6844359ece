package dev.dwellwise.job;

/**
 * One stage of the schedule: an oven zone, a hold, a conveyor section or a cooling zone.
 *
 * @param name                         a name for reports (default {@code stage N})
 * @param airTemperatureC              air temperature, °C (required)
 * @param airEndTemperatureC           air temperature at the end of a {@code seconds} stage: a linear ramp
 * @param convectionWPerM2K            convection coefficient, W/(m²·K) (required)
 * @param surroundingsTemperatureC     radiant surroundings, °C (default: the air's, ramping with it)
 * @param surroundingsEndTemperatureC  surroundings at the end of a ramp (with surroundingsTemperatureC)
 * @param until                        the end condition (required)
 * @param maxSeconds                   the longest the stage may last (default 86,400 s, or a timed stage's own seconds where longer)
 */
public record Stage(String name, Double airTemperatureC, Double airEndTemperatureC, Double convectionWPerM2K,
                    Double surroundingsTemperatureC, Double surroundingsEndTemperatureC, Until until,
                    Double maxSeconds) {

    public static final double DEFAULT_MAX_SECONDS = 86_400;

    Stage withDefaults() {
        // surroundings left out follow the air, its ramp included: spelt out, so that a job that
        // writes them as the air's hashes the same as one that leaves them out
        boolean followAir = surroundingsTemperatureC == null;
        return new Stage(name, airTemperatureC, airEndTemperatureC, convectionWPerM2K,
                followAir ? airTemperatureC : surroundingsTemperatureC,
                followAir ? airEndTemperatureC : surroundingsEndTemperatureC,
                until, maxSeconds == null ? defaultMaxSeconds() : maxSeconds);
    }

    private double defaultMaxSeconds() {
        // a fixed-duration stage is bounded by its own duration
        return until != null && until.seconds() != null ? Math.max(until.seconds(), DEFAULT_MAX_SECONDS)
                : DEFAULT_MAX_SECONDS;
    }
}
