package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The wall-clock part of {@link ComputeBudget}: a run past its deadline stops with the TIME limit. */
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
        ThermalProblem problem = heating(ComputeBudget.standard().withMaxMillis(0));
        Stepper stepper = new LumpedModel().newStepper(problem.part(), problem.budget());
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
}
