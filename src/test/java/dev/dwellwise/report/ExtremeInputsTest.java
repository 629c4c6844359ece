package dev.dwellwise.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.http.Services;
import dev.dwellwise.job.Job;
import org.junit.jupiter.api.Test;

/**
 * Valid but extreme jobs solve to finite answers (or a clear compute-limit problem), never an
 * internal error: no case here has a reference value, only the guarantee that the service does not
 * break at the edges of what it accepts.
 */
class ExtremeInputsTest {

    private final Services services = Services.bundled();

    private SimulationResult simulate(String json) throws Exception {
        return services.simulator().simulate(services.mapper().readValue(json, Job.class));
    }

    private static void assertFinite(SimulationResult r) {
        for (StageReport s : r.stages()) {
            for (double v : new double[] {s.startSeconds(), s.endSeconds(), s.startTemperatureC(),
                    s.endTemperatureC(), s.peakTemperatureC(), s.endSurfaceTemperatureC(), s.endCoreTemperatureC(),
                    s.biotNumber(), s.radiationCoefficientWPerM2K(), s.steadyTemperatureC()}) {
                assertTrue(Double.isFinite(v), s.name() + ": " + v);
            }
        }
    }

    @Test
    void aNearMasslessFrontLayerUnderExtremeConvectionAcrossALateStageBoundarySolves() throws Exception {
        // once gave a step below the clock's resolution at t = 86,400 s, then NaN and an internal error
        SimulationResult r = simulate("""
            {"part": {"layers": [{"material": {"densityKgPerM3": 30, "specificHeatJPerKgK": 1000,
                                               "conductivityWPerMK": 0.03}, "thicknessMm": 0.001},
                                 {"material": "steel-1010", "thicknessMm": 80}],
                      "emissivity": 1, "initialTemperatureC": 20},
             "stages": [{"airTemperatureC": 200, "convectionWPerM2K": 10000, "until": {"seconds": 86400}},
                        {"airTemperatureC": 20, "convectionWPerM2K": 10000, "until": {"seconds": 86400}}],
             "model": "slab", "output": {"series": false}}
            """);
        assertEquals("slab", r.model().used());
        assertEquals(172_800, r.totalSeconds(), 1e-6);
        assertFinite(r);
        // two days in 200 C then 20 C air at h = 10,000: the part ends at the air temperature
        assertEquals(20, r.stages().get(1).endTemperatureC(), 0.01);
    }

    @Test
    void aThickWallAtTheCellLimitWithManyLayersSolves() throws Exception {
        StringBuilder layers = new StringBuilder();
        for (int i = 0; i < 12; i++) {
            layers.append(i == 0 ? "" : ",").append("{\"material\": \"")
                    .append(i % 2 == 0 ? "steel-1010" : "aluminium-pure").append("\", \"thicknessMm\": 10}");
        }
        SimulationResult r = simulate("""
            {"part": {"layers": [%s], "emissivity": 0.8, "initialTemperatureC": 20},
             "stages": [{"airTemperatureC": 600, "convectionWPerM2K": 50, "until": {"seconds": 7200}}],
             "model": "slab", "slabCells": 400, "output": {"series": false}}
            """.formatted(layers));
        assertFinite(r);
    }
}
