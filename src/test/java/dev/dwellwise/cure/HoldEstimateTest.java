package dev.dwellwise.cure;

import static dev.dwellwise.cure.Paths.kelvin;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** Further hold at a constant temperature, against closed forms and by running the hold. */
class HoldEstimateTest {

    private static final CureBudget BUDGET = CureBudget.standard();

    private static CureSpec spec(Kinetics kinetics, double minDegree) {
        return new CureSpec(Optional.of(new TimeAboveSpec(kelvin(180), 600, OptionalDouble.empty())),
                Optional.of(new EquivalentTimeSpec(kelvin(190), 80e3, 420, OptionalDouble.empty())),
                Optional.of(new KineticsSpec(kinetics, minDegree, Optional.empty())));
    }

    private static CureFigures figures(double timeAbove, double equivalent, double degree) {
        return new CureFigures(OptionalDouble.of(timeAbove), OptionalDouble.of(equivalent), OptionalDouble.of(degree),
                OptionalDouble.empty());
    }

    @Test
    void theMissingEquivalentTimeIsStretchedByTheHoldsArrheniusFactor() {
        // 220 equivalent seconds at 190 C are missing; at 180 C each second is worth 1/1.5816 of one at
        // 190 C (REFERENCES.md section 6 [C], E = 80 kJ/mol), so the hold is 220 x 1.5816 s, to the
        // multiplier's half unit of its last digit.
        HoldEstimate estimate = HoldEstimate.of(spec(new NthOrderKinetics(2.0e7, 80e3, 1, 0), 0.95),
                figures(0, 200, 0), kelvin(180), BUDGET);
        assertEquals(220 * 1.5816, estimate.equivalentTimeSeconds().getAsDouble(), 220 * 5e-5);
    }

    @Test
    void runningTheEstimatedHoldBringsTheEquivalentTimeToItsMinimum() {
        // 300 s at 170 C, then the estimated hold at 185 C: the two-step history is worth the minimum,
        // to the quadrature's 1e-9 relative.
        CureSpec spec = spec(new NthOrderKinetics(2.0e7, 80e3, 1, 0), 0.95);
        TemperaturePath first = Paths.constant(kelvin(170), 300);
        CureFigures now = CureAnalysis.along(spec, first, BUDGET);
        double hold = HoldEstimate.of(spec, now, kelvin(185), BUDGET).equivalentTimeSeconds().getAsDouble();
        TemperaturePath withHold = Paths.steps(new double[] {kelvin(170), kelvin(185)}, new double[] {300, hold});
        assertEquals(420, EquivalentTime.seconds(withHold, kelvin(190), 80e3, BUDGET), 420 * 1e-9);
    }

    @Test
    void theMissingDegreeOfAFirstOrderCureTakesLnOfTheRemainingRatioOverK() {
        // First order isothermal closed form (REFERENCES.md section 7 [C]): from alpha to alpha_min in
        // ln[(1 - alpha)/(1 - alpha_min)] / k; the event is located to 1e-9 s, the integration leaves 1e-9 relative.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 1, 0);
        double k = Arrhenius.rateConstant(2.0e7, 80e3, kelvin(185));
        double exact = Math.log(0.5 / 0.05) / k;
        double estimated = HoldEstimate.of(spec(kinetics, 0.95), figures(0, 0, 0.5), kelvin(185), BUDGET)
                .degreeSeconds().getAsDouble();
        assertEquals(exact, estimated, 1e-8 * exact);
    }

    @Test
    void theAnhydrideCuredEpoxyReachesNinetyFivePercentAtOneHundredFiftyCelsiusInItsQuotedTime() {
        // REFERENCES.md section 7 [C]: ln A = 25, E = 104.6 kJ/mol, first order: t(0.95) = 339.6 s at 150 C,
        // printed to 0.1 s (so within 0.05 s).
        NthOrderKinetics kinetics = new NthOrderKinetics(Math.exp(25), 104.6e3, 1, 0);
        assertEquals(339.6, DegreeOfCure.secondsToReach(kinetics, kelvin(150), 0, 0.95, BUDGET).getAsDouble(), 0.05);
    }

    @Test
    void anOrderBelowOneReachesFullCureInItsFiniteTime() {
        // n = 0.5: alpha = 1 at k t = 1/(1 - n) = 2 (REFERENCES.md section 7 closed form [C]). There
        // 1 - alpha = (k (t_f - t) / 2)^2 touches 0 with zero slope, so an error e in alpha moves the arrival
        // by sqrt(e) relative: about 3e-6 for the integration's 1e-11, hence 1e-5.
        NthOrderKinetics kinetics = new NthOrderKinetics(2.0e7, 80e3, 0.5, 0);
        double k = Arrhenius.rateConstant(2.0e7, 80e3, kelvin(185));
        assertEquals(2 / k, DegreeOfCure.secondsToReach(kinetics, kelvin(185), 0, 1, BUDGET).getAsDouble(),
                1e-5 * (2 / k));
    }

    @Test
    void kineticsThatNeverGetThereGiveNoEstimate() {
        // Kamal-Sourour with k1 = 0 from alpha = 0 never starts; an order >= 1 only approaches alpha = 1.
        Kinetics unseeded = new KamalSourourKinetics(0, 89.1e3, 3.0e5, 68.8e3, 0.5, 1.7, 0);
        assertTrue(HoldEstimate.of(spec(unseeded, 0.9), figures(0, 0, 0), kelvin(190), BUDGET).degreeSeconds().isEmpty());
        Kinetics firstOrder = new NthOrderKinetics(2.0e7, 80e3, 1, 0);
        assertTrue(DegreeOfCure.secondsToReach(firstOrder, kelvin(190), 0.5, 1, BUDGET).isEmpty());
    }

    @Test
    void theMissingTimeAboveIsTheShortfallIfTheHoldIsAtOrAboveTheThresholdAndUnknownBelowIt() {
        CureSpec spec = spec(new NthOrderKinetics(2.0e7, 80e3, 1, 0), 0.95);
        assertEquals(150, HoldEstimate.of(spec, figures(450, 0, 0), kelvin(180), BUDGET).timeAboveSeconds().getAsDouble());
        assertTrue(HoldEstimate.of(spec, figures(450, 0, 0), kelvin(179), BUDGET).timeAboveSeconds().isEmpty());
    }

    @Test
    void aFigureThatAlreadyMeetsItsMinimumNeedsNoMoreHoldEvenBelowTheThreshold() {
        HoldEstimate estimate = HoldEstimate.of(spec(new NthOrderKinetics(2.0e7, 80e3, 1, 0), 0.95),
                figures(600, 500, 0.96), kelvin(150), BUDGET);
        assertEquals(0, estimate.timeAboveSeconds().getAsDouble());
        assertEquals(0, estimate.equivalentTimeSeconds().getAsDouble());
        assertEquals(0, estimate.degreeSeconds().getAsDouble());
    }

    @Test
    void aPartTheSpecDoesNotHaveGivesNoEstimate() {
        CureSpec none = new CureSpec(Optional.empty(), Optional.empty(), Optional.empty());
        HoldEstimate estimate = HoldEstimate.of(none, figures(0, 0, 0), kelvin(190), BUDGET);
        assertTrue(estimate.timeAboveSeconds().isEmpty());
        assertTrue(estimate.equivalentTimeSeconds().isEmpty());
        assertTrue(estimate.degreeSeconds().isEmpty());
    }
}
