package dev.dwellwise.cure;

import static dev.dwellwise.cure.Paths.kelvin;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.thermal.DenseHistory;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** The entry point on real lumped histories: every figure the spec asks for, at both points. */
class CureAnalysisTest {

    private static final GlassTransitionSpec RESIN =
            new GlassTransitionSpec(kelvin(-15), kelvin(180), 0.62, OptionalDouble.of(kelvin(110)));
    private static final NthOrderKinetics RATE_LAW = new NthOrderKinetics(2.0e7, 80e3, 1.6, 0);

    private static final CureSpec FULL = new CureSpec(
            Optional.of(new TimeAboveSpec(kelvin(170), 480, OptionalDouble.empty())),
            Optional.of(new EquivalentTimeSpec(kelvin(180), 80e3, 420, OptionalDouble.of(1800))),
            Optional.of(new KineticsSpec(RATE_LAW, 0.95, Optional.of(RESIN))));

    /** 600 s in 200 C air at h = 30, then 600 s in 24 C air at h = 20: the steel plate of LumpedRuns. */
    private static DenseHistory bakeAndCool() {
        return LumpedRuns.run(20, LumpedRuns.stage("bake", 200, 30, 600), LumpedRuns.stage("cool", 24, 20, 600));
    }

    @Test
    void aLumpedHistoryHasTheSameFiguresAtItsColdestAndHottestPoint() {
        CureResult result = CureAnalysis.of(FULL, bakeAndCool());
        assertEquals(result.coldest(), result.hottest());
    }

    @Test
    void everyFigureTheSpecAsksForComesFromItsOwnCalculationOverTheWholeHistory() {
        CureFigures figures = CureAnalysis.of(FULL, bakeAndCool()).coldest();
        // Time above 170 C between the closed-form crossings of the two stages (Incropera Eqs. 5.6-5.7 [M];
        // see TimeAboveTest), 1e-4 s.
        double tau1 = LumpedRuns.tau(30);
        double tau2 = LumpedRuns.tau(20);
        double at600 = 200 - 180 * Math.exp(-600 / tau1);
        double above = 600 + tau2 * Math.log((at600 - 24) / (170 - 24)) - tau1 * Math.log(180 / 30.0);
        assertEquals(above, figures.timeAboveSeconds().getAsDouble(), 1e-4);
        // Equivalent time over both stages: an independent Simpson sum of the two closed-form exponentials,
        // 1e-7 relative as in EquivalentTimeTest.
        double reference = EquivalentTimeTest.simpson(t -> Arrhenius.equivalenceFactor(80e3, kelvin(180),
                kelvin(bakeAndCoolC(t, tau1, tau2, at600))), 0, 600, 20_000)
                + EquivalentTimeTest.simpson(t -> Arrhenius.equivalenceFactor(80e3, kelvin(180),
                kelvin(bakeAndCoolC(t, tau1, tau2, at600))), 600, 1200, 20_000);
        double equivalent = figures.equivalentSeconds().getAsDouble();
        assertEquals(reference, equivalent, 1e-7 * reference);
        // Separable kinetics: the isothermal closed form [C] at T_ref run for t_eq (REFERENCES.md section 6 [M];
        // see NthOrderKineticsTest), 1e-9.
        double kt = Arrhenius.rateConstant(2.0e7, 80e3, kelvin(180)) * equivalent;
        double degree = figures.degree().getAsDouble();
        assertEquals(1 - Math.pow(1 + 0.6 * kt, -1 / 0.6), degree, 1e-9);
        assertEquals(RESIN.kelvinAt(degree), figures.glassTransitionK().getAsDouble());
    }

    @Test
    void aFigureTheSpecDoesNotAskForIsAbsent() {
        CureSpec timeOnly = new CureSpec(Optional.of(new TimeAboveSpec(kelvin(170), 480, OptionalDouble.empty())),
                Optional.empty(), Optional.empty());
        CureFigures figures = CureAnalysis.of(timeOnly, bakeAndCool()).coldest();
        assertTrue(figures.timeAboveSeconds().isPresent());
        assertTrue(figures.equivalentSeconds().isEmpty());
        assertTrue(figures.degree().isEmpty());
        assertTrue(figures.glassTransitionK().isEmpty());
        CureSpec withoutTg = new CureSpec(Optional.empty(), Optional.empty(),
                Optional.of(new KineticsSpec(RATE_LAW, 0.95, Optional.empty())));
        CureFigures kineticsOnly = CureAnalysis.of(withoutTg, bakeAndCool()).coldest();
        assertTrue(kineticsOnly.degree().isPresent());
        assertTrue(kineticsOnly.glassTransitionK().isEmpty());
    }

    @Test
    void aHistoryOfNoDurationHasNoTimeAboveNoEquivalentTimeAndTheInitialDegree() {
        // A job whose only stage ends at once (its condition already met) leaves an empty dense history.
        CureFigures figures = CureAnalysis.of(FULL, new DenseHistory()).coldest();
        assertEquals(0, figures.timeAboveSeconds().getAsDouble());
        assertEquals(0, figures.equivalentSeconds().getAsDouble());
        assertEquals(0, figures.degree().getAsDouble());
        assertEquals(kelvin(-15), figures.glassTransitionK().getAsDouble(), 1e-12);
    }

    /** The closed-form temperature of the bake-and-cool history, Celsius. */
    private static double bakeAndCoolC(double t, double tau1, double tau2, double at600) {
        return t <= 600 ? 200 - 180 * Math.exp(-t / tau1) : 24 + (at600 - 24) * Math.exp(-(t - 600) / tau2);
    }
}
