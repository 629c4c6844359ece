package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/**
 * First law for the lumped back end: the heat that entered through the faces,
 * ∫ faces [h (T_air − T) + eps sigma (T_sur⁴ − T⁴)] dt, equals the heat stored,
 * L rho ∫ c(T) dT from the initial to the final temperature. Both sides are computed here from
 * the dense history and the property table, independently of the solver's right-hand side.
 */
class EnergyBalanceTest {

    @Test
    void heatInThroughTheFacesEqualsTheHeatStoredWithATemperatureDependentSpecificHeat() {
        Material steel = MaterialLibrary.bundled().find("steel-1010").orElseThrow();
        double thickness = 0.003;
        double eps = 0.8;
        ThermalPart part = new ThermalPart(List.of(new Layer(steel, thickness)), 2, eps, Physics.toKelvin(20));
        double k = Physics.KELVIN_OFFSET;
        StageConditions bake = new StageConditions("bake", k + 220, k + 220, k + 180, k + 180, 28,
                new EndCondition.AfterDuration(900), 900);
        StageConditions cool = new StageConditions("cool", k + 25, k + 25, k + 25, k + 25, 15,
                new EndCondition.AfterDuration(600), 600);
        ThermalHistory h = StageRunner.run(
                new ThermalProblem(part, List.of(bake, cool), 10, ComputeBudget.standard(), List.of()),
                new LumpedModel());

        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(5, 1e-10, 1e-6);
        double heatIn = 0;
        double[] knots = h.dense().knots();
        for (int i = 0; i + 1 < knots.length; i++) {
            StageConditions s = knots[i] < 900 ? bake : cool;
            double start = s == bake ? 0 : 900;
            heatIn += quad.integrate(100_000, t -> {
                double temp = h.dense().at(t).meanK();
                return 2 * (s.convection() * (s.airK(t - start) - temp)
                        + eps * Physics.STEFAN_BOLTZMANN * (Math.pow(s.surroundingsK(t - start), 4) - Math.pow(temp, 4)));
            }, knots[i], knots[i + 1]);
        }
        double finalK = h.finalState().meanK();
        double stored = thickness * steel.densityKgPerM3()
                * quad.integrate(100_000, steel.specificHeat()::at, part.initialK(), finalK);
        // measured 8.0e-6 of the stored heat at relative tolerance 1e-8 (2.4e-6 at 1e-9); 2e-5 is
        // 4e-4 K of this part's temperature, twenty-five times inside the 0.01 K target
        assertEquals(stored, heatIn, Math.abs(stored) * 2e-5, "J/m2 in vs stored");
    }
}
