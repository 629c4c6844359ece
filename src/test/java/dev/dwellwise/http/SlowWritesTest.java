package dev.dwellwise.http;

import static java.nio.charset.StandardCharsets.US_ASCII;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.job.WireJson;
import io.javalin.Javalin;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eclipse.jetty.util.thread.QueuedThreadPool;
import org.eclipse.jetty.util.thread.Scheduler;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Timeout;

/**
 * The handlers {@link HttpServerSettings} puts in front of the routes deliver a small answer whose
 * write is slow to finish. On a loaded node a thread that has handed an answer to the socket can wait
 * tens of milliseconds to run again, and a cold JVM loads classes on its first write; a CI run lost
 * the body of its first readiness answer that way (status and headers arrived, the 18 bytes did not)
 * while Jetty's minimum write rate was on, which gives a one-write answer length/rate to finish (4.4 ms
 * for 18 bytes at 4 KiB/s). Here a handler outside them holds every write back for 50 ms: before
 * passing it on, as a descheduled thread would, or by handing it on late from another thread, as a
 * socket slow to take it would (the write then waits, and {@link AnswerRateGuard} watches it).
 */
@Timeout(30)
class SlowWritesTest {

    private static final byte[] ANSWER = "{\"status\":\"ready\"}".getBytes(US_ASCII);
    private static final long WRITE_DELAY_MILLIS = 50;

    /** Writes that {@link #delayedWrites} handed on from another thread. */
    private final AtomicInteger delays = new AtomicInteger();

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void aSmallAnswerWhoseWriteIsDelayedArrivesWhole(boolean handedOnLate) throws Exception {
        ServiceConfig config = RunningService.config(Map.of());
        QueuedThreadPool threads = HttpServerSettings.threadPool(config);
        ServiceMetrics metrics = new ServiceMetrics(threads);
        AccessLog access = new AccessLog(metrics);
        ProblemErrorHandler errors = new ProblemErrorHandler(WireJson.create(), access);
        Javalin app = Javalin.create(cfg -> {
            cfg.startup.showJavalinBanner = false;
            cfg.jetty.host = "127.0.0.1";
            cfg.jetty.port = 0;
            cfg.jetty.threadPool = threads;
            cfg.jetty.modifyHttpConfiguration(HttpServerSettings::configure);
            cfg.jetty.modifyServer(server -> {
                HttpServerSettings.configure(server, config, errors, access);
                // outermost: the delay falls inside every write they make
                server.insertHandler(delayedWrites(handedOnLate));
            });
            cfg.requestLogger.http(access::answered); // as App wires the access line
            cfg.routes.before(access::begin);
            cfg.routes.get("/health/ready", ctx -> ctx.contentType(MediaTypes.JSON).result(ANSWER));
        }).start();
        try {
            HttpClient client = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1).build();
            long start = System.nanoTime();
            HttpResponse<String> answer = client.send(HttpRequest.newBuilder(
                    URI.create("http://127.0.0.1:" + app.port() + "/health/ready"))
                    .timeout(Duration.ofSeconds(10)).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(200, answer.statusCode());
            assertEquals(new String(ANSWER, US_ASCII), answer.body());
            assertTrue(System.nanoTime() - start >= TimeUnit.MILLISECONDS.toNanos(WRITE_DELAY_MILLIS),
                    "the answer's write went through the delay");
            assertEquals(handedOnLate, delays.get() > 0, "the write was handed on late");
            assertEquals("200", deliveredStatus(metrics), "counted as delivered, not cut off");
        } finally {
            app.stop();
            metrics.close();
        }
    }

    /** The status the readiness answer was counted with once Jetty completed it (499 if it was cut off). */
    private static String deliveredStatus(ServiceMetrics metrics) throws InterruptedException {
        Pattern counted = Pattern.compile("http_server_requests_seconds_count\\{method=\"GET\",route=\"/health/ready\","
                + "status=\"(\\d+)\"} 1(?:\\.0)?$", Pattern.MULTILINE);
        for (int attempt = 0; attempt < 100; attempt++) {
            Matcher m = counted.matcher(metrics.scrape());
            if (m.find()) {
                return m.group(1);
            }
            Thread.sleep(50);
        }
        return "not counted";
    }

    /**
     * Holds each write back for {@link #WRITE_DELAY_MILLIS}: in the writing thread, or by returning at
     * once and handing it on from the scheduler's thread then.
     */
    private InterceptedWrites delayedWrites(boolean handedOnLate) {
        return new InterceptedWrites((request, onward) -> {
            Scheduler scheduler = request.getComponents().getScheduler();
            return (last, content, written) -> {
                if (handedOnLate) {
                    // handed on from another thread later: the write waits, and its bytes go out late
                    scheduler.schedule(() -> {
                        delays.incrementAndGet();
                        onward.write(last, content, written);
                    }, WRITE_DELAY_MILLIS, TimeUnit.MILLISECONDS);
                    return;
                }
                InterceptedWrites.stall(WRITE_DELAY_MILLIS);
                onward.write(last, content, written);
            };
        });
    }
}
