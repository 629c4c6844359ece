package dev.dwellwise.cure;

import static dev.dwellwise.cure.Paths.kelvin;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Time at or above a temperature against the crossing times of the lumped closed form. */
class TimeAboveTest {

    private static final CureBudget BUDGET = CureBudget.standard();

    /** Crossings are located to 1e-9 s (TimeAbove.TIME_ACCURACY); two of them, with rounding: 1e-8 s. */
    private static final double ROOT_ACCURACY = 1e-8;

    @Test
    void exponentialHeatingIsAboveFromTheClosedFormCrossingTimeOn() {
        // Lumped convection heating T = T_air - (T_air - T_i) e^(-t/tau) (Incropera Eqs. 5.6-5.7 [M]) crosses
        // T_c at t_c = tau ln[(T_air - T_i)/(T_air - T_c)], so over [0, t_end] it is above for t_end - t_c.
        // With REFERENCES.md section 2 [C]: tau = 113.303 s, 20 C into 200 C air, T_c = 180 C -> t_c = tau ln 9.
        double tau = 113.303;
        TemperaturePath path = Paths.exponential(kelvin(200), kelvin(20), tau, 900, 37);
        double crossing = tau * Math.log((200.0 - 20) / (200.0 - 180));
        assertEquals(248.952, crossing, 1e-3);
        assertEquals(900 - crossing, TimeAbove.seconds(path, kelvin(180), BUDGET), ROOT_ACCURACY);
    }

    @Test
    void aComputedBakeAndCoolHistoryIsAboveBetweenItsTwoClosedFormCrossings() {
        // A real DenseHistory: steel plate (tau = rho c Lc / h), 600 s in 200 C air at h = 30, then 600 s in
        // 24 C air at h = 20. Closed forms (Incropera Eqs. 5.6-5.7 [M]) for each stage: up-crossing
        // t1 = tau1 ln[180/(200 - Tc)], down-crossing t2 = 600 + tau2 ln[(T600 - 24)/(Tc - 24)].
        // The history's temperatures carry about 1e-6 K (LumpedModel Javadoc); at rates above 0.1 K/s that moves
        // each crossing by 1e-5 s at most: 1e-4 s for the two, far inside DESIGN.md's 0.05 s for events.
        double tau1 = LumpedRuns.tau(30);
        double tau2 = LumpedRuns.tau(20);
        var history = LumpedRuns.run(20, LumpedRuns.stage("bake", 200, 30, 600),
                LumpedRuns.stage("cool", 24, 20, 600));
        double tc = 170;
        double t1 = tau1 * Math.log(180 / (200 - tc));
        double at600 = 200 - 180 * Math.exp(-600 / tau1);
        double t2 = 600 + tau2 * Math.log((at600 - 24) / (tc - 24));
        assertEquals(t2 - t1, TimeAbove.seconds(TemperaturePath.coldestOf(history), kelvin(tc), BUDGET), 1e-4);
    }

    @Test
    void aStepProfileIsAboveForExactlyItsHotStep() {
        // 600 s at 160 C then 900 s at 195 C, threshold 180 C: above for the second step only. The crossing is
        // the jump at the knot itself, so no root is found and only rounding remains.
        TemperaturePath twoSteps = Paths.steps(new double[] {kelvin(160), kelvin(195)}, new double[] {600, 900});
        assertEquals(900, TimeAbove.seconds(twoSteps, kelvin(180), BUDGET), 1e-9);
    }

    @Test
    void aHoldExactlyAtTheThresholdCountsAsAtOrAbove() {
        assertEquals(600, TimeAbove.seconds(Paths.constant(kelvin(180), 600), kelvin(180), BUDGET), 1e-9);
    }

    @Test
    void aPathThatNeverReachesTheThresholdIsNeverAbove() {
        TemperaturePath path = Paths.exponential(kelvin(175), kelvin(20), 113.303, 3600, 60);
        assertEquals(0, TimeAbove.seconds(path, kelvin(180), BUDGET));
    }
}
