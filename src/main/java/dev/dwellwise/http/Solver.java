package dev.dwellwise.http;

import dev.dwellwise.job.InvalidJobException;
import dev.dwellwise.job.Job;
import dev.dwellwise.report.SimulationResult;
import dev.dwellwise.report.Simulator;
import dev.dwellwise.thermal.ComputeLimitExceededException;
import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.Timer;
import java.time.Duration;

/**
 * The simulator as the routes call it: admitted by {@link AdmissionControl}, and timed into
 * {@code dwellwise_solve_seconds} by outcome. The timing lives here so that the numerical packages
 * stay free of metrics.
 */
final class Solver {

    private final Simulator simulator;
    private final AdmissionControl admission;
    private final MeterRegistry registry;

    Solver(Simulator simulator, AdmissionControl admission, MeterRegistry registry) {
        this.simulator = simulator;
        this.admission = admission;
        this.registry = registry;
    }

    /** Solves a job, its field paths under {@code prefix} ("" when the job is the body). */
    SimulationResult simulate(Job job, String prefix) {
        return admission.run(() -> timed(job, prefix));
    }

    private SimulationResult timed(Job job, String prefix) {
        long start = System.nanoTime();
        String outcome = "error";
        try {
            SimulationResult result = simulator.simulate(job, prefix);
            outcome = result.verdict();
            return result;
        } catch (InvalidJobException e) {
            outcome = "invalid";
            throw e;
        } catch (ComputeLimitExceededException e) {
            outcome = "compute-limit";
            throw e;
        } finally {
            timer(outcome).record(Duration.ofNanos(System.nanoTime() - start));
        }
    }

    private Timer timer(String outcome) {
        return Timer.builder("dwellwise.solve")
                .description("Time inside the simulator per job: validation, solve, checks and write-up")
                .tag("outcome", outcome)
                .serviceLevelObjectives(ServiceMetrics.LATENCY_BUCKETS)
                .register(registry);
    }
}
