package dev.dwellwise.http;

import static dev.dwellwise.http.CureJobBodies.autocatalytic;
import static dev.dwellwise.http.CureJobBodies.curingJob;
import static dev.dwellwise.http.CureJobBodies.release;
import static dev.dwellwise.http.Jobs.with;
import static dev.dwellwise.http.Jobs.without;
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
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * An invalid cure is a 422 naming the field, on a real port; in a release check the field is under
 * {@code job.}. The requests break the contract on purpose, so only the answers are validated against it.
 */
class CureValidationHttpTest {

    @RegisterExtension
    static final BundledServer server = new BundledServer();

    /** The field the answer must name, and the job that is wrong there. */
    private static Arguments badJob(String field, ObjectNode job) {
        return Arguments.of(field, job);
    }

    /** The curing job with {@code value} at {@code field}, which the answer must then name. */
    private static Arguments bad(String field, Object value) {
        return badJob(field, with(curingJob(), field, value));
    }

    static Stream<Arguments> badCures() {
        return Stream.of(
                bad("cure.kinetics.model", "first-order"),
                badJob("cure.kinetics.model", without(curingJob(), "cure.kinetics.model")),
                bad("cure.kinetics.activationEnergyKJPerMol", -80),
                bad("cure.equivalentTime.activationEnergyKJPerMol", -1),
                bad("cure.kinetics.order", -0.5),
                bad("cure.kinetics.minDegree", 1.2),
                bad("cure.kinetics.initialDegree", -0.1),
                // order 1.5 only approaches full cure: a minimum of 1 could never be met
                bad("cure.kinetics.minDegree", 1),
                bad("cure.timeAbove.maxSeconds", 300),
                bad("cure.equivalentTime.maxSeconds", 100),
                bad("cure.equivalentTime.referenceC", -273.15),
                bad("cure.equivalentTime.referenceC", -300),
                bad("cure.kinetics.preExponentialPerS", 0),
                bad("cure.kinetics.preExponentialPerS", -2.7e8),
                // beyond any published kinetics, and too stiff to integrate within the budget
                bad("cure.kinetics.preExponentialPerS", 1e300),
                bad("cure.kinetics.activationEnergyKJPerMol", 1e300),
                bad("cure.kinetics.glassTransition.lambda", 0),
                bad("cure.kinetics.glassTransition.lambda", 1.5),
                bad("cure.kinetics.glassTransition.minC", 120),
                bad("cure.kinetics.glassTransition.tgFullC", 40),
                bad("cure.kinetics.m", 0.5),
                bad("cure.timeAboveC", 180),
                badJob("cure.timeAbove.minSeconds", without(curingJob(), "cure.timeAbove.minSeconds")),
                bad("cure.timeAbove.temperatureC", "180"),
                bad("cure", Jobs.JSON.createObjectNode()),
                badJob("cure.kinetics.k2PreExponentialPerS",
                        with(autocatalytic(), "cure.kinetics.k2PreExponentialPerS", 0)),
                badJob("cure.kinetics.k1ActivationEnergyKJPerMol",
                        with(autocatalytic(), "cure.kinetics.k1ActivationEnergyKJPerMol", -5)),
                badJob("cure.kinetics.m", with(autocatalytic(), "cure.kinetics.m", -1)),
                badJob("cure.kinetics.minDegree", with(with(autocatalytic(), "cure.kinetics.n", 1.2),
                        "cure.kinetics.minDegree", 1)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badCures")
    void anInvalidCureIsA422NamingTheField(String field, ObjectNode job) {
        server.request(Contract.responsesOnly()).contentType("application/json").body(Jobs.text(job))
                .when().post("/v1/simulations")
                .then().statusCode(422).contentType("application/problem+json")
                .body("type", equalTo("urn:dwellwise:problem:invalid-job"))
                .body("errors.field", hasItem(field));
    }

    @ParameterizedTest(name = "job.{0}")
    @MethodSource("badCures")
    void anInvalidCureInAReleaseCheckIsNamedUnderJob(String field, ObjectNode job) {
        server.request(Contract.responsesOnly()).contentType("application/json").body(release("B-1", job))
                .when().post("/v1/release-checks")
                .then().statusCode(422).contentType("application/problem+json")
                .body("type", equalTo("urn:dwellwise:problem:invalid-job"))
                .body("errors.field", hasItem("job." + field));
    }

    @Test
    void aKamalSourourCureIsComputedAndJudged() {
        server.request(Contract.strict()).contentType("application/json").body(Jobs.text(autocatalytic()))
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
        try (TestServer limited = TestServer.start(services)) {
            limited.request(Contract.strict()).contentType("application/json").body(release("B-1", curingJob()))
                    .when().post("/v1/release-checks")
                    .then().statusCode(422).contentType("application/problem+json")
                    .body("type", equalTo("urn:dwellwise:problem:compute-limit"))
                    .body("errors.field", hasItem("job.cure"));
        }
    }
}
