package dev.dwellwise.http;

/** Job bodies for the production tests: an ordinary job and a stiff one that computes for long. */
public final class Workloads {

    /** A small lumped job that passes: a thin steel panel through a bake and a cool-down. */
    static final String PANEL = """
            {
              "part": { "material": "steel-1010", "thicknessMm": 1.2, "exposedFaces": 2, "emissivity": 0.9,
                        "initialTemperatureC": 20 },
              "stages": [
                { "name": "bake", "airTemperatureC": 200, "convectionWPerM2K": 35,
                  "until": { "holdAboveC": 180, "holdSeconds": 600 }, "maxSeconds": 2400 },
                { "name": "cool", "airTemperatureC": 25, "convectionWPerM2K": 12,
                  "until": { "partBelowC": 45 }, "maxSeconds": 3600 }
              ],
              "model": "lumped",
              "output": { "series": false }
            }
            """;

    /**
     * A stiff job: a 10 micrometre foil in a strong air stream has a time constant of about half a
     * millisecond, and the air ramps, so the part never settles: the explicit integrator needs tens
     * of thousands of steps for five minutes of ramp, around a second of computing, yet inside the
     * step and evaluation limits.
     */
    public static final String STIFF_FOIL = """
            {
              "part": { "material": { "densityKgPerM3": 1000, "specificHeatJPerKgK": 500, "conductivityWPerMK": 50 },
                        "thicknessMm": 0.01, "exposedFaces": 2, "emissivity": 0.5, "initialTemperatureC": 20 },
              "stages": [ { "name": "ramp", "airTemperatureC": 20, "airEndTemperatureC": 200,
                            "convectionWPerM2K": 5000, "until": { "seconds": 300 } } ],
              "model": "lumped",
              "output": { "sampleSeconds": 10, "series": false }
            }
            """;

    private Workloads() {
    }
}
