package dev.dwellwise.http;

import static dev.dwellwise.http.CureJobBodies.curingJob;
import static dev.dwellwise.http.CureJobBodies.release;
import static dev.dwellwise.http.Jobs.parse;
import static dev.dwellwise.http.Jobs.with;
import static dev.dwellwise.http.Jobs.without;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import com.atlassian.oai.validator.restassured.OpenApiValidationFilter;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.dwellwise.report.Cautions;
import io.restassured.response.ValidatableResponse;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * {@code POST /v1/release-checks} on a real port: the MES's release question. Valid requests and
 * their answers are validated against the contract; for requests wrong on purpose, the answers.
 */
class ReleaseChecksHttpTest {

    @RegisterExtension
    static final BundledServer server = new BundledServer();

    /**
     * A batch that fails five ways at once: a preheat that never reaches its target (120 C air, 150 C wanted), a
     * 240 C bake that overshoots the 200 C limit yet holds 180 C too briefly, a cooling stage too short to handle
     * the parts, and a heating-rate limit the bake exceeds.
     */
    private static final String FAILING_JOB = """
            {
              "part": { "material": "steel-1010", "thicknessMm": 2.0, "emissivity": 0.9, "initialTemperatureC": 22 },
              "stages": [
                { "name": "preheat", "airTemperatureC": 120, "convectionWPerM2K": 30,
                  "until": { "partAboveC": 150 }, "maxSeconds": 300 },
                { "name": "bake", "airTemperatureC": 240, "convectionWPerM2K": 30, "until": { "seconds": 240 } },
                { "name": "cool", "airTemperatureC": 26, "convectionWPerM2K": 15, "until": { "seconds": 60 } }
              ],
              "cure": { "timeAbove": { "temperatureC": 180, "minSeconds": 600 } },
              "limits": { "maxPartTemperatureC": 200, "handlingTemperatureC": 45, "maxHeatingRateCPerMin": 20 }
            }
            """;

    private static ValidatableResponse post(String body, OpenApiValidationFilter contract) {
        return server.request(contract).contentType("application/json").body(body)
                .when().post("/v1/release-checks").then();
    }

    /** A valid request: it and its answer are checked against the contract. */
    private static ValidatableResponse post(String body) {
        return post(body, Contract.strict());
    }

    /** A request wrong on purpose: only its answer is checked against the contract. */
    private static ValidatableResponse postInvalid(String body) {
        return post(body, Contract.responsesOnly());
    }

    @Test
    void theAccessLineOfAReleaseCheckIsTheAuditTrailOfTheDecision() throws InterruptedException {
        try (CapturedLog access = CapturedLog.of("dwellwise.access")) {
            var answer = post(release("B-2026-0412/08", curingJob())).statusCode(200).extract();
            String hash = answer.path("inputSha256");
            List<String> lines = access.linesOf(answer.header("X-Request-Id"));
            assertEquals(1, lines.size(), lines.toString());
            assertEquals("POST /v1/release-checks 200 ms batch=B-2026-0412/08 release=true inputSha256=" + hash,
                    lines.get(0).replaceFirst(" \\d+ms ", " ms "));
        }
    }

    @Test
    void aBatchThatCuresIsReleasedWithItsChecksAndTheCautionsButNoSeries() {
        post(release("B-2026-0412/07", curingJob()))
                .statusCode(200).contentType("application/json")
                .body("release", equalTo(true))
                .body("batchId", equalTo("B-2026-0412/07"))
                .body("reasons", empty())
                .body("checks.status", everyItem(equalTo("pass")))
                .body("checks.name", hasItem("cure-degree"))
                .body("inputSha256", matchesPattern("[0-9a-f]{64}"))
                .body("service", startsWith("dwellwise "))
                .body("cautions", SafetyCautions.named())
                .body("cautions", hasSize(Cautions.ALL.size()))
                .body("$", not(hasKey("series")));
    }

