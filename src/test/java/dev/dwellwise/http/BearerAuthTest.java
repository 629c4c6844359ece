package dev.dwellwise.http;

import static org.hamcrest.Matchers.anyOf;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.startsWith;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

@Timeout(20)
class BearerAuthTest {

    private static final String TOKEN = "line-3-mes-token-0123456789";
    private static RunningService secured;
    private static RunningService open;

    @BeforeAll
    static void start() {
        secured = RunningService.start(Map.of(ServiceConfig.API_TOKEN, TOKEN));
        open = RunningService.start(Map.of());
    }

    @AfterAll
    static void stop() {
        secured.close();
        open.close();
    }

    @Test
    void withoutAConfiguredTokenTheApiAnswersWithoutCredentials() {
        Http.given(open).get("/v1/materials").then().statusCode(200);
    }

    @Test
    void withATokenConfiguredARequestWithoutOneGets401ProblemDetailsWithABearerChallenge() {
        Http.given(secured).filter(Contract.strict()).get("/v1/materials").then()
                .statusCode(401)
                .contentType("application/problem+json")
                .header("WWW-Authenticate", startsWith("Bearer"))
                .body("type", equalTo(ProblemType.UNAUTHORIZED.uri()))
                .body("status", equalTo(401));
    }

    @Test
    void aWrongTokenGets401NamingTheInvalidToken() {
        Http.given(secured).header("Authorization", "Bearer " + TOKEN + "x").get("/v1/materials").then()
                .statusCode(401)
                .header("WWW-Authenticate", equalTo("Bearer realm=\"dwellwise\", error=\"invalid_token\""))
                .body("type", equalTo(ProblemType.UNAUTHORIZED.uri()));
    }

    @Test
    void anotherSchemeThanBearerGets401() {
        Http.given(secured).header("Authorization", "Basic " + TOKEN).get("/v1/materials").then().statusCode(401);
    }

    @Test
    void theRightTokenIsLetThroughWhateverTheCaseOfTheScheme() {
        Http.given(secured).header("Authorization", "bearer " + TOKEN).get("/v1/materials").then().statusCode(200);
    }

    @Test
    void aPostIsRefusedBeforeItsBodyIsSolved() {
        Http.given(secured).contentType("application/json").body(Workloads.PANEL).post("/v1/simulations").then()
                .statusCode(401);
    }

    @Test
    void theProbesTheMetricsAndTheContractStayOpenWithoutAToken() {
        Http.given(secured).get("/health/live").then().statusCode(200);
        Http.given(secured).get("/health/ready").then().statusCode(200);
        Http.given(secured).get("/metrics").then().statusCode(200);
        Http.given(secured).get("/metrics/").then().statusCode(200);
        Http.given(secured).get("/openapi.yaml").then().statusCode(200);
    }

    @Test
    void aHeadRequestIsRefusedWithoutATokenNotAnsweredWithAServerError() {
        // a HEAD matches no route of its own (Javalin answers it from the GET route)
        Http.given(secured).head("/v1/materials").then().statusCode(401);
        Http.given(secured).header("Authorization", "Bearer " + TOKEN).head("/v1/materials").then().statusCode(200);
    }

    @Test
    void aHeadOnTheOpenPathsNeedsNoToken() {
        // load balancers and uptime checks often probe with HEAD
        for (String path : BearerAuth.OPEN_PATHS) {
            Http.given(secured).head(path).then().statusCode(200);
        }
        Http.given(secured).head("/metrics/").then().statusCode(200);
    }

    @Test
    void twoAuthorizationHeadersAreRefusedRatherThanOnePicked() {
        for (List<String> pair : List.of(List.of("Bearer " + TOKEN, "Bearer wrong-token-0123456789"),
                List.of("Bearer wrong-token-0123456789", "Bearer " + TOKEN))) {
            Http.given(secured).header("Authorization", pair.get(0)).header("Authorization", pair.get(1))
                    .get("/v1/materials").then().statusCode(401)
                    .header("WWW-Authenticate", equalTo("Bearer realm=\"dwellwise\", error=\"invalid_request\""));
        }
    }

    @Test
    void aPathThatOnlyLooksLikeAnOpenOneStaysClosed() {
        Http.given(secured).get("/health/live/../../v1/materials").then().statusCode(anyOf(is(401), is(404)));
        Http.given(secured).get("/v1/materials?x=/health/live").then().statusCode(401);
    }
}
