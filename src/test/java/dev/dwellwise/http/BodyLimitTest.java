package dev.dwellwise.http;

import static org.hamcrest.Matchers.equalTo;

import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

@Timeout(20)
class BodyLimitTest {

    private static RunningService service;

    @BeforeAll
    static void start() {
        service = RunningService.start(Map.of(ServiceConfig.MAX_BODY_BYTES, "2048"));
    }

    @AfterAll
    static void stop() {
        service.close();
    }

    @Test
    void aBodyOverTheConfiguredLimitGets413ProblemDetails() {
        String padded = Workloads.PANEL.replace("\"bake\"", "\"bake" + " ".repeat(4096) + "\"");
        Http.given(service).contentType("application/json").body(padded).post("/v1/simulations").then()
                .statusCode(413)
                .contentType("application/problem+json")
                .body("type", equalTo(ProblemType.BODY_TOO_LARGE.uri()));
    }

    @Test
    void aChunkedBodyOverTheLimitGets413Too() throws Exception {
        String chunk = "x".repeat(3000);
        String answer = Http.raw(service, "POST /v1/simulations HTTP/1.1\r\nHost: x\r\nContent-Type: application/json"
                + "\r\nTransfer-Encoding: chunked\r\nConnection: close\r\n\r\n" + Integer.toHexString(chunk.length())
                + "\r\n" + chunk + "\r\n0\r\n\r\n");
        org.junit.jupiter.api.Assertions.assertTrue(answer.startsWith("HTTP/1.1 413 "), answer);
    }

    @Test
    void aBodyWithinTheLimitIsSolved() {
        Http.given(service).contentType("application/json").body(Workloads.PANEL).post("/v1/simulations").then()
                .statusCode(200);
    }
}
