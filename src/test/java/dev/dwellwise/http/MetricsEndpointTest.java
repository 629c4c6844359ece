package dev.dwellwise.http;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

@Timeout(20)
class MetricsEndpointTest {

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
        assertEquals(before + 1, value(scrape(), series));
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
        String text = scrape();
        assertEquals(-1, text.indexOf("wp-admin"));
        assertEquals(true, value(text, "http_server_requests_seconds_count{method=\"GET\",route=\"unmatched\","
                + "status=\"404\"}") >= 1);
    }

    @Test
    void theScrapeIsPrometheusTextWithTheJvmAndLatencyBuckets() {
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

    private static String scrape() {
        return Http.given(service).get("/metrics").then().statusCode(200).extract().asString();
    }

    /** The value of one series in a scrape, 0 where it is not there yet. */
    private static double value(String scrape, String series) {
        Matcher m = Pattern.compile("^" + Pattern.quote(series) + " (\\S+)$", Pattern.MULTILINE).matcher(scrape);
        return m.find() ? Double.parseDouble(m.group(1)) : 0;
    }
}
