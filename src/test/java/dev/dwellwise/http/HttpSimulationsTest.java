package dev.dwellwise.http;

import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.oneOf;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.dwellwise.job.Example;
import dev.dwellwise.job.ExampleLibrary;
import dev.dwellwise.job.WireJson;
import dev.dwellwise.report.Cautions;
import dev.dwellwise.report.SeriesCsv;
import io.restassured.response.Response;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** {@code POST /v1/simulations} with valid jobs: JSON and CSV answers, each checked against the contract. */
class HttpSimulationsTest {

    @RegisterExtension
    static final BundledServer server = new BundledServer();

    static Stream<String> exampleIds() {
        return ExampleLibrary.bundled(WireJson.create()).all().stream().map(Example::id);
    }

    private static Response simulate(ObjectNode job) {
        return server.request().contentType("application/json").body(Jobs.text(job)).post("/v1/simulations");
    }

    @ParameterizedTest(name = "the bundled example {0} simulates as it is, with a verdict and a report per stage")
    @MethodSource("exampleIds")
    void everyBundledExampleSimulatesAsItIs(String id) {
        ObjectNode job = Jobs.example(id);
        simulate(job).then()
                .statusCode(200)
                .contentType("application/json")
                .body("verdict", oneOf("pass", "fail"))
                .body("model.used", oneOf("lumped", "slab"))
                .body("stages", hasSize(job.get("stages").size()))
                .body("stages.ended", everyItem(oneOf("duration", "reached", "hold-complete", "max-seconds")))
                .body("checks.name", hasItem("model-validity"))
                .body("provenance.inputSha256", matchesPattern("[0-9a-f]{64}"))
                .body("cautions", SafetyCautions.named())
                .body("cautions", hasSize(Cautions.ALL.size()));
    }

    @Test
    void theSeriesHasOneEqualLengthColumnPerQuantity() {
        Response answer = simulate(Jobs.small());
        answer.then().statusCode(200);
        int samples = answer.path("series.timeSeconds.size()");
        answer.then()
                .body("series.temperatureC", hasSize(samples))
                .body("series.surfaceTemperatureC", hasSize(samples))
                .body("series.coreTemperatureC", hasSize(samples))
                .body("series.stageIndex", hasSize(samples))
                .body("series.timeSeconds[0]", equalTo(0.0f));
    }

    @Test
    void acceptTextCsvAnswersTheSeriesWithAHeaderAndOneRowPerJsonSample() {
        ObjectNode job = Jobs.small();
        JsonNode json = Jobs.parse(simulate(job).then().statusCode(200).extract().asString());
        Response csv = server.request().contentType("application/json").accept("text/csv")
                .body(Jobs.text(job)).post("/v1/simulations");
        csv.then().statusCode(200).contentType(startsWith("text/csv"));
        List<String> lines = csv.asString().lines().toList();
        JsonNode time = json.get("series").get("timeSeconds");
        assertEquals(SeriesCsv.HEADER, lines.get(0));
        assertEquals(time.size(), lines.size() - 1, "one data row per JSON sample");
        for (int i = 0; i < time.size(); i++) {
            assertEquals(time.get(i).asDouble(), Double.parseDouble(lines.get(i + 1).split(",")[0]), "row " + (i + 1));
        }
    }

    @Test
    void acceptImageSvgAnswersAChartOfTheSameHistory() {
        ObjectNode job = Jobs.small();
        Response svg = server.request().contentType("application/json").accept("image/svg+xml")
                .body(Jobs.text(job)).post("/v1/simulations");
        svg.then().statusCode(200).contentType(startsWith("image/svg+xml"));
        String body = svg.asString();
        assertTrue(body.startsWith("<svg xmlns=\"http://www.w3.org/2000/svg\""), body.substring(0, 60));
        assertTrue(body.contains(">oven<") && body.contains(">cooling<"), "a band per stage");
        assertTrue(body.contains("max part 200 °C") && body.contains("handling 50 °C"), "the limit lines");
    }

    @Test
    void anAcceptHeaderThatPrefersJsonOverCsvGetsJson() {
        server.request().contentType("application/json").accept("text/csv;q=0.5, application/json")
                .body(Jobs.text(Jobs.small())).post("/v1/simulations")
                .then().statusCode(200).contentType("application/json").body("$", hasKey("series"));
    }

    @Test
    void aJobThatAsksForNoSeriesGetsAnAnswerWithoutOne() {
        simulate(Jobs.with(Jobs.small(), "output.series", false)).then()
                .statusCode(200)
                .body("$", not(hasKey("series")))
                .body("verdict", equalTo("pass"));
    }

