package dev.dwellwise.http;

import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.not;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import io.restassured.response.Response;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** Every answer carries a request id: the client's when it sent a usable one, else a fresh UUID. */
class HttpRequestIdTest {

    private static final String UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";

    @RegisterExtension
    static final BundledServer server = new BundledServer();

    @Test
    void aRequestIdTheClientSendsIsEchoed() {
        server.request(Contract.strict()).header("X-Request-Id", "mes-batch-4711.line:3_b").get("/health/live")
                .then().statusCode(200).header("X-Request-Id", "mes-batch-4711.line:3_b");
    }

    @Test
    void aRequestWithoutAnIdGetsAGeneratedOne() {
        server.request(Contract.strict()).get("/health/ready")
                .then().statusCode(200).header("X-Request-Id", matchesPattern(UUID));
    }

    @Test
    void twoRequestsWithoutAnIdGetDifferentIds() {
        String first = server.request(Contract.strict()).get("/health/live").header("X-Request-Id");
        String second = server.request(Contract.strict()).get("/health/live").header("X-Request-Id");
        assertNotEquals(first, second);
    }

    @Test
    void aRequestIdWithCharactersOutsideTheSafeSetIsReplaced() {
        server.request(Contract.strict()).header("X-Request-Id", "batch 4711; drop").get("/health/live")
                .then().statusCode(200)
                .header("X-Request-Id", not(equalTo("batch 4711; drop")))
                .header("X-Request-Id", matchesPattern(UUID));
    }

    @Test
    void aRequestIdLongerThan128CharactersIsReplaced() {
        server.request(Contract.strict()).header("X-Request-Id", "a".repeat(129)).get("/health/live")
                .then().statusCode(200).header("X-Request-Id", matchesPattern(UUID));
    }

    @Test
    void aProblemBodyCarriesTheRequestIdTheClientSent() {
        server.request(Contract.responsesOnly()).header("X-Request-Id", "mes-4711").contentType("application/json")
                .body("[]").post("/v1/simulations")
                .then().statusCode(400)
                .header("X-Request-Id", "mes-4711")
                .body("requestId", equalTo("mes-4711"));
    }

    @Test
    void aProblemBodyCarriesTheGeneratedRequestIdOfTheAnswer() {
        Response answer = server.request(Contract.strict()).get("/v1/materials/unobtainium");
        answer.then().statusCode(404)
                .header("X-Request-Id", matchesPattern(UUID))
                .body("requestId", equalTo(answer.header("X-Request-Id")));
    }

    @Test
    void aSimulationAnswerCarriesTheRequestId() {
        server.request(Contract.strict()).header("X-Request-Id", "sim-1").contentType("application/json")
                .body(Jobs.text(Jobs.small())).post("/v1/simulations")
                .then().statusCode(200).header("X-Request-Id", "sim-1");
    }
}
