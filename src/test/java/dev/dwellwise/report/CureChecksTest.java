package dev.dwellwise.report;

import static dev.dwellwise.report.CureJobs.R;
import static dev.dwellwise.report.CureJobs.check;
import static dev.dwellwise.report.CureJobs.isothermal;
import static dev.dwellwise.report.CureJobs.job;
import static dev.dwellwise.report.CureJobs.tau;
import static dev.dwellwise.report.CureJobs.timed;
import static dev.dwellwise.report.CureJobs.withCure;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.cure.CureComputationException;
import dev.dwellwise.job.Cure;
import dev.dwellwise.job.CureKinetics;
import dev.dwellwise.job.Job;
import org.junit.jupiter.api.Test;

/**
 * The verdicts of the cure checks on histories known in closed form (see {@link CureJobs}): each
 * passes with its figure on the right side of its limit and fails on the wrong side, minimums at the
 * coldest point, maximums at the hottest. The closed-form figure sits half a second (or 1e-3 of
 * degree) from the limit, far beyond the figures' accuracy (1e-4 s, 1e-9).
 */
class CureChecksTest {

    private static final Simulator SIMULATOR = CureJobs.simulator();

    /** 20 C in 200 C air at h = 30 for 900 s: 180 C from tau ln 9 = 248.952 s (REFERENCES.md section 2 [C]) on. */
    private static final double ABOVE_180 = 900 - tau(30) * Math.log(9);

    private static Job bake(Cure cure) {
        return job(20, cure, timed("bake", 200, 30, 900));
    }

    @Test
    void timeAbovePassesAboveItsMinimumAndFailsBelowIt() {
        CheckResult pass = check(SIMULATOR.simulate(bake(CureJobs.timeAbove(180, ABOVE_180 - 0.5, null))),
                CureChecks.TIME_ABOVE);
        assertEquals(CheckResult.PASS, pass.status());
        assertEquals(ABOVE_180, pass.value(), 1e-3);
        SimulationResult failed = SIMULATOR.simulate(bake(CureJobs.timeAbove(180, ABOVE_180 + 0.5, null)));
        CheckResult fail = check(failed, CureChecks.TIME_ABOVE);
        assertEquals(CheckResult.FAIL, fail.status());
        assertEquals(ABOVE_180 + 0.5, fail.limit());
        assertEquals(SimulationResult.FAIL, failed.verdict());
    }

    @Test
    void aTimeAboveMaximumIsTheOverBakeSideAndNamesTheHottestPointsFigure() {
        CheckResult pass = check(SIMULATOR.simulate(bake(CureJobs.timeAbove(180, 600, ABOVE_180 + 0.5))),
                CureChecks.TIME_ABOVE);
        assertEquals(CheckResult.PASS, pass.status());
        assertEquals(600, pass.limit(), "with both ends met the minimum is the one shown");
        CheckResult fail = check(SIMULATOR.simulate(bake(CureJobs.timeAbove(180, 600, ABOVE_180 - 0.5))),
                CureChecks.TIME_ABOVE);
        assertEquals(CheckResult.FAIL, fail.status());
        assertEquals(ABOVE_180 - 0.5, fail.limit());
        assertEquals(ABOVE_180, fail.value(), 1e-3);
        assertTrue(fail.detail().contains("over-bake"), fail.detail());
    }

    @Test
    void equivalentTimeIsJudgedAgainstBothEndsOfTheCureWindow() {
        // 190 C for 600 s at E = 80 kJ/mol: exp[(E/R)(1/453.15 - 1/463.15)] x 600 = 948.96 s at 180 C
        // (multiplier 1.5816, REFERENCES.md section 6 [C]), here from the exact factor.
        double worth = 600 * Math.exp(80e3 / R * (1 / 453.15 - 1 / 463.15));
        assertEquals(CheckResult.PASS, equivalentTimeCheck(worth - 0.5, worth + 0.5).status());
        CheckResult tooShort = equivalentTimeCheck(worth + 0.5, null);
        assertEquals(CheckResult.FAIL, tooShort.status());
        assertEquals(worth + 0.5, tooShort.limit());
        CheckResult overBaked = equivalentTimeCheck(worth - 100, worth - 0.5);
        assertEquals(CheckResult.FAIL, overBaked.status());
        assertEquals(worth - 0.5, overBaked.limit());
        assertEquals(worth, overBaked.value(), 1e-3);
    }

    private static CheckResult equivalentTimeCheck(double min, Double max) {
        return check(SIMULATOR.simulate(isothermal(190, 600, CureJobs.equivalentTime(180, 80, min, max))),
                CureChecks.EQUIVALENT_TIME);
    }

