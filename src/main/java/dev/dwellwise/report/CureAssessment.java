package dev.dwellwise.report;

import dev.dwellwise.cure.CureAnalysis;
import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.cure.CureResult;
import dev.dwellwise.cure.CureSpec;
import dev.dwellwise.job.Cure;
import dev.dwellwise.job.CureSpecBuilder;
import dev.dwellwise.thermal.ThermalHistory;
import java.util.List;

/**
 * The cure of one computed history: the figures the job's cure spec asks for, over the whole
 * history at the coldest and the hottest point, and the checks that judge them.
 *
 * @param report the figures as the answer carries them
 * @param checks the cure checks, in the order of the spec
 */
record CureAssessment(CureReport report, List<CheckResult> checks) {

    CureAssessment {
        checks = List.copyOf(checks);
    }

    /** Throws {@link dev.dwellwise.cure.CureComputationException} when a figure exceeds the budget. */
    static CureAssessment of(Cure cure, ThermalHistory history, CureBudget budget) {
        CureSpec spec = CureSpecBuilder.build(cure);
        CureResult result = CureAnalysis.of(spec, history.dense(), budget);
        CureReport report = CureReport.of(result);
        HoldAdvice hold = new HoldAdvice(spec, result.coldest(), history, budget);
        return new CureAssessment(report, CureChecks.of(spec, report, hold));
    }
}
