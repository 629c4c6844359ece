package dev.dwellwise.job;

/**
 * Limits the history is judged against; a check whose limit is not given is left out.
 *
 * @param maxPartTemperatureC    the hottest point must stay at or below this, °C
 * @param handlingTemperatureC   the hottest point at the end of the last stage must be at or below this, °C
 * @param maxHeatingRateCPerMin  the mass-mean temperature must rise no faster than this, °C/min
 */
public record Limits(Double maxPartTemperatureC, Double handlingTemperatureC, Double maxHeatingRateCPerMin) {

    public static final Limits NONE = new Limits(null, null, null);
}
