package dev.dwellwise.report;

import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.job.CanonicalJson;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.JobLimits;
import dev.dwellwise.job.JobValidator;
import dev.dwellwise.job.Output;
import dev.dwellwise.job.ProblemBuilder;
import dev.dwellwise.job.ReleaseRequest;
import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.MaterialLibrary;
import dev.dwellwise.thermal.ModelSelector;
import dev.dwellwise.thermal.SlabModel;
import dev.dwellwise.thermal.ThermalProblem;
import java.util.ArrayList;
import java.util.List;

/**
 * The whole simulation of one job: validate, fill defaults, hash, build the problem, choose the
 * model and solve, check (the cure included), and write up. Stateless and thread-safe; every solve
 * gets fresh steppers.
 */
public final class Simulator {

    /**
     * What a release decision needs of the output: nothing. No series and no profiles, and one
     * sample a day (the coarsest spacing a job may ask for), so that only the stage boundaries are
     * sampled; samples are read off the solution and change no figure.
     */
    private static final Output DECISION_ONLY = new Output(86_400.0, false, null);

    private final MaterialLibrary library;
    private final ModelSelector selector;
    private final JobLimits limits;
    private final ComputeBudget budget;
    private final CureBudget cureBudget;
    private final String service;

    public Simulator(MaterialLibrary library, ModelSelector selector, JobLimits limits, ComputeBudget budget,
                     CureBudget cureBudget, String service) {
        this.library = library;
        this.selector = selector;
        this.limits = limits;
        this.budget = budget;
        this.cureBudget = cureBudget;
        this.service = service;
    }

    public MaterialLibrary library() {
        return library;
    }

    /** Validates and solves a job as the client sent it; field paths are relative to the job. */
    public SimulationResult simulate(Job raw) {
        return simulate(raw, "");
    }

    /** As {@link #simulate(Job)}, with field paths under {@code prefix} (for a job nested in a request). */
    public SimulationResult simulate(Job raw, String prefix) {
        Job job = JobValidator.validated(raw, library, limits, prefix);
        return run(job, job);
    }

    /**
     * Answers the MES's release question. The job is hashed as the client sent it (defaults
     * filled), so the hash equals that of a simulation of the same job, and solved without its
     * output, which a decision does not need.
     */
    public ReleaseAnswer release(ReleaseRequest request) {
        Job job = JobValidator.validated(request, library, limits);
        return ReleaseAnswer.of(request.batchId(), run(job, job.withOutput(DECISION_ONLY)));
    }

    /** Solves {@code solved} and reports it under the hash of {@code hashed}, the same job as sent. */
    private SimulationResult run(Job hashed, Job solved) {
        String hash = CanonicalJson.sha256(hashed);
        ThermalProblem problem = new ProblemBuilder(library).build(solved, budget);
        ModelSelector chosen = solved.slabCells() == null ? selector
                : selector.withSlab(new SlabModel(solved.slabCells()));
        ModelSelector.Selection selection = chosen.solve(problem, solved.model());
        List<CheckResult> checks = new ArrayList<>(Checks.thermal(selection, solved.limits()));
        CureReport cure = null;
        if (solved.cure() != null) {
            CureAssessment assessment = CureAssessment.of(solved.cure(), selection.history(), cureBudget);
            cure = assessment.report();
            checks.addAll(assessment.checks());
        }
        Provenance provenance = new Provenance(service, hash, selection.model().method(),
                selection.model().tolerance(), selection.history().steps(), selection.history().evaluations());
        return ResultAssembler.assemble(solved, selection, cure, checks, provenance);
    }
}
