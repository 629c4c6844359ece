package dev.dwellwise.http;

import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** One worker and no queue: while a solve is held in the worker, the next one is refused with 503. */
@Timeout(20)
class OverloadTest {

    @Test
    void aSolveBeyondTheWorkersAndTheQueueGets503WithRetryAfterWhileTheHeldOneCompletes() throws Exception {
        Map<String, String> env = Map.of(ServiceConfig.WORKER_THREADS, "1", ServiceConfig.QUEUE_SIZE, "0");
        SolveGate gate = new SolveGate(1);
        try (RunningService service = RunningService.start(env, gate.services(RunningService.config(env)))) {
            CompletableFuture<HttpResponse<String>> held = post(service);
            assertTrue(gate.awaitEntered(), "the first solve reached the worker");

            Http.given(service).filter(Contract.responsesOnly()).contentType("application/json")
                    .body(Workloads.PANEL).post("/v1/simulations").then()
                    .statusCode(503)
                    .contentType("application/problem+json")
                    .header("Retry-After", equalTo(Problems.RETRY_AFTER_SECONDS))
                    .body("type", equalTo(ProblemType.OVERLOADED.uri()));
            Http.given(service).get("/health/live").then().statusCode(200);

            gate.open();
            assertEquals(200, held.get(Http.TIMEOUT_MILLIS, TimeUnit.MILLISECONDS).statusCode());
            Http.given(service).contentType("application/json").body(Workloads.PANEL).post("/v1/simulations").then()
                    .statusCode(200);
        } finally {
            gate.open();
        }
    }

    static CompletableFuture<HttpResponse<String>> post(RunningService service) {
        HttpRequest request = HttpRequest.newBuilder(URI.create(service.url("/v1/simulations")))
                .timeout(Duration.ofMillis(Http.TIMEOUT_MILLIS * 2L))
                .header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofString(Workloads.PANEL)).build();
        return HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1).connectTimeout(Duration.ofMillis(Http.TIMEOUT_MILLIS)).build()
                .sendAsync(request, HttpResponse.BodyHandlers.ofString());
    }
}
