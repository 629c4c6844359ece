package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Root finding on dense output, against roots known in closed form. */
class EventLocatorTest {

    @Test
    void aRootAtOrAfterLiesOnTheSideWhereTheConditionHolds() {
        // g(t) = e^(-t/50) - 1e-6 falls through zero at t = 50 ln(1e6): the side of b is g <= 0, the
        // property a stepper relies on to settle where the part has come within a band
        double exact = 50 * Math.log(1e6);
        for (double b : new double[] {exact + 1e-3, exact + 40, exact + 400}) {
            double t = EventLocator.rootAtOrAfter(x -> Math.exp(-x / 50) - 1e-6, 0, b);
            assertTrue(Math.exp(-t / 50) - 1e-6 <= 0, "g(" + t + ") > 0");
            // the solver also stops where |g| <= 1e-14: 5e-7 s at this slope of 2e-8 per second
            assertEquals(exact, t, 1e-6, "b = " + b);
        }
    }

    @Test
    void aRootAtTheRightEndIsThatEnd() {
        assertEquals(2.0, EventLocator.rootAtOrAfter(x -> 2 - x, 0, 2));
    }
}
