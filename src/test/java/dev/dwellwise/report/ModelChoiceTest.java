package dev.dwellwise.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.dwellwise.http.Services;
import dev.dwellwise.job.Job;
import org.junit.jupiter.api.Test;

/**
 * The model choice of DESIGN.md section 3: {@code auto} keeps the lumped model below Bi = 0.1 and
 * solves the slab above it; a forced lumped model above it still runs but fails model-validity with
 * the surface-to-core difference the slab model finds.
 */
class ModelChoiceTest {

    private final Services services = Services.bundled();
    private final ObjectMapper mapper = services.mapper();

    /** A 60 mm steel block in a hot radiant furnace: Bi = (h + h_r) (L/2) / k is about 0.1 to 0.2. */
    private Job thickBlock(String model, String extra) throws Exception {
        return mapper.readValue("""
            {"part": {"material": "steel-plain-carbon", "thicknessMm": 60, "emissivity": 0.85,
                      "initialTemperatureC": 20},
             "stages": [{"airTemperatureC": 650, "convectionWPerM2K": 40, "until": {"partAboveC": 550},
                         "maxSeconds": 20000}],
             "model": "%s" %s}
            """.formatted(model, extra), Job.class);
    }

    @Test
    void autoSolvesTheSlabModelWhenTheBiotNumberIsAtOrAboveTheLimit() throws Exception {
        SimulationResult r = services.simulator().simulate(thickBlock("auto", ""));
        assertEquals("slab", r.model().used());
        assertTrue(r.model().reason().contains(">= 0.1"), r.model().reason());
        CheckResult validity = r.checks().get(0);
        assertEquals("model-validity", validity.name());
        assertEquals("pass", validity.status());
        assertTrue(validity.value() >= 0.1);
        StageReport heat = r.stages().get(0);
        // the coldest point (the mid-plane) decides partAboveC; the surface is ahead of it
        assertEquals(550, heat.endCoreTemperatureC(), 1e-3);
        assertTrue(heat.endSurfaceTemperatureC() > heat.endCoreTemperatureC() + 1);
    }

    @Test
    void aForcedLumpedModelBeyondTheLimitRunsButFailsValiditySayingHowFarSurfaceAndCoreDiffer() throws Exception {
        SimulationResult r = services.simulator().simulate(thickBlock("lumped", ""));
        assertEquals("lumped", r.model().used());
        assertEquals("fail", r.verdict());
        CheckResult validity = r.checks().get(0);
        assertEquals("fail", validity.status());
        assertTrue(validity.detail().matches(".*differing by up to \\d+\\.\\d K.*"), validity.detail());
    }

    @Test
    void theJobsSlabCellsAreUsedAndNamedInTheProvenance() throws Exception {
        SimulationResult r = services.simulator().simulate(thickBlock("slab", ", \"slabCells\": 12"));
        assertTrue(r.provenance().solver().contains("12 cells"), r.provenance().solver());
    }

    @Test
    void aThinSheetStaysLumpedUnderAuto() throws Exception {
        SimulationResult r = services.simulator().simulate(
                services.examples().find("powder-coat-steel-panel").orElseThrow().job());
        assertEquals("lumped", r.model().used());
        assertTrue(r.model().reason().contains("< 0.1"));
    }
}
