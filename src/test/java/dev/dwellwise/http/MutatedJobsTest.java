package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.restassured.response.Response;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.function.Function;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.Timeout;

/**
 * The bundled examples with values broken at random (seeded, so every run sends the same bodies):
 * whatever a client sends, the service answers either a result or a 4xx problem that follows the
 * contract, names the field for a bad value, shows nothing of its internals, and gives the same
 * bytes to the same body. Never a 5xx, never a hang (every request is bounded by the client's
 * timeout and the service's compute budget, cut here to keep the run short).
 */
@Timeout(180)
class MutatedJobsTest {

    private static final String SIMULATIONS = "/v1/simulations";
    private static final long SEED = 0x5EED_2026_1202L;
    private static final int BODIES = 120;
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    /** Every bundled example: one added later is broken too. */
    private static final List<String> EXAMPLES = exampleIds();
    /** The problem types a job can earn; anything else (not-found, internal) would be a defect here. */
    private static final Set<String> JOB_PROBLEMS = Set.of("urn:dwellwise:problem:unreadable-body",
            "urn:dwellwise:problem:invalid-job", "urn:dwellwise:problem:compute-limit",
            "urn:dwellwise:problem:body-too-large");
    /**
     * Number literals a JSON library may mishandle, written into the body as they stand: beyond the
     * doubles (1e400 reads as infinity), below the smallest normal one, negative zero, integers past
     * 32 and 64 bits.
     */
    private static final List<String> LITERALS = List.of("0", "-0.0", "-1", "1", "0.5", "3", "1e-300", "4.9e-324",
            "1e300", "1.7976931348623157e308", "1e400", "-1e400", "2147483648", "-2147483649",
            "123456789012345678901234567890", "1E3", "600000", "86400.000001", "273.15", "-273.15");
    private static final List<Function<SplittableRandom, JsonNode>> VALUES = List.of(
            r -> NODES.textNode(""), r -> NODES.textNode("  "), r -> NODES.textNode("x".repeat(5_000)),
            r -> NODES.textNode("Ω \uD83D\uDD25 °C"), r -> NODES.textNode("slab"), r -> NODES.textNode("steel-1010"),
            r -> NODES.booleanNode(r.nextBoolean()), r -> NODES.nullNode(), r -> NODES.arrayNode(),
            r -> NODES.objectNode(), r -> NODES.arrayNode().add(1), r -> NODES.objectNode().put("seconds", 60));

    private static RunningService service;

    @BeforeAll
    static void start() {
        // a short budget: a broken job that would compute for long is stopped with its 422 sooner
        service = RunningService.start(Map.of(ServiceConfig.COMPUTE_BUDGET_MS, "1500"));
    }

    @AfterAll
    static void stop() {
        service.close();
    }

    /** A body, what was broken in it, and the route it goes to. */
    record Mutant(String route, String body, String what) {
    }

    @TestFactory
    Stream<DynamicTest> everyBrokenJobGetsAResultOrAProblemThatNamesTheField() {
        SplittableRandom random = new SplittableRandom(SEED);
        List<Mutant> mutants = new ArrayList<>();
        for (int i = 0; i < BODIES; i++) {
            mutants.add(mutant(random, i % 3 == 2, i % 2 == 0));
        }
        return mutants.stream().map(m -> DynamicTest.dynamicTest(m.route() + ": " + m.what(), () -> check(m)));
    }

    private static void check(Mutant mutant) {
        Response first = send(mutant);
        int status = first.statusCode();
        String body = first.asString();
        assertTrue(status == 200 || status == 400 || status == 413 || status == 422,
                () -> status + " for " + mutant.what() + ": " + body);
        Internals.assertNone(body);
        if (status != 200) {
            assertTrue(first.contentType().startsWith(MediaTypes.PROBLEM_JSON), first.contentType());
            JsonNode problem = read(body);
            assertTrue(JOB_PROBLEMS.contains(problem.path("type").asText()), body);
            if (status == 422 && problem.path("type").asText().endsWith("invalid-job")) {
                assertFalse(problem.path("errors").isEmpty(), body);
                problem.path("errors").forEach(error -> assertFalse(error.path("field").asText().isBlank(),
                        () -> "an error without its field: " + body));
            }
            if (problem.path("type").asText().endsWith("compute-limit")) {
                return; // a wall-clock stop may fall elsewhere on a second try
            }
        }
        if (status == 200 && mutant.route().equals(SIMULATIONS)) {
            assertWithinItsSurroundings(read(mutant.body()), read(body));
        }
        Response second = send(mutant);
        assertEquals(body, second.asString(), "the same body answered differently");
    }

