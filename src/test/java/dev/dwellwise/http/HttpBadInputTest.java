package dev.dwellwise.http;

import static org.hamcrest.Matchers.containsInAnyOrder;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.emptyOrNullString;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.atlassian.oai.validator.model.SimpleRequest;
import com.atlassian.oai.validator.report.ValidationReport;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Requests that are wrong on purpose, each answered with the right status and problem type and, for
 * a bad field, its path. The requests break the contract, so only the answers are validated against
 * it (and each problem body against the Problem schema, also where no operation describes it).
 */
class HttpBadInputTest {

    private static final String SIMULATIONS = "/v1/simulations";
    private static final String UNREADABLE = "urn:dwellwise:problem:unreadable-body";
    private static final String INVALID = "urn:dwellwise:problem:invalid-job";

    @RegisterExtension
    static final BundledServer server = new BundledServer();
    /** Each case is sent once; both tests of a case read its one answer. */
    private static final Map<String, Response> ANSWERS = new ConcurrentHashMap<>();

    /**
     * One bad request, what it must be answered with, and the field the answer must name (or null).
     * {@code job} is the body of a job the service refuses, and {@code contractRefuses} says whether
     * the contract's request schema states the rule too (a bound, an enum, a required field) or only
     * describes it (a rule across fields or against the material library).
     */
    record Case(String sentence, int status, String type, String field, Function<RequestSpecification, Response> send,
                String job, boolean contractRefuses) {

        Case(String sentence, int status, String type, String field, Function<RequestSpecification, Response> send) {
            this(sentence, status, type, field, send, null, false);
        }

        @Override
        public String toString() {
            return sentence;
        }
    }

    private static Function<RequestSpecification, Response> post(String body) {
        return r -> r.contentType("application/json").body(body).post(SIMULATIONS);
    }

    private static Function<RequestSpecification, Response> post(ObjectNode job) {
        return post(Jobs.text(job));
    }

    private static Case unreadable(String sentence, String body) {
        return new Case(sentence, 400, UNREADABLE, null, post(body));
    }

    private static Case invalid(String sentence, String field, ObjectNode job) {
        return new Case(sentence, 422, INVALID, field, post(job), Jobs.text(job), true);
    }

    /** A job the service refuses by a rule the contract describes in words only. */
    private static Case invalidBeyondSchema(String sentence, String field, ObjectNode job) {
        return new Case(sentence, 422, INVALID, field, post(job), Jobs.text(job), false);
    }

    private static ObjectNode job() {
        return Jobs.small();
    }

