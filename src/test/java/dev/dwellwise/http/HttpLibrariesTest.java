package dev.dwellwise.http;

import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.emptyOrNullString;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The read-only resources: material and example libraries, health probes and the contract itself. */
class HttpLibrariesTest {

    @RegisterExtension
    static final BundledServer server = new BundledServer();

    @Test
    void theMaterialLibraryListsAtLeastEightMaterialsEachWithASource() {
        server.request().get("/v1/materials").then()
                .statusCode(200)
                .contentType("application/json")
                .body("materials.size()", greaterThanOrEqualTo(8))
                .body("materials.source", everyItem(not(emptyOrNullString())))
                .body("materials.id", hasItem("steel-1010"));
    }

    @Test
    void everyListedMaterialIsServedByItsId() {
        List<String> ids = server.request().get("/v1/materials").then().statusCode(200)
                .extract().path("materials.id");
        assertFalse(ids.isEmpty());
        for (String id : ids) {
            server.request().get("/v1/materials/{id}", id).then()
                    .statusCode(200).contentType("application/json").body("id", equalTo(id));
        }
    }

    @Test
    void aTabulatedMaterialCarriesItsTableAndAConstantOneDoesNot() {
        server.request().get("/v1/materials/steel-1010").then().statusCode(200)
                .body("table.size()", greaterThanOrEqualTo(2))
                .body("table[0].temperatureC", equalTo(26.85f));
        server.request().get("/v1/materials/aluminium-6061-t6").then().statusCode(200)
                .body("table", equalTo(null));
    }

    @Test
    void anUnknownMaterialIdIsANotFoundProblem() {
        server.request().get("/v1/materials/unobtainium").then()
                .statusCode(404)
                .contentType("application/problem+json")
                .body("type", equalTo("urn:dwellwise:problem:not-found"))
                .body("status", equalTo(404))
                .body("instance", equalTo("/v1/materials/unobtainium"));
    }

    @Test
    void theExamplesAreListedEachWithAJob() {
        server.request().get("/v1/examples").then()
                .statusCode(200)
                .contentType("application/json")
                .body("examples.size()", greaterThanOrEqualTo(3))
                .body("examples.id", hasItem("powder-coat-steel-panel"))
                .body("examples.job.stages", everyItem(not(hasSize(0))));
    }

    @Test
    void everyListedExampleIsServedByItsId() {
        List<String> ids = server.request().get("/v1/examples").then().statusCode(200)
                .extract().path("examples.id");
        for (String id : ids) {
            server.request().get("/v1/examples/{id}", id).then()
                    .statusCode(200).contentType("application/json").body("id", equalTo(id));
        }
    }

    @Test
    void anUnknownExampleIdIsANotFoundProblem() {
        server.request().get("/v1/examples/no-such-line").then()
                .statusCode(404)
                .contentType("application/problem+json")
                .body("type", equalTo("urn:dwellwise:problem:not-found"))
                .body("status", equalTo(404));
    }

    @Test
    void theLivenessProbeAnswersUp() {
        server.request().get("/health/live").then()
                .statusCode(200).contentType("application/json").body("status", equalTo("up"));
    }

    @Test
    void theReadinessProbeAnswersReady() {
        server.request().get("/health/ready").then()
                .statusCode(200).contentType("application/json").body("status", equalTo("ready"));
    }

    @Test
    void theContractIsServedAsYamlByteForByteAsTheFileInTheRepository() throws IOException {
        String served = server.request().get("/openapi.yaml").then()
                .statusCode(200).contentType(startsWith("application/yaml")).extract().asString();
        assertEquals(Files.readString(Path.of("openapi", "dwellwise.yaml"), StandardCharsets.UTF_8), served);
    }
}
