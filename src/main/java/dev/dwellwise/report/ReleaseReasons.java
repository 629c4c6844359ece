package dev.dwellwise.report;

import java.util.Comparator;
import java.util.List;

/**
 * The reasons a batch is held, most serious first. The order follows what the failure means for
 * the batch already made:
 * <ol>
 * <li>model validity: a lumped model forced on a part whose surface and core differ; every other
 * figure rests on it, so it is read first (re-run with model auto or slab);</li>
 * <li>under-cure (a cure minimum missed): the coating may not perform, the batch needs rework;</li>
 * <li>over-bake (the peak temperature or a cure maximum exceeded): the coating may be damaged;</li>
 * <li>a stage that ran out of time: the line did not run as the recipe meant;</li>
 * <li>handling temperature: the parts are too hot to touch, which waiting or cooling fixes;</li>
 * <li>heating rate: a risk of surface defects to inspect for.</li>
 * </ol>
 * Failures of the same rank keep the order of the checks. A stage-end sentence is prefixed with its stage.
 */
final class ReleaseReasons {

    private ReleaseReasons() {
    }

    static List<String> of(List<CheckResult> checks) {
        return checks.stream().filter(CheckResult::failed)
                .sorted(Comparator.comparingInt(ReleaseReasons::rank))
                .map(c -> c.stage() == null ? c.detail() : "stage '" + c.stage() + "': " + c.detail())
                .toList();
    }

    /** Lower is more serious. */
    static int rank(CheckResult check) {
        return switch (check.name()) {
            case "model-validity" -> 0;
            // a cure check names the minimum as its limit unless only the maximum failed
            case CureChecks.TIME_ABOVE, CureChecks.EQUIVALENT_TIME, CureChecks.DEGREE, CureChecks.GLASS_TRANSITION ->
                    check.value() < check.limit() ? 1 : 2;
            case "peak-temperature" -> 2;
            case "stage-end" -> 3;
            case "handling-temperature" -> 4;
            case "heating-rate" -> 5;
            default -> 6; // a check without a rank of its own comes last rather than hiding a worse one
        };
    }
}
