package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The slab's segments in the shared stage loop ({@link StageRunner}): events and holds located on
 * the dense output against the crossing times of the exact plane-wall series (Incropera Eq. 5.42 [M],
 * REFERENCES.md section 1), the state cut at an event, determinism and the compute budget.
 */
class SlabStageRunnerTest {

    private static final double TIME_SCALE = 300; // L^2/alpha of the test solid at L = 10 mm, s
    private static final double TARGET_K = 0.05;

    /** Test solid at Bi = 1: one face of 10 mm, or both faces of 20 mm. */
    private static ThermalPart wall(int faces, double startC) {
        return Parts.plate(Parts.testSolid(), 0.01 * faces, faces, 0, startC);
    }

    /** Time at which the series' theta at x* falls to {@code theta}, seconds. */
    private static double seriesCrossing(double xStar, double theta) {
        PlaneWallSeries series = new PlaneWallSeries(1);
        return TIME_SCALE * new BrentSolver(1e-14, 1e-12).solve(200, fo -> series.theta(xStar, fo) - theta, 0.05, 5);
    }

    /**
     * An event time is as good as the temperature over the rate there: the slab target (0.05 K) over
     * the series' rate of change of the temperature at the crossing.
     */
    private static double timeTolerance(double xStar, double crossing, double span) {
        PlaneWallSeries series = new PlaneWallSeries(1);
        double fo = crossing / TIME_SCALE;
        double rate = Math.abs(span * (series.theta(xStar, fo + 1e-5) - series.theta(xStar, fo - 1e-5)) / 2e-5 / TIME_SCALE);
        return TARGET_K / rate;
    }

    @ParameterizedTest(name = "{0} exposed face(s)")
    @ValueSource(ints = {1, 2})
    void theCoreReachingATemperatureEndsTheStageWhenTheSeriesSaysSo(int faces) {
        // Heating from 20 C in 200 C air: the coldest point is the back face (one face) or the mid-plane.
        double targetK = Physics.toKelvin(110); // theta = 0.5
        ThermalProblem problem = Parts.problem(wall(faces, 20), 10,
                Parts.stage("bake", 200, 200, 60, new EndCondition.ColdestReaches(targetK), 3600));
        ThermalHistory history = StageRunner.run(problem, new SlabModel());
        StageOutcome bake = history.stages().get(0);
        double crossing = seriesCrossing(0, 0.5);
        assertEquals(StageEnd.REACHED, bake.ended());
        assertEquals(crossing, bake.endSeconds(), timeTolerance(0, crossing, 180));
        assertEquals(targetK, bake.end().coldestK(), 1e-6, "the event is on the dense output, not a step end");
        assertEquals(targetK, bake.end().coreK(), 1e-6);
    }

    @Test
    void aHoldCompletesItsLengthAfterTheCoreRisesThrough() {
        double holdK = Physics.toKelvin(155); // theta = 0.25
        ThermalProblem problem = Parts.problem(wall(1, 20), 10,
                Parts.stage("bake", 200, 200, 60, new EndCondition.HoldAbove(holdK, 120), 3600));
        StageOutcome bake = StageRunner.run(problem, new SlabModel()).stages().get(0);
        double crossing = seriesCrossing(0, 0.25);
        assertEquals(StageEnd.HOLD_COMPLETE, bake.ended());
        assertEquals(120, bake.holdSecondsAccumulated(), 1e-9);
        assertEquals(crossing + 120, bake.endSeconds(), timeTolerance(0, crossing, 180));
    }

    @Test
    void coolingEndsWhenTheHottestPointFallsToTheLimit() {
        // A part at 200 C in 20 C air: during cooling the hottest point is the core.
        double limitK = Physics.toKelvin(65); // theta = 0.25
        ThermalProblem problem = Parts.problem(wall(2, 200), 10,
                Parts.stage("cool", 20, 20, 60, new EndCondition.HottestFallsTo(limitK), 3600));
        StageOutcome cool = StageRunner.run(problem, new SlabModel()).stages().get(0);
        double crossing = seriesCrossing(0, 0.25);
        assertEquals(StageEnd.REACHED, cool.ended());
        assertEquals(crossing, cool.endSeconds(), timeTolerance(0, crossing, 180));
        assertEquals(limitK, cool.end().hottestK(), 1e-6);
    }

