package dev.dwellwise.thermal;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The temperature a part settles at under fixed surroundings: the root T of
 * h (T_air − T) + eps sigma (T_sur⁴ − T⁴) = 0. The balance falls strictly with T, so the root is
 * unique and lies between the air and surroundings temperatures. With neither convection nor
 * radiation the part exchanges no heat and keeps its (mean) temperature.
 */
public final class SteadyState {

    private SteadyState() {
    }

    /** The root of the balance; {@code currentK} where no heat is exchanged at all. */
    public static double temperatureK(double h, double airK, double emissivity, double surroundingsK,
                                      double currentK) {
        if (h == 0 && emissivity == 0) {
            return currentK;
        }
        double low = Math.min(airK, surroundingsK);
        double high = Math.max(airK, surroundingsK);
        if (high - low < 1e-12) {
            return h > 0 ? airK : surroundingsK;
        }
        BrentSolver solver = new BrentSolver(1e-12, 1e-10);
        return solver.solve(200, t -> Physics.surfaceFlux(h, airK, emissivity, surroundingsK, t), low, high);
    }

    /** The steady temperature under a stage's end conditions (the end of a ramp), from a mean temperature. */
    public static double of(StageConditions stage, double emissivity, double currentMeanK) {
        return temperatureK(stage.convection(), stage.airEndK(), emissivity, stage.surroundingsEndK(), currentMeanK);
    }
}
