package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import io.swagger.v3.oas.models.SpecVersion;
import io.swagger.v3.parser.OpenAPIV3Parser;
import io.swagger.v3.parser.core.models.SwaggerParseResult;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The contract and the running app describe the same service: no route missing from either. */
class HttpContractCoverageTest {

    @RegisterExtension
    static final BundledServer server = new BundledServer();

    /** {@code GET /v1/materials/{id}} for every HTTP route in Javalin's own router (filters left out). */
    private static Set<String> registeredRoutes() {
        return server.app().unsafe.internalRouter.allHttpHandlers().stream()
                .map(parsed -> parsed.endpoint)
                .filter(endpoint -> endpoint.method.isHttpMethod())
                .map(endpoint -> endpoint.method.name() + " " + endpoint.path)
                .collect(Collectors.toCollection(TreeSet::new));
    }

    @Test
    void everyRouteTheAppRegistersIsInTheContract() {
        Set<String> registered = registeredRoutes();
        assertFalse(registered.isEmpty(), "the router lists no routes");
        Set<String> missing = new TreeSet<>(registered);
        missing.removeAll(Contract.operations());
        assertTrue(missing.isEmpty(), () -> "routes the contract does not describe: " + missing);
    }

    @Test
    void everyOperationInTheContractIsARegisteredRoute() {
        Set<String> extra = new TreeSet<>(Contract.operations());
        extra.removeAll(registeredRoutes());
        assertTrue(extra.isEmpty(), () -> "operations the app does not register: " + extra);
    }

    @Test
    void everyOperationInTheContractIsServedWithItsOwnExamples() {
        JsonNode paths = Contract.document().get("paths");
        List<String> failures = new ArrayList<>();
        for (String operation : Contract.operations()) {
            String method = operation.substring(0, operation.indexOf(' '));
            String template = operation.substring(method.length() + 1);
            JsonNode spec = paths.get(template).get(method.toLowerCase(java.util.Locale.ROOT));
            RequestSpecification request = server.request(Contract.strict());
            String path = template;
            for (JsonNode parameter : spec.path("parameters")) {
                if ("path".equals(parameter.path("in").asText())) {
                    assertTrue(parameter.has("example"), () -> operation + ": give the path parameter an example");
                    path = path.replace("{" + parameter.get("name").asText() + "}", parameter.get("example").asText());
                }
            }
            JsonNode body = spec.path("requestBody").path("content").path("application/json").path("examples");
            if (body.size() > 0) {
                request = request.contentType("application/json").body(Jobs.text(body.elements().next().get("value")));
            }
            Response answer = request.request(method, path);
            if (answer.statusCode() != 200) {
                failures.add(operation + " answered " + answer.statusCode());
            }
        }
        assertEquals(List.of(), failures);
    }

    @Test
    void theContractIsAnOpenApi31DocumentThatParsesWithoutMessages() {
        SwaggerParseResult parsed = new OpenAPIV3Parser().readContents(Contract.text(), null, null);
        assertEquals(List.of(), parsed.getMessages());
        assertEquals(SpecVersion.V31, parsed.getOpenAPI().getSpecVersion());
        assertEquals("3.1.0", parsed.getOpenAPI().getOpenapi());
    }

    @Test
    void theCopyTheValidatorReadsParsesWithoutMessagesToo() {
        assertEquals(List.of(), new OpenAPIV3Parser().readContents(Contract.forValidator(), null, null).getMessages());
    }

    @Test
    void theContractNamesTheLocalServerAndTheSafetyCautions() {
        JsonNode document = Contract.document();
        assertEquals("http://localhost:8080", document.get("servers").get(0).get("url").asText());
        String description = document.get("info").get("description").asText();
        for (String caution : List.of("estimate", "measured part-temperature profile", "supplier's data sheet",
                "ISO 13732-1", "NFPA 86", "EN 1539", "local codes")) {
            assertTrue(description.contains(caution), () -> "info.description does not mention " + caution);
        }
    }

    @Test
    void everyObjectSchemaAJobIsMadeOfRefusesUnknownProperties() {
        JsonNode schemas = Contract.document().get("components").get("schemas");
        Set<String> seen = new HashSet<>();
        Deque<String> todo = new ArrayDeque<>(List.of("Job"));
        List<String> open = new ArrayList<>();
        while (!todo.isEmpty()) {
            String name = todo.pop();
            if (!seen.add(name)) {
                continue;
            }
            JsonNode schema = schemas.get(name);
            if ("object".equals(schema.path("type").asText()) && !schema.path("additionalProperties").isBoolean()) {
                open.add(name);
            } else if (schema.path("additionalProperties").asBoolean(false)) {
                open.add(name);
            }
            schema.findValuesAsText("$ref").forEach(ref -> todo.push(ref.substring(ref.lastIndexOf('/') + 1)));
        }
        assertTrue(seen.size() > 10, () -> "only " + seen + " reached from Job");
        assertEquals(List.of(), open, "object schemas of the job that admit unknown properties");
    }
}
