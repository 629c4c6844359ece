package dev.dwellwise.report;

import static dev.dwellwise.report.CureJobs.check;
import static dev.dwellwise.report.CureJobs.job;
import static dev.dwellwise.report.CureJobs.tau;
import static dev.dwellwise.report.CureJobs.timed;
import static dev.dwellwise.report.CureJobs.withLimits;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.job.Job;
import dev.dwellwise.job.Limits;
import org.junit.jupiter.api.Test;

/**
 * The thermal limit checks of DESIGN.md section 3 ("Checks") on histories known in closed form (the
 * convection-only 2 mm plate of {@link CureJobs}: T(t) = T_air + (T_0 − T_air) exp(−t/tau), tau =
 * rho c Lc / h, Incropera Eqs. 5.6–5.7 [M]; tau = 113.303 s at h = 30, REFERENCES.md section 2 [C]),
 * and on a slab whose core and surface differ: {@code peak-temperature} and {@code handling-temperature}
 * read the hottest point, {@code heating-rate} the largest rise of the mean; every limit is inclusive.
 */
class ChecksTest {

    private static final Simulator SIMULATOR = CureJobs.simulator();

    /** The plate from 20 C in 200 C air at h = 30 for 300 s. */
    private static Job bake(Limits limits) {
        return withLimits(job(20, null, timed("bake", 200, 30, 300)), limits);
    }

    @Test
    void thePeakOfAHeatingPlateIsItsClosedFormEndTemperatureAndALimitAtItPasses() {
        // [C] the exponential at t = 300 s: 200 - 180 exp(-300 / 113.303) = 187.3 C; reported to 1e-4 K
        double closedForm = 200 - 180 * Math.exp(-300 / tau(30));
        CheckResult generous = check(SIMULATOR.simulate(bake(new Limits(230.0, null, null))), "peak-temperature");
        assertEquals(CheckResult.PASS, generous.status());
        assertEquals(closedForm, generous.value(), 1e-3); // [C]; lumped target 0.01 K
        // the limit is inclusive ("within the limit" for peakC <= limitC): a limit equal to the reported
        // figure passes, one a rounding unit (1e-4 K) below it fails
        double peak = generous.value();
        CheckResult atLimit = check(SIMULATOR.simulate(bake(new Limits(peak, null, null))), "peak-temperature");
        assertEquals(CheckResult.PASS, atLimit.status(), atLimit.detail());
        assertEquals(peak, atLimit.value());
        assertTrue(atLimit.detail().contains("within the"), atLimit.detail());
        CheckResult justBelow = check(SIMULATOR.simulate(bake(new Limits(peak - 1e-4, null, null))),
                "peak-temperature");
        assertEquals(CheckResult.FAIL, justBelow.status(), justBelow.detail());
    }

    @Test
    void aPartSettledAtTheOvenTemperaturePassesAPeakLimitSetToThatTemperature() {
        // convection only: the part approaches the 200 C air and settles at exactly it (3,000 s = 26 tau;
        // 180 e^-26 = 1e-9 K [C]), never above; a peak limit at the oven's 200 C is met with equality
        Job soak = withLimits(job(20, null, timed("soak", 200, 30, 3000)), new Limits(200.0, null, null));
        CheckResult peak = check(SIMULATOR.simulate(soak), "peak-temperature");
        assertEquals(200.0, peak.value(), 0.0);
        assertEquals(CheckResult.PASS, peak.status(), peak.detail());
    }

    @Test
    void theHeatingRateIsTheClosedFormRateOfTheMeanAtTheStageStart() {
        // [C] dT/dt = (T_air - T) / tau is largest at t = 0: (200 - 20) / 113.303 s = 1.58866 K/s = 95.3197 C/min
        double closedForm = (200 - 20) / tau(30) * 60;
        CheckResult pass = check(SIMULATOR.simulate(bake(new Limits(null, null, closedForm + 0.01))), "heating-rate");
        assertEquals(CheckResult.PASS, pass.status(), pass.detail());
        assertEquals(closedForm, pass.value(), 1e-3); // [C]; reported to 1e-4
        CheckResult fail = check(SIMULATOR.simulate(bake(new Limits(null, null, closedForm - 0.01))), "heating-rate");
        assertEquals(CheckResult.FAIL, fail.status(), fail.detail());
        assertEquals(closedForm, fail.value(), 1e-3);
        CheckResult atLimit = check(SIMULATOR.simulate(bake(new Limits(null, null, pass.value()))), "heating-rate");
        assertEquals(CheckResult.PASS, atLimit.status(), "the limit is inclusive: " + atLimit.detail());
    }

    @Test
    void aSlabLeavingTheLineWithAHotCoreFailsHandlingEvenWhenItsSurfaceIsBelowTheLimit() {
        // 40 mm of steel from 200 C into 20 C air at h = 300 for 120 s (Bi = 300 x 0.02 / 63.9 = 0.094 per face;
        // measured: core 129.4 C, surface 124.4 C at the end):
        // the faces cool ahead of the mid-plane, so at the end the core is the hottest point. A handling limit
        // halfway between the two end temperatures must fail: the hottest point decides.
        Job cooling = CureJobs.onSlab(job(200, null, timed("cool", 20, 300, 120)), 40);
        SimulationResult free = SIMULATOR.simulate(cooling);
        StageReport cool = free.stages().get(0);
        double core = cool.endCoreTemperatureC();
        double surface = cool.endSurfaceTemperatureC();
        assertTrue(core > surface + 2, () -> "core " + core + " C, surface " + surface + " C");
        double between = (core + surface) / 2;

        CheckResult handling = check(SIMULATOR.simulate(withLimits(cooling, new Limits(null, between, null))),
                "handling-temperature");
        assertEquals(CheckResult.FAIL, handling.status(), handling.detail());
        assertEquals(between, handling.limit());
        assertTrue(handling.value() >= core - 1e-4, "the hottest point, at least the core: " + handling.value());
        assertTrue(handling.detail().contains("at the hottest point"), handling.detail());

        CheckResult aboveTheCore = check(SIMULATOR.simulate(withLimits(cooling, new Limits(null, core + 0.5, null))),
                "handling-temperature");
        assertEquals(CheckResult.PASS, aboveTheCore.status(), aboveTheCore.detail());
    }
}
