package dev.dwellwise.http;

import static java.nio.charset.StandardCharsets.ISO_8859_1;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.matchesPattern;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.response.Response;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** Every answer carries a request id, and so does every log line written while serving it. */
@Timeout(20)
class RequestIdTest {

    private static final String TOKEN = "request-id-token-0123456789";
    private static final String UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";
    private static RunningService service;

    @BeforeAll
    static void start() {
        service = RunningService.start(Map.of(ServiceConfig.API_TOKEN, TOKEN));
    }

    @AfterAll
    static void stop() {
        service.close();
    }

    @Test
    void aSafeIdFromTheCallerIsEchoed() {
        Http.given(service).header("X-Request-Id", "mes-batch-4711.2").get("/health/live").then()
                .header("X-Request-Id", equalTo("mes-batch-4711.2"));
    }

    @Test
    void anUnsafeIdIsReplacedByAFreshOne() {
        Http.given(service).header("X-Request-Id", "evil id; injected=1").get("/health/live").then()
                .header("X-Request-Id", matchesPattern(UUID));
    }

    @Test
    void freshIdsAreDistinctRandomUuidsOfVersionFour() {
        // RFC 9562, section 5.4: version 4 in the version field, the variant bits 10
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < 10_000; i++) {
            String id = RequestIds.fresh();
            java.util.UUID parsed = java.util.UUID.fromString(id); // the field UUID is the text pattern
            assertEquals(4, parsed.version(), id);
            assertEquals(2, parsed.variant(), id);
            assertTrue(id.matches(UUID), id);
            assertTrue(seen.add(id), "repeated " + id);
        }
    }

    @Test
    void aProblemNamesTheIdOfItsRequest() {
        Response response = Http.given(service).get("/v1/materials");
        response.then().statusCode(401).body("requestId", equalTo(response.header("X-Request-Id")));
    }

    @Test
    void theAccessLineOfEveryAnswerCarriesItsIdIncludingErrors() throws InterruptedException, IOException {
        try (CapturedLog access = CapturedLog.of("dwellwise.access")) {
            Http.given(service).header("X-Request-Id", "refused-1").get("/v1/materials").then().statusCode(401);
            String refusedEarly = refusedBeforeItsBody("refused-post-1");
            assertTrue(refusedEarly.startsWith("HTTP/1.1 401 "), refusedEarly);
            Http.given(service).header("Authorization", "Bearer " + TOKEN).header("X-Request-Id", "missing-1")
                    .get("/v1/nowhere").then().statusCode(404);
            Http.given(service).header("Authorization", "Bearer " + TOKEN).header("X-Request-Id", "invalid-1")
                    .contentType("application/json").body("{\"part\": {}}").post("/v1/simulations").then()
                    .statusCode(422);
            assertOneLine(access, "refused-1", "GET /v1/materials 401 \\d+ms");
            assertOneLine(access, "refused-post-1", "POST /v1/simulations 401 \\d+ms");
            assertOneLine(access, "missing-1", "GET /v1/nowhere 404 \\d+ms");
            assertOneLine(access, "invalid-1", "POST /v1/simulations 422 \\d+ms");
        }
    }

    /**
     * A job refused before its 200 KB body is read: the answer still arrived, so its line says 401,
     * not 499. Sent on a raw socket that reads the answer after the first kilobyte of the body: a
     * client that sends all of it first can meet the connection the service closed behind its answer
     * before it reads that answer (a broken pipe, and a retry).
     */
    private static String refusedBeforeItsBody(String requestId) throws IOException {
        byte[] body = (Workloads.PANEL + " ".repeat(200_000)).getBytes(ISO_8859_1);
        try (Socket socket = new Socket("127.0.0.1", service.port())) {
            socket.setSoTimeout(10_000);
            OutputStream out = socket.getOutputStream();
            out.write(("POST /v1/simulations HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/json\r\n"
                    + "X-Request-Id: " + requestId + "\r\nContent-Length: " + body.length + "\r\n\r\n")
                    .getBytes(ISO_8859_1));
            out.write(body, 0, 1024);
            out.flush();
            return new String(socket.getInputStream().readAllBytes(), ISO_8859_1); // it closes after a refusal
        }
    }

    @Test
    void theAccessLineOfASolveCarriesItsSummaryAndIsTheRequestsOnlyLine() throws InterruptedException {
        try (CapturedLog all = CapturedLog.of(org.slf4j.Logger.ROOT_LOGGER_NAME)) {
            Http.given(service).header("Authorization", "Bearer " + TOKEN).header("X-Request-Id", "solve-1")
                    .contentType("application/json").body(Workloads.PANEL).post("/v1/simulations").then().statusCode(200);
            assertOneLine(all, "solve-1",
                    "POST /v1/simulations 200 \\d+ms model=lumped steps=\\d+ evaluations=\\d+ verdict=(pass|fail)");
        }
    }

    /**
     * A line written on a server thread outside any request (Jetty's refusal of a malformed request)
     * must not carry the id of a request that thread served before: the id is taken out of the
     * thread's logging context after every dispatch. Each round serves a request on a kept-alive
     * connection and then sends garbage on it, so the refusal is parsed where the request was read.
     */
    @Test
    void noRefusalLineCarriesTheIdOfAnEarlierRequest() throws Exception {
        try (CapturedLog access = CapturedLog.of("dwellwise.access")) {
            for (int round = 0; round < 40; round++) {
                try (Socket socket = new Socket("127.0.0.1", service.port())) {
                    socket.setSoTimeout(Http.TIMEOUT_MILLIS);
                    OutputStream out = socket.getOutputStream();
                    InputStream in = socket.getInputStream();
                    out.write(("GET /health/live HTTP/1.1\r\nHost: x\r\nX-Request-Id: earlier-" + round
                            + "\r\n\r\n").getBytes(ISO_8859_1));
                    out.flush();
                    byte[] buffer = new byte[8192];
                    String answer = "";
                    // a health answer is small: its headers and body arrive together
                    while (!answer.contains("\r\n\r\n")) {
                        int read = in.read(buffer);
                        assertTrue(read > 0, "the connection closed before the answer");
                        answer += new String(buffer, 0, read, ISO_8859_1);
                    }
                    assertTrue(answer.startsWith("HTTP/1.1 200 "), answer);
                    out.write("GARBAGE\r\n\r\n".getBytes(ISO_8859_1));
                    out.flush();
                    socket.shutdownOutput();
                    in.transferTo(OutputStream.nullOutputStream());
                }
            }
            // a refusal's line is written before its answer, so all of them are in by now
            List<String> idsOnRefusals = access.requestIdsOfLinesContaining("rejected by the HTTP layer");
            assertEquals(40, idsOnRefusals.size(), idsOnRefusals.toString());
            assertTrue(idsOnRefusals.stream().noneMatch(id -> id != null && id.startsWith("earlier-")),
                    "refusals logged under the id of an earlier request: " + idsOnRefusals);
        }
    }

    private static void assertOneLine(CapturedLog log, String requestId, String pattern) throws InterruptedException {
        List<String> lines = log.linesOf(requestId);
        assertEquals(1, lines.size(), requestId + ": " + lines);
        assertTrue(lines.get(0).matches(pattern), lines.get(0));
    }
}
