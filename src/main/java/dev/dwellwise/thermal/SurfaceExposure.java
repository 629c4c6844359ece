package dev.dwellwise.thermal;

/**
 * What an exposed face of the slab sees during one stage: the stage's air and radiant surroundings,
 * which may ramp with the time elapsed since the stage started, and the part's emissivity.
 *
 * @param stage             the stage's conditions
 * @param stageStartSeconds when the stage started, seconds on the one clock
 * @param emissivity        the face's emissivity
 */
record SurfaceExposure(StageConditions stage, double stageStartSeconds, double emissivity) {

    /** Newton on the face balance stops when a step is below this fraction of the temperature. */
    private static final double FACE_TOLERANCE = 1e-13;

    /** More than enough: the iteration converges monotonically and quadratically (see {@link #faceTemperature}). */
    private static final int FACE_ITERATIONS = 50;

    /** No exchange at all, at a uniform temperature: the part before its first stage. */
    static SurfaceExposure none(double temperatureK) {
        return new SurfaceExposure(new StageConditions("none", temperatureK, temperatureK, temperatureK,
                temperatureK, 0, new EndCondition.AfterDuration(0), 0), 0, 0);
    }

    /** Heat flux into a face at {@code surfaceK} at time {@code t}, W/m². */
    double flux(double t, double surfaceK) {
        double elapsed = t - stageStartSeconds;
        return Physics.surfaceFlux(stage.convection(), stage.airK(elapsed), emissivity,
                stage.surroundingsK(elapsed), surfaceK);
    }

    /** d(flux)/d(surface temperature), W/(m²·K). */
    double fluxSlope(double surfaceK) {
        return Physics.surfaceFluxSlope(stage.convection(), emissivity, surfaceK);
    }

    /**
     * The face temperature Ts at which the heat arriving from outside is conducted on into the
     * adjacent cell: flux(Ts) = g (Ts − T_cell), with g = 2k/dx the conductance of the half cell.
     * The residual is concave and strictly falling in Ts, so Newton from T_cell lands above the
     * root after one step and then descends to it monotonically.
     */
    double faceTemperature(double t, double cellK, double conductance) {
        double surface = cellK;
        for (int i = 0; i < FACE_ITERATIONS; i++) {
            double residual = flux(t, surface) - conductance * (surface - cellK);
            double step = residual / (fluxSlope(surface) - conductance);
            surface -= step;
            if (Math.abs(step) <= FACE_TOLERANCE * surface) {
                break;
            }
        }
        return surface;
    }
}
