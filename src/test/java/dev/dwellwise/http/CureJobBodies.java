package dev.dwellwise.http;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * Request bodies for the HTTP tests of the cure and the release call: a job that cures (a powder-
 * coated 2 mm steel panel in a 200 °C convection oven, then a cooling tunnel; invented), another rate
 * law for it, and the release-check body around a job.
 */
final class CureJobBodies {

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
        return (ObjectNode) Jobs.parse(CURING_JOB);
    }

    /** The curing job with Kamal–Sourour kinetics instead of nth-order. */
    static ObjectNode autocatalytic() {
        return Jobs.with(curingJob(), "cure.kinetics", Jobs.parse(KAMAL_SOUROUR));
    }

    /** The release-check body for {@code job}. */
    static String release(String batchId, JsonNode job) {
        ObjectNode body = Jobs.JSON.createObjectNode();
        body.put("batchId", batchId);
        body.set("job", job);
        return Jobs.text(body);
    }
}