    @Test
    void aConditionAlreadyMetEndsTheStageAtOnce() {
        ThermalProblem problem = Parts.problem(wall(2, 120), 10,
                Parts.stage("preheated", 200, 200, 60, new EndCondition.ColdestReaches(Physics.toKelvin(100)), 3600),
                Parts.stage("bake", 200, 200, 60, new EndCondition.AfterDuration(60), 60));
        ThermalHistory history = StageRunner.run(problem, new SlabModel());
        assertEquals(StageEnd.REACHED, history.stages().get(0).ended());
        assertEquals(0, history.stages().get(0).endSeconds());
        assertEquals(60, history.totalSeconds(), 1e-9);
    }

    @Test
    void theStateCutAtAnEventCarriesOnAsIfTheStageHadBeenTimedToIt() {
        // Stage 1 ends on an event inside a step; the stepper is cut back to the interpolated state
        // there. The same history with stage 1 timed to that instant must agree: both carry the same
        // dense-output and step errors (a fraction of the tolerance), so within the slab target.
        ThermalPart part = Parts.plate(Parts.testSolid(), 0.02, 2, 0.9, 20);
        ThermalProblem onEvent = Parts.problem(part, 10,
                Parts.stage("bake", 200, 200, 40, new EndCondition.ColdestReaches(Physics.toKelvin(120)), 3600),
                Parts.stage("cool", 25, 25, 20, new EndCondition.AfterDuration(900), 900));
        ThermalHistory a = StageRunner.run(onEvent, new SlabModel());
        double eventTime = a.stages().get(0).endSeconds();
        ThermalProblem timed = Parts.problem(part, 10,
                Parts.stage("bake", 200, 200, 40, new EndCondition.AfterDuration(eventTime), eventTime),
                Parts.stage("cool", 25, 25, 20, new EndCondition.AfterDuration(900), 900));
        ThermalHistory b = StageRunner.run(timed, new SlabModel());
        assertEquals(a.stages().get(0).end().meanK(), a.stages().get(1).start().meanK(), 0,
                "the next stage starts from the cut state");
        double[] time = a.series().timeSeconds();
        for (double t : time) {
            if (t > eventTime) {
                Observation x = a.dense().at(t);
                Observation y = b.dense().at(t);
                assertEquals(y.meanK(), x.meanK(), TARGET_K, "mean at " + t);
                assertEquals(y.surfaceK(), x.surfaceK(), TARGET_K, "surface at " + t);
                assertEquals(y.coreK(), x.coreK(), TARGET_K, "core at " + t);
            }
        }
    }

    @Test
    void theSameInputGivesBitIdenticalOutput() {
        ThermalPart part = new ThermalPart(List.of(new Layer(SlabEquationsTest.steelTable(), 0.004),
                new Layer(SlabEquationsTest.insulation(), 0.01)), 2, 0.85, 300);
        ThermalProblem problem = Parts.problem(part, 5,
                Parts.stage("bake", 200, 220, 35, new EndCondition.HoldAbove(Physics.toKelvin(150), 300), 3600),
                Parts.stage("cool", 25, 25, 20, new EndCondition.HottestFallsTo(Physics.toKelvin(60)), 7200));
        ThermalHistory a = StageRunner.run(problem, new SlabModel());
        ThermalHistory b = StageRunner.run(problem, new SlabModel());
        assertArrayEquals(a.series().timeSeconds(), b.series().timeSeconds(), 0);
        assertArrayEquals(a.series().meanK(), b.series().meanK(), 0);
        assertArrayEquals(a.series().surfaceK(), b.series().surfaceK(), 0);
        assertArrayEquals(a.series().coreK(), b.series().coreK(), 0);
        assertEquals(a.steps(), b.steps());
        assertEquals(a.evaluations(), b.evaluations());
    }

    @Test
    void theComputeBudgetStopsTheSolve() {
        ThermalPart part = wall(1, 20);
        StageConditions bake = Parts.stage("bake", 200, 200, 60, new EndCondition.AfterDuration(3600), 3600);
        ThermalProblem fewSteps = new ThermalProblem(part, List.of(bake), 10, new ComputeBudget(20, 5_000_000, 100_000),
                List.of());
        ComputeLimitExceededException steps = assertThrows(ComputeLimitExceededException.class,
                () -> StageRunner.run(fewSteps, new SlabModel()));
        assertEquals(ComputeLimitExceededException.Limit.STEPS, steps.limit());
        ThermalProblem fewSolves = new ThermalProblem(part, List.of(bake), 10, new ComputeBudget(200_000, 50, 100_000),
                List.of());
        ComputeLimitExceededException solves = assertThrows(ComputeLimitExceededException.class,
                () -> StageRunner.run(fewSolves, new SlabModel()));
        assertEquals(ComputeLimitExceededException.Limit.EVALUATIONS, solves.limit());
    }

