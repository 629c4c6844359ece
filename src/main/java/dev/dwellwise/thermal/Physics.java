package dev.dwellwise.thermal;

/** Physical constants and the surface exchange laws shared by every back end. */
public final class Physics {

    /** Stefan–Boltzmann constant, W/(m²·K⁴), CODATA 2018 (exact in the 2019 SI). */
    public static final double STEFAN_BOLTZMANN = 5.670374419e-8;

    /** Offset between the Celsius and kelvin scales. */
    public static final double KELVIN_OFFSET = 273.15;

    private Physics() {
    }

    public static double toKelvin(double celsius) {
        return celsius + KELVIN_OFFSET;
    }

    public static double toCelsius(double kelvin) {
        return kelvin - KELVIN_OFFSET;
    }

    /**
     * Heat flux into a surface at {@code surfaceK}, W/m²: convection from air at {@code airK} plus
     * grey-body radiation exchange with large surroundings at {@code surroundingsK}.
     */
    public static double surfaceFlux(double h, double airK, double emissivity, double surroundingsK,
                                     double surfaceK) {
        double s2 = surfaceK * surfaceK;
        double r2 = surroundingsK * surroundingsK;
        return h * (airK - surfaceK) + emissivity * STEFAN_BOLTZMANN * (r2 * r2 - s2 * s2);
    }

    /** Derivative of {@link #surfaceFlux} with respect to the surface temperature, W/(m²·K). */
    public static double surfaceFluxSlope(double h, double emissivity, double surfaceK) {
        return -h - 4 * emissivity * STEFAN_BOLTZMANN * surfaceK * surfaceK * surfaceK;
    }

    /** Linearised radiation coefficient h_r = eps sigma (T + T_sur)(T² + T_sur²), W/(m²·K). */
    public static double radiationCoefficient(double emissivity, double surfaceK, double surroundingsK) {
        return emissivity * STEFAN_BOLTZMANN * (surfaceK + surroundingsK)
                * (surfaceK * surfaceK + surroundingsK * surroundingsK);
    }
}
