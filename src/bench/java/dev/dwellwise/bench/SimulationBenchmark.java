package dev.dwellwise.bench;

import dev.dwellwise.http.Services;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.JobLimits;
import dev.dwellwise.job.JobValidator;
import dev.dwellwise.job.Output;
import dev.dwellwise.job.ProblemBuilder;
import dev.dwellwise.report.SimulationResult;
import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.LumpedModel;
import dev.dwellwise.thermal.StageRunner;
import dev.dwellwise.thermal.ThermalHistory;
import dev.dwellwise.thermal.ThermalProblem;
import java.io.IOException;
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
 * checks, rounded series), as a request pays it before JSON writing; {@code answer} is what a
 * request pays past HTTP in the load run: the body read as a job with the series off, simulated,
 * and written as JSON.
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
    private byte[] summaryBody;

    @Setup
    public void setUp() throws IOException {
        services = Services.bundled();
        job = services.examples().find(example).orElseThrow().job();
        Job valid = JobValidator.validated(job, services.materials(), JobLimits.standard());
        problem = new ProblemBuilder(services.materials()).build(valid, ComputeBudget.standard());
        Output given = job.output() == null ? Output.DEFAULTS : job.output();
        // the series off, as src/load/run-load.sh sends the job
        summaryBody = services.mapper().writeValueAsBytes(
                job.withOutput(new Output(given.sampleSeconds(), false, given.profiles())));
    }

    @Benchmark
    public ThermalHistory solve() {
        return StageRunner.run(problem, new LumpedModel());
    }

    @Benchmark
    public SimulationResult simulate() {
        return services.simulator().simulate(job);
    }

    @Benchmark
    public byte[] answer() throws IOException {
        Job sent = services.mapper().readValue(summaryBody, Job.class);
        return services.mapper().writeValueAsBytes(services.simulator().simulate(sent));
    }
}
