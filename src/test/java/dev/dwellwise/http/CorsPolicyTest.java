package dev.dwellwise.http;

import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.nullValue;
import static org.junit.jupiter.api.Assertions.assertEquals;

import io.restassured.response.Response;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

@Timeout(20)
class CorsPolicyTest {

    private static final String DASHBOARD = "https://dashboard.plant.example";
    private static final String TOKEN = "dashboard-token-0123456789";
    private static RunningService service;

    @BeforeAll
    static void start() {
        service = RunningService.start(Map.of(ServiceConfig.CORS_ORIGINS, DASHBOARD + ",http://localhost:3000",
                ServiceConfig.API_TOKEN, TOKEN));
    }

    @AfterAll
    static void stop() {
        service.close();
    }

    @Test
    void anAllowedOriginIsNamedInTheAnswerAndMayReadTheRequestId() {
        Http.given(service).header("Origin", DASHBOARD).header("Authorization", "Bearer " + TOKEN)
                .get("/v1/materials").then()
                .statusCode(200)
                .header("Access-Control-Allow-Origin", equalTo(DASHBOARD))
                .header("Access-Control-Expose-Headers", equalTo(CorsPolicy.EXPOSED_HEADERS))
                .header("Vary", equalTo("Origin"));
    }

    @Test
    void aRefusedOriginGetsNoCorsHeaderAtAll() {
        Response response = Http.given(service).header("Origin", "https://dashboard.plant.example.attacker.example")
                .header("Authorization", "Bearer " + TOKEN).get("/v1/materials");
        assertEquals(200, response.statusCode());
        assertEquals(List.of(), corsHeaders(response));
    }

    @Test
    void anOriginDifferingOnlyInSchemeIsRefused() {
        Response response = Http.given(service).header("Origin", "http://dashboard.plant.example")
                .header("Authorization", "Bearer " + TOKEN).get("/v1/materials");
        assertEquals(List.of(), corsHeaders(response));
    }

    @Test
    void aPreflightFromAnAllowedOriginIsAnsweredWithoutATokenAndAllowsTheAuthorizationHeader() {
        Http.given(service).header("Origin", DASHBOARD).header("Access-Control-Request-Method", "POST")
                .header("Access-Control-Request-Headers", "authorization, content-type")
                .options("/v1/simulations").then()
                .statusCode(204)
                .header("Access-Control-Allow-Origin", equalTo(DASHBOARD))
                .header("Access-Control-Allow-Methods", equalTo("POST, OPTIONS"))
                .header("Access-Control-Allow-Headers", equalTo(CorsPolicy.ALLOWED_HEADERS))
                .header("Access-Control-Max-Age", equalTo(CorsPolicy.MAX_AGE_SECONDS));
    }

    @Test
    void aPreflightFromARefusedOriginGetsNoCorsHeaders() {
        Response response = Http.given(service).header("Origin", "https://elsewhere.example")
                .header("Access-Control-Request-Method", "POST").options("/v1/simulations");
        assertEquals(204, response.statusCode());
        assertEquals(List.of(), corsHeaders(response));
    }

    @Test
    void anOptionsNamesTheMethodsOfItsPath() {
        Http.given(service).options("/v1/materials").then().statusCode(204)
                .header("Allow", equalTo("GET, HEAD, OPTIONS"));
        Http.given(service).options("/v1/materials/steel-1010").then().statusCode(204)
                .header("Allow", equalTo("GET, HEAD, OPTIONS"));
        Http.given(service).options("/v1/release-checks").then().statusCode(204)
                .header("Allow", equalTo("POST, OPTIONS"));
    }

    @Test
    void anOptionsOnAPathTheServiceDoesNotHaveIsA404Problem() {
        Http.given(service).filter(Contract.responsesOnly()).header("Origin", DASHBOARD)
                .header("Access-Control-Request-Method", "GET").options("/v1/nowhere").then()
                .statusCode(404).contentType("application/problem+json")
                .body("type", equalTo(ProblemType.NOT_FOUND.uri()));
    }

    @Test
    void aRequestWithoutAnOriginGetsNoAllowOrigin() {
        Http.given(service).header("Authorization", "Bearer " + TOKEN).get("/v1/materials").then()
                .statusCode(200).header("Access-Control-Allow-Origin", nullValue());
    }

    private static List<String> corsHeaders(Response response) {
        return response.headers().asList().stream().map(h -> h.getName())
                .filter(name -> name.toLowerCase(java.util.Locale.ROOT).startsWith("access-control-")).toList();
    }
}
