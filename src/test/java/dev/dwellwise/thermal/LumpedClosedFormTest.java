package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The lumped back end against closed-form solutions. Targets (DESIGN.md section 2): temperatures
 * within 0.01 K and event times within 0.05 s of the exact answer.
 */
class LumpedClosedFormTest {

    private static final double KELVIN_TARGET = 0.01;
    private static final double SECONDS_TARGET = 0.05;

    @Test
    void convectionOnlyHeatingFollowsTheExponentialAndReachesTheTargetAtTauLnNine() {
        // Lumped convection closed form theta/theta_i = exp(-t/tau), tau = rho c Lc / h
        // (Incropera, Fundamentals of Heat and Mass Transfer, Eqs. 5.6-5.7 [M]). REFERENCES.md section 2 [C]:
        // steel 7832 kg/m3, 434 J/kgK, Lc = 1 mm, h = 30 -> tau = 113.303 s; 20 C in 200 C air to 180 C at tau ln 9 = 248.952 s.
        ThermalPart part = Parts.plate(Parts.steel1010(), 0.002, 2, 0.0, 20);
        ThermalProblem problem = Parts.problem(part, 5,
                Parts.stage("bake", 200, 200, 30, new EndCondition.ColdestReaches(Physics.toKelvin(180)), 3600));
        ThermalHistory history = StageRunner.run(problem, new LumpedModel());

        double tau = 7832 * 434 * 0.001 / 30;
        assertEquals(113.303, tau, 1e-3);
        StageOutcome bake = history.stages().get(0);
        assertEquals(StageEnd.REACHED, bake.ended());
        assertEquals(248.952, bake.endSeconds(), SECONDS_TARGET);
        assertEquals(tau * Math.log(9), bake.endSeconds(), 1e-6);
        assertFollowsTheExponential(history, tau, KELVIN_TARGET);
        assertFollowsTheExponential(history, tau, 1e-6); // well inside the target
    }

    @Test
    void aLongStageStaysOnTheExponentialAfterThePartHasSettled() {
        // same closed form (Incropera Eqs. 5.6-5.7 [M]) over 20,000 s: the part settles near 2,000 s,
        // within one step's error scale (about 5e-6 K) of the air, and the stepper then holds the
        // steady temperature; every 500 s sample stays within 1e-6 K of the exponential
        ThermalPart part = Parts.plate(Parts.steel1010(), 0.002, 2, 0.0, 20);
        ThermalProblem problem = Parts.problem(part, 500,
                Parts.stage("long soak", 200, 200, 30, new EndCondition.AfterDuration(20_000), 20_000));
        ThermalHistory history = StageRunner.run(problem, new LumpedModel());
        assertFollowsTheExponential(history, 7832 * 434 * 0.001 / 30, 1e-6);
    }

    /** Every sample on T = T_air - (T_air - T_i) e^(-t/tau) for 20 C into 200 C air. */
    private static void assertFollowsTheExponential(ThermalHistory history, double tau, double toleranceK) {
        double[] time = history.series().timeSeconds();
        double[] temp = history.series().meanK();
        for (int i = 0; i < time.length; i++) {
            assertEquals(Physics.toKelvin(200) - 180 * Math.exp(-time[i] / tau), temp[i], toleranceK,
                    "at t = " + time[i]);
        }
    }

    @Test
    void aFoilUnderExtremeConvectionSettlesInsteadOfExhaustingTheStepBudget() {
        // 1 um steel at h = 10,000: tau = rho c L / (2 h) = 0.17 ms, a stiff problem for an explicit
        // method; once settled the part sits at the air temperature (the closed form's limit)
        ThermalPart part = Parts.plate(Parts.steel1010(), 0.000001, 2, 0.9, 20);
        ThermalProblem problem = Parts.problem(part, 600,
                Parts.stage("oven", 200, 200, 10_000, new EndCondition.AfterDuration(3600), 3600));
        ThermalHistory history = StageRunner.run(problem, new LumpedModel());
        assertEquals(Physics.toKelvin(200), history.finalState().meanK(), 1e-6);
        assertEquals(3600, history.totalSeconds(), 1e-9);
    }

    @Test
    void radiationOnlyHeatingReachesTheTargetAtTheClosedFormTime() {
        // Radiation-only lumped body, fixed surroundings: Bejan & Kraus (eds.), Heat Transfer Handbook (2003),
        // Eq. 3.283 with eps sigma for sigma [F]; same as Incropera Eq. 5.18 [M]. REFERENCES.md section 2 [C]:
        // 2 mm steel plate, both faces, eps 0.9, T_sur 473.15 K, 293.15 K -> 453.15 K in 440.960 s.
        ThermalPart part = Parts.plate(Parts.steel1010(), 0.002, 2, 0.9, 20);
        ThermalProblem problem = Parts.problem(part, 10,
                Parts.stage("radiant", 200, 200, 0, new EndCondition.ColdestReaches(453.15), 3600));
        ThermalHistory history = StageRunner.run(problem, new LumpedModel());
        assertEquals(440.960, history.stages().get(0).endSeconds(), SECONDS_TARGET);
        double[] time = history.series().timeSeconds();
        double[] temp = history.series().meanK();
        for (int i = 1; i < time.length; i++) {
            assertEquals(radiationTime(293.15, temp[i], 473.15, 0.9, 7832 * 434 * 0.001), time[i], 1e-4,
                    "closed-form time of the sampled temperature " + temp[i]);
        }
    }

    @Test
    void convectionWithRadiationToAZeroKelvinSinkMatchesTheHandbookClosedForm() {
        // Bejan & Kraus, Heat Transfer Handbook, Eq. 3.284 (sink at 0 K) [F]; REFERENCES.md section 2 [C]:
        // h = 10, eps 0.9, rho c Lc = 7832*434*0.001, 500 K -> 300 K in 132.354 s.
        ThermalPart part = new ThermalPart(java.util.List.of(new Layer(Parts.steel1010(), 0.002)), 2, 0.9, 500);
        StageConditions cold = new StageConditions("sink", 0, 0, 0, 0, 10,
                new EndCondition.HottestFallsTo(300), 3600);
        ThermalHistory history = StageRunner.run(Parts.problem(part, 10, cold), new LumpedModel());
        assertEquals(132.354, history.stages().get(0).endSeconds(), SECONDS_TARGET);
    }

    /** Eq. 3.283 of Bejan & Kraus with eps sigma in place of sigma: time from ti to t under surroundings ts. */
    static double radiationTime(double ti, double t, double ts, double eps, double capacityPerArea) {
        double k = capacityPerArea / (4 * eps * Physics.STEFAN_BOLTZMANN * ts * ts * ts);
        return k * (Math.log(Math.abs((ts + t) / (ts - t))) - Math.log(Math.abs((ts + ti) / (ts - ti)))
                + 2 * (Math.atan(t / ts) - Math.atan(ti / ts)));
    }
}
