package dev.dwellwise.report;

import static dev.dwellwise.report.CureJobs.R;
import static dev.dwellwise.report.CureJobs.isothermal;
import static dev.dwellwise.report.CureJobs.job;
import static dev.dwellwise.report.CureJobs.tau;
import static dev.dwellwise.report.CureJobs.timed;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.job.Cure;
import dev.dwellwise.job.CureKinetics;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.Stage;
import dev.dwellwise.job.Until;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The cure figures of a whole job's answer against closed forms of its history (see {@link CureJobs}).
 * Times are reported to the millisecond and degrees to 1e-6, so each tolerance is that rounding plus
 * the solver's part: event times within 1e-4 s, degrees within 1e-9.
 */
class CureFiguresTest {

    private static final Simulator SIMULATOR = CureJobs.simulator();

    /** Kelvin from Celsius, written out so that the checks do not lean on the service's conversion. */
    private static double k(double c) {
        return c + 273.15;
    }

    @Test
    void timeAboveCountsEveryStageBetweenTheClosedFormCrossings() {
        // Bake: 20 C in 200 C air at h = 30 crosses 180 C at tau ln 9 = 248.952 s (REFERENCES.md section 2 [C]).
        // Cool: from T(600) in 24 C air at h = 20 it falls back through 180 C after tau2 ln[(T(600) - 24)/156].
        double tau1 = tau(30);
        double tau2 = tau(20);
        double at600 = 200 - 180 * Math.exp(-600 / tau1);
        double expected = (600 - tau1 * Math.log(9)) + tau2 * Math.log((at600 - 24) / (180 - 24));
        SimulationResult result = SIMULATOR.simulate(job(20, CureJobs.timeAbove(180, 0, null),
                timed("bake", 200, 30, 600), timed("cool", 24, 20, 600)));
        assertEquals(248.952, tau1 * Math.log(9), 5e-4);
        assertEquals(expected, result.cure().coldest().timeAboveSeconds(), 1e-3);
    }

    @Test
    void aHoldAtTheAirTemperatureItselfAndTheTimeAboveItAreTheSame600SecondsOnBothModels() {
        // "hold above 200 C" in 200 C air is met only in the limit: the closed form 200 - 180 e^(-t/tau)
        // never gets there. The part counts as there from where it settles, for the stage's hold and
        // the cure figure alike: a hold started anywhere else leaves the figure short of it. On the
        // slab model (no settled state before) the hold ended at the stage bound, held a few seconds.
        Stage oven = new Stage("oven", 200.0, null, 30.0, null, null, new Until(null, null, null, 200.0, 600.0),
                7200.0);
        Job lumped = job(20, CureJobs.timeAbove(200, 600, null), oven);
        for (Job run : List.of(lumped, CureJobs.onSlab(lumped, 2.0))) {
            SimulationResult result = SIMULATOR.simulate(run);
            assertEquals("hold-complete", result.stages().get(0).ended(), run.model());
            assertEquals(600, result.stages().get(0).holdSeconds(), 1e-3, run.model());
            assertEquals(600, result.cure().coldest().timeAboveSeconds(), 1e-3, run.model());
            assertEquals(SimulationResult.PASS, result.verdict(), run.model());
        }
    }

    @Test
    void aTargetAtTheAirTemperatureThatRunsOutOfTimeSaysThePartOnlyApproachesIt() {
        // 100 mm of the steel on the slab model, tau = rho c L / h = 5665 s at h = 30: after an hour the
        // core is some 95 K short of 200 C; only a stage long enough for it to settle would meet 200 C
        Until[] targets = {new Until(null, null, null, 200.0, 600.0), new Until(null, 200.0, null, null, null)};
        String[] sentences = {"the hold temperature itself, which a part only approaches (it counts as reached once"
            + " the part has settled to within about 5e-6 K, which a longer stage would give): set the hold below the"
            + " temperature the part settles at", "the target itself, which a part only approaches (it counts as"
            + " reached once the part has settled to within about 5e-6 K, which a longer stage would give): set the"
            + " target below the temperature the part settles at"};
        for (int i = 0; i < targets.length; i++) {
            Stage soak = new Stage("soak", 200.0, null, 30.0, null, null, targets[i], 3600.0);
            SimulationResult result = SIMULATOR.simulate(CureJobs.onSlab(job(20, null, soak), 100.0));
            assertEquals("max-seconds", result.stages().get(0).ended());
            CheckResult end = CureJobs.check(result, "stage-end");
            assertEquals(CheckResult.FAIL, end.status());
            assertTrue(end.detail().contains(sentences[i]), end.detail());
        }
    }

