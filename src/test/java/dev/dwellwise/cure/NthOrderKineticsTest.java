package dev.dwellwise.cure;

import static dev.dwellwise.cure.Paths.kelvin;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Degree of cure with nth-order kinetics against the isothermal closed forms (REFERENCES.md
 * section 7 [C], exact integration): n = 1, 1 − alpha = (1 − alpha0) e^(−kt); n ≠ 1,
 * (1 − alpha)^(1−n) = (1 − alpha0)^(1−n) − (1 − n) k t.
 */
class NthOrderKineticsTest {

    private static final CureBudget BUDGET = CureBudget.standard();

    /**
     * The integrator's tolerances (1e-11 relative, 1e-12 absolute per step) accumulate over some
     * hundred steps to well under this.
     */
    private static final double INTEGRATION = 1e-9;

    /** A hold long enough for k t = {@code kt} under {@code kinetics} at {@code kelvin}. */
    private static TemperaturePath holdFor(NthOrderKinetics kinetics, double kelvin, double kt) {
        double k = Arrhenius.rateConstant(kinetics.preExponentialPerS(), kinetics.activationEnergyJPerMol(), kelvin);
        return Paths.constant(kelvin, kt / k);
    }

    @Test
    void firstOrderFollowsOneMinusExpOfMinusKt() {
        // REFERENCES.md section 7 [C]: n = 1, alpha = 1 - exp(-k t). DESIGN.md's example rate law
        // (A = 2e7 1/s, E = 80 kJ/mol), first order, held at 190 C for k t = 2.3.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 1, 0);
        double alpha = DegreeOfCure.atEnd(holdFor(kinetics, kelvin(190), 2.3), kinetics, BUDGET);
        assertEquals(1 - Math.exp(-2.3), alpha, INTEGRATION);
    }

    @Test
    void secondOrderIsHalfCuredAtKtOne() {
        // REFERENCES.md section 7 [C]: n = 2, k t = 1 -> alpha = 1 - [1 + (n - 1) k t]^(-1/(n-1)) = 0.5.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 2, 0);
        assertEquals(0.5, DegreeOfCure.atEnd(holdFor(kinetics, kelvin(190), 1), kinetics, BUDGET), INTEGRATION);
    }

    @Test
    void orderOnePointSixFromAnInitialDegreeFollowsTheClosedForm() {
        // REFERENCES.md section 7 [C], n != 1 from alpha0 = 0.2: (1 - alpha)^(-0.6) = 0.8^(-0.6) + 0.6 k t.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 1.6, 0.2);
        double kt = 3;
        double exact = 1 - Math.pow(Math.pow(0.8, -0.6) + 0.6 * kt, -1 / 0.6);
        assertEquals(exact, DegreeOfCure.atEnd(holdFor(kinetics, kelvin(185), kt), kinetics, BUDGET), INTEGRATION);
    }

    @Test
    void anOrderBelowOneReachesFullCureInFiniteTimeAndStaysThereWithoutNaN() {
        // REFERENCES.md section 7 closed form [C] with n = 0.5: (1 - alpha)^0.5 = 1 - 0.5 k t, so alpha = 0.75
        // at k t = 1 and alpha = 1 from k t = 2 on.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 0.5, 0);
        assertEquals(0.75, DegreeOfCure.atEnd(holdFor(kinetics, kelvin(190), 1), kinetics, BUDGET), INTEGRATION);
        assertEquals(1.0, DegreeOfCure.atEnd(holdFor(kinetics, kelvin(190), 2), kinetics, BUDGET), INTEGRATION);
        assertEquals(1.0, DegreeOfCure.atEnd(holdFor(kinetics, kelvin(190), 6), kinetics, BUDGET));
    }

