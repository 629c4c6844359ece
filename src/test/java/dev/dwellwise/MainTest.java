package dev.dwellwise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code run JOB.json}: the result on stdout, exit 0 on pass, 1 on fail, 2 on an invalid job. */
class MainTest {

    @TempDir
    Path dir;

    private int run(String json, ByteArrayOutputStream out, ByteArrayOutputStream err) throws Exception {
        Path job = dir.resolve("job.json");
        Files.writeString(job, json);
        return Main.run(new String[] {"run", job.toString()}, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    private static String job(double handlingC) {
        return """
            {"part": {"material": "steel-1010", "thicknessMm": 2, "emissivity": 0.9, "initialTemperatureC": 20},
             "stages": [{"airTemperatureC": 200, "convectionWPerM2K": 30, "until": {"partAboveC": 180}},
                        {"airTemperatureC": 25, "convectionWPerM2K": 20, "until": {"seconds": 600}}],
             "limits": {"handlingTemperatureC": %s}}
            """.formatted(handlingC);
    }

    @Test
    void aPassingJobPrintsTheResultAndExitsZero() throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertEquals(0, run(job(60), out, new ByteArrayOutputStream()));
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("\"verdict\" : \"pass\""));
    }

    @Test
    void aFailingJobExitsOne() throws Exception {
        // after 600 s in 25 C air the 2 mm plate is near 25 C, so a 25 C handling limit fails
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertEquals(1, run(job(25), out, new ByteArrayOutputStream()));
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("\"verdict\" : \"fail\""));
    }

    @Test
    void anInvalidJobNamesTheFieldAndExitsTwo() throws Exception {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(2, run(job(60).replace("\"emissivity\": 0.9", "\"emissivity\": 1.9"),
                new ByteArrayOutputStream(), err));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("part.emissivity"));
    }

    @Test
    void aMisspeltFieldIsRefusedNotDefaulted() throws Exception {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(2, run(job(60).replace("exposedFaces", "x").replace("\"emissivity\"", "\"emisivity\""),
                new ByteArrayOutputStream(), err));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("emisivity"));
    }

    @Test
    void anUnknownCommandPrintsTheUsageAndExitsTwo() {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(2, Main.run(new String[] {"frobnicate"}, new PrintStream(new ByteArrayOutputStream()),
                new PrintStream(err, true, StandardCharsets.UTF_8)));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("usage"));
    }
}