    /**
     * No source and no cure exotherm in the model, so no temperature of the part may leave the range
     * of its start and of every air and surroundings temperature it meets: heat flows only from hot
     * to cold (the maximum principle for the heat equation; textbook physics, no table). A job the
     * validator should have refused, a negative thickness say (it gave -1291 °C), breaks it. The margin
     * is the slab model's accuracy target of 0.05 K (the looser one) plus the answer's rounding to
     * 1e-4 K.
     */
    private static void assertWithinItsSurroundings(JsonNode job, JsonNode result) {
        List<Double> bounds = new ArrayList<>(List.of(job.path("part").path("initialTemperatureC").asDouble()));
        for (JsonNode stage : job.path("stages")) {
            for (String field : List.of("airTemperatureC", "airEndTemperatureC", "surroundingsTemperatureC",
                    "surroundingsEndTemperatureC")) {
                if (stage.path(field).isNumber()) {
                    bounds.add(stage.path(field).asDouble());
                }
            }
        }
        double lo = bounds.stream().mapToDouble(Double::doubleValue).min().orElseThrow();
        double hi = bounds.stream().mapToDouble(Double::doubleValue).max().orElseThrow();
        double margin = 0.05 + 1e-4;
        List<Double> temperatures = new ArrayList<>();
        for (JsonNode stage : result.path("stages")) {
            for (String field : List.of("startTemperatureC", "endTemperatureC", "peakTemperatureC",
                    "endSurfaceTemperatureC", "endCoreTemperatureC", "steadyTemperatureC")) {
                if (stage.path(field).isNumber()) {
                    temperatures.add(stage.path(field).asDouble());
                }
            }
        }
        for (String column : List.of("temperatureC", "surfaceTemperatureC", "coreTemperatureC")) {
            result.path("series").path(column).forEach(value -> temperatures.add(value.asDouble()));
        }
        assertFalse(temperatures.isEmpty(), result::toString);
        for (double t : temperatures) {
            assertTrue(t >= lo - margin && t <= hi + margin,
                    () -> t + " °C outside [" + lo + ", " + hi + "] °C in " + result.path("stages"));
        }
    }

    /** With a fixed request id, so that two answers to one body may be compared byte for byte. */
    private static Response send(Mutant mutant) {
        return Http.given(service).filter(Contract.responsesOnly()).header(RequestIds.HEADER, "mutant-1")
                .contentType("application/json").body(mutant.body()).post(mutant.route());
    }

