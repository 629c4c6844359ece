package dev.dwellwise.http;

import io.micrometer.core.instrument.Counter;
import io.micrometer.core.instrument.Gauge;
import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.Timer;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;

/**
 * Bounds the solves in progress: at most {@code workers} compute at once and at most {@code queue}
 * more wait for a worker. A solve beyond that is refused at once with 503 rather
 * than piling up behind the others; so is one that waited a whole compute budget without getting
 * a worker. Solves run on the request's own thread: the HTTP thread pool is sized to hold every
 * admitted solve plus headroom, so probes and scrapes are answered while the solvers are full.
 *
 * <p>A request takes its {@linkplain #enter place} before its body is read, since reading blocks
 * the thread too: clients that send their bodies slowly can then take the queue places, and get
 * the others 503s, but never the headroom that the probes are answered from.
 */
final class AdmissionControl {

    private final int workers;
    private final int queue;
    private final long maxWaitMillis;
    /** Workers plus queue places: one is held from arrival to the end of the solve. */
    private final Semaphore admitted;
    /**
     * Workers: one is held while computing. Not fair: a fair semaphore hands each freed permit to a
     * parked thread and the core idles until that thread is scheduled, which on two cores cut the
     * throughput of short solves to about half (measured with 64 waiting threads). A waiter is still
     * bounded by {@code maxWaitMillis}.
     */
    private final Semaphore computing;
    private final Counter rejected;
    private final Timer waited;

    AdmissionControl(int workers, int queue, long maxWaitMillis, MeterRegistry registry) {
        this.workers = workers;
        this.queue = queue;
        this.maxWaitMillis = maxWaitMillis;
        this.admitted = new Semaphore(workers + queue);
        this.computing = new Semaphore(workers, false);
        this.rejected = Counter.builder("dwellwise.admission.rejected")
                .description("Solves refused with 503 because every worker and queue place was taken")
                .register(registry);
        this.waited = Timer.builder("dwellwise.admission.wait")
                .description("Time admitted solves waited for a worker")
                .register(registry);
        Gauge.builder("dwellwise.solves.active", this, AdmissionControl::active)
                .description("Solves computing now").register(registry);
        Gauge.builder("dwellwise.solves.waiting", this, AdmissionControl::waiting)
                .description("Admitted solves not computing: waiting for a worker, or for their body")
                .register(registry);
    }

    /**
     * A place among the admitted requests, from before the body is read to the end of the solve;
     * throws a 503 problem when every worker and queue place is taken.
     */
    Place enter() {
        if (!admitted.tryAcquire()) {
            throw overloaded("all " + workers + " workers are busy and all " + queue + " queue places are taken");
        }
        return new Place();
    }

    /** A request's place, given back once. */
    final class Place implements AutoCloseable {

        private boolean left;

        private Place() {
        }

        /** Runs the solve when a worker is free; throws a 503 problem when none comes free in time. */
        <T> T compute(Supplier<T> solve) {
            try {
                long start = System.nanoTime();
                if (!computing.tryAcquire(maxWaitMillis, TimeUnit.MILLISECONDS)) {
                    throw overloaded("no worker came free within " + maxWaitMillis + " ms");
                }
                waited.record(System.nanoTime() - start, TimeUnit.NANOSECONDS);
                try {
                    return solve.get();
                } finally {
                    computing.release();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw overloaded("the service is stopping");
            }
        }

        @Override
        public void close() {
            if (!left) {
                left = true;
                admitted.release();
            }
        }
    }

    int active() {
        return workers - computing.availablePermits();
    }

    int waiting() {
        return Math.max(0, workers + queue - admitted.availablePermits() - active());
    }

    private ApiException overloaded(String why) {
        rejected.increment();
        return new ApiException(ProblemType.OVERLOADED, why + "; retry shortly");
    }
}