    @Test
    void aJobThatAsksForNoSeriesIsNotHeldToTheSampleLimit() {
        // 0.1 s samples over a day would be 864,000 samples; without a series none are kept
        ObjectNode job = Jobs.with(Jobs.with(Jobs.small(), "output", Map.of("sampleSeconds", 0.1, "series", false)),
                "stages[0].until.seconds", 86_400);
        simulate(job).then().statusCode(200).body("$", not(hasKey("series"))).body("stages", hasSize(2));
    }

    @Test
    void aStageThatNeverMeetsItsConditionEndsAtMaxSecondsFailsItsCheckAndTheLaterStagesStillRun() {
        ObjectNode job = Jobs.with(Jobs.small(), "stages[0].until", Map.of("partAboveC", 250));
        job = Jobs.with(job, "stages[0].maxSeconds", 1200);
        simulate(job).then()
                .statusCode(200)
                .body("verdict", equalTo("fail"))
                .body("stages.ended", contains("max-seconds", "reached"))
                .body("checks.find { it.name == 'stage-end' && it.stage == 'oven' }.status", equalTo("fail"))
                .body("stages[0].steadyTemperatureC", equalTo(190.0f));
    }

    @Test
    void aHoldStageReportsTheTimeHeldAboveTheHoldTemperature() {
        ObjectNode job = Jobs.with(Jobs.small(), "stages[0].until", Map.of("holdAboveC", 170, "holdSeconds", 300));
        simulate(job).then()
                .statusCode(200)
                .body("stages[0].ended", equalTo("hold-complete"))
                .body("stages[0].holdSeconds", equalTo(300.0f))
                .body("stages[1]", not(hasKey("holdSeconds")));
    }

    @Test
    void aRampedStageWithItsOwnSurroundingsIsAccepted() {
        ObjectNode job = Jobs.with(Jobs.small(), "stages[0].airEndTemperatureC", 210);
        job = Jobs.with(job, "stages[0].surroundingsTemperatureC", 150);
        job = Jobs.with(job, "stages[0].surroundingsEndTemperatureC", 220);
        simulate(job).then().statusCode(200).body("stages[0].ended", equalTo("duration"));
    }

    @Test
    void aCustomMaterialObjectStandsInForALibraryId() {
        ObjectNode job = Jobs.with(Jobs.small(), "part.material", Map.of("name", "a mild steel from the mill sheet",
                "densityKgPerM3", 7850, "specificHeatJPerKgK", 470, "conductivityWPerMK", 52));
        simulate(job).then().statusCode(200).body("verdict", oneOf("pass", "fail"));
    }

    @Test
    void aCustomMaterialMayTabulateItsPropertiesAgainstTemperature() {
        ObjectNode job = Jobs.with(Jobs.small(), "part.material", Map.of("densityKgPerM3", 7850,
                "specificHeatTable", List.of(Map.of("temperatureC", 20, "specificHeatJPerKgK", 450),
                        Map.of("temperatureC", 300, "specificHeatJPerKgK", 540)),
                "conductivityTable", List.of(Map.of("temperatureC", 20, "conductivityWPerMK", 55))));
        simulate(job).then().statusCode(200);
    }

    @Test
    void aLayeredWallStandsInForMaterialAndThickness() {
        ObjectNode job = Jobs.without(Jobs.without(Jobs.small(), "part.material"), "part.thicknessMm");
        job = Jobs.with(job, "part.layers", List.of(Map.of("material", "steel-1010", "thicknessMm", 1.0),
                Map.of("material", "aluminium-6061-t6", "thicknessMm", 0.5)));
        simulate(job).then().statusCode(200).body("stages", hasSize(2));
    }

    @Test
    void profilesAskedForAreInTheAnswerOnePerTime() {
        ObjectNode job = Jobs.with(Jobs.small(), "output.profiles", Map.of("timesSeconds", List.of(0, 60, 600)));
        simulate(job).then().statusCode(200)
                .body("profiles", hasSize(3))
                .body("profiles.timeSeconds", contains(0.0f, 60.0f, 600.0f));
    }

    @Test
    void aForcedLumpedModelOnAThickPartFailsModelValidity() {
        ObjectNode job = Jobs.with(Jobs.small(), "part.thicknessMm", 80);
        job = Jobs.with(job, "stages[0].convectionWPerM2K", 400);
        job = Jobs.with(job, "model", "lumped");
        simulate(job).then().statusCode(200)
                .body("verdict", equalTo("fail"))
                .body("model.requested", equalTo("lumped"))
                .body("checks[0].name", equalTo("model-validity"))
                .body("checks[0].status", equalTo("fail"));
    }

    @Test
    void aLimitThatIsNotGivenLeavesItsCheckOut() {
        simulate(Jobs.without(Jobs.small(), "limits")).then().statusCode(200)
                .body("checks.name", not(hasItem("peak-temperature")))
                .body("checks.name", not(hasItem("handling-temperature")))
                .body("checks.name", not(hasItem("heating-rate")))
                .body("checks.name", is(List.of("model-validity", "stage-end")));
    }
}
