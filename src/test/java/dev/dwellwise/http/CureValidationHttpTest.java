package dev.dwellwise.http;

import static dev.dwellwise.http.CureJobBodies.curingJob;
import static dev.dwellwise.http.CureJobBodies.parse;
import static dev.dwellwise.http.CureJobBodies.release;
import static dev.dwellwise.http.CureJobBodies.remove;
import static dev.dwellwise.http.CureJobBodies.set;
import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.notNullValue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.job.ExampleLibrary;
import dev.dwellwise.job.JobLimits;
import dev.dwellwise.report.Simulator;
import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.LumpedModel;
import dev.dwellwise.thermal.MaterialLibrary;
import dev.dwellwise.thermal.ModelSelector;
import dev.dwellwise.thermal.SlabModel;
import io.javalin.Javalin;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** An invalid cure is a 422 naming the field, on a real port; in a release check the field is under {@code job.}. */
class CureValidationHttpTest {

    private static Javalin app;

    @BeforeAll
    static void start() {
        app = App.create(ServiceConfig.defaults().withPort(0), Services.bundled()).start();
    }

    @AfterAll
    static void stop() {
        app.stop();
    }

    private static Arguments bad(String field, UnaryOperator<ObjectNode> edit) {
        return Arguments.of(field, edit);
    }

    private static ObjectNode kamalSourour(ObjectNode job) {
        return set(job, "/cure/kinetics", parse(CureJobBodies.KAMAL_SOUROUR));
    }

    static Stream<Arguments> badCures() {
        return Stream.of(
                bad("cure.kinetics.model", j -> set(j, "/cure/kinetics/model", "first-order")),
                bad("cure.kinetics.model", j -> remove(j, "/cure/kinetics/model")),
                bad("cure.kinetics.activationEnergyKJPerMol", j -> set(j, "/cure/kinetics/activationEnergyKJPerMol", -80)),
                bad("cure.equivalentTime.activationEnergyKJPerMol",
                        j -> set(j, "/cure/equivalentTime/activationEnergyKJPerMol", -1)),
                bad("cure.kinetics.order", j -> set(j, "/cure/kinetics/order", -0.5)),
                bad("cure.kinetics.minDegree", j -> set(j, "/cure/kinetics/minDegree", 1.2)),
                bad("cure.kinetics.initialDegree", j -> set(j, "/cure/kinetics/initialDegree", -0.1)),
                // order 1.5 only approaches full cure: a minimum of 1 could never be met
                bad("cure.kinetics.minDegree", j -> set(j, "/cure/kinetics/minDegree", 1)),
                bad("cure.timeAbove.maxSeconds", j -> set(j, "/cure/timeAbove/maxSeconds", 300)),
                bad("cure.equivalentTime.maxSeconds", j -> set(j, "/cure/equivalentTime/maxSeconds", 100)),
                bad("cure.equivalentTime.referenceC", j -> set(j, "/cure/equivalentTime/referenceC", -273.15)),
                bad("cure.equivalentTime.referenceC", j -> set(j, "/cure/equivalentTime/referenceC", -300)),
                bad("cure.kinetics.preExponentialPerS", j -> set(j, "/cure/kinetics/preExponentialPerS", 0)),
                bad("cure.kinetics.preExponentialPerS", j -> set(j, "/cure/kinetics/preExponentialPerS", -2.7e8)),
                bad("cure.kinetics.glassTransition.lambda", j -> set(j, "/cure/kinetics/glassTransition/lambda", 0)),
                bad("cure.kinetics.glassTransition.lambda", j -> set(j, "/cure/kinetics/glassTransition/lambda", 1.5)),
                bad("cure.kinetics.glassTransition.minC", j -> set(j, "/cure/kinetics/glassTransition/minC", 120)),
                bad("cure.kinetics.glassTransition.tgFullC", j -> set(j, "/cure/kinetics/glassTransition/tgFullC", 40)),
                bad("cure.kinetics.m", j -> set(j, "/cure/kinetics/m", 0.5)),
                bad("cure.timeAboveC", j -> set(j, "/cure/timeAboveC", 180)),
                bad("cure.timeAbove.minSeconds", j -> remove(j, "/cure/timeAbove/minSeconds")),
                bad("cure.timeAbove.temperatureC", j -> set(j, "/cure/timeAbove/temperatureC", "180")),
                bad("cure", j -> set(j, "/cure", CureJobBodies.MAPPER.createObjectNode())),
                bad("cure.kinetics.k2PreExponentialPerS",
                        j -> set(kamalSourour(j), "/cure/kinetics/k2PreExponentialPerS", 0)),
                bad("cure.kinetics.k1ActivationEnergyKJPerMol",
                        j -> set(kamalSourour(j), "/cure/kinetics/k1ActivationEnergyKJPerMol", -5)),
                bad("cure.kinetics.m", j -> set(kamalSourour(j), "/cure/kinetics/m", -1)),
                bad("cure.kinetics.minDegree", j -> set(set(kamalSourour(j), "/cure/kinetics/n", 1.2),
                        "/cure/kinetics/minDegree", 1)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badCures")
    void anInvalidCureIsA422NamingTheField(String field, UnaryOperator<ObjectNode> edit) {
        given().port(app.port()).contentType("application/json").body(edit.apply(curingJob()).toString())
                .when().post("/v1/simulations")
                .then().statusCode(422).contentType("application/problem+json")
                .body("type", equalTo("urn:dwellwise:problem:invalid-job"))
                .body("errors.field", hasItem(field));
    }

    @ParameterizedTest(name = "job.{0}")
    @MethodSource("badCures")
    void anInvalidCureInAReleaseCheckIsNamedUnderJob(String field, UnaryOperator<ObjectNode> edit) {
        given().port(app.port()).contentType("application/json").body(release("B-1", edit.apply(curingJob())))
                .when().post("/v1/release-checks")
                .then().statusCode(422).contentType("application/problem+json")
                .body("type", equalTo("urn:dwellwise:problem:invalid-job"))
                .body("errors.field", hasItem("job." + field));
    }

    @Test
    void aKamalSourourCureIsComputedAndJudged() {
        given().port(app.port()).contentType("application/json").body(kamalSourour(curingJob()).toString())
                .when().post("/v1/simulations")
                .then().statusCode(200).contentType("application/json")
                .body("cure.coldest.degree", notNullValue())
                .body("checks.name", hasItem("cure-degree"));
    }

    @Test
    void aCureFigureBeyondItsBudgetIsAComputeLimitProblemNamingTheCure() {
        Services bundled = Services.bundled();
        Simulator stingy = new Simulator(MaterialLibrary.bundled(),
                new ModelSelector(new LumpedModel(), new SlabModel()), JobLimits.standard(), ComputeBudget.standard(),
                new CureBudget(50), "dwellwise test");
        Services services = new Services(stingy, bundled.materials(), ExampleLibrary.bundled(bundled.mapper()),
                bundled.mapper(), bundled.version(), bundled.openApi());
        Javalin limited = App.create(ServiceConfig.defaults().withPort(0), services).start();
        try {
            given().port(limited.port()).contentType("application/json").body(release("B-1", curingJob()))
                    .when().post("/v1/release-checks")
                    .then().statusCode(422).contentType("application/problem+json")
                    .body("type", equalTo("urn:dwellwise:problem:compute-limit"))
                    .body("errors.field", hasItem("job.cure"));
        } finally {
            limited.stop();
        }
    }
}
