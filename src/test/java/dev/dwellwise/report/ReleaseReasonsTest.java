package dev.dwellwise.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The order of a held batch's reasons: what the failure means for the batch, most serious first. */
class ReleaseReasonsTest {

    private static CheckResult failed(String name, double value, double limit, String stage) {
        return new CheckResult(name, CheckResult.FAIL, value, limit, name + (value < limit ? " short" : " over"), stage);
    }

    @Test
    void modelValidityComesFirstThenUnderCureOverBakeStageEndHandlingAndHeatingRate() {
        List<CheckResult> checks = List.of(
                failed("model-validity", 0.2, 0.1, null),
                new CheckResult("stage-end", CheckResult.PASS, 600.0, 600.0, "met", "bake"),
                failed("stage-end", 45, 180, "preheat"),
                failed("peak-temperature", 240, 230, null),
                failed("handling-temperature", 60, 45, null),
                failed("heating-rate", 90, 60, null),
                failed(CureChecks.TIME_ABOVE, 1300, 1200, null),
                failed(CureChecks.EQUIVALENT_TIME, 300, 420, null),
                failed(CureChecks.DEGREE, 0.9, 0.95, null),
                failed(CureChecks.GLASS_TRANSITION, 100, 110, null));
        assertEquals(List.of(
                "model-validity over",
                CureChecks.EQUIVALENT_TIME + " short",
                CureChecks.DEGREE + " short",
                CureChecks.GLASS_TRANSITION + " short",
                "peak-temperature over",
                CureChecks.TIME_ABOVE + " over",
                "stage 'preheat': stage-end short",
                "handling-temperature over",
                "heating-rate over"), ReleaseReasons.of(checks));
    }

    @Test
    void aBatchWithNothingFailedHasNoReasons() {
        assertEquals(List.of(), ReleaseReasons.of(List.of(
                new CheckResult("peak-temperature", CheckResult.PASS, 200.0, 230.0, "within", null))));
    }
}
