package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The slab's fluxes and their Jacobian: Newton is only quadratic (and the solver only "not lagged")
 * if dF/dT is exact, so it is checked against central differences of F itself, with radiation,
 * tabulated properties and a layer interface all present.
 */
class SlabEquationsTest {

    /** AISI 1010 k and cp at 300, 400, 600, 800 K: REFERENCES.md section 4 (Incropera Table A.1 [M]). */
    static Material steelTable() {
        return new Material("steel-1010-table", "AISI 1010, tabulated", 7832,
                PropertyCurve.table(new double[] {300, 400, 600, 800}, new double[] {434, 487, 559, 685}),
                PropertyCurve.table(new double[] {300, 400, 600, 800}, new double[] {63.9, 58.7, 48.8, 39.2}),
                "Incropera Table A.1 [M]");
    }

    /** An invented insulating layer whose conductivity rises with temperature. */
    static Material insulation() {
        return new Material("test-insulation", "invented insulation", 150,
                PropertyCurve.table(new double[] {250, 700}, new double[] {800, 1200}),
                PropertyCurve.table(new double[] {250, 700}, new double[] {0.04, 0.09}), "invented for the tests");
    }

    @Test
    void jacobianMatchesCentralDifferencesOfTheFluxes() {
        ThermalPart part = new ThermalPart(List.of(new Layer(steelTable(), 0.004), new Layer(insulation(), 0.01)),
                2, 0.85, 300);
        SlabGrid grid = SlabGrid.of(part, 6);
        SlabEquations equations = new SlabEquations(grid);
        int n = grid.cells();
        StageConditions ramp = new StageConditions("ramp", 350, 520, 450, 600, 35,
                new EndCondition.AfterDuration(900), 900);
        SurfaceExposure exposure = new SurfaceExposure(ramp, 100, part.emissivity());
        double t = 400;
        double[] temps = new double[n];
        for (int i = 0; i < n; i++) {
            temps[i] = 330 + 23.7 * i + 5 * Math.sin(i); // uneven, and clear of the table points
        }
        SlabEquations.Linearisation at = new SlabEquations.Linearisation(n);
        equations.evaluate(t, temps, exposure, at);
        SlabEquations.Linearisation plus = new SlabEquations.Linearisation(n);
        SlabEquations.Linearisation minus = new SlabEquations.Linearisation(n);
        double delta = 1e-3; // K: central differences err by O(delta^2 F''') ~ 1e-9 of the entries
        for (int j = 0; j < n; j++) {
            double[] up = temps.clone();
            double[] down = temps.clone();
            up[j] += delta;
            down[j] -= delta;
            equations.evaluate(t, up, exposure, plus);
            equations.evaluate(t, down, exposure, minus);
            for (int i = Math.max(0, j - 1); i <= Math.min(n - 1, j + 1); i++) {
                double numeric = (plus.flux[i] - minus.flux[i]) / (2 * delta);
                double analytic = i == j ? at.diagonal[i] : i == j - 1 ? at.upper[i] : at.lower[i];
                double scale = Math.abs(at.diagonal[i]);
                assertEquals(numeric, analytic, 1e-6 * scale, "dF_" + i + "/dT_" + j);
            }
        }
    }

    @Test
    void fluxesOfTheInteriorCancelSoTheirSumIsTheFaceFluxes() {
        ThermalPart part = new ThermalPart(List.of(new Layer(steelTable(), 0.004), new Layer(insulation(), 0.01)),
                2, 0.85, 300);
        SlabGrid grid = SlabGrid.of(part, 8);
        SlabEquations equations = new SlabEquations(grid);
        int n = grid.cells();
        SurfaceExposure exposure = new SurfaceExposure(Parts.stage("bake", 200, 220, 30,
                new EndCondition.AfterDuration(600), 600), 0, part.emissivity());
        double[] temps = new double[n];
        for (int i = 0; i < n; i++) {
            temps[i] = 320 + 10 * i;
        }
        SlabEquations.Linearisation at = new SlabEquations.Linearisation(n);
        equations.evaluate(50, temps, exposure, at);
        double sum = 0;
        for (double f : at.flux) {
            sum += f;
        }
        double front = equations.faceTemperature(0, 50, temps[0], exposure);
        double back = equations.faceTemperature(n - 1, 50, temps[n - 1], exposure);
        double faces = exposure.flux(50, front) + exposure.flux(50, back);
        assertEquals(faces, sum, 1e-9 * Math.abs(faces), "conservation form: interior fluxes telescope");
        // The face temperature passes the arriving flux on through the half cell.
        double conductance = 1 / equations.halfCellResistance(0, temps[0]);
        assertEquals(exposure.flux(50, front), conductance * (front - temps[0]), 1e-9 * Math.abs(exposure.flux(50, front)));
    }
}