    @Test
    void orderZeroCuresLinearlyUntilFull() {
        // REFERENCES.md section 7 closed form [C] with n = 0: alpha = k t up to 1. The rate law must not keep going at alpha = 1, where (1 - alpha)^0 = 1.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 0, 0);
        assertEquals(0.4, DegreeOfCure.atEnd(holdFor(kinetics, kelvin(190), 0.4), kinetics, BUDGET), INTEGRATION);
        assertEquals(1.0, DegreeOfCure.atEnd(holdFor(kinetics, kelvin(190), 2), kinetics, BUDGET));
    }

    @Test
    void theAnhydrideCuredEpoxyIllustrationIsNinetyFivePercentCuredAfterItsQuotedTime() {
        // REFERENCES.md section 7: DGEBA/anhydride, first order, E = 104.6 kJ/mol, ln A = 25 [F, abstract];
        // k(150 C) = 8.82e-3 1/s and t(0.95) = 339.6 s, k(120 C) = 9.13e-4 1/s and t(0.95) = 3283 s [C].
        // Tolerances from the printed rounding: half a unit of k's third digit; for alpha, the rate
        // k (1 - alpha) times half a unit of the printed time (0.05 s: 2.2e-5; 0.5 s: 2.3e-5), rounded up to 3e-5.
        NthOrderKinetics kinetics = new NthOrderKinetics(Math.exp(25), 104.6e3, 1, 0);
        assertEquals(8.82e-3, Arrhenius.rateConstant(Math.exp(25), 104.6e3, kelvin(150)), 0.005e-3);
        assertEquals(9.13e-4, Arrhenius.rateConstant(Math.exp(25), 104.6e3, kelvin(120)), 0.005e-4);
        assertEquals(0.95, DegreeOfCure.atEnd(Paths.constant(kelvin(150), 339.6), kinetics, BUDGET), 3e-5);
        assertEquals(0.95, DegreeOfCure.atEnd(Paths.constant(kelvin(120), 3283), kinetics, BUDGET), 3e-5);
    }

    @Test
    void onAComputedHistoryTheDegreeIsTheIsothermalClosedFormAtTheEquivalentTime() {
        // For separable kinetics with one activation energy the degree is a function of the equivalent
        // time alone (REFERENCES.md section 6; Prime 1997 [M]): along any history, alpha equals the
        // isothermal closed form at T_ref run for t_eq. A real lumped bake and cool, order 1.6; both
        // sides are integrated to about 1e-9, so they agree to INTEGRATION.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 1.6, 0);
        var history = LumpedRuns.run(20, LumpedRuns.stage("bake", 200, 30, 600), LumpedRuns.stage("cool", 24, 20, 600));
        TemperaturePath path = TemperaturePath.coldestOf(history);
        double reference = kelvin(180);
        double equivalent = EquivalentTime.seconds(path, reference, 80e3, BUDGET);
        double kt = Arrhenius.rateConstant(2.0e7, 80e3, reference) * equivalent;
        double exact = 1 - Math.pow(1 + 0.6 * kt, -1 / 0.6);
        assertEquals(exact, DegreeOfCure.atEnd(path, kinetics, BUDGET), INTEGRATION);
    }

    @Test
    void aSliverOfAPieceLeftByAnEventCutCountsWithoutBreakingTheIntegration() {
        // A stage cut by an event just after a step end leaves a piece far shorter than Commons Math's
        // smallest integration interval (1e-12 relative); the degree must be that of the same path without it.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 1.6, 0);
        double k = Arrhenius.rateConstant(2.0e7, 80e3, kelvin(190));
        double kt = 2;
        TemperaturePath withSliver = TemperaturePath.of(t -> kelvin(190), 0, 0.5 / k, 0.5 / k + 1e-14, kt / k);
        assertEquals(1 - Math.pow(1 + 0.6 * kt, -1 / 0.6), DegreeOfCure.atEnd(withSliver, kinetics, BUDGET),
                INTEGRATION);
    }

    @Test
    void aPathOfNoDurationLeavesTheInitialDegree() {
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 1.6, 0.3);
        assertEquals(0.3, DegreeOfCure.atEnd(TemperaturePath.of(t -> kelvin(190)), kinetics, BUDGET));
    }
}
