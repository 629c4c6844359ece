package dev.dwellwise.job;

/**
 * What the result carries.
 *
 * @param sampleSeconds  spacing of the series samples, s (default 10)
 * @param series         whether the series is included (default true)
 * @param profiles       through-thickness profiles at chosen times (optional)
 */
public record Output(Double sampleSeconds, Boolean series, ProfileRequest profiles) {

    public static final double DEFAULT_SAMPLE_SECONDS = 10;
    public static final Output DEFAULTS = new Output(DEFAULT_SAMPLE_SECONDS, true, null);

    Output withDefaults() {
        return new Output(sampleSeconds == null ? DEFAULT_SAMPLE_SECONDS : sampleSeconds,
                series == null ? Boolean.TRUE : series, profiles);
    }

    /** Times at which through-thickness temperature profiles are wanted. */
    public record ProfileRequest(java.util.List<Double> timesSeconds) {
        public ProfileRequest {
            timesSeconds = WireLists.copy(timesSeconds);
        }
    }
}