    @Test
    void aBatchThatFailsIsHeldWithItsReasonsMostSeriousFirst() {
        post(release("B-7", parse(FAILING_JOB)))
                .statusCode(200).contentType("application/json")
                .body("release", equalTo(false))
                .body("reasons", hasSize(5))
                .body("reasons[0]", containsString("under-cured"))
                .body("reasons[1]", startsWith("hottest point peaked"))
                .body("reasons[2]", startsWith("stage 'preheat': "))
                .body("reasons[3]", containsString("handling limit"))
                .body("reasons[4]", containsString("°C/min limit"));
    }

    @Test
    void theSameBodyGetsAByteIdenticalAnswer() {
        String body = release("B-8", parse(FAILING_JOB));
        byte[] first = post(body).statusCode(200).extract().asByteArray();
        byte[] second = post(body).statusCode(200).extract().asByteArray();
        assertArrayEquals(first, second);
    }

    @Test
    void theInputHashOfTheBundledCureWindowExampleIsTheOneTheReadmeShows() {
        // pins the canonical form: a change to it (key order, number or text form) changes the hashes the
        // MES has stored, and must be made on purpose, with this value and the README changed together
        String hash = post(release("B-2026-0412-07", Jobs.example("powder-coat-bracket-cure-window")))
                .statusCode(200).extract().path("inputSha256");
        assertEquals("c783126fa10b1bf7acd9c59ed0c849c1b9f14d393d190e5990bf2b0172dfb669", hash);
    }

    @Test
    void theInputHashIsTheHashOfTheJobAsSentWhateverTheBatch() {
        // The release solve drops the series internally; the hash is still that of the job with its output asked for.
        String simulated = server.request(Contract.strict()).contentType("application/json")
                .body(CureJobBodies.CURING_JOB).post("/v1/simulations").then().statusCode(200)
                .extract().path("provenance.inputSha256");
        String released = post(release("B-9", curingJob())).statusCode(200).extract().path("inputSha256");
        String otherBatch = post(release("B-10", curingJob())).statusCode(200).extract().path("inputSha256");
        assertEquals(simulated, released);
        assertEquals(released, otherBatch);
    }

    @Test
    void aJobErrorIsNamedUnderJob() {
        postInvalid(release("B-11", without(curingJob(), "stages[0].until")))
                .statusCode(422).contentType("application/problem+json")
                .body("type", equalTo("urn:dwellwise:problem:invalid-job"))
                .body("errors.field", hasItem("job.stages[0].until"));
        ObjectNode misspelt = with(curingJob(), "stages[1].until.partBelow", 45);
        postInvalid(release("B-11", misspelt))
                .statusCode(422).body("errors.field", hasItem("job.stages[1].until.partBelow"));
    }

    @Test
    void aMissingBatchIdIsNamedAlongWithTheJobsErrors() {
        ObjectNode body = (ObjectNode) parse(release("x", without(curingJob(), "part.emissivity")));
        body.remove("batchId");
        postInvalid(Jobs.text(body))
                .statusCode(422).contentType("application/problem+json")
                .body("type", equalTo("urn:dwellwise:problem:invalid-job"))
                .body("errors.field", hasItem("batchId"))
                .body("errors.field", hasItem("job.part.emissivity"));
    }

    @Test
    void aBatchIdOutsideTheSafeCharactersOrTooLongIsRefused() {
        postInvalid(release("B 1; drop", curingJob())).statusCode(422).body("errors.field", hasItem("batchId"));
        postInvalid(release("", curingJob())).statusCode(422).body("errors.field", hasItem("batchId"));
        postInvalid(release("B".repeat(129), curingJob())).statusCode(422).body("errors.field", hasItem("batchId"));
    }

    @Test
    void anUnknownPropertyOrAMissingJobIsRefusedNamingIt() {
        ObjectNode typo = (ObjectNode) parse(release("B-12", curingJob()));
        typo.put("batch", "B-12");
        postInvalid(Jobs.text(typo)).statusCode(422).body("errors.field", hasItem("batch"));
        postInvalid("{ \"batchId\": \"B-12\" }").statusCode(422).body("errors.field", hasItem("job"));
    }

    @Test
    void theAnswerIsJsonOnly() {
        server.request(Contract.responsesOnly()).contentType("application/json").accept("text/csv")
                .body(release("B-13", curingJob())).post("/v1/release-checks")
                .then().statusCode(406).contentType("application/problem+json");
    }
}
