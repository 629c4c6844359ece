package dev.dwellwise.http;

import com.atlassian.oai.validator.OpenApiInteractionValidator;
import com.atlassian.oai.validator.report.LevelResolver;
import com.atlassian.oai.validator.report.MessageResolver;
import com.atlassian.oai.validator.report.ValidationReport;
import com.atlassian.oai.validator.restassured.OpenApiValidationFilter;
import com.atlassian.oai.validator.schema.SchemaValidator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import io.swagger.v3.oas.models.media.Schema;
import io.swagger.v3.parser.OpenAPIV3Parser;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The contract, {@code openapi/dwellwise.yaml} as packaged on the classpath, and the validators the
 * HTTP tests check every answer with.
 *
 * <p><b>Why the validator reads an adapted copy.</b> swagger-request-validator 2.44.9 loads an
 * OpenAPI 3.1 document, but turns each schema into the JSON Schema (draft-04) that its engine checks
 * through swagger-core's OpenAPI 3.0 serialiser, which drops the {@code type},
 * {@code additionalProperties: false}, {@code const} and numeric {@code exclusiveMinimum} of a 3.1
 * schema: a response carrying a string where the contract says number would pass
 * ({@link ValidatorDialectTest} shows it). The contract is therefore written in the part of JSON
 * Schema that OpenAPI 3.0 and 3.1 read alike (no type arrays, no {@code const}, no schema-level
 * {@code examples}), plus 3.1's numeric exclusive bounds. The validator gets the same document
 * labelled 3.0.3 with each {@code exclusiveMinimum: x} written the 3.0 way
 * ({@code minimum: x, exclusiveMinimum: true}); nothing else is changed, and the schemas are checked
 * by the library, not by this class.
 */
final class Contract {

    static final String RESOURCE = "/openapi/dwellwise.yaml";
    private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory());
    private static final ObjectMapper JSON = new ObjectMapper();
    /** The keys of a path item that are operations (the others are its summary, parameters, servers). */
    private static final Set<String> METHODS = Set.of("get", "put", "post", "delete", "options", "head", "patch",
            "trace");

    private static final String TEXT = read();
    private static final String FOR_VALIDATOR = adapt(TEXT);

    private Contract() {
    }

    /** The contract as packaged, byte for byte what {@code GET /openapi.yaml} serves. */
    static String text() {
        return TEXT;
    }

    /** The contract parsed as a tree. */
    static JsonNode document() {
        try {
            return YAML.readTree(TEXT);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Path templates and their methods, upper case, as the contract declares them ({@code GET /v1/materials/{id}}). */
    static List<String> operations() {
        List<String> out = new ArrayList<>();
        Iterator<Map.Entry<String, JsonNode>> paths = document().get("paths").fields();
        while (paths.hasNext()) {
            Map.Entry<String, JsonNode> path = paths.next();
            path.getValue().fieldNames().forEachRemaining(key -> {
                if (METHODS.contains(key)) {
                    out.add(key.toUpperCase(Locale.ROOT) + " " + path.getKey());
                }
            });
        }
        return out;
    }

    /** The document as the validator reads it (see the class comment). */
    static String forValidator() {
        return FOR_VALIDATOR;
    }

    /** Checks requests and responses: for requests that are meant to be valid. */
    static OpenApiValidationFilter strict() {
        return Validators.STRICT;
    }

    /**
     * Checks the responses only: for requests that are wrong on purpose (a bad body, a method or a
     * media type the contract does not offer), whose answers must still follow the contract.
     */
    static OpenApiValidationFilter responsesOnly() {
        return Validators.RESPONSES_ONLY;
    }

    /**
     * Built once for the whole test run: the validators are thread-safe and cache the compiled
     * schemas, which is most of their cost.
     */
    private static final class Validators {
        static final OpenApiInteractionValidator STRICT_VALIDATOR = validator(FOR_VALIDATOR);
        static final OpenApiValidationFilter STRICT = new OpenApiValidationFilter(STRICT_VALIDATOR);
        static final OpenApiValidationFilter RESPONSES_ONLY = new OpenApiValidationFilter(
                OpenApiInteractionValidator.createForInlineApiSpecification(FOR_VALIDATOR)
                        .withLevelResolver(LevelResolver.create()
                                .withLevel("validation.request", ValidationReport.Level.IGNORE).build())
                        .build());
        static final Map<String, Schema<?>> REFS = new ConcurrentHashMap<>();
        static final SchemaValidator SCHEMAS = new SchemaValidator(
                new OpenAPIV3Parser().readContents(FOR_VALIDATOR, null, null).getOpenAPI(), new MessageResolver());
    }

    /** The validator behind {@link #strict()}, for checking a response without a server. */
    static OpenApiInteractionValidator strictValidator() {
        return Validators.STRICT_VALIDATOR;
    }

    /** A validator for any document text, with the library's default levels. */
    static OpenApiInteractionValidator validator(String document) {
        return OpenApiInteractionValidator.createForInlineApiSpecification(document).build();
    }

    /**
     * Validates a JSON body against one of the contract's component schemas, with the library's
     * schema validator: for answers that no operation of the contract can describe (a 405 for a
     * method the path does not offer, a 404 for a path the service does not have).
     */
    static ValidationReport validateAgainst(String schemaName, String json) {
        // one Schema instance per name: the validator caches the compiled schema by instance
        Schema<?> schema = Validators.REFS.computeIfAbsent(schemaName,
                name -> new Schema<>().$ref("#/components/schemas/" + name));
        return Validators.SCHEMAS.validate(json, schema, "response.body");
    }

    private static String read() {
        try (InputStream in = Contract.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException(RESOURCE + " is not on the test classpath");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String adapt(String yaml) {
        try {
            ObjectNode root = (ObjectNode) YAML.readTree(yaml);
            if (!"3.1.0".equals(root.path("openapi").asText())) {
                throw new IllegalStateException("the contract must declare openapi 3.1.0");
            }
            root.put("openapi", "3.0.3");
            rewriteExclusiveBounds(root);
            return JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void rewriteExclusiveBounds(JsonNode node) {
        if (node instanceof ObjectNode object) {
            rewrite(object, "exclusiveMinimum", "minimum");
            rewrite(object, "exclusiveMaximum", "maximum");
        }
        node.elements().forEachRemaining(Contract::rewriteExclusiveBounds);
    }

    private static void rewrite(ObjectNode schema, String exclusive, String inclusive) {
        JsonNode bound = schema.get(exclusive);
        if (bound == null || !bound.isNumber()) {
            return;
        }
        if (schema.has(inclusive)) {
            throw new IllegalStateException("a schema gives both " + exclusive + " and " + inclusive + ": " + schema);
        }
        schema.set(inclusive, bound);
        schema.put(exclusive, true);
    }
}
