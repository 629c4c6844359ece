package dev.dwellwise.cure;

import static dev.dwellwise.cure.Paths.kelvin;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Arrhenius equivalent time against ASTM C1074's summation form, published multipliers, and an
 * independent quadrature of the lumped closed form.
 */
class EquivalentTimeTest {

    private static final CureBudget BUDGET = CureBudget.standard();

    /** Rounding of a sum of a few exact terms: the integrand is constant on every piece. */
    private static final double ROUNDING = 1e-12;

    /** ASTM C1074 equivalent age, one term: exp[−Q (1/Ta − 1/Ts)] Δt with Q = E/R. */
    private static double c1074Term(double activationEnergy, double actualK, double specifiedK, double seconds) {
        double q = activationEnergy / Arrhenius.GAS_CONSTANT;
        return Math.exp(-q * (1 / actualK - 1 / specifiedK)) * seconds;
    }

    @Test
    void anIsothermalHistoryIsWorthItsDurationTimesTheC1074Factor() {
        // ASTM C1074 equivalent age te = sum exp[-Q(1/Ta - 1/Ts)] dt (REFERENCES.md section 6, formula [M]),
        // by hand: 1200 s at 170 C, Ts = 180 C, E = 80 kJ/mol.
        double byHand = c1074Term(80e3, kelvin(170), kelvin(180), 1200);
        double computed = EquivalentTime.seconds(Paths.constant(kelvin(170), 1200), kelvin(180), 80e3, BUDGET);
        assertEquals(byHand, computed, ROUNDING * byHand);
    }

    @Test
    void aTwoStepHistoryIsTheC1074SumOfItsSteps() {
        // ASTM C1074 summation form (REFERENCES.md section 6 [M]), two terms by hand: 600 s at 160 C then
        // 900 s at 195 C, Ts = 180 C, E = 80 kJ/mol. The path jumps at the step: each piece must use its own side.
        double byHand = c1074Term(80e3, kelvin(160), kelvin(180), 600) + c1074Term(80e3, kelvin(195), kelvin(180), 900);
        TemperaturePath twoSteps = Paths.steps(new double[] {kelvin(160), kelvin(195)}, new double[] {600, 900});
        assertEquals(byHand, EquivalentTime.seconds(twoSteps, kelvin(180), 80e3, BUDGET), ROUNDING * byHand);
    }

    @Test
    void theMultipliersToTwentyFiveCelsiusMatchTheNistHydrationModel() {
        // NIST (Bentz et al., cement hydration model, ciks.cbt.nist.gov "node16") [F]: E = 38.2 kJ/mol gives
        // multipliers 0.585 at 15 C and 1.65 at 35 C to equivalent time at 25 C. Tolerance: one unit in the
        // last printed digit (the formula gives 0.5858, which NIST printed as 0.585).
        // REFERENCES.md section 6 [C]: 0.58580 and 1.64884 with R = 8.314462618, checked to half a unit of
        // their last digit.
        double at15 = EquivalentTime.seconds(Paths.constant(kelvin(15), 3600), kelvin(25), 38.2e3, BUDGET) / 3600;
        double at35 = EquivalentTime.seconds(Paths.constant(kelvin(35), 3600), kelvin(25), 38.2e3, BUDGET) / 3600;
        assertEquals(0.585, at15, 1e-3);
        assertEquals(1.65, at35, 1e-2);
        assertEquals(0.58580, at15, 5e-6);
        assertEquals(1.64884, at35, 5e-6);
    }

    @Test
    void tenDegreesAboveAHundredAndEightyCelsiusIsWorthTheComputedMultipliers() {
        // REFERENCES.md section 6 [C]: 190 C relative to T_ref = 180 C is worth 1.4103 (E = 60 kJ/mol),
        // 1.5816 (80) and 1.7737 (100); tolerance half a unit of the last printed digit.
        double[] energies = {60e3, 80e3, 100e3};
        double[] multipliers = {1.4103, 1.5816, 1.7737};
        for (int i = 0; i < energies.length; i++) {
            double t = EquivalentTime.seconds(Paths.constant(kelvin(190), 600), kelvin(180), energies[i], BUDGET);
            assertEquals(multipliers[i], t / 600, 5e-5, "E = " + energies[i]);
        }
    }

    @Test
    void exponentialHeatingMatchesAnIndependentSimpsonSumOfTheClosedForm() {
        // Lumped convection closed form (Incropera Eqs. 5.6-5.7 [M]) integrated by a composite Simpson rule
        // written here (20,000 intervals: its error ~h^4 is below 1e-12 relative). The quadrature is asked
        // for 1e-10 per piece; 1e-9 relative leaves room for the sum over 36 pieces.
        double air = kelvin(200);
        double initial = kelvin(20);
        double tau = 113.303;
        double reference = simpson(t -> Arrhenius.equivalenceFactor(80e3, kelvin(180),
                Paths.exponentialAt(air, initial, tau, t)), 0, 1800, 20_000);
        TemperaturePath path = Paths.exponential(air, initial, tau, 1800, 50);
        assertEquals(reference, EquivalentTime.seconds(path, kelvin(180), 80e3, BUDGET), 1e-9 * reference);
    }

    @Test
    void aComputedLumpedHistoryGivesTheEquivalentTimeOfItsClosedForm() {
        // A real DenseHistory of the lumped back end (steel plate, h = 30, 20 C into 200 C air for 1800 s)
        // against the Simpson sum of its closed-form exponential. LumpedModel's tolerance leaves about 1e-6 K
        // on the history (its Javadoc), which moves the factor by (E/RT^2) dT ~ 5e-8 relative: hence 1e-7.
        double tau = LumpedRuns.tau(30);
        var history = LumpedRuns.run(20, LumpedRuns.stage("bake", 200, 30, 1800));
        double reference = simpson(t -> Arrhenius.equivalenceFactor(80e3, kelvin(180),
                Paths.exponentialAt(kelvin(200), kelvin(20), tau, t)), 0, 1800, 20_000);
        double computed = EquivalentTime.seconds(TemperaturePath.coldestOf(history), kelvin(180), 80e3, BUDGET);
        assertEquals(reference, computed, 1e-7 * reference);
    }

    @Test
    void aPathOfNoDurationIsWorthNothing() {
        assertEquals(0, EquivalentTime.seconds(TemperaturePath.of(t -> kelvin(180), 5), kelvin(180), 80e3, BUDGET));
    }

    static double simpson(java.util.function.DoubleUnaryOperator f, double a, double b, int intervals) {
        double h = (b - a) / intervals;
        double sum = f.applyAsDouble(a) + f.applyAsDouble(b);
        for (int i = 1; i < intervals; i++) {
            sum += f.applyAsDouble(a + i * h) * (i % 2 == 1 ? 4 : 2);
        }
        return sum * h / 3;
    }
}