    @Test
    void theDegreeCheckPassesAtOrAboveItsMinimumAndFailsBelowIt() {
        // REFERENCES.md section 7 [C]: n = 1.6 held at 190 C for 300 s, alpha = 1 - [1 + 0.6 k t]^(-1/0.6).
        double kt = 2.0e7 * Math.exp(-80e3 / (R * 463.15)) * 300;
        double alpha = 1 - Math.pow(1 + 0.6 * kt, -1 / 0.6);
        CheckResult pass = degreeCheck(alpha - 1e-3);
        assertEquals(CheckResult.PASS, pass.status());
        assertEquals(alpha, pass.value(), 1e-6);
        CheckResult fail = degreeCheck(alpha + 1e-3);
        assertEquals(CheckResult.FAIL, fail.status());
        assertEquals(alpha + 1e-3, fail.limit());
    }

    private static CheckResult degreeCheck(double minDegree) {
        return check(SIMULATOR.simulate(isothermal(190, 300, CureJobs.nthOrder(2.0e7, 80, 1.6, minDegree, null))),
                CureChecks.DEGREE);
    }

    @Test
    void aGlassTransitionMinimumIsItsOwnCheckOnTheTgOfTheDegreeReached() {
        // The Tg of the degree reached by the DiBenedetto equation (CureFiguresTest) against a minimum 0.5 K either side.
        double tg = SIMULATOR.simulate(isothermal(190, 120, withTg(null))).cure().coldest().glassTransitionC();
        CheckResult pass = check(SIMULATOR.simulate(isothermal(190, 120, withTg(tg - 0.5))), CureChecks.GLASS_TRANSITION);
        assertEquals(CheckResult.PASS, pass.status());
        assertEquals(tg, pass.value());
        CheckResult fail = check(SIMULATOR.simulate(isothermal(190, 120, withTg(tg + 0.5))), CureChecks.GLASS_TRANSITION);
        assertEquals(CheckResult.FAIL, fail.status());
        assertEquals(tg + 0.5, fail.limit(), 1e-9);
        assertEquals(CheckResult.PASS, check(SIMULATOR.simulate(isothermal(190, 120, withTg(tg + 0.5))),
                CureChecks.DEGREE).status(), "the degree is judged on its own minimum");
    }

    private static Cure withTg(Double minC) {
        return CureJobs.nthOrder(2.0e7, 80, 1.6, 0.5, new CureKinetics.GlassTransition(-15.0, 180.0, 0.62, minC));
    }

    @Test
    void aCureTheStagesCanNeverReachIsAFailWithAReasonNotAnError() {
        // A 200 C oven cannot hold any point at 250 C: the part settles at the air temperature (no radiation).
        CheckResult check = check(SIMULATOR.simulate(bake(CureJobs.timeAbove(250, 600, null))), CureChecks.TIME_ABOVE);
        assertEquals(CheckResult.FAIL, check.status());
        assertEquals(0, check.value());
        assertTrue(check.detail().contains("never gets hot enough"), check.detail());
        assertTrue(check.detail().contains("settles it at 200.0 °C"), check.detail());
    }

    @Test
    void aCureTooSlowForAnyPracticalHoldAtTheOvensTemperatureSaysThePartNeverGetsHotEnough() {
        // At 60 C an 80 kJ/mol cure runs exp[(E/R)(1/333.15 - 1/453.15)] = 1.7e-4 of its pace at 180 C, so the
        // missing 600 s would take some forty days, beyond a day's practical hold.
        Job lukewarm = job(20, CureJobs.equivalentTime(180, 80, 600, null), timed("oven", 60, 30, 900));
        CheckResult check = check(SIMULATOR.simulate(lukewarm), CureChecks.EQUIVALENT_TIME);
        assertEquals(CheckResult.FAIL, check.status());
        assertTrue(check.detail().contains("never gets hot enough"), check.detail());
    }

    @Test
    void aStageThatEndedBeforeThePartWasHotEnoughIsToBeLengthenedWithoutAnEstimate() {
        // After 150 s in 200 C air the part is at 200 - 180 exp(-150/tau) = 152.8 C, below the 180 C of the spec,
        // though the stage would take it to 200 C.
        Job shortBake = job(20, CureJobs.timeAbove(180, 600, null), timed("bake", 200, 30, 150));
        CheckResult check = check(SIMULATOR.simulate(shortBake), CureChecks.TIME_ABOVE);
        assertEquals(CheckResult.FAIL, check.status());
        assertFalse(check.detail().contains("about"), check.detail());
        assertTrue(check.detail().contains("lengthen 'bake' (the part was heading for 200.0 °C)"), check.detail());
    }

