package dev.dwellwise.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.job.Example;
import dev.dwellwise.job.ExampleLibrary;
import dev.dwellwise.job.WireJson;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The bundled example with a cure spec simulates as it is, cures, and carries every cure figure and check. */
class CureExampleTest {

    @Test
    void thePowderCoatedBracketPassesItsCureWindow() {
        Example example = ExampleLibrary.bundled(WireJson.create()).find("powder-coat-bracket-cure-window")
                .orElseThrow();
        SimulationResult result = CureJobs.simulator().simulate(example.job());
        assertTrue(result.passed(), () -> result.checks().toString());
        assertEquals(List.of(CureChecks.TIME_ABOVE, CureChecks.EQUIVALENT_TIME, CureChecks.DEGREE,
                CureChecks.GLASS_TRANSITION), result.checks().stream().map(CheckResult::name)
                .filter(n -> n.startsWith("cure-")).toList());
        assertNotNull(result.cure().coldest().glassTransitionC());
    }
}