    static Stream<Case> cases() {
        ObjectNode job = job();
        return Stream.of(
                unreadable("a JSON syntax error is a 400 unreadable-body problem", "{\"part\": {\"material\": "),
                unreadable("a syntax error inside a nested object is a 400, not a 422 on the enclosing field",
                        "{\"part\": {\"material\": \"steel-1010\", \"thicknessMm\": }, \"stages\": []}"),
                unreadable("an empty body is a 400 unreadable-body problem", ""),
                unreadable("a JSON array for a body is a 400 unreadable-body problem", "[" + Jobs.text(job) + "]"),
                unreadable("a JSON null for a body is a 400 unreadable-body problem", "null"),
                unreadable("a JSON string for a body is a 400 unreadable-body problem", "\"steel-1010\""),
                unreadable("a key given twice in a nested object is a 400 unreadable-body problem",
                        "{\"part\": {\"emissivity\": 0.9, \"emissivity\": 0.2}}"),
                unreadable("content after the JSON object is a 400 unreadable-body problem",
                        Jobs.text(job) + " {}"),

                new Case("a body sent as text/plain is a 415 unsupported-media-type problem", 415,
                        "urn:dwellwise:problem:unsupported-media-type", null,
                        r -> r.contentType("text/plain").body(Jobs.text(job)).post(SIMULATIONS)),
                new Case("a body sent as application/xml is a 415 unsupported-media-type problem", 415,
                        "urn:dwellwise:problem:unsupported-media-type", null,
                        r -> r.contentType("application/xml").body("<job/>").post(SIMULATIONS)),
                new Case("a body over 1 MiB is a 413 body-too-large problem", 413,
                        "urn:dwellwise:problem:body-too-large", null,
                        r -> r.config(TestServer.EXPECT_CONTINUE).contentType("application/json")
                                .body("{\"part\": {\"material\": \"" + "x".repeat(1_100_000) + "\"}}")
                                .post(SIMULATIONS)),
                new Case("Accept: application/xml is a 406 not-acceptable problem", 406,
                        "urn:dwellwise:problem:not-acceptable", null,
                        r -> r.contentType("application/json").accept("application/xml").body(Jobs.text(job))
                                .post(SIMULATIONS)),
                new Case("Accept: text/csv on a job that wants no series is a 406 not-acceptable problem", 406,
                        "urn:dwellwise:problem:not-acceptable", null,
                        r -> r.contentType("application/json").accept("text/csv")
                                .body(Jobs.text(Jobs.with(job, "output.series", false))).post(SIMULATIONS)),
                new Case("DELETE on the simulations resource is a 405 method-not-allowed problem", 405,
                        "urn:dwellwise:problem:method-not-allowed", null, r -> r.delete(SIMULATIONS)),
                new Case("GET on the simulations resource is a 405 method-not-allowed problem", 405,
                        "urn:dwellwise:problem:method-not-allowed", null, r -> r.get(SIMULATIONS)),
                new Case("POST on the material library is a 405 method-not-allowed problem", 405,
                        "urn:dwellwise:problem:method-not-allowed", null,
                        r -> r.contentType("application/json").body("{}").post("/v1/materials")),
                new Case("PUT on the liveness probe is a 405 method-not-allowed problem", 405,
                        "urn:dwellwise:problem:method-not-allowed", null, r -> r.put("/health/live")),
                new Case("a path the service does not have is a 404 not-found problem", 404,
                        "urn:dwellwise:problem:not-found", null, r -> r.get("/v1/no-such-resource")),

                invalid("a negative thickness names part.thicknessMm", "part.thicknessMm",
                        Jobs.with(job, "part.thicknessMm", -1.5)),
                invalid("a zero thickness names part.thicknessMm", "part.thicknessMm",
                        Jobs.with(job, "part.thicknessMm", 0)),
                invalid("an emissivity above 1 names part.emissivity", "part.emissivity",
                        Jobs.with(job, "part.emissivity", 1.2)),
                invalid("a negative emissivity names part.emissivity", "part.emissivity",
                        Jobs.with(job, "part.emissivity", -0.1)),
                invalid("a temperature at absolute zero names its field", "part.initialTemperatureC",
                        Jobs.with(job, "part.initialTemperatureC", -273.15)),
                invalid("a temperature below absolute zero names its field", "stages[1].airTemperatureC",
                        Jobs.with(job, "stages[1].airTemperatureC", -300)),
                invalid("two until forms at once name stages[1].until", "stages[1].until",
                        Jobs.with(job, "stages[1].until", Map.of("partBelowC", 50, "seconds", 600))),
                invalid("a stage without until names stages[1].until", "stages[1].until",
                        Jobs.without(job, "stages[1].until")),
                invalid("an empty until names stages[0].until", "stages[0].until",
                        Jobs.with(job, "stages[0].until", Map.of())),
                invalid("a hold without holdSeconds names stages[0].until.holdSeconds", "stages[0].until.holdSeconds",
                        Jobs.with(job, "stages[0].until", Map.of("holdAboveC", 170))),
                invalid("a hold of no time names stages[0].until.holdSeconds", "stages[0].until.holdSeconds",
                        Jobs.with(job, "stages[0].until", Map.of("holdAboveC", 170, "holdSeconds", 0))),
                invalid("a hold temperature below absolute zero names stages[0].until.holdAboveC",
                        "stages[0].until.holdAboveC",
                        Jobs.with(job, "stages[0].until", Map.of("holdAboveC", -274, "holdSeconds", 60))),
                invalid("a target at absolute zero names stages[0].until.partAboveC", "stages[0].until.partAboveC",
                        Jobs.with(job, "stages[0].until", Map.of("partAboveC", -273.15))),
                invalid("a target below absolute zero names stages[1].until.partBelowC", "stages[1].until.partBelowC",
                        Jobs.with(job, "stages[1].until", Map.of("partBelowC", -280))),
                invalidBeyondSchema("an unknown material id names part.material", "part.material",
                        Jobs.with(job, "part.material", "unobtainium")),
                invalid("a misspelt property is refused, naming it, not ignored", "part.emisivity",
                        Jobs.with(Jobs.without(job, "part.emissivity"), "part.emisivity", 0.9)),
                invalid("a misspelt property of a stage is refused, naming it", "stages[0].untill",
                        Jobs.with(job, "stages[0].untill", Map.of("seconds", 60))),
                invalid("a number sent as a string names its field", "part.thicknessMm",
                        Jobs.with(job, "part.thicknessMm", "1.5")),
                invalid("a boolean sent as a string names its field", "output.series",
                        Jobs.with(job, "output.series", "true")),
                invalid("a fraction for a whole number names its field", "part.exposedFaces",
                        Jobs.with(job, "part.exposedFaces", 1.5)),
                invalid("three exposed faces name part.exposedFaces", "part.exposedFaces",
                        Jobs.with(job, "part.exposedFaces", 3)),
                invalid("more than 40 stages name stages", "stages",
                        Jobs.with(job, "stages", Collections.nCopies(41, job.get("stages").get(0)))),
                invalid("no stages name stages", "stages", Jobs.with(job, "stages", List.of())),
                invalid("a null stage names stages[1]", "stages[1]",
                        Jobs.with(job, "stages[1]", null)),
                invalid("a missing part names part", "part", Jobs.without(job, "part")),
                invalid("layers together with material name part.layers", "part.layers",
                        Jobs.with(job, "part.layers", List.of(Map.of("material", "steel-1010", "thicknessMm", 1)))),
                invalidBeyondSchema("an air ramp on a stage that does not end after fixed seconds names airEndTemperatureC",
                        "stages[1].airEndTemperatureC", Jobs.with(job, "stages[1].airEndTemperatureC", 20)),
                invalidBeyondSchema("a surroundings ramp without its start names surroundingsEndTemperatureC",
                        "stages[0].surroundingsEndTemperatureC",
                        Jobs.with(job, "stages[0].surroundingsEndTemperatureC", 200)),
                invalid("a stage maxSeconds beyond 7 days names stages[1].maxSeconds", "stages[1].maxSeconds",
                        Jobs.with(job, "stages[1].maxSeconds", 8 * 86_400)),
                invalid("a fixed stage time beyond 7 days names stages[0].until.seconds", "stages[0].until.seconds",
                        Jobs.with(job, "stages[0].until.seconds", 8 * 86_400)),
                invalidBeyondSchema("stages that may last beyond 40 days in all name stages", "stages",
                        Jobs.with(job, "stages", Collections.nCopies(7,
                                Jobs.with(job, "stages[1].maxSeconds", 7 * 86_400).get("stages").get(1)))),
                invalid("a negative convection coefficient names its field", "stages[0].convectionWPerM2K",
                        Jobs.with(job, "stages[0].convectionWPerM2K", -5)),
                invalid("a blank stage name names stages[0].name", "stages[0].name",
                        Jobs.with(job, "stages[0].name", "  ")),
                invalid("a sample spacing below 0.1 s names output.sampleSeconds", "output.sampleSeconds",
                        Jobs.with(job, "output.sampleSeconds", 0.01)),
                invalid("an unknown model names model", "model", Jobs.with(job, "model", "finite-element")),
                invalidBeyondSchema("a control character in a stage name names stages[0].name (XML, and so the "
                        + "SVG chart, cannot hold it)", "stages[0].name", Jobs.with(job, "stages[0].name", "cure\u0001oven")),
                invalidBeyondSchema("a bidirectional override in a stage name names stages[0].name", "stages[0].name",
                        Jobs.with(job, "stages[0].name", "\u202Enevo eruc")),
                new Case("an unpaired surrogate in a stage name names stages[0].name", 422, INVALID, "stages[0].name",
                        post(Jobs.text(Jobs.with(job, "stages[0].name", "LONE")).replace("\"LONE\"", "\"\\ud800\""))),
                invalid("a custom material without density names its densityKgPerM3", "part.material.densityKgPerM3",
                        Jobs.with(job, "part.material", Map.of("specificHeatJPerKgK", 460, "conductivityWPerMK", 50))),
                invalid("a custom material with both a constant and a table names the table",
                        "part.material.specificHeatTable",
                        Jobs.with(job, "part.material", Map.of("densityKgPerM3", 7850, "specificHeatJPerKgK", 460,
                                "specificHeatTable", List.of(Map.of("temperatureC", 20, "specificHeatJPerKgK", 450)),
                                "conductivityWPerMK", 50))),
                invalid("a material that is neither a string nor an object names part.material", "part.material",
                        Jobs.with(job, "part.material", 1010)),
                new Case("too many samples (0.1 s over three days) is a 422 compute-limit problem on "
                        + "output.sampleSeconds", 422, "urn:dwellwise:problem:compute-limit", "output.sampleSeconds",
                        post(Jobs.with(Jobs.with(job, "output.sampleSeconds", 0.1), "stages[0].until.seconds",
                                3 * 86_400))));
    }

