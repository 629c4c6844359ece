package dev.dwellwise.http;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * {@code /metrics} counts what the service served. A request whose answer cannot be delivered is
 * counted and logged too: Javalin skips its request loggers when writing the answer fails.
 */
@Timeout(30)
class MetricsEndpointTest {

    /** The panel with its series sampled twice a second: about 64 KB, twice Jetty's 32 KB buffer. */
    private static final String LARGE_ANSWER = Workloads.PANEL.replace("\"output\": { \"series\": false }",
            "\"output\": { \"series\": true, \"sampleSeconds\": 0.5 }");
    private static RunningService service;

    @BeforeAll
    static void start() {
        service = RunningService.start(Map.of());
    }

    @AfterAll
    static void stop() {
        service.close();
    }

    @Test
    void aRequestIsCountedUnderItsRouteTemplateAndStatus() {
        String series = "http_server_requests_seconds_count{method=\"GET\",route=\"/v1/materials/{id}\",status=\"404\"}";
        double before = value(scrape(), series);
        Http.given(service).get("/v1/materials/unobtainium").then().statusCode(404);
        assertEquals(before + 1, awaitValue(series, before + 1));
    }

    @Test
    void aSolveIsTimedByOutcome() {
        String series = "dwellwise_solve_seconds_count{kind=\"simulation\",outcome=\"pass\"}";
        double before = value(scrape(), series);
        Http.given(service).contentType("application/json").body(Workloads.PANEL).post("/v1/simulations").then()
                .statusCode(200);
        assertEquals(before + 1, value(scrape(), series));
    }

    @Test
    void anUnmatchedPathIsCountedWithoutItsRawPath() {
        Http.given(service).get("/wp-admin/setup.php").then().statusCode(404);
        String unmatched = "http_server_requests_seconds_count{method=\"GET\",route=\"unmatched\",status=\"404\"}";
        assertEquals(true, awaitValue(unmatched, 1) >= 1);
        assertEquals(-1, scrape().indexOf("wp-admin"));
    }

    @Test
    void anInventedMethodIsCountedAsOtherNotUnderItsOwnName() throws Exception {
        // each made-up name would otherwise add a histogram: a scrape that grows without bound
        String other = "http_server_requests_seconds_count{method=\"other\",route=\"unmatched\",status=\"405\"}";
        double before = value(scrape(), other);
        for (String method : List.of("FROBNICATE", "MX17QQQ")) {
            String answer = Http.raw(service, method + " /health/live HTTP/1.1\r\nHost: x\r\nConnection: close\r\n\r\n");
            assertTrue(answer.startsWith("HTTP/1.1 405 "), answer);
        }
        assertEquals(before + 2, awaitValue(other, before + 2));
        String scrape = scrape();
        assertEquals(-1, scrape.indexOf("FROBNICATE"));
        assertEquals(-1, scrape.indexOf("MX17QQQ"));
    }

    @Test
    void aHeadIsCountedUnderTheRouteOfItsGet() {
        String series = "http_server_requests_seconds_count{method=\"HEAD\",route=\"/v1/materials/{id}\",status=\"200\"}";
        double before = value(scrape(), series);
        Http.given(service).head("/v1/materials/steel-1010").then().statusCode(200);
        assertEquals(before + 1, awaitValue(series, before + 1));
    }

    @Test
    void theScrapeIsPrometheusTextWithTheJvmAndLatencyBuckets() {
        // a scrape is counted once it has completed, so the second one shows the first
        awaitValue("http_server_requests_seconds_count{method=\"GET\",route=\"/metrics\",status=\"200\"}", 1);
        Http.given(service).filter(Contract.strict()).get("/metrics").then()
                .statusCode(200)
                .contentType(startsWith("text/plain; version=0.0.4"))
                .body(containsString("jvm_memory_used_bytes{area=\"heap\""))
                .body(containsString("jvm_threads_live_threads"))
                .body(containsString("jvm_gc_"))
                .body(containsString("jetty_threads_busy"))
                .body(containsString("dwellwise_solves_active"))
                .body(containsString("http_server_requests_seconds_bucket{method=\"GET\",route=\"/metrics\","
                        + "status=\"200\",le=\"0.001\"}"));
    }

    @Test
    void theLargeAnswerIsLargerThanTheOutputBuffer() {
        int size = Http.given(service).contentType("application/json").body(LARGE_ANSWER).post("/v1/simulations")
                .then().statusCode(200).extract().asByteArray().length;
        assertTrue(size > 32_768, "answer of " + size + " bytes");
    }

    @Test
    void anAnswerTheClientWalkedAwayFromIsLoggedAndCounted() throws Exception {
        // a series larger than Jetty's output buffer fails while Javalin copies it; a summary fails
        // only when Jetty sends it, after Javalin's request logger has run
        assertTrue(walkAway(LARGE_ANSWER, "walked-away-series").matches("POST /v1/simulations 499 \\d+ms "
                + "model=lumped steps=\\d+ evaluations=\\d+ verdict=pass answer not delivered"));
        assertTrue(walkAway(Workloads.PANEL, "walked-away-summary").matches("POST /v1/simulations 499 \\d+ms "
                + "model=lumped steps=\\d+ evaluations=\\d+ verdict=pass answer not delivered"));
    }

    /**
     * Posts the job and resets the connection while its solve is held at a gate, so the answer's send
     * must fail; the request's access line, after checking that it was counted once as a 499.
     */
    private static String walkAway(String job, String id) throws Exception {
        SolveGate gate = new SolveGate(1);
        String count = "http_server_requests_seconds_count{method=\"POST\",route=\"/v1/simulations\",status=\"499\"}";
        try (RunningService gated = RunningService.start(Map.of(), gate.services(RunningService.config(Map.of())));
             CapturedLog access = CapturedLog.of("dwellwise.access")) {
            byte[] body = job.getBytes(StandardCharsets.UTF_8);
            String head = "POST /v1/simulations HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/json\r\n"
                    + "X-Request-Id: " + id + "\r\nContent-Length: " + body.length + "\r\n\r\n";
            try (Socket socket = new Socket("127.0.0.1", gated.port())) {
                socket.setSoLinger(true, 0); // close() resets the connection
                OutputStream out = socket.getOutputStream();
                out.write(head.getBytes(StandardCharsets.US_ASCII));
                out.write(body);
                out.flush();
                assertTrue(gate.awaitEntered(), "the solve started");
            } finally {
                gate.open(); // after the resource's close(): the reset reaches the service first
            }
            List<String> lines = access.linesOf(id);
            assertEquals(1, lines.size(), lines.toString());
            // counted before the line was written
            assertEquals(1, value(Http.given(gated).get("/metrics").then().statusCode(200).extract().asString(), count));
            return lines.get(0);
        }
    }

    /** Scrapes until the series reaches at least {@code atLeast} (bounded); its last value. */
    private static double awaitValue(String series, double atLeast) {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(Http.TIMEOUT_MILLIS);
        double value = value(scrape(), series);
        while (value < atLeast && System.nanoTime() < deadline) {
            value = value(scrape(), series);
        }
        return value;
    }

    private static String scrape() {
        return Http.given(service).get("/metrics").then().statusCode(200).extract().asString();
    }

    /** The value of one series in a scrape, 0 where it is not there yet. */
    private static double value(String scrape, String series) {
        Matcher m = Pattern.compile("^" + Pattern.quote(series) + " (\\S+)$", Pattern.MULTILINE).matcher(scrape);
        return m.find() ? Double.parseDouble(m.group(1)) : 0;
    }
}
