package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BisectionSolver;
import org.junit.jupiter.api.Test;

/**
 * The "precise semantics" of DESIGN.md section 3 that clients rely on: one clock, samples on absolute
 * multiples plus boundaries, conditions already met, holds counted from the stage start, conditions
 * never met, ramps. Expected values are closed forms of the lumped convection model
 * (T = T_air − (T_air − T_i) e^(−t/tau), Incropera Eqs. 5.6–5.7 [M]) or follow from the definitions.
 */
class StageSemanticsTest {

    private static final Material STEEL = Parts.steel1010();
    private static final double K = Physics.KELVIN_OFFSET;

    private static ThermalHistory run(ThermalPart part, double sample, StageConditions... stages) {
        return StageRunner.run(Parts.problem(part, sample, stages), new LumpedModel());
    }

    @Test
    void samplesFallOnAbsoluteMultiplesAndEachBoundaryAppearsOnceWithTheStageStartingThere() {
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 20);
        ThermalHistory h = run(part, 10,
                Parts.stage("a", 200, 200, 30, new EndCondition.AfterDuration(25), 25),
                Parts.stage("b", 200, 200, 30, new EndCondition.AfterDuration(20), 20));
        assertArrayEquals(new double[] {0, 10, 20, 25, 30, 40, 45}, h.series().timeSeconds(), 1e-12);
        assertArrayEquals(new int[] {0, 0, 0, 1, 1, 1, 1}, h.series().stageIndex());
        assertEquals(45, h.totalSeconds(), 1e-12);
    }

    @Test
    void aSampleOnAStepEndInsideAStageIsKeptExactlyOnce() {
        // a stepper whose steps end on sample times must not lose those samples
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 20);
        ThermalProblem p = Parts.problem(part, 5,
                Parts.stage("a", 200, 200, 30, new EndCondition.AfterDuration(30), 30));
        ThermalModel fixedSteps = new ThermalModel() {
            @Override
            public String name() {
                return "lumped";
            }

            @Override
            public String method() {
                return "lumped in windows of exactly 5 s";
            }

            @Override
            public double tolerance() {
                return LumpedModel.RELATIVE_TOLERANCE;
            }

            @Override
            public Stepper newStepper(ThermalPart thermalPart, ComputeBudget budget, Deadline deadline) {
                Stepper inner = new LumpedModel().newStepper(thermalPart, budget, deadline);
                return new Stepper() {
                    public void enterStage(StageConditions stage) {
                        inner.enterStage(stage);
                    }

                    public double time() {
                        return inner.time();
                    }

                    public Observation observe() {
                        return inner.observe();
                    }

                    public Segment advance(double limit) {
                        return inner.advance(Math.min(limit, inner.time() + 5));
                    }

                    public void cutAt(double t) {
                        inner.cutAt(t);
                    }

                    public long steps() {
                        return inner.steps();
                    }

                    public long evaluations() {
                        return inner.evaluations();
                    }

                    public double[] profilePositionsM() {
                        return inner.profilePositionsM();
                    }
                };
            }
        };
        ThermalHistory h = StageRunner.run(p, fixedSteps);
        assertArrayEquals(new double[] {0, 5, 10, 15, 20, 25, 30}, h.series().timeSeconds(), 1e-9);
    }

    @Test
    void aConditionAlreadyMetAtTheStageStartEndsTheStageAtOnce() {
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 150);
        ThermalHistory h = run(part, 10,
                Parts.stage("already hot", 200, 200, 30, new EndCondition.ColdestReaches(K + 100), 600),
                Parts.stage("then", 200, 200, 30, new EndCondition.AfterDuration(10), 10));
        StageOutcome first = h.stages().get(0);
        assertEquals(StageEnd.REACHED, first.ended());
        assertEquals(0, first.endSeconds(), 0);
        assertEquals(0, h.stages().get(1).startSeconds(), 0);
    }

    @Test
    void zeroLengthStagesShareOneBoundarySampleCarryingTheLastStageThatStartsThere() {
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 150);
        ThermalHistory h = run(part, 10,
                Parts.stage("met", 200, 200, 30, new EndCondition.ColdestReaches(K + 100), 600),
                Parts.stage("met too", 200, 200, 30, new EndCondition.ColdestReaches(K + 120), 600),
                Parts.stage("bake", 200, 200, 30, new EndCondition.AfterDuration(20), 20),
                Parts.stage("met at the end", 20, 20, 30, new EndCondition.HottestFallsTo(K + 400), 600));
        assertArrayEquals(new double[] {0, 10, 20}, h.series().timeSeconds(), 1e-12);
        assertArrayEquals(new int[] {2, 2, 3}, h.series().stageIndex());
    }

    @Test
    void aHoldCountsFromTheStageStartWhenThePartIsAlreadyAbove() {
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 190);
        ThermalHistory h = run(part, 10,
                Parts.stage("hold", 200, 200, 30, new EndCondition.HoldAbove(K + 180, 300), 3600));
        assertEquals(StageEnd.HOLD_COMPLETE, h.stages().get(0).ended());
        assertEquals(300, h.stages().get(0).endSeconds(), 1e-9);
    }

    @Test
    void aHoldCompletesAtTheCrossingTimePlusTheHoldSeconds() {
        // tau = rho c Lc / h = 113.303 s (REFERENCES.md section 2 [C]); 180 C crossing at tau ln 9
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 20);
        ThermalHistory h = run(part, 10,
                Parts.stage("hold", 200, 200, 30, new EndCondition.HoldAbove(K + 180, 600), 3600));
        double tau = 7832 * 434 * 0.001 / 30;
        assertEquals(tau * Math.log(9) + 600, h.stages().get(0).endSeconds(), 1e-6);
        assertEquals(600, h.stages().get(0).holdSecondsAccumulated(), 1e-9);
    }

    @Test
    void aHoldInterruptedByCoolingKeepsTheTimeAlreadyAccumulatedAcrossTheDip() {
        // ONE hold stage (holds are cumulative within the stage, DESIGN.md "Holds"): the part starts above
        // 180 C while the air ramps from 100 C to 300 C over the stage's 1,000 s bound, so it first cools
        // through 180 C, dips, and is carried back above it by the rising air. With convection only, the
        // linear ODE tau dT/dt = T_a(t) - T, T_a = a + r t, has the exact solution
        // T(t) = a + r (t - tau) + (T0 - a + r tau) e^(-t/tau) (the ramp form used above) [C]; the crossings
        // t1 (down) and t2 (back up) are its roots, found below by bisection on the closed form. The hold of
        // 60 s then completes at t2 + (60 - t1): the first spell counts, a clock restarted at the dip would
        // complete at t2 + 60 instead. (A job on the wire may ramp only a timed stage; the runner takes any
        // stage, and a ramp is the one way the air turns the part round within a single stage.)
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 200);
        StageConditions rampUp = new StageConditions("dip and recover", K + 100, K + 300, K + 100, K + 300, 30,
                new EndCondition.HoldAbove(K + 180, 60), 1000);
        StageOutcome hold = run(part, 10, rampUp).stages().get(0);
        double tau = 7832 * 434 * 0.001 / 30;
        double r = 200.0 / 1000;
        UnivariateFunction above = t ->
                100 + r * (t - tau) + (200 - 100 + r * tau) * Math.exp(-t / tau) - 180;
        double coldest = tau * Math.log((200 - 100 + r * tau) / (r * tau)); // dT/dt = 0 [C]
        assertTrue(above.value(coldest) < -40, "the closed form dips well below 180 C");
        double t1 = bisect(above, 0, coldest);
        double t2 = bisect(above, coldest, 1000);
        assertTrue(t1 > 20, "a first spell worth telling apart: " + t1 + " s");
        assertEquals(StageEnd.HOLD_COMPLETE, hold.ended());
        assertEquals(60, hold.holdSecondsAccumulated(), 1e-9);
        assertEquals(t2 + 60 - t1, hold.endSeconds(), 1e-4); // [C] closed-form crossings; lumped target 0.05 s
    }

    @Test
    void aPartThatStartsAboveTheHoldAndCoolsBelowItHasHeldUntilTheClosedFormCrossing() {
        // 200 C part in 100 C air, hold above 150 C for 600 s within a 300 s stage: the coldest point is above
        // from the stage start until T = T_air + (T0 - T_air) e^(-t/tau) crosses 150 C, at
        // t = tau ln((T0 - T_air)/(T_x - T_air)) = tau ln 2 = 78.536 s (Incropera Eqs. 5.6-5.7 [M], tau = 113.303 s
        // from REFERENCES.md section 2 [C]); the stage then runs out, and that time is what it held.
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 200);
        StageOutcome hold = run(part, 10, Parts.stage("falling short", 100, 100, 30,
                new EndCondition.HoldAbove(K + 150, 600), 300)).stages().get(0);
        double tau = 7832 * 434 * 0.001 / 30;
        assertEquals(StageEnd.MAX_SECONDS, hold.ended());
        assertEquals(300, hold.endSeconds(), 1e-9);
        assertEquals(78.536, tau * Math.log(2), 1e-3); // [C] tau ln 2
        assertEquals(tau * Math.log(2), hold.holdSecondsAccumulated(), 1e-4); // [C]; lumped target 0.05 s
    }

    /**
     * A root of {@code f} in [lo, hi], where f changes sign, by Commons Math's bisection: a different
     * method from the Brent solver the service places its events with.
     */
    private static double bisect(UnivariateFunction f, double lo, double hi) {
        return new BisectionSolver(1e-12, 1e-12).solve(200, f, lo, hi);
    }

    @Test
    void aTargetNeverReachedEndsAtMaxSecondsAndReportsTheSteadyTemperature() {
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0.9, 20);
        ThermalHistory h = run(part, 60,
                Parts.stage("too cool", 170, 170, 30, new EndCondition.ColdestReaches(K + 180), 1800),
                Parts.stage("next", 20, 20, 10, new EndCondition.AfterDuration(60), 60));
        StageOutcome s = h.stages().get(0);
        assertEquals(StageEnd.MAX_SECONDS, s.ended());
        assertEquals(1800, s.endSeconds(), 1e-9);
        assertEquals(K + 170, s.steadyK(), 1e-9, "air and surroundings equal: steady at the air temperature");
        assertEquals(1860, h.totalSeconds(), 1e-9, "the later stages still run");
    }

    @Test
    void theSteadyTemperatureBalancesConvectionAgainstColderSurroundings() {
        // root of h (Ta - T) + eps sigma (Ts^4 - T^4) = 0, checked by putting it back into the balance
        double steady = SteadyState.temperatureK(20, K + 200, 0.9, K + 100, K + 20);
        assertTrue(steady > K + 100 && steady < K + 200);
        assertEquals(0, Physics.surfaceFlux(20, K + 200, 0.9, K + 100, steady), 1e-8);
    }

    @Test
    void withNoHeatExchangeThePartKeepsItsTemperatureAndThatIsItsSteadyTemperature() {
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 20);
        ThermalHistory h = run(part, 10,
                Parts.stage("insulated transfer", 100, 100, 0, new EndCondition.ColdestReaches(K + 50), 600));
        StageOutcome s = h.stages().get(0);
        assertEquals(StageEnd.MAX_SECONDS, s.ended());
        assertEquals(K + 20, s.end().meanK(), 1e-9);
        assertEquals(K + 20, s.steadyK(), 1e-9);
    }

    @Test
    void aRampStageFollowsTheLinearAirTemperatureAndItsSteadyUsesTheEndValues() {
        // with no radiation and h large the part tracks the ramp one time constant behind:
        // T(t) = Ta(t) - r tau (1 - e^(-t/tau)) for Ta(t) = T0 + r t starting at T0 (linear ODE, exact)
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 20);
        StageConditions ramp = new StageConditions("ramp", K + 20, K + 140, K + 20, K + 140, 30,
                new EndCondition.AfterDuration(600), 600);
        ThermalHistory h = run(part, 50, ramp);
        double tau = 7832 * 434 * 0.001 / 30;
        double r = 120.0 / 600;
        double[] t = h.series().timeSeconds();
        double[] temp = h.series().meanK();
        for (int i = 0; i < t.length; i++) {
            double exact = K + 20 + r * t[i] - r * tau * (1 - Math.exp(-t[i] / tau));
            assertEquals(exact, temp[i], 1e-6, "t = " + t[i]);
        }
        assertEquals(K + 140, h.stages().get(0).steadyK(), 1e-9);
    }

    @Test
    void theLargestRadiationCoefficientAndBiotNumberFollowTheirDefinitions() {
        // h_r = eps sigma (T + Tsur)(T^2 + Tsur^2) (Incropera Eq. 1.9 [M]); REFERENCES.md section 2 [C]:
        // 20.290 W/m2K at 453.15 K against 473.15 K surroundings for eps 0.9
        assertEquals(20.290, Physics.radiationCoefficient(0.9, 453.15, 473.15), 5e-4);
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0.9, 20);
        ThermalHistory h = run(part, 10,
                Parts.stage("bake", 200, 200, 30, new EndCondition.ColdestReaches(453.15), 3600));
        StageOutcome s = h.stages().get(0);
        assertEquals(Physics.radiationCoefficient(0.9, 453.15, 473.15), s.largestRadiationCoefficient(), 1e-6);
        double k = STEEL.conductivity().minimumOver(293.15, 453.15);
        assertEquals((30 + s.largestRadiationCoefficient()) * 0.001 / k, s.biotNumber(), 1e-12);
    }

    @Test
    void aLayeredWallsBiotNumberUsesTheSeriesConductivityOfItsLayers() {
        // 2 mm of steel (k 63.9) with a 1 mm insulating layer (the invented test solid, k 0.6), both faces
        // exposed, eps 0.9, heated to 180 C in 200 C air (h = 30) and surroundings. DESIGN.md "Biot number and
        // radiation": Bi = (h + h_r,max) (L / faces) / k_eff with, for layers, k_eff = L / sum(t_i / k_i), the
        // series thermal resistance of a plane wall (any heat-transfer textbook, e.g. Incropera ch. 3 [M]):
        // 0.003 / (0.002 / 63.9 + 0.001 / 0.6) = 1.7668 W/mK [C], where the arithmetic mean of the k would be 32.25.
        ThermalPart part = new ThermalPart(List.of(new Layer(STEEL, 0.002), new Layer(Parts.testSolid(), 0.001)),
                2, 0.9, K + 20);
        StageOutcome s = run(part, 10,
                Parts.stage("bake", 200, 200, 30, new EndCondition.ColdestReaches(453.15), 3600)).stages().get(0);
        // h_r = eps sigma (T + Tsur)(T^2 + Tsur^2) at the end, 453.15 K against 473.15 K (Incropera Eq. 1.9 [M]),
        // written out here: 20.290 W/m2K, REFERENCES.md section 2 [C]
        double hr = 0.9 * 5.670374419e-8 * (453.15 + 473.15) * (453.15 * 453.15 + 473.15 * 473.15);
        assertEquals(20.290, hr, 5e-4);
        assertEquals(hr, s.largestRadiationCoefficient(), 1e-6);
        double kEffective = 0.003 / (0.002 / 63.9 + 0.001 / 0.6);
        assertEquals(1.7668, kEffective, 1e-4); // [C] series resistance
        double expected = (30 + hr) * (0.003 / 2) / kEffective; // [C] 0.042695
        assertEquals(expected, s.biotNumber(), 1e-6 * expected);
    }

    @Test
    void thePeakInsideARampDownIsFoundBetweenSamples() {
        // the air falls through the part's temperature mid-stage: the part peaks where T = T_air,
        // between steps; the peak must exceed every sample and the stage ends
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 100);
        StageConditions ramp = new StageConditions("over the top", K + 200, K + 20, K + 200, K + 20, 30,
                new EndCondition.AfterDuration(900), 900);
        ThermalHistory h = run(part, 300, ramp);
        double sampledMax = 0;
        for (double v : h.series().meanK()) {
            sampledMax = Math.max(sampledMax, v);
        }
        assertTrue(h.peakK() > sampledMax + 1, "peak " + h.peakK() + " vs samples " + sampledMax);
        // the peak lies on the air line: T(t*) = Ta(t*) where dT/dt = 0; find t* from the dense history
        DenseHistory d = h.dense();
        double best = 0;
        for (double t = 0; t <= 900; t += 0.01) {
            best = Math.max(best, d.at(t).hottestK());
        }
        assertEquals(best, h.peakK(), 1e-6);
    }

    @Test
    void profileTimesAreHonouredWithUniformProfilesForTheLumpedModel() {
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 20);
        ThermalProblem p = new ThermalProblem(part, List.of(
                Parts.stage("bake", 200, 200, 30, new EndCondition.AfterDuration(300), 300)), 10,
                ComputeBudget.standard(), List.of(0.0, 100.0));
        ThermalHistory h = StageRunner.run(p, new LumpedModel());
        assertEquals(2, h.profiles().size());
        double tau = 7832 * 434 * 0.001 / 30;
        assertEquals(K + 200 - 180 * Math.exp(-100 / tau), h.profiles().get(1).temperaturesK()[0], 1e-6);
    }

    @Test
    void aConditionAtTheAirTemperatureItselfIsMetWhereThePartSettles() {
        // 2 mm steel, convection only (h = 30): T = T_air - 180 e^(-t/tau) never reaches 200 C. The lumped
        // solve counts it reached, and a hold at it begun, where the part settles: where it comes within
        // the settle band b = 1e-7 K + 1e-8 T of it, at tau ln(180 / b) in closed form, not wherever the
        // integration first touched 200 C (by rounding, or by the dense output's overshoot of a hair),
        // which a stiff part might not do within its step budget at all, nor at the end of the step
        // that entered the band (a step there spans a time constant or more).
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 20);
        double air = K + 200;
        double band = 1e-7 + 1e-8 * air;
        double tau = 7832 * 434 * 0.001 / 30;
        for (EndCondition end : List.of(new EndCondition.ColdestReaches(air), new EndCondition.HoldAbove(air, 300))) {
            StageOutcome oven = run(part, 60, Parts.stage("oven", 200, 200, 30, end, 9000)).stages().get(0);
            boolean hold = end instanceof EndCondition.HoldAbove;
            assertEquals(hold ? StageEnd.HOLD_COMPLETE : StageEnd.REACHED, oven.ended(), end.toString());
            assertSettlesWhereTheBandIsEntered(oven.endSeconds() - (hold ? 300 : 0), tau, 180, band);
        }
    }

    @Test
    void coolingToTheAirTemperatureItselfEndsWhereThePartSettles() {
        // from 200 C into 28 C air: T = T_air + 172 e^(-t/tau)
        ThermalPart part = Parts.plate(STEEL, 0.002, 2, 0, 200);
        double air = K + 28;
        double tau = 7832 * 434 * 0.001 / 12;
        StageOutcome tunnel = run(part, 60, Parts.stage("tunnel", 28, 28, 12, new EndCondition.HottestFallsTo(air),
                20_000)).stages().get(0);
        assertEquals(StageEnd.REACHED, tunnel.ended());
        assertSettlesWhereTheBandIsEntered(tunnel.endSeconds(), tau, 172, 1e-7 + 1e-8 * air);
    }

    /**
     * {@code t} is where the closed-form gap {@code gap0 e^(-t/tau)} enters the band, give or take the
     * solve's own error there: a temperature error e moves that time by tau ln(b / (b -+ e)); e up to
     * half the band is allowed (measured: a sixth of it at most), so the window is -0.41 tau to +0.69 tau.
     */
    private static void assertSettlesWhereTheBandIsEntered(double t, double tau, double gap0, double band) {
        double earliest = tau * Math.log(gap0 / (1.5 * band));
        double latest = tau * Math.log(gap0 / (0.5 * band));
        assertTrue(t >= earliest && t <= latest, t + " s, the band entered at " + tau * Math.log(gap0 / band)
                + " s, tau " + tau);
    }
}
