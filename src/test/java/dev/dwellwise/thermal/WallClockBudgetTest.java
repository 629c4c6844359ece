package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The wall-clock part of {@link ComputeBudget}: a run past its deadline stops with the TIME limit,
 * and the model runs of one solve share one deadline.
 */
class WallClockBudgetTest {

    private static ThermalProblem heating(ComputeBudget budget) {
        ThermalPart part = Parts.plate(Parts.steel1010(), 0.002, 2, 0.9, 20);
        StageConditions bake = Parts.stage("bake", 200, 200, 30,
                new EndCondition.ColdestReaches(Physics.toKelvin(180)), 3600);
        return new ThermalProblem(part, List.of(bake), 5, budget, List.of());
    }

    @Test
    void aRunWithAZeroMillisecondBudgetStopsAtItsFirstBudgetCheck() {
        ComputeLimitExceededException e = assertThrows(ComputeLimitExceededException.class,
                () -> StageRunner.run(heating(ComputeBudget.standard().withMaxMillis(0)), new LumpedModel()));
        assertEquals(ComputeLimitExceededException.Limit.TIME, e.limit());
    }

    @Test
    void theLumpedStepperStopsInsideAWindowWithoutWaitingForItsEnd() {
        // the solve's deadline, not one of the stepper's own from the (ample) budget
        ThermalProblem problem = heating(ComputeBudget.standard());
        Stepper stepper = new LumpedModel().newStepper(problem.part(), problem.budget(),
                Deadline.startingNow(ComputeBudget.standard().withMaxMillis(0)));
        stepper.enterStage(problem.stages().get(0));
        ComputeLimitExceededException e = assertThrows(ComputeLimitExceededException.class,
                () -> stepper.advance(3600));
        assertEquals(ComputeLimitExceededException.Limit.TIME, e.limit());
    }

    @Test
    void theSameRunWithTheStandardBudgetCompletes() {
        ThermalHistory history = StageRunner.run(heating(ComputeBudget.standard()), new LumpedModel());
        assertEquals(StageEnd.REACHED, history.stages().get(0).ended());
    }

    @Test
    void aBudgetBeyondADayIsRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> ComputeBudget.standard().withMaxMillis(ComputeBudget.LONGEST_MAX_MILLIS + 1));
    }

    /** A thick block in a hot, fast oven: Bi about 1, so {@code auto} falls back to the slab model. */
    private static ThermalProblem thickBlock(ComputeBudget budget) {
        ThermalPart part = Parts.plate(Parts.steel1010(), 0.2, 2, 0.9, 20);
        StageConditions soak = Parts.stage("soak", 600, 600, 500, new EndCondition.AfterDuration(600), 600);
        return new ThermalProblem(part, List.of(soak), 60, budget, List.of());
    }

    /**
     * {@code auto} tries the lumped model and falls back to the slab; a forced {@code lumped} solve
     * runs the slab as its comparison. Each model takes 200 ms before its first step: 400 ms in all
     * against a 300 ms budget, which either run alone would keep.
     */
    @ParameterizedTest
    @ValueSource(strings = {"auto", "lumped"})
    void theTwoModelRunsOfOneSolveShareOneDeadline(String requested) {
        AtomicInteger runs = new AtomicInteger();
        ModelSelector slow = new ModelSelector(slowToStart(new LumpedModel(), runs),
                slowToStart(new SlabModel(), runs));
        ComputeLimitExceededException e = assertThrows(ComputeLimitExceededException.class,
                () -> slow.solve(thickBlock(ComputeBudget.standard().withMaxMillis(300)), requested));
        assertEquals(ComputeLimitExceededException.Limit.TIME, e.limit());
        runs.set(0);
        slow.solve(thickBlock(ComputeBudget.standard()), requested);
        assertEquals(2, runs.get(), "both models run when the budget allows");
    }

    /** A model that takes 200 ms before each run's first step, as a cold or loaded machine might. */
    private static ThermalModel slowToStart(ThermalModel model, AtomicInteger runs) {
        return new HookedModel(model, () -> {
            runs.incrementAndGet();
            try {
                Thread.sleep(200);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException(e);
            }
        });
    }
}
