package dev.dwellwise.cure;

import static dev.dwellwise.cure.Paths.kelvin;
import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Every calculation stops with a domain exception at its evaluation budget instead of running on. */
class CureBudgetTest {

    /** Far below one evaluation per knot of the path below (200 pieces), far above nothing. */
    private static final CureBudget TINY = new CureBudget(50);

    private static final TemperaturePath PATH = Paths.exponential(kelvin(200), kelvin(20), 113.303, 2000, 10);
    private static final NthOrderKinetics KINETICS = new NthOrderKinetics(2.0e7, 80e3, 1.6, 0);

    private static void exceedsTinyButNotStandard(Executable tiny, Executable standard) {
        assertThrows(CureComputationException.class, tiny);
        assertDoesNotThrow(standard);
    }

    @Test
    void timeAboveStopsAtItsBudget() {
        exceedsTinyButNotStandard(() -> TimeAbove.seconds(PATH, kelvin(180), TINY),
                () -> TimeAbove.seconds(PATH, kelvin(180), CureBudget.standard()));
    }

    @Test
    void equivalentTimeStopsAtItsBudget() {
        exceedsTinyButNotStandard(() -> EquivalentTime.seconds(PATH, kelvin(180), 80e3, TINY),
                () -> EquivalentTime.seconds(PATH, kelvin(180), 80e3, CureBudget.standard()));
    }

    @Test
    void theDegreeOfCureStopsAtItsBudget() {
        exceedsTinyButNotStandard(() -> DegreeOfCure.atEnd(PATH, KINETICS, TINY),
                () -> DegreeOfCure.atEnd(PATH, KINETICS, CureBudget.standard()));
    }

    @Test
    void theHoldEstimateForTheDegreeStopsAtItsBudget() {
        exceedsTinyButNotStandard(() -> DegreeOfCure.secondsToReach(KINETICS, kelvin(150), 0, 0.99, new CureBudget(5)),
                () -> DegreeOfCure.secondsToReach(KINETICS, kelvin(150), 0, 0.99, CureBudget.standard()));
    }

    @Test
    void aBudgetMustAllowSomeWork() {
        assertThrows(IllegalArgumentException.class, () -> new CureBudget(0));
    }
}
