package dev.dwellwise.cure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class ArrheniusTest {

    @Test
    void theGasConstantIsAvogadroTimesBoltzmann() {
        // CODATA 2018 / 2019 SI: N_A = 6.02214076e23 1/mol and k = 1.380649e-23 J/K exactly, R = N_A k
        // = 8.31446261815324 [C]; REFERENCES.md section 3 quotes 8.314462618 [M]. The constant carries 10 digits.
        assertEquals(6.02214076e23 * 1.380649e-23, Arrhenius.GAS_CONSTANT, 5e-10);
    }

    @Test
    void theEquivalenceFactorIsTheRatioOfRateConstants() {
        // exp[(E/R)(1/T_ref - 1/T)] = k(T)/k(T_ref) for any A: 1 at the reference. Rounding only: 1e-14.
        assertEquals(1, Arrhenius.equivalenceFactor(80e3, 463.15, 463.15), 1e-14);
        double ratio = Arrhenius.rateConstant(2e7, 80e3, 453.15) / Arrhenius.rateConstant(2e7, 80e3, 463.15);
        assertEquals(ratio, Arrhenius.equivalenceFactor(80e3, 463.15, 453.15), 1e-14);
    }
}
