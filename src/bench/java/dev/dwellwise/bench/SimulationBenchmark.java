package dev.dwellwise.bench;

import dev.dwellwise.http.Services;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.JobLimits;
import dev.dwellwise.job.JobValidator;
import dev.dwellwise.job.ProblemBuilder;
import dev.dwellwise.report.SimulationResult;
import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.LumpedModel;
import dev.dwellwise.thermal.StageRunner;
import dev.dwellwise.thermal.ThermalHistory;
import dev.dwellwise.thermal.ThermalProblem;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;

/**
 * The in-process solve of each bundled example, on one thread: {@code solve} is the lumped back end
 * and the stage runner alone; {@code simulate} is the whole answer (validation, hash, model choice,
 * checks, rounded series), as a request pays it before JSON writing.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Threads(1)
public class SimulationBenchmark {

    @Param({"powder-coat-steel-panel", "e-coat-bracket-ramped-oven", "aluminium-extrusion-ageing"})
    public String example;

    private Services services;
    private Job job;
    private ThermalProblem problem;

    @Setup
    public void setUp() {
        services = Services.bundled();
        job = services.examples().find(example).orElseThrow().job();
        Job valid = JobValidator.validated(job, services.materials(), JobLimits.standard());
        problem = new ProblemBuilder(services.materials()).build(valid, ComputeBudget.standard());
    }

    @Benchmark
    public ThermalHistory solve() {
        return StageRunner.run(problem, new LumpedModel());
    }

    @Benchmark
    public SimulationResult simulate() {
        return services.simulator().simulate(job);
    }
}
