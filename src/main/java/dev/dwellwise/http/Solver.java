package dev.dwellwise.http;

import dev.dwellwise.cure.CureComputationException;
import dev.dwellwise.job.InvalidJobException;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.ReleaseRequest;
import dev.dwellwise.report.ReleaseAnswer;
import dev.dwellwise.report.SimulationResult;
import dev.dwellwise.report.Simulator;
import dev.dwellwise.thermal.ComputeLimitExceededException;
import io.micrometer.core.instrument.MeterRegistry;
import java.time.Duration;
import java.util.function.Function;
import java.util.function.Supplier;

/**
 * The simulator as the routes call it: every solve admitted by {@link AdmissionControl} and timed
 * into {@code dwellwise_solve_seconds} by kind and outcome. The timing lives here so that the
 * numerical packages stay free of metrics.
 */
final class Solver {

    private final Simulator simulator;
    private final AdmissionControl admission;
    private final LatencyTimers timers;

    Solver(Simulator simulator, AdmissionControl admission, MeterRegistry registry) {
        this.simulator = simulator;
        this.admission = admission;
        this.timers = new LatencyTimers(registry, "dwellwise.solve",
                "Time inside the simulator per request: validation, solve, checks and write-up", "kind", "outcome");
    }

    /** A place for one request's solve, taken before its body is read (see {@link AdmissionControl}). */
    AdmissionControl.Place admit() {
        return admission.enter();
    }

    /** Solves a job in its request's place, its field paths under {@code prefix} ("" when the job is the body). */
    SimulationResult simulate(AdmissionControl.Place place, Job job, String prefix) {
        return place.compute(() -> timed("simulation", () -> simulator.simulate(job, prefix),
                SimulationResult::verdict));
    }

    /** The MES's release check of one batch, in its request's place. */
    ReleaseAnswer release(AdmissionControl.Place place, ReleaseRequest request) {
        return place.compute(() -> timed("release-check", () -> simulator.release(request),
                answer -> answer.release() ? "release" : "hold"));
    }

    /** What the request's access line adds about a simulation: the model, its effort and the verdict. */
    static String accessDetail(SimulationResult result) {
        return "model=" + result.model().used() + " steps=" + result.provenance().steps() + " evaluations="
                + result.provenance().evaluations() + " verdict=" + result.verdict();
    }

    /** What the request's access line adds about a release check: the MES's audit trail of the decision. */
    static String accessDetail(ReleaseAnswer answer) {
        return "batch=" + answer.batchId() + " release=" + answer.release() + " inputSha256=" + answer.inputSha256();
    }

    private <T> T timed(String kind, Supplier<T> solve, Function<T, String> outcomeOf) {
        long start = System.nanoTime();
        String outcome = "error";
        try {
            T result = solve.get();
            outcome = outcomeOf.apply(result);
            return result;
        } catch (InvalidJobException e) {
            outcome = "invalid";
            throw e;
        } catch (ComputeLimitExceededException | CureComputationException e) {
            outcome = "compute-limit";
            throw e;
        } finally {
            timers.get(kind, outcome).record(Duration.ofNanos(System.nanoTime() - start));
        }
    }
}
