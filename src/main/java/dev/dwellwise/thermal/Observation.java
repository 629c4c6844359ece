package dev.dwellwise.thermal;

/**
 * The temperatures of the part at one instant, kelvin. For the lumped model all five are equal.
 *
 * @param meanK    mass-weighted mean temperature
 * @param surfaceK front-face temperature
 * @param coreK    mid-plane (two exposed faces) or back face (one)
 * @param coldestK the coldest point anywhere in the part
 * @param hottestK the hottest point anywhere in the part
 */
public record Observation(double meanK, double surfaceK, double coreK, double coldestK, double hottestK) {

    public static Observation uniform(double k) {
        return new Observation(k, k, k, k, k);
    }
}
