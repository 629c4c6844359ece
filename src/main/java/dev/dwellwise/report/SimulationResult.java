package dev.dwellwise.report;

import java.util.List;

/**
 * The answer to a simulation: the verdict first, then why, then the history. {@code cure} is
 * present only when the job has a cure spec.
 */
public record SimulationResult(String verdict, ModelReport model, double totalSeconds, List<StageReport> stages,
                               CureReport cure, List<CheckResult> checks, SeriesReport series, List<ProfileReport> profiles,
                               Provenance provenance, List<String> cautions) {

    public static final String PASS = "pass";
    public static final String FAIL = "fail";

    public SimulationResult {
        stages = List.copyOf(stages);
        checks = List.copyOf(checks);
        profiles = profiles == null ? null : List.copyOf(profiles);
        cautions = List.copyOf(cautions);
    }

    public boolean passed() {
        return PASS.equals(verdict);
    }
}