    @Test
    void aLumpedPartHasTheSameFiguresAtItsColdestAndHottestPoint() {
        Cure all = new Cure(new Cure.TimeAbove(180.0, 0.0, null), new Cure.EquivalentTime(180.0, 80.0, 0.0, null),
                new CureKinetics.NthOrder(2.0e7, 80.0, 1.6, 0.5, null,
                        new CureKinetics.GlassTransition(-15.0, 180.0, 0.62, null)));
        CureReport cure = SIMULATOR.simulate(job(20, all, timed("bake", 200, 30, 600))).cure();
        assertEquals(cure.coldest(), cure.hottest());
    }

    @Test
    void anIsothermalHoldIsWorthTheNistMultiplierOfEquivalentTime() {
        // NIST (Bentz et al., REFERENCES.md section 6 [F]): E = 38.2 kJ/mol makes 35 C worth 1.65 times its time
        // at 25 C; printed to 3 digits, so within 0.005 of it. The exact factor of the ASTM C1074 equivalent age,
        // exp[(E/R)(1/T_ref - 1/T)], is 1.64884 [C]: within the millisecond of rounding.
        SimulationResult result = SIMULATOR.simulate(isothermal(35, 1000, CureJobs.equivalentTime(25, 38.2, 0, null)));
        double equivalent = result.cure().coldest().equivalentSeconds();
        assertEquals(1.65, equivalent / 1000, 0.005);
        assertEquals(1000 * Math.exp(38.2e3 / R * (1 / k(25) - 1 / k(35))), equivalent, 1e-3);
    }

    @Test
    void tenKelvinAboveTheReferenceAtEightyKilojoulesIsWorthTheComputedMultiplier() {
        // REFERENCES.md section 6 [C]: 190 C relative to T_ref = 180 C at E = 80 kJ/mol multiplies by 1.5816, printed
        // to 4 decimals: 600 s hold -> 948.96 s, within 600 x 5e-5.
        SimulationResult result = SIMULATOR.simulate(isothermal(190, 600, CureJobs.equivalentTime(180, 80, 0, null)));
        assertEquals(600 * 1.5816, result.cure().coldest().equivalentSeconds(), 600 * 5e-5);
    }

    @Test
    void theDegreeOfAnIsothermalHoldIsTheNthOrderClosedForm() {
        // REFERENCES.md section 7 [C], n != 1: alpha = 1 - [1 + (n - 1) k t]^(-1/(n - 1)), k = A exp(-E/RT);
        // DESIGN.md's example rate law (A = 2e7 1/s, E = 80 kJ/mol, n = 1.6) held at 190 C for 300 s.
        double kt = 2.0e7 * Math.exp(-80e3 / (R * k(190))) * 300;
        double exact = 1 - Math.pow(1 + 0.6 * kt, -1 / 0.6);
        SimulationResult result = SIMULATOR.simulate(isothermal(190, 300, CureJobs.nthOrder(2.0e7, 80, 1.6, 0, null)));
        assertEquals(exact, result.cure().coldest().degree(), 1e-6);
    }

    @Test
    void theAnhydrideCuredEpoxyIsNinetyFivePercentCuredAfterItsQuotedTimeAtOneHundredFifty() {
        // REFERENCES.md section 7 [C] from published first-order parameters (ln A = 25, E = 104.6 kJ/mol [F]):
        // t(alpha = 0.95) = 339.6 s at 150 C. The printed 0.05 s moves alpha by k (1 - alpha) x 0.05 = 2.2e-5.
        SimulationResult result = SIMULATOR.simulate(isothermal(150, 339.6,
                CureJobs.nthOrder(Math.exp(25), 104.6, 1, 0, null)));
        assertEquals(0.95, result.cure().coldest().degree(), 3e-5);
    }

    @Test
    void theGlassTransitionIsTheDiBenedettoTgOfTheDegreeReached() {
        // Pascault-Williams form (REFERENCES.md section 7 [M]): Tg = Tg0 + (Tg_inf - Tg0) lambda a / [1 - (1 - lambda) a],
        // with the published calculator's Tg0 = -15 C, Tg_inf = 180 C, lambda = 0.62 [F]; within the rounding of both.
        SimulationResult result = SIMULATOR.simulate(isothermal(190, 120, CureJobs.nthOrder(2.0e7, 80, 1.6, 0,
                new CureKinetics.GlassTransition(-15.0, 180.0, 0.62, null))));
        double a = result.cure().coldest().degree();
        assertEquals(-15 + 195 * 0.62 * a / (1 - 0.38 * a), result.cure().coldest().glassTransitionC(), 1e-3);
    }

    @Test
    void aFigureTheSpecDoesNotAskForIsLeftOutAndAJobWithoutCureHasNoCure() {
        CureReport.Point figures = SIMULATOR.simulate(isothermal(190, 60, CureJobs.timeAbove(180, 0, null)))
                .cure().coldest();
        assertNull(figures.equivalentSeconds());
        assertNull(figures.degree());
        assertNull(figures.glassTransitionC());
        assertNull(SIMULATOR.simulate(isothermal(190, 60, null)).cure());
    }
}
