package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.micrometer.core.instrument.simple.SimpleMeterRegistry;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

@Timeout(20)
class AdmissionControlTest {

    private final SimpleMeterRegistry registry = new SimpleMeterRegistry();
    private final ExecutorService callers = Executors.newFixedThreadPool(2);
    private final CountDownLatch release = new CountDownLatch(1);

    @AfterEach
    void stopCallers() {
        release.countDown();
        callers.shutdownNow();
    }

    @Test
    void aSolveWaitsInTheQueueWhileTheWorkerIsBusyAndTheOneAfterItIsRefused() throws Exception {
        AdmissionControl admission = new AdmissionControl(1, 1, 5_000, registry);
        CountDownLatch computing = new CountDownLatch(1);
        Future<String> first = callers.submit(() -> run(admission, () -> {
            computing.countDown();
            await(release);
            return "first";
        }));
        assertTrue(computing.await(5, TimeUnit.SECONDS));
        Future<String> second = callers.submit(() -> run(admission, () -> "second"));
        awaitWaiting(admission, 1);

        ApiException refused = assertThrows(ApiException.class, () -> run(admission, () -> "third"));
        assertEquals(ProblemType.OVERLOADED, refused.type());
        assertEquals(1.0, registry.get("dwellwise.admission.rejected").counter().count());

        release.countDown();
        assertEquals("first", first.get(5, TimeUnit.SECONDS));
        assertEquals("second", second.get(5, TimeUnit.SECONDS));
        assertEquals(0, admission.active());
        assertEquals(0, admission.waiting());
    }

    @Test
    void aQueuedSolveThatGetsNoWorkerWithinTheWaitLimitIsRefused() throws Exception {
        AdmissionControl admission = new AdmissionControl(1, 1, 50, registry);
        CountDownLatch computing = new CountDownLatch(1);
        callers.submit(() -> run(admission, () -> {
            computing.countDown();
            await(release);
            return "held";
        }));
        assertTrue(computing.await(5, TimeUnit.SECONDS));
        ApiException refused = assertThrows(ApiException.class, () -> run(admission, () -> "late"));
        assertEquals(ProblemType.OVERLOADED, refused.type());
    }

    @Test
    void aFailingSolveGivesItsPlacesBack() {
        AdmissionControl admission = new AdmissionControl(1, 0, 1_000, registry);
        assertThrows(IllegalStateException.class, () -> run(admission, () -> {
            throw new IllegalStateException("solver failed");
        }));
        assertEquals("next", run(admission, () -> "next"));
    }

    @Test
    void aPlaceIsHeldFromEntrySoARequestReadingItsBodyTakesAQueuePlace() {
        // a request takes its place before its body is read (SimulationRoutes): one still reading
        // fills the queue as a waiting solve does
        AdmissionControl admission = new AdmissionControl(1, 1, 1_000, registry);
        try (AdmissionControl.Place reading = admission.enter();
             AdmissionControl.Place alsoReading = admission.enter()) {
            assertEquals(2, admission.waiting());
            ApiException refused = assertThrows(ApiException.class, admission::enter);
            assertEquals(ProblemType.OVERLOADED, refused.type());
            alsoReading.close();
            alsoReading.close(); // given back once, however often closed
            assertEquals(1, admission.waiting());
            assertEquals("computed", reading.compute(() -> "computed"));
        }
        assertEquals(0, admission.waiting());
        assertEquals("next", run(admission, () -> "next"));
    }

    /** One request's way through: a place, then a worker. */
    private static <T> T run(AdmissionControl admission, Supplier<T> solve) {
        try (AdmissionControl.Place place = admission.enter()) {
            return place.compute(solve);
        }
    }

    /** Polls the gauge the metrics show until the expected number of solves wait (bounded). */
    private static void awaitWaiting(AdmissionControl admission, int expected) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
        while (admission.waiting() != expected) {
            assertTrue(System.nanoTime() < deadline, "waiting solves: " + admission.waiting());
            Thread.sleep(5);
        }
    }

    private static void await(CountDownLatch latch) {
        try {
            assertTrue(latch.await(5, TimeUnit.SECONDS));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
