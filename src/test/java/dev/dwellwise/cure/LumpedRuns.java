package dev.dwellwise.cure;

import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.DenseHistory;
import dev.dwellwise.thermal.EndCondition;
import dev.dwellwise.thermal.Layer;
import dev.dwellwise.thermal.LumpedModel;
import dev.dwellwise.thermal.Material;
import dev.dwellwise.thermal.Physics;
import dev.dwellwise.thermal.StageConditions;
import dev.dwellwise.thermal.StageRunner;
import dev.dwellwise.thermal.ThermalPart;
import dev.dwellwise.thermal.ThermalProblem;
import java.util.List;

/**
 * Real computed histories for the cure tests: a 2 mm steel plate heated on both faces by
 * convection only (emissivity 0), so that its history is the exponential of the lumped closed form
 * with tau = rho c Lc / h (Incropera, Eqs. 5.6-5.7 [M]).
 */
final class LumpedRuns {

    /** AISI 1010 at 300 K as REFERENCES.md section 4 quotes it (Incropera Table A.1 [M]). */
    static final double DENSITY = 7832;
    static final double SPECIFIC_HEAT = 434;
    static final double HALF_THICKNESS = 0.001;

    private LumpedRuns() {
    }

    static double tau(double h) {
        return DENSITY * SPECIFIC_HEAT * HALF_THICKNESS / h;
    }

    /** A fixed-length stage in air at {@code airC} with convection {@code h}, no radiation. */
    static StageConditions stage(String name, double airC, double h, double seconds) {
        double air = Physics.toKelvin(airC);
        return new StageConditions(name, air, air, air, air, h, new EndCondition.AfterDuration(seconds), seconds);
    }

    static DenseHistory run(double initialC, StageConditions... stages) {
        Material steel = Material.constant("steel-1010", "AISI 1010", DENSITY, SPECIFIC_HEAT, 63.9,
                "Incropera Table A.1 [M]");
        ThermalPart part = new ThermalPart(List.of(new Layer(steel, 2 * HALF_THICKNESS)), 2, 0.0,
                Physics.toKelvin(initialC));
        ThermalProblem problem = new ThermalProblem(part, List.of(stages), 10, ComputeBudget.standard(), List.of());
        return StageRunner.run(problem, new LumpedModel()).dense();
    }
}
