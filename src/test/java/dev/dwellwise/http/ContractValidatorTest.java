package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.atlassian.oai.validator.OpenApiInteractionValidator;
import com.atlassian.oai.validator.model.Request;
import com.atlassian.oai.validator.model.SimpleResponse;
import com.atlassian.oai.validator.report.ValidationReport;
import com.atlassian.oai.validator.restassured.OpenApiValidationFilter;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.dwellwise.job.Job;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The validation itself can fail: a wrong answer or a wrong contract is reported, so the HTTP tests
 * cannot pass by validating nothing. Also pins down why the validator reads an adapted copy of the
 * contract (see {@link Contract}).
 */
class ContractValidatorTest {

    /** A real answer of the service to a small job, as the wire carries it. */
    private static ObjectNode answer;

    @BeforeAll
    static void simulate() throws JsonProcessingException {
        Services services = Services.bundled();
        Job job = services.mapper().readValue(Jobs.text(Jobs.small()), Job.class);
        answer = (ObjectNode) Jobs.parse(services.mapper().writeValueAsString(services.simulator().simulate(job)));
    }

    private static ValidationReport validate(OpenApiInteractionValidator validator, JsonNode body) {
        return validator.validateResponse("/v1/simulations", Request.Method.POST,
                SimpleResponse.Builder.ok().withContentType("application/json").withHeader("X-Request-Id", "test-1")
                        .withBody(Jobs.text(body)).build());
    }

    private static Arguments breaks(String sentence, UnaryOperator<ObjectNode> edit) {
        return Arguments.of(sentence, edit);
    }

    static Stream<Arguments> wrongAnswers() {
        return Stream.of(
                breaks("a number sent as a string", a -> a.put("totalSeconds", "952.6")),
                breaks("a verdict outside its enum", a -> a.put("verdict", "maybe")),
                breaks("a required field left out", a -> {
                    a.remove("provenance");
                    return a;
                }),
                breaks("a field the contract does not describe", a -> a.put("score", 0.97)),
                breaks("a stage end outside its enum", a -> {
                    ((ObjectNode) a.get("stages").get(0)).put("ended", "timeout");
                    return a;
                }),
                breaks("a fraction in the integer stage index", a -> {
                    ((ArrayNode) a.get("series").get("stageIndex")).set(1, 0.5);
                    return a;
                }),
                breaks("a check without its status", a -> {
                    ((ObjectNode) a.get("checks").get(0)).remove("status");
                    return a;
                }),
                breaks("an input hash that is not 64 hex digits", a -> {
                    ((ObjectNode) a.get("provenance")).put("inputSha256", "not-a-hash");
                    return a;
                }),
                breaks("an object where an array belongs", a -> a.set("cautions", Jobs.parse("{}"))));
    }

    @Test
    void theServicesRealAnswerPassesTheValidator() {
        ValidationReport report = validate(Contract.strictValidator(), answer);
        assertFalse(report.hasErrors(), () -> report.getMessages().toString());
    }

    @ParameterizedTest(name = "an answer with {0} is reported by the validator")
    @MethodSource("wrongAnswers")
    void aWrongAnswerIsReported(String sentence, UnaryOperator<ObjectNode> edit) {
        ValidationReport report = validate(Contract.strictValidator(), edit.apply(answer.deepCopy()));
        assertTrue(report.hasErrors(), "the validator accepted an answer with " + sentence);
    }

    @Test
    void theFilterFailsARequestWhoseAnswerBreaksTheContract() {
        // a deliberately wrong contract: the liveness probe would have to answer "down"
        String wrong = Contract.forValidator().replace("\"enum\" : [ \"up\" ]", "\"enum\" : [ \"down\" ]");
        assertFalse(wrong.equals(Contract.forValidator()), "the edit did not apply");
        try (TestServer server = TestServer.start()) {
            OpenApiValidationFilter filter = new OpenApiValidationFilter(Contract.validator(wrong));
            assertThrows(OpenApiValidationFilter.OpenApiValidationException.class,
                    () -> server.request(filter).get("/health/live"));
        }
    }

    /**
     * Why {@link Contract} hands the validator a copy labelled 3.0.3: read as 3.1, the library loses
     * the schemas' types and lets a string through where the contract says number. If this starts to
     * fail, the library has learnt 3.1 and the adapter can go.
     */
    @Test
    void readAsOpenApi31TheValidatorLibraryMissesAWrongType() {
        ObjectNode wrong = answer.deepCopy().put("totalSeconds", "952.6");
        ValidationReport as31 = validate(Contract.validator(Contract.text()), wrong);
        assertFalse(as31.hasErrors(), () -> "the validator now checks types in a 3.1 document (" + as31.getMessages()
                + "): drop the adapter in Contract");
        assertTrue(validate(Contract.strictValidator(), wrong).hasErrors());
    }

    @Test
    void theAdaptedCopyDiffersFromTheContractOnlyInItsVersionAndTheFormOfExclusiveBounds() {
        ObjectNode adapted = (ObjectNode) Jobs.parse(Contract.forValidator());
        assertEquals("3.0.3", adapted.get("openapi").asText());
        adapted.put("openapi", "3.1.0");
        undoExclusiveBounds(adapted);
        assertEquals(Contract.document(), adapted);
    }

    private static void undoExclusiveBounds(JsonNode node) {
        if (node instanceof ObjectNode schema) {
            for (String[] pair : new String[][] {{"exclusiveMinimum", "minimum"}, {"exclusiveMaximum", "maximum"}}) {
                if (schema.path(pair[0]).isBoolean()) {
                    schema.set(pair[0], schema.remove(pair[1]));
                }
            }
        }
        node.elements().forEachRemaining(ContractValidatorTest::undoExclusiveBounds);
    }
}
