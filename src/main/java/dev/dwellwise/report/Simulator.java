package dev.dwellwise.report;

import dev.dwellwise.job.CanonicalJson;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.JobLimits;
import dev.dwellwise.job.JobValidator;
import dev.dwellwise.job.ProblemBuilder;
import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.MaterialLibrary;
import dev.dwellwise.thermal.ModelSelector;
import dev.dwellwise.thermal.SlabModel;
import dev.dwellwise.thermal.ThermalProblem;
import java.util.List;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The whole simulation of one job: validate, fill defaults, hash, build the problem, choose the
 * model and solve, check, and write up. Stateless and thread-safe; every solve gets fresh steppers.
 */
public final class Simulator {

    private static final Logger LOG = LoggerFactory.getLogger(Simulator.class);

    private final MaterialLibrary library;
    private final ModelSelector selector;
    private final JobLimits limits;
    private final ComputeBudget budget;
    private final String service;

    public Simulator(MaterialLibrary library, ModelSelector selector, JobLimits limits, ComputeBudget budget,
                     String service) {
        this.library = library;
        this.selector = selector;
        this.limits = limits;
        this.budget = budget;
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
        long started = System.nanoTime();
        Job job = JobValidator.validated(raw, library, limits, prefix);
        String hash = CanonicalJson.sha256(job);
        ThermalProblem problem = new ProblemBuilder(library).build(job, budget);
        ModelSelector chosen = job.slabCells() == null ? selector : selector.withSlab(new SlabModel(job.slabCells()));
        ModelSelector.Selection selection = chosen.solve(problem, job.model());
        List<CheckResult> checks = Checks.thermal(selection, job.limits());
        Provenance provenance = new Provenance(service, hash, selection.model().method(),
                selection.model().tolerance(), selection.history().steps(), selection.history().evaluations());
        SimulationResult result = ResultAssembler.assemble(job, selection, checks, provenance);
        if (LOG.isInfoEnabled()) {
            LOG.info("solved model={} stages={} steps={} evaluations={} verdict={} ms={}",
                    selection.history().modelName(), problem.stages().size(), selection.history().steps(),
                    selection.history().evaluations(), result.verdict(), (System.nanoTime() - started) / 1_000_000);
        }
        return result;
    }
}