    @Test
    void workFallsAsTheToleranceLoosens() {
        ThermalProblem problem = Parts.problem(wall(2, 20), 10,
                Parts.stage("bake", 200, 200, 60, new EndCondition.AfterDuration(1800), 1800));
        long previous = Long.MAX_VALUE;
        for (double tolerance : new double[] {1e-9, 1e-7, 1e-5}) {
            long steps = StageRunner.run(problem, new SlabModel(SlabResolution.standard().withRelativeTolerance(tolerance)))
                    .steps();
            // O(h^3) local error: steps grow as tol^(-1/3), about 4.6x per two decades
            assertTrue(steps < previous / 3, "steps at " + tolerance + ": " + steps);
            previous = steps;
        }
    }

    @Test
    void aConditionAtTheAirTemperatureIsMetOnlyOnceTheWholeSlabHasSettled() {
        // One face of 10 mm at Bi = 1: "reaches 200 C" in 200 C air is met where the slab has settled, or
        // where a step's dense output first touches 200 C, so never before the coldest point has crossed
        // 200 C less 1.2 settle bands (found by integrating the same steps). A settle judged too early,
        // or a jump to the steady temperature, would report it sooner.
        double air = Physics.toKelvin(200);
        double band = LumpedModel.settleBandK(air);
        double atAir = StageRunner.run(Parts.problem(wall(1, 20), 600, Parts.stage("oven", 200, 200, 60,
                new EndCondition.ColdestReaches(air), 20_000)), new SlabModel()).stages().get(0).endSeconds();
        StageOutcome near = StageRunner.run(Parts.problem(wall(1, 20), 600, Parts.stage("oven", 200, 200, 60,
                new EndCondition.ColdestReaches(air - 1.2 * band), 20_000)), new SlabModel()).stages().get(0);
        assertEquals(StageEnd.REACHED, near.ended());
        assertTrue(atAir >= near.endSeconds(), atAir + " s against " + near.endSeconds() + " s");
    }

    @Test
    void aConditionAtTheAirTemperatureIsMetWhereTheSlabComesWithinTheSettleBand() {
        // Near the air temperature the slab's error exceeds the band (its tolerance is 1e-7 T), so the
        // time is judged against the slab's own profile, read 1 ms before it: every point is then just
        // outside the band, by less than the 1 ms of approach (~1e-5 of it) plus the faces' reading
        // beyond the cells (~1e-4). Settling on one cell, or at the end of the step that entered the
        // band (a step there spans several time constants), leaves the part far from, or well inside,
        // the band at that moment. Both faces exposed read as one face: the same wall, mirrored.
        double air = Physics.toKelvin(200);
        double band = LumpedModel.settleBandK(air);
        for (EndCondition end : List.of(new EndCondition.ColdestReaches(air), new EndCondition.HoldAbove(air, 300))) {
            for (int faces : new int[] {1, 2}) {
                StageConditions oven = Parts.stage("oven", 200, 200, 60, end, 20_000);
                StageOutcome outcome = StageRunner.run(Parts.problem(wall(faces, 20), 600, oven), new SlabModel())
                        .stages().get(0);
                double met = outcome.endSeconds() - (end instanceof EndCondition.HoldAbove ? 300 : 0);
                Profile before = StageRunner.run(new ThermalProblem(wall(faces, 20), List.of(oven), 600,
                        ComputeBudget.standard(), List.of(met - 1e-3)), new SlabModel()).profiles().get(0);
                double deviation = 0;
                for (double k : before.temperaturesK()) {
                    deviation = Math.max(deviation, Math.abs(k - air));
                }
                assertTrue(deviation > band && deviation < 1.01 * band, end + ", " + faces + " face(s): "
                        + deviation / band + " bands from the air 1 ms before it was met at " + met + " s");
            }
        }
    }

    @Test
    void aThresholdAHairBelowTheAirIsStillFoundByIntegratingNotBySettling() {
        // 1e-6 K below 200 C, inside the settle band: the crossing itself, located on the dense output
        double threshold = Physics.toKelvin(200) - 1e-6;
        StageOutcome oven = StageRunner.run(Parts.problem(wall(1, 20), 600, Parts.stage("oven", 200, 200, 60,
                new EndCondition.ColdestReaches(threshold), 20_000)), new SlabModel()).stages().get(0);
        assertEquals(StageEnd.REACHED, oven.ended());
        assertEquals(threshold, oven.end().coldestK(), 1e-9);
    }
}
