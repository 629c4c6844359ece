package dev.dwellwise.cure;

import static dev.dwellwise.cure.Paths.kelvin;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** The DiBenedetto equation, Pascault–Williams form (J. Polym. Sci. B 28 (1990) 85 [M]). */
class GlassTransitionTest {

    private static final GlassTransitionSpec RESIN =
            new GlassTransitionSpec(kelvin(-15), kelvin(180), 0.62, OptionalDouble.empty());

    @Test
    void theUncuredResinIsAtTgZeroAndTheFullyCuredNetworkAtTgInfinity() {
        // Limits of (Tg - Tg0)/(Tg_inf - Tg0) = lambda alpha / [1 - (1 - lambda) alpha]: 0 at alpha = 0, 1 at alpha = 1.
        assertEquals(kelvin(-15), RESIN.kelvinAt(0), 1e-12);
        assertEquals(kelvin(180), RESIN.kelvinAt(1), 1e-12);
    }

    @Test
    void seventyEightPercentCureGivesTheComputedTg() {
        // REFERENCES.md section 7: Tg0 = -15 C, Tg_inf = 180 C, lambda = 0.62 [F, public Tg calculator page],
        // alpha = 0.78 -> 119.03 C [C]; tolerance half a unit of the printed last digit.
        assertEquals(kelvin(119.03), RESIN.kelvinAt(0.78), 0.005);
    }

    @Test
    void lambdaOfOneMakesTgLinearInTheDegree() {
        // lambda = 1 turns the denominator into 1: Tg = Tg0 + (Tg_inf - Tg0) alpha.
        GlassTransitionSpec linear = new GlassTransitionSpec(300, 400, 1, OptionalDouble.empty());
        assertEquals(340, linear.kelvinAt(0.4), 1e-12);
    }

    @Test
    void theDegreeAtATgUndoesTheEquationAndStaysInsideZeroToOne() {
        // Round trip through the REFERENCES.md section 7 case [C]: degreeAt(119.03 C) = 0.78, where the printed
        // half unit of 0.005 K moves alpha by 2e-5 (d alpha/dTg = 0.0041 /K there), hence 1e-4. Below Tg0 nothing is
        // needed and Tg_inf needs full cure.
        assertEquals(0.78, RESIN.degreeAt(RESIN.kelvinAt(0.78)), 1e-12);
        assertEquals(0.78, RESIN.degreeAt(kelvin(119.03)), 1e-4);
        assertEquals(0, RESIN.degreeAt(kelvin(-40)));
        assertEquals(1, RESIN.degreeAt(kelvin(180)), 1e-12);
    }
}
