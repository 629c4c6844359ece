package dev.dwellwise.http;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.UncheckedIOException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Job bodies for the HTTP tests: the bundled examples, a small valid job, and edits by JSON path. */
final class Jobs {

    static final ObjectMapper JSON = new ObjectMapper();
    private static final Pattern STEP = Pattern.compile("([A-Za-z][A-Za-z0-9]*)|\\[(\\d+)]");

    private Jobs() {
    }

    /** The job of a bundled example: the example file is the job, as a client would post it. */
    static ObjectNode example(String id) {
        return (ObjectNode) parse(TestServer.resource("/examples/" + id + ".json"));
    }

    /** A small valid job: a thin steel panel, one timed oven stage and a cooling stage. */
    static ObjectNode small() {
        return (ObjectNode) parse("""
                {"part": {"material": "steel-1010", "thicknessMm": 1.5, "emissivity": 0.9, "initialTemperatureC": 20},
                 "stages": [
                   {"name": "oven", "airTemperatureC": 190, "convectionWPerM2K": 30, "until": {"seconds": 900}},
                   {"name": "cooling", "airTemperatureC": 25, "convectionWPerM2K": 15, "until": {"partBelowC": 50},
                    "maxSeconds": 3600}],
                 "limits": {"maxPartTemperatureC": 200, "handlingTemperatureC": 50},
                 "output": {"sampleSeconds": 30}}
                """);
    }

    /** The job with the value at a path ({@code stages[1].until}, {@code part.thicknessMm}) replaced or added. */
    static ObjectNode with(ObjectNode job, String path, Object value) {
        ObjectNode copy = job.deepCopy();
        JsonNode node = JSON.valueToTree(value);
        Matcher m = STEP.matcher(path);
        JsonNode parent = null;
        String lastField = null;
        int lastIndex = -1;
        JsonNode current = copy;
        while (m.find()) {
            parent = current;
            lastField = m.group(1);
            lastIndex = lastField == null ? Integer.parseInt(m.group(2)) : -1;
            current = lastField != null ? current.get(lastField) : current.get(lastIndex);
        }
        if (lastField != null) {
            ((ObjectNode) parent).set(lastField, node);
        } else {
            ((ArrayNode) parent).set(lastIndex, node);
        }
        return copy;
    }

    /** The job with the field at a path taken out. */
    static ObjectNode without(ObjectNode job, String path) {
        ObjectNode copy = with(job, path, null);
        int dot = path.lastIndexOf('.');
        JsonNode parent = dot < 0 ? copy : at(copy, path.substring(0, dot));
        ((ObjectNode) parent).remove(path.substring(dot + 1));
        return copy;
    }

    static JsonNode at(JsonNode root, String path) {
        Matcher m = STEP.matcher(path);
        JsonNode current = root;
        while (m.find()) {
            current = m.group(1) != null ? current.get(m.group(1)) : current.get(Integer.parseInt(m.group(2)));
        }
        return current;
    }

    static JsonNode parse(String json) {
        try {
            return JSON.readTree(json);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String text(JsonNode node) {
        try {
            return JSON.writeValueAsString(node);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }
}
