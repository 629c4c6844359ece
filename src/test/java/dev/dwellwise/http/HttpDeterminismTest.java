package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import com.fasterxml.jackson.databind.node.ObjectNode;
import io.restassured.response.Response;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** Same input, same answer: the MES stores the input hash beside each release. */
class HttpDeterminismTest {

    /** The small job with its keys in another order, spaces and line breaks, and every default written out. */
    private static final String SMALL_REORDERED_WITH_DEFAULTS = """
            {
              "output": { "series": true, "sampleSeconds": 30 },
              "model": "auto",
              "limits": { "handlingTemperatureC": 50, "maxPartTemperatureC": 200 },
              "stages": [
                { "until": { "seconds": 900 }, "convectionWPerM2K": 30, "airTemperatureC": 190, "maxSeconds": 86400,
                  "surroundingsTemperatureC": 190, "name": "oven" },
                { "maxSeconds": 3600, "until": { "partBelowC": 50 }, "name": "cooling",
                  "surroundingsTemperatureC": 25, "convectionWPerM2K": 15, "airTemperatureC": 25 }
              ],
              "part": { "initialTemperatureC": 20, "exposedFaces": 2, "emissivity": 0.9, "thicknessMm": 1.5,
                        "material": "steel-1010" }
            }
            """;

    @RegisterExtension
    static final BundledServer server = new BundledServer();

    private static Response simulate(String body) {
        Response answer = server.request().contentType("application/json").body(body).post("/v1/simulations");
        answer.then().statusCode(200);
        return answer;
    }

    private static String hash(String body) {
        return simulate(body).path("provenance.inputSha256");
    }

    @Test
    void theSameJobPostedTwiceGivesByteIdenticalBodies() {
        String job = Jobs.text(Jobs.example("e-coat-bracket-ramped-oven"));
        assertArrayEquals(simulate(job).asByteArray(), simulate(job).asByteArray());
    }

    @Test
    void theSameJobPostedTwiceAsCsvGivesByteIdenticalBodies() {
        String job = Jobs.text(Jobs.small());
        byte[] first = server.request().contentType("application/json").accept("text/csv").body(job)
                .post("/v1/simulations").then().statusCode(200).extract().asByteArray();
        byte[] second = server.request().contentType("application/json").accept("text/csv").body(job)
                .post("/v1/simulations").then().statusCode(200).extract().asByteArray();
        assertArrayEquals(first, second);
    }

    @Test
    void aJobWithKeysReorderedAndDefaultsSpeltOutHasTheSameInputHash() {
        assertEquals(hash(Jobs.text(Jobs.small())), hash(SMALL_REORDERED_WITH_DEFAULTS));
    }

    @Test
    void aRampWhoseSurroundingsAreSpeltOutAsFollowingTheAirHasTheSameInputHash() {
        ObjectNode ramp = Jobs.with(Jobs.small(), "stages[0].airEndTemperatureC", 210);
        ObjectNode spelt = Jobs.with(Jobs.with(ramp, "stages[0].surroundingsTemperatureC", 190),
                "stages[0].surroundingsEndTemperatureC", 210);
        assertEquals(hash(Jobs.text(ramp)), hash(Jobs.text(spelt)));
    }

    @Test
    void aRampWithFixedSurroundingsHasAnotherInputHashThanOneWhoseSurroundingsFollowTheAir() {
        ObjectNode ramp = Jobs.with(Jobs.small(), "stages[0].airEndTemperatureC", 210);
        ObjectNode fixed = Jobs.with(ramp, "stages[0].surroundingsTemperatureC", 190);
        assertNotEquals(hash(Jobs.text(ramp)), hash(Jobs.text(fixed)));
    }

    @Test
    void aDifferentJobHasADifferentInputHash() {
        assertNotEquals(hash(Jobs.text(Jobs.small())), hash(Jobs.text(Jobs.with(Jobs.small(), "part.thicknessMm", 1.6))));
    }

    @Test
    void aDifferentOutputRequestHasADifferentInputHash() {
        ObjectNode coarser = Jobs.with(Jobs.small(), "output", Map.of("sampleSeconds", 60));
        assertNotEquals(hash(Jobs.text(Jobs.small())), hash(Jobs.text(coarser)));
    }
}
