package dev.dwellwise.report;

import java.util.List;

/**
 * The answer to the MES's release question. Carries no series: only the decision, why, and what
 * it rests on.
 *
 * @param release     true when no check failed
 * @param batchId     the batch, as the request named it
 * @param reasons     the failing checks' sentences, most serious first ({@link ReleaseReasons})
 * @param checks      every check, in the order of a simulation's answer
 * @param inputSha256 SHA-256 of the canonical job (defaults filled, keys sorted), as a simulation of the
 *                    same job reports it; the batch id is not part of it
 * @param service     {@code dwellwise <version>}
 * @param cautions    the cautions every answer carries, a release included
 */
public record ReleaseAnswer(boolean release, String batchId, List<String> reasons, List<CheckResult> checks,
                            String inputSha256, String service, List<String> cautions) {

    public ReleaseAnswer {
        reasons = List.copyOf(reasons);
        checks = List.copyOf(checks);
        cautions = List.copyOf(cautions);
    }

    static ReleaseAnswer of(String batchId, SimulationResult result) {
        return new ReleaseAnswer(result.passed(), batchId, ReleaseReasons.of(result.checks()), result.checks(),
                result.provenance().inputSha256(), result.provenance().service(), result.cautions());
    }
}
