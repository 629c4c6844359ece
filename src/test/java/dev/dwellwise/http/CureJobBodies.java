package dev.dwellwise.http;

import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.UncheckedIOException;

/**
 * Request bodies for the HTTP tests of the cure and the release call: a job that cures (a powder-
 * coated 2 mm steel panel in a 200 °C convection oven, then a cooling tunnel; invented) and small
 * edits of it by JSON pointer.
 */
final class CureJobBodies {

    static final ObjectMapper MAPPER = new ObjectMapper();

    static final String CURING_JOB = """
            {
              "part": { "material": "steel-1010", "thicknessMm": 2.0, "exposedFaces": 2, "emissivity": 0.9,
                        "initialTemperatureC": 22 },
              "stages": [
                { "name": "cure oven", "airTemperatureC": 200, "convectionWPerM2K": 30,
                  "until": { "holdAboveC": 180, "holdSeconds": 600 }, "maxSeconds": 3600 },
                { "name": "cooling tunnel", "airTemperatureC": 26, "convectionWPerM2K": 15,
                  "until": { "partBelowC": 45 }, "maxSeconds": 3600 }
              ],
              "cure": {
                "timeAbove": { "temperatureC": 180, "minSeconds": 600 },
                "equivalentTime": { "referenceC": 180, "activationEnergyKJPerMol": 90, "minSeconds": 600,
                                    "maxSeconds": 2400 },
                "kinetics": { "model": "nth-order", "preExponentialPerS": 2.7e8, "activationEnergyKJPerMol": 90,
                              "order": 1.5, "minDegree": 0.95,
                              "glassTransition": { "tg0C": 50, "tgFullC": 110, "lambda": 0.5, "minC": 100 } }
              },
              "limits": { "maxPartTemperatureC": 215, "handlingTemperatureC": 45 },
              "output": { "sampleSeconds": 5, "series": true }
            }
            """;

    /** Autocatalytic kinetics in the published range (REFERENCES.md section 7: E1 89.1, E2 68.8 kJ/mol [F]). */
    static final String KAMAL_SOUROUR = """
            { "model": "kamal-sourour", "k1PreExponentialPerS": 1.0e7, "k1ActivationEnergyKJPerMol": 89.1,
              "k2PreExponentialPerS": 3.0e5, "k2ActivationEnergyKJPerMol": 68.8, "m": 0.5, "n": 1.7,
              "minDegree": 0.9 }
            """;

    private CureJobBodies() {
    }

    static ObjectNode curingJob() {
        return (ObjectNode) parse(CURING_JOB);
    }

    static JsonNode parse(String json) {
        try {
            return MAPPER.readTree(json);
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Sets the value at {@code pointer} (its parent must exist), replacing what is there. */
    static ObjectNode set(ObjectNode root, String pointer, Object value) {
        JsonPointer p = JsonPointer.compile(pointer);
        JsonNode node = value instanceof JsonNode n ? n : MAPPER.valueToTree(value);
        ((ObjectNode) root.at(p.head())).set(p.last().getMatchingProperty(), node);
        return root;
    }

    static ObjectNode remove(ObjectNode root, String pointer) {
        JsonPointer p = JsonPointer.compile(pointer);
        ((ObjectNode) root.at(p.head())).remove(p.last().getMatchingProperty());
        return root;
    }

    /** The release-check body for {@code job}. */
    static String release(String batchId, JsonNode job) {
        ObjectNode body = MAPPER.createObjectNode();
        body.put("batchId", batchId);
        body.set("job", job);
        return body.toString();
    }
}
