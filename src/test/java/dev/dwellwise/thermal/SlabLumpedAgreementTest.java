package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * At a Biot number of 0.01 the slab's mean temperature must agree with the lumped model
 * ({@link LumpedModel}), with radiation on, constant or tabulated properties. They differ by physics,
 * not numerics: from the one-term series (Incropera Eq. 5.42–5.43 [M]), ζ₁² = Bi − Bi²/3 + O(Bi³) and
 * C₁ sin ζ₁/ζ₁ = 1 + O(Bi²), so the exact mean θ exceeds the lumped exp(−Bi Fo) by
 * (Bi/3)(Bi Fo) exp(−Bi Fo) ≤ Bi/(3e) (this bound is derived here, from memory). REFERENCES.md
 * section 1 [C] confirms the size: at Bi = 0.01 the exact centre stays within 0.5 % of exp(−Bi Fo).
 */
class SlabLumpedAgreementTest {

    @ParameterizedTest(name = "tabulated properties: {0}")
    @ValueSource(booleans = {false, true})
    void meanTemperatureAgreesWithTheLumpedModelAtBiotZeroPointZeroOne(boolean tabulated) {
        // 25 mm of AISI 1010, both faces, eps 0.9, h 30: (h + h_r,max) (L/2) / k = 0.0095 at most with
        // constant properties, 0.0117 with the table (k falls to 55 W/mK at 470 K).
        Material steel = tabulated ? SlabEquationsTest.steelTable() : Parts.steel1010();
        ThermalPart part = Parts.plate(steel, 0.025, 2, 0.9, 20);
        ThermalProblem problem = Parts.problem(part, 30,
                Parts.stage("bake", 200, 200, 30, new EndCondition.AfterDuration(5400), 5400),
                Parts.stage("cool", 25, 25, 20, new EndCondition.AfterDuration(3600), 3600));
        ThermalHistory slab = StageRunner.run(problem, new SlabModel());
        ThermalHistory lumped = StageRunner.run(problem, new LumpedModel());
        double biot = slab.largestBiotNumber();
        assertTrue(biot > 0.008 && biot < 0.012, "the case is at Bi = 0.01: " + biot);
        // The bound, on the largest temperature span of a stage (180 K), and 1.5 for the radiation
        // coefficient varying over a stage; slab numerics (< 0.05 K) fit well inside.
        double tolerance = 1.5 * biot / (3 * Math.E) * 180;
        double[] time = slab.series().timeSeconds();
        double[] mean = slab.series().meanK();
        double largest = 0;
        for (int i = 0; i < time.length; i++) {
            double difference = mean[i] - lumped.dense().at(time[i]).meanK();
            assertEquals(0, difference, tolerance, "at t = " + time[i]);
            largest = Math.max(largest, Math.abs(difference));
        }
        assertTrue(largest > 0.01 * tolerance, "the comparison sees the finite Biot number: " + largest);
        // Through the thickness the spread is small too: surface minus core ~ q L / (2 k faces) < 0.5 K.
        Observation end = slab.stages().get(0).end();
        assertEquals(end.surfaceK(), end.coreK(), 0.5);
    }
}
