package dev.dwellwise.cure;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Cumulative time at or above a temperature, the trade's simplest cure condition ("ten minutes at
 * 180 °C metal temperature").
 *
 * @param kelvin     the temperature, kelvin
 * @param minSeconds the least time at or above it for a full cure, seconds
 * @param maxSeconds the most before over-bake, seconds, if the coating has such a limit
 */
public record TimeAboveSpec(double kelvin, double minSeconds, OptionalDouble maxSeconds) {

    public TimeAboveSpec {
        Objects.requireNonNull(maxSeconds, "maxSeconds");
    }
}