    private static Response answer(Case c) {
        return ANSWERS.computeIfAbsent(c.sentence(), k -> c.send().apply(server.request(Contract.responsesOnly())));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void isAnsweredWithItsProblem(Case c) {
        Response answer = answer(c);
        answer.then()
                .statusCode(c.status())
                .contentType("application/problem+json")
                .body("type", equalTo(c.type()))
                .body("status", equalTo(c.status()))
                .body("title", not(emptyOrNullString()))
                .body("requestId", equalTo(answer.header("X-Request-Id")));
        if (c.field() != null) {
            answer.then().body("errors.field", hasItem(c.field()));
        }
        ValidationReport report = Contract.validateAgainst("Problem", answer.asString());
        assertFalse(report.hasErrors(), () -> "the body breaks the Problem schema: " + report.getMessages());
    }

    static Stream<Case> jobsTheContractRefuses() {
        return cases().filter(Case::contractRefuses);
    }

    @Test
    void theContractAdmitsTheValidJobTheCasesAreMadeFrom() {
        ValidationReport report = Contract.strictValidator().validateRequest(SimpleRequest.Builder.post(SIMULATIONS)
                .withContentType("application/json").withBody(Jobs.text(job())).build());
        assertFalse(report.hasErrors(), () -> report.getMessages().toString());
    }

    @ParameterizedTest(name = "{0}; the contract's request schema refuses it too")
    @MethodSource("jobsTheContractRefuses")
    void theContractRefusesTheJobToo(Case c) {
        ValidationReport report = Contract.strictValidator().validateRequest(SimpleRequest.Builder.post(SIMULATIONS)
                .withContentType("application/json").withBody(c.job()).build());
        assertTrue(report.hasErrors(), "the contract admits a job that the service refuses on " + c.field());
    }

    @ParameterizedTest(name = "{0}, with no stack trace or Java class name in the answer")
    @MethodSource("cases")
    void carriesNoStackTraceOrClassName(Case c) {
        Internals.assertNone(answer(c).asString());
    }

    /**
     * {@code "model": "slab"} is a valid choice (it was refused before the slab back end landed).
     */
    @Test
    void theSlabModelIsServedWhenAsked() {
        server.request(Contract.strict()).contentType("application/json")
                .body(Jobs.text(Jobs.with(job(), "model", "slab"))).post(SIMULATIONS).then()
                .statusCode(200)
                .contentType("application/json")
                .body("model.used", equalTo("slab"));
    }

    /** Headers a broken client sends, raw: REST Assured would not send them as they are. */
    @Test
    void aLoneSemicolonForAcceptOrContentTypeIsRefusedNotAnInternalError() throws Exception {
        String job = Jobs.text(job());
        for (String[] header : new String[][] {{"Accept: ;", "406"}, {"Accept: application/json, ;", "200"},
                {"Accept: ;;", "406"}}) {
            String answer = Http.raw(server.port(), "POST " + SIMULATIONS + " HTTP/1.1\r\nHost: x\r\n" + header[0]
                    + "\r\nContent-Type: application/json\r\nContent-Length: " + job.length()
                    + "\r\nConnection: close\r\n\r\n" + job);
            assertTrue(answer.startsWith("HTTP/1.1 " + header[1] + " "), header[0] + ": " + answer);
        }
        String answer = Http.raw(server.port(), "POST " + SIMULATIONS + " HTTP/1.1\r\nHost: x\r\nContent-Type: ;"
                + "\r\nContent-Length: 2\r\nConnection: close\r\n\r\n{}");
        assertTrue(answer.startsWith("HTTP/1.1 415 "), answer);
        assertTrue(answer.contains(ProblemType.UNSUPPORTED_MEDIA_TYPE.uri()), answer);
    }

    @Test
    void aCompressedBodyIsRefusedWith415NamingTheCodingItTakes() {
        for (String route : List.of(SIMULATIONS, "/v1/release-checks")) {
            server.request(Contract.responsesOnly()).contentType("application/json").header("Content-Encoding", "gzip")
                    .body("{}").post(route).then()
                    .statusCode(415)
                    .header("Accept-Encoding", equalTo("identity"))
                    .body("type", equalTo(ProblemType.UNSUPPORTED_MEDIA_TYPE.uri()));
        }
        server.request(Contract.responsesOnly()).contentType("application/json").header("Content-Encoding", "identity")
                .body(Jobs.text(job())).post(SIMULATIONS).then().statusCode(200);
    }

    @Test
    void aMethodNotAllowedAnswerNamesTheMethodsThePathOffers() {
        server.request(Contract.responsesOnly()).delete(SIMULATIONS).then()
                .statusCode(405).header("Allow", equalTo("POST"));
        server.request(Contract.responsesOnly()).post("/v1/materials/steel-1010").then()
                .statusCode(405).header("Allow", equalTo("GET"));
    }

    @Test
    void everyInvalidFieldIsReportedInOneAnswer() {
        ObjectNode job = Jobs.with(Jobs.with(job(), "part.thicknessMm", -1), "part.emissivity", 2);
        job = Jobs.with(job, "stages[1].until", Map.of());
        Response answer = server.request(Contract.responsesOnly()).contentType("application/json")
                .body(Jobs.text(job)).post(SIMULATIONS);
        answer.then().statusCode(422).body("errors.field", containsInAnyOrder(
                "part.thicknessMm", "part.emissivity", "stages[1].until"));
    }
}
