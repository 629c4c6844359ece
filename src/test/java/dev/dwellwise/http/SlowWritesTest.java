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
import java.nio.ByteBuffer;
import java.time.Duration;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.Callback;
import org.eclipse.jetty.util.thread.QueuedThreadPool;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * The handlers {@link HttpServerSettings} puts in front of the routes deliver a small answer whose
 * write is slow to finish. On a loaded node a thread that has handed an answer to the socket can wait
 * tens of milliseconds to run again, and a cold JVM loads classes on its first write; a CI run lost
 * the body of its first readiness answer that way (status and headers arrived, the 18 bytes did not)
 * while Jetty's minimum write rate was on, which gives a one-write answer length/rate to finish (4.4 ms
 * for 18 bytes at 4 KiB/s). Here a handler outside them holds every write back for 50 ms.
 */
@Timeout(30)
class SlowWritesTest {

    private static final byte[] ANSWER = "{\"status\":\"ready\"}".getBytes(US_ASCII);
    private static final long WRITE_DELAY_MILLIS = 50;

    @Test
    void aSmallAnswerWhoseWriteIsDelayedArrivesWhole() throws Exception {
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
                server.insertHandler(new DelayedWrites()); // outermost: the delay falls inside every write they make
            });
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
        } finally {
            app.stop();
            metrics.close();
        }
    }

    /** Holds each write back before passing it on, as a descheduled thread would. */
    private static final class DelayedWrites extends Handler.Wrapper {

        @Override
        public boolean handle(Request request, Response response, Callback callback) throws Exception {
            return super.handle(request, new Response.Wrapper(request, response) {
                @Override
                public void write(boolean last, ByteBuffer content, Callback written) {
                    try {
                        Thread.sleep(WRITE_DELAY_MILLIS);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    super.write(last, content, written);
                }
            }, callback);
        }
    }
}
