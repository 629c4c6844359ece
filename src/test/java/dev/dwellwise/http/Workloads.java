package dev.dwellwise.http;

/** Job bodies for the production tests: an ordinary job and one that computes for long. */
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
     * A job that computes for long yet stays inside the step and evaluation limits: a 300 mm steel
     * block at the finest slab resolution (400 cells) through 40 one-hour air ramps between 20 and
     * 600 °C. About nine thousand implicit steps on 400 cells: a second or more of computing.
     */
    public static final String LONG_SOLVE = longSolve();

    private static String longSolve() {
        StringBuilder stages = new StringBuilder();
        for (int i = 0; i < 40; i++) {
            int from = i % 2 == 0 ? 600 : 20;
            int to = i % 2 == 0 ? 20 : 600;
            stages.append(i == 0 ? "" : ",\n").append("    { \"name\": \"ramp ").append(i + 1)
                    .append("\", \"airTemperatureC\": ").append(from).append(", \"airEndTemperatureC\": ").append(to)
                    .append(", \"convectionWPerM2K\": 2000, \"until\": { \"seconds\": 3600 } }");
        }
        return """
                {
                  "part": { "material": "steel-1010", "thicknessMm": 300, "exposedFaces": 2, "emissivity": 0.8,
                            "initialTemperatureC": 20 },
                  "stages": [
                %s
                  ],
                  "model": "slab",
                  "slabCells": 400,
                  "output": { "sampleSeconds": 60, "series": false }
                }
                """.formatted(stages);
    }

    private Workloads() {
    }
}
