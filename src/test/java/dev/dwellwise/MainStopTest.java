package dev.dwellwise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.http.App;
import dev.dwellwise.http.ServiceConfig;
import dev.dwellwise.http.Services;
import dev.dwellwise.http.SolveGate;
import io.javalin.Javalin;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** The exit code the shutdown hook earns: 0 for a clean stop, 1 when requests had to be cut off. */
@Timeout(20)
class MainStopTest {

    private static final String JOB = """
            { "part": { "material": "steel-1010", "thicknessMm": 1.2, "emissivity": 0.9, "initialTemperatureC": 20 },
              "stages": [ { "name": "bake", "airTemperatureC": 200, "convectionWPerM2K": 35,
                            "until": { "seconds": 600 } } ],
              "output": { "series": false } }
            """;

    private static ServiceConfig config(String graceSeconds) {
        return ServiceConfig.fromEnvironment(Map.of(ServiceConfig.PORT, "0", ServiceConfig.HOST, "127.0.0.1",
                ServiceConfig.SHUTDOWN_GRACE_SECONDS, graceSeconds));
    }

    @Test
    void aStopWithNothingInFlightEarnsExitCodeZero() {
        Javalin app = App.create(config("5"), Services.bundled()).start();
        assertEquals(Main.EXIT_PASS, Main.stop(app));
    }

    @Test
    void aStopThatOutlastsTheGracePeriodEarnsExitCodeOne() throws Exception {
        ServiceConfig config = config("1");
        SolveGate gate = new SolveGate(1);
        Javalin app = App.create(config, gate.services(config)).start();
        try {
            HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1).build().sendAsync(
                    HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + app.port() + "/v1/simulations"))
                            .timeout(Duration.ofSeconds(10)).header("Content-Type", "application/json")
                            .POST(HttpRequest.BodyPublishers.ofString(JOB)).build(),
                    HttpResponse.BodyHandlers.discarding());
            assertTrue(gate.awaitEntered());
            assertEquals(Main.EXIT_FAIL, Main.stop(app));
        } finally {
            gate.open();
        }
    }
}