    /**
     * One to three breaks in a random example, sent as a simulation or (wrapped) as a release check;
     * {@code plausible} ones only scale numbers, which mostly leaves a valid job with unusual values.
     */
    private static Mutant mutant(SplittableRandom random, boolean releaseCheck, boolean plausible) {
        ObjectNode job = (ObjectNode) example(EXAMPLES.get(random.nextInt(EXAMPLES.size())));
        ObjectNode root = job;
        if (releaseCheck) {
            root = NODES.objectNode().put("batchId", "B-2026-1202-01");
            root.set("job", job);
        }
        List<String> what = new ArrayList<>();
        Map<String, String> literals = new HashMap<>();
        int breaks = 1 + random.nextInt(3);
        for (int b = 0; b < breaks; b++) {
            what.add(plausible ? scaleOne(root, random) : breakOne(root, random, literals));
        }
        String body;
        try {
            body = JSON.writeValueAsString(root);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        for (Map.Entry<String, String> literal : literals.entrySet()) {
            body = body.replace("\"" + literal.getKey() + "\"", literal.getValue());
        }
        if (!plausible && random.nextInt(8) == 0) {
            int end = random.nextInt(body.length());
            what.add("cut off after " + end + " characters");
            body = body.substring(0, end);
        }
        return new Mutant(releaseCheck ? "/v1/release-checks" : SIMULATIONS, body, String.join("; ", what));
    }

    /** Breaks one place of the tree; says what it did. */
    private static String breakOne(ObjectNode root, SplittableRandom random, Map<String, String> literals) {
        List<Place> places = new ArrayList<>();
        collect(root, "", places);
        if (places.isEmpty()) {
            return "nothing left to break";
        }
        Place place = places.get(random.nextInt(places.size()));
        int kind = random.nextInt(10);
        if (kind < 5) {
            String literal = LITERALS.get(random.nextInt(LITERALS.size()));
            String marker = "@literal-" + literals.size() + "@";
            literals.put(marker, literal);
            place.set(NODES.textNode(marker));
            return place.path + " = " + literal;
        }
        if (kind < 8) {
            JsonNode value = VALUES.get(random.nextInt(VALUES.size())).apply(random);
            place.set(value);
            return place.path + " = " + abbreviated(value);
        }
        if (kind == 8) {
            place.remove();
            return place.path + " removed";
        }
        if (place.parent instanceof ArrayNode array && array.size() > 0) {
            int copies = 1 + random.nextInt(60);
            for (int c = 0; c < copies; c++) {
                array.add(array.get(0).deepCopy());
            }
            return place.path + ": " + copies + " more copies of the first element";
        }
        ((ObjectNode) place.parent).put("unexpected", 1);
        return place.path + ": an unknown sibling";
    }

    /**
     * Multiplies one number by a factor between 1/100 and 100, its sign flipped one time in four:
     * the solver's corners, and values the validator must refuse (the bound check below catches a
     * negative thickness or mass that gets through).
     */
    private static String scaleOne(ObjectNode root, SplittableRandom random) {
        List<Place> places = new ArrayList<>();
        collect(root, "", places);
        List<Place> numbers = places.stream().filter(p -> p.value().isNumber()).toList();
        if (numbers.isEmpty()) {
            return "no number left to scale";
        }
        Place place = numbers.get(random.nextInt(numbers.size()));
        double scaled = place.value().doubleValue() * Math.pow(10, random.nextDouble(-2, 2))
                * (random.nextInt(4) == 0 ? -1 : 1);
        place.set(NODES.numberNode(scaled));
        return place.path + " = " + scaled;
    }

    /** A value's place in its parent: an object's key or an array's index. */
    private record Place(JsonNode parent, String key, int index, String path) {

        JsonNode value() {
            return parent instanceof ObjectNode object ? object.get(key) : parent.get(index);
        }

        void set(JsonNode value) {
            if (parent instanceof ObjectNode object) {
                object.set(key, value);
            } else {
                ((ArrayNode) parent).set(index, value);
            }
        }

        void remove() {
            if (parent instanceof ObjectNode object) {
                object.remove(key);
            } else {
                ((ArrayNode) parent).remove(index);
            }
        }
    }

    private static void collect(JsonNode node, String path, List<Place> places) {
        if (node instanceof ObjectNode object) {
            Iterator<Map.Entry<String, JsonNode>> fields = object.fields();
            while (fields.hasNext()) {
                Map.Entry<String, JsonNode> field = fields.next();
                String child = path.isEmpty() ? field.getKey() : path + "." + field.getKey();
                places.add(new Place(object, field.getKey(), -1, child));
                collect(field.getValue(), child, places);
            }
        } else if (node instanceof ArrayNode array) {
            for (int i = 0; i < array.size(); i++) {
                String child = path + "[" + i + "]";
                places.add(new Place(array, null, i, child));
                collect(array.get(i), child, places);
            }
        }
    }

    private static String abbreviated(JsonNode value) {
        String text = value.toString();
        return text.length() > 40 ? text.substring(0, 20) + "...(" + text.length() + " characters)" : text;
    }

    private static JsonNode example(String id) {
        return resource("/examples/" + id + ".json");
    }

    private static List<String> exampleIds() {
        List<String> ids = new ArrayList<>();
        resource("/examples/index.json").forEach(entry -> ids.add(entry.path("id").asText()));
        return List.copyOf(ids);
    }

    private static JsonNode resource(String path) {
        try (InputStream in = MutatedJobsTest.class.getResourceAsStream(path)) {
            return JSON.readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static JsonNode read(String body) {
        try {
            return JSON.readTree(body);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
