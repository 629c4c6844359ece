package dev.dwellwise.report;

import static dev.dwellwise.report.CureJobs.R;
import static dev.dwellwise.report.CureJobs.check;
import static dev.dwellwise.report.CureJobs.isothermal;
import static dev.dwellwise.report.CureJobs.job;
import static dev.dwellwise.report.CureJobs.proposedHold;
import static dev.dwellwise.report.CureJobs.timed;
import static dev.dwellwise.report.CureJobs.withStageSeconds;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.job.Cure;
import dev.dwellwise.job.CureKinetics;
import dev.dwellwise.job.Job;
import org.junit.jupiter.api.Test;

/**
 * The extra hold a failed cure minimum proposes, taken at its word: the job is run again with the
 * hold stage lengthened by the proposal, and the check must then pass. On an isothermal hold the
 * proposal is also tight (a couple of seconds less must still fail), since the part is exactly at
 * the hold temperature; on a heating part it errs long, as the part keeps warming during the hold.
 */
class HoldAdviceTest {

    private static final Simulator SIMULATOR = CureJobs.simulator();

    /** 400 s of bake in 200 C air from 20 C (the part ends near 195 C, still heating), then 600 s cooling in 24 C. */
    private static Job bakeAndCool(Cure cure) {
        return job(20, cure, timed("bake", 200, 30, 400), timed("cool", 24, 20, 600));
    }

    /** Runs the job, asserts the check failed, lengthens stage {@code index} by the proposal, and returns the re-run check. */
    private static CheckResult afterProposedHold(Job job, int index, String name) {
        CheckResult failed = check(SIMULATOR.simulate(job), name);
        assertEquals(CheckResult.FAIL, failed.status(), failed.detail());
        long hold = proposedHold(failed);
        double seconds = job.stages().get(index).until().seconds();
        return check(SIMULATOR.simulate(withStageSeconds(job, index, seconds + hold)), name);
    }

    @Test
    void theProposedHoldForTimeAboveBringsAHeatingPartToItsMinimum() {
        Job job = bakeAndCool(CureJobs.timeAbove(180, 600, null));
        assertEquals(CheckResult.PASS, afterProposedHold(job, 0, CureChecks.TIME_ABOVE).status());
    }

    @Test
    void theProposedHoldForEquivalentTimeBringsAHeatingPartToItsMinimum() {
        Job job = bakeAndCool(CureJobs.equivalentTime(180, 80, 900, null));
        assertEquals(CheckResult.PASS, afterProposedHold(job, 0, CureChecks.EQUIVALENT_TIME).status());
    }

    @Test
    void theProposedHoldForTheDegreeBringsAHeatingPartToItsMinimum() {
        Job job = bakeAndCool(CureJobs.nthOrder(2.0e7, 80, 1.6, 0.98, null));
        assertEquals(CheckResult.PASS, afterProposedHold(job, 0, CureChecks.DEGREE).status());
    }

    @Test
    void theProposedHoldForTheGlassTransitionBringsAHeatingPartToItsMinimum() {
        Job job = bakeAndCool(CureJobs.nthOrder(2.0e7, 80, 1.6, 0,
                new CureKinetics.GlassTransition(-15.0, 180.0, 0.62, 170.0)));
        assertEquals(CheckResult.PASS, afterProposedHold(job, 0, CureChecks.GLASS_TRANSITION).status());
    }

    @Test
    void onAnIsothermalHoldTheProposedDegreeHoldIsTheClosedFormShortfallRoundedUp() {
        // REFERENCES.md section 7 [C]: t(alpha) = [(1 - alpha)^(1 - n) - 1] / [(n - 1) k] at 190 C for n = 1.6;
        // the hold from 300 s to alpha = 0.99 is t(0.99) - 300, and the sentence rounds it up to whole seconds.
        double k = 2.0e7 * Math.exp(-80e3 / (R * 463.15));
        double needed = (Math.pow(0.01, -0.6) - 1) / (0.6 * k) - 300;
        Job job = isothermal(190, 300, CureJobs.nthOrder(2.0e7, 80, 1.6, 0.99, null));
        CheckResult failed = check(SIMULATOR.simulate(job), CureChecks.DEGREE);
        long hold = proposedHold(failed);
        assertEquals((long) Math.ceil(needed), hold);
        assertTrue(failed.detail().contains("in 'hold' (coldest point at or above 190.0 °C)"), failed.detail());
        assertEquals(CheckResult.PASS, check(SIMULATOR.simulate(withStageSeconds(job, 0, 300 + hold)),
                CureChecks.DEGREE).status());
        assertEquals(CheckResult.FAIL, check(SIMULATOR.simulate(withStageSeconds(job, 0, 300 + hold - 2)),
                CureChecks.DEGREE).status());
    }

    @Test
    void theHoldStageIsTheLastStageHotterThanTheThresholdHeldAtNoMoreThanItsSteadyTemperature() {
        // Zone 1 at 220 C takes the part to 214.1 C in 400 s; zone 2 at 190 C (still above the 180 C threshold) lets
        // it fall toward 190 C, so the hold is estimated at 190 C, not at the 194.1 C the part ends zone 2 with.
        Job job = job(20, CureJobs.timeAbove(180, 1200, null), timed("zone 1", 220, 30, 400),
                timed("zone 2", 190, 30, 200), timed("cool", 24, 20, 600));
        CheckResult failed = check(SIMULATOR.simulate(job), CureChecks.TIME_ABOVE);
        assertTrue(failed.detail().contains("in 'zone 2' (coldest point at or above 190.0 °C)"), failed.detail());
        assertEquals(CheckResult.PASS, afterProposedHold(job, 1, CureChecks.TIME_ABOVE).status());
    }
}
