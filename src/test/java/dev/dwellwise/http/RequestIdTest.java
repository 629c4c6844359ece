package dev.dwellwise.http;

import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.matchesPattern;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.response.Response;
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
    void theAccessLineOfEveryAnswerCarriesItsIdIncludingErrors() throws InterruptedException {
        try (CapturedLog access = CapturedLog.of("dwellwise.access")) {
            String refused = Http.given(service).header("X-Request-Id", "refused-1").get("/v1/materials")
                    .then().statusCode(401).extract().header("X-Request-Id");
            String missing = Http.given(service).header("Authorization", "Bearer " + TOKEN)
                    .header("X-Request-Id", "missing-1").get("/v1/nowhere").then().statusCode(404)
                    .extract().header("X-Request-Id");
            String invalid = Http.given(service).header("Authorization", "Bearer " + TOKEN)
                    .header("X-Request-Id", "invalid-1").contentType("application/json").body("{\"part\": {}}")
                    .post("/v1/simulations").then().statusCode(422).extract().header("X-Request-Id");
            assertEquals(List.of(refused, missing, invalid), access.awaitEvents(3).requestIds());
            assertTrue(access.messages().get(0).matches("GET /v1/materials 401 \\d+ms"), access.messages().get(0));
            assertTrue(access.messages().get(1).matches("GET /v1/nowhere 404 \\d+ms"), access.messages().get(1));
            assertTrue(access.messages().get(2).matches("POST /v1/simulations 422 \\d+ms"), access.messages().get(2));
        }
    }

    @Test
    void theAccessLineOfASolveCarriesItsSummaryAndIsTheRequestsOnlyLine() throws InterruptedException {
        try (CapturedLog all = CapturedLog.of(org.slf4j.Logger.ROOT_LOGGER_NAME)) {
            Http.given(service).header("Authorization", "Bearer " + TOKEN).header("X-Request-Id", "solve-1")
                    .contentType("application/json").body(Workloads.PANEL).post("/v1/simulations").then().statusCode(200);
            assertEquals(List.of("solve-1"), all.awaitEvents(1).requestIds());
            assertTrue(all.messages().get(0).matches(
                    "POST /v1/simulations 200 \\d+ms model=lumped steps=\\d+ evaluations=\\d+ verdict=(pass|fail)"),
                    all.messages().get(0));
        }
    }
}