    @Test
    void aSlabIsJudgedForUnderCureAtItsColdestPointAndForOverBakeAtItsHottest() {
        // 40 mm of steel at h = 300: Bi = 300 x 0.02 / 63.9 = 0.094 per face, so the mid-plane lags the faces and
        // spends less time above 180 C. A limit halfway between the two points' figures tells which point is judged.
        Job thick = CureJobs.onSlab(job(20, CureJobs.timeAbove(180, 0, null), timed("bake", 200, 300, 1800)), 40);
        CureReport figures = SIMULATOR.simulate(thick).cure();
        double coldest = figures.coldest().timeAboveSeconds();
        double hottest = figures.hottest().timeAboveSeconds();
        assertTrue(hottest > coldest + 10, () -> "surface " + hottest + " s, core " + coldest + " s");
        double between = (coldest + hottest) / 2;
        CheckResult underCured = check(SIMULATOR.simulate(withCure(thick, CureJobs.timeAbove(180, between, null))),
                CureChecks.TIME_ABOVE);
        assertEquals(CheckResult.FAIL, underCured.status());
        assertEquals(coldest, underCured.value());
        CheckResult overBaked = check(SIMULATOR.simulate(withCure(thick, CureJobs.timeAbove(180, 0, between))),
                CureChecks.TIME_ABOVE);
        assertEquals(CheckResult.FAIL, overBaked.status());
        assertEquals(hottest, overBaked.value());
    }

    @Test
    void aSlabsEquivalentTimeMinimumIsJudgedAtItsColdestPointAndItsMaximumAtItsHottest() {
        // The same 40 mm slab: its mid-plane lags the faces, so its history is worth less time at 180 C
        // (E = 80 kJ/mol). A minimum halfway between the two points' figures fails on the coldest point's
        // figure; a maximum there fails on the hottest point's.
        Job thick = CureJobs.onSlab(job(20, CureJobs.equivalentTime(180, 80, 0, null), timed("bake", 200, 300, 1800)), 40);
        CureReport figures = SIMULATOR.simulate(thick).cure();
        double coldest = figures.coldest().equivalentSeconds();
        double hottest = figures.hottest().equivalentSeconds();
        assertTrue(hottest > coldest + 10, () -> "surface " + hottest + " s, core " + coldest + " s");
        double between = (coldest + hottest) / 2;
        CheckResult underCured = check(SIMULATOR.simulate(withCure(thick, CureJobs.equivalentTime(180, 80, between, null))),
                CureChecks.EQUIVALENT_TIME);
        assertEquals(CheckResult.FAIL, underCured.status(), underCured.detail());
        assertEquals(coldest, underCured.value());
        assertEquals(between, underCured.limit());
        CheckResult overBaked = check(SIMULATOR.simulate(withCure(thick, CureJobs.equivalentTime(180, 80, 0, between))),
                CureChecks.EQUIVALENT_TIME);
        assertEquals(CheckResult.FAIL, overBaked.status(), overBaked.detail());
        assertEquals(hottest, overBaked.value());
        assertEquals(between, overBaked.limit());
    }

    @Test
    void aSlabsDegreeOfCureMinimumIsJudgedAtItsColdestPoint() {
        // The same slab with a slow nth-order cure (A = 2e5 /s, E = 80 kJ/mol, n = 1.6: k(190 C) = 1.9e-4 /s
        // [C], so neither point is near full cure after 1,800 s) and a minimum degree halfway between the two
        // points' degrees: under-cured at the lagging mid-plane, whatever the faces reached.
        Job thick = CureJobs.onSlab(job(20, CureJobs.nthOrder(2.0e5, 80, 1.6, 0.0, null),
                timed("bake", 200, 300, 1800)), 40);
        CureReport figures = SIMULATOR.simulate(thick).cure();
        double coldest = figures.coldest().degree();
        double hottest = figures.hottest().degree();
        assertTrue(hottest > coldest + 1e-3 && hottest < 0.99, () -> "surface " + hottest + ", core " + coldest);
        double between = (coldest + hottest) / 2;
        CheckResult underCured = check(SIMULATOR.simulate(withCure(thick, CureJobs.nthOrder(2.0e5, 80, 1.6, between,
                null))), CureChecks.DEGREE);
        assertEquals(CheckResult.FAIL, underCured.status(), underCured.detail());
        assertEquals(coldest, underCured.value());
        assertEquals(between, underCured.limit());
    }


    @Test
    void aCureFigureBeyondItsBudgetIsAComputationErrorNotAVerdict() {
        Simulator stingy = CureJobs.simulator(new CureBudget(50));
        assertThrows(CureComputationException.class,
                () -> stingy.simulate(bake(CureJobs.nthOrder(2.0e7, 80, 1.6, 0.9, null))));
    }
}
