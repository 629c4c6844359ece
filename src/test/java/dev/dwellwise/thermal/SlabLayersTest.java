package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Layers in perfect contact: a wall cut into layers of one material is the same wall. */
class SlabLayersTest {

    private static final Material SOLID = Parts.testSolid();

    private static ThermalProblem job(ThermalPart part) {
        return Parts.problem(part, 10,
                Parts.stage("bake", 200, 210, 60, new EndCondition.AfterDuration(900), 900),
                Parts.stage("cool", 25, 25, 25, new EndCondition.AfterDuration(900), 900));
    }

    @Test
    void twoIdenticalHalvesExposedOnBothFacesAreOneLayerOfTheirTotalThickness() {
        // The interface lies on the mid-plane, which is a cell face in either case: the grids coincide,
        // so only rounding may differ.
        ThermalPart one = new ThermalPart(List.of(new Layer(SOLID, 0.02)), 2, 0.9, 293.15);
        ThermalPart two = new ThermalPart(List.of(new Layer(SOLID, 0.01), new Layer(SOLID, 0.01)), 2, 0.9, 293.15);
        assertSameHistory(StageRunner.run(job(one), new SlabModel()), StageRunner.run(job(two), new SlabModel()), 1e-9);
    }

    @Test
    void twoIdenticalLayersOfUnequalThicknessAreOneLayerToTheDiscretisationError() {
        // One face; the interface at 4 of 10 mm becomes a cell face the single layer does not have, so
        // the grids differ and each carries its own second-order error of the same solution. Those
        // nearly coincide (the same grading): measured 4e-4 K; 0.002 K allows for that five times, and an
        // error at the interface would show as tenths of a kelvin (the layers here conduct poorly).
        // Left out: the instant a stage starts, when the face value takes the new conditions across
        // half the first cell (an O(dx) jump, q dx/(2k) ~ 1.6 K here, that fades within dx^2/alpha ~
        // 0.1 s) and the two grids' first cells differ in width.
        ThermalPart one = new ThermalPart(List.of(new Layer(SOLID, 0.01)), 1, 0.9, 293.15);
        ThermalPart two = new ThermalPart(List.of(new Layer(SOLID, 0.004), new Layer(SOLID, 0.006)), 1, 0.9, 293.15);
        assertSameHistory(StageRunner.run(job(one), new SlabModel()), StageRunner.run(job(two), new SlabModel()), 0.002);
    }

    private static void assertSameHistory(ThermalHistory a, ThermalHistory b, double tolerance) {
        double[] time = a.series().timeSeconds();
        for (int i = 0; i < time.length; i++) {
            Observation x = a.dense().at(time[i]);
            Observation y = b.dense().at(time[i]);
            assertEquals(x.meanK(), y.meanK(), tolerance, "mean at " + time[i]);
            if (isStageStart(a, time[i])) {
                continue;
            }
            assertEquals(x.surfaceK(), y.surfaceK(), tolerance, "surface at " + time[i]);
            assertEquals(x.coreK(), y.coreK(), tolerance, "core at " + time[i]);
            assertEquals(x.coldestK(), y.coldestK(), tolerance, "coldest at " + time[i]);
            assertEquals(x.hottestK(), y.hottestK(), tolerance, "hottest at " + time[i]);
        }
    }

    private static boolean isStageStart(ThermalHistory history, double t) {
        for (StageOutcome stage : history.stages()) {
            if (stage.startSeconds() == t) {
                return true;
            }
        }
        return false;
    }
}
