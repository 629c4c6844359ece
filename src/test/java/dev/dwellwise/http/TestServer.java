package dev.dwellwise.http;

import static io.restassured.RestAssured.given;

import io.javalin.Javalin;
import io.restassured.config.EncoderConfig;
import io.restassured.config.HttpClientConfig;
import io.restassured.config.RestAssuredConfig;
import io.restassured.filter.Filter;
import io.restassured.specification.RequestSpecification;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/**
 * One app on a free port for one test class: created by the app factory with the bundled services,
 * started in {@code @BeforeAll}, stopped in {@code @AfterAll} (a stopped Javalin cannot start again).
 */
final class TestServer implements AutoCloseable {

    /** UTF-8 bodies, and no charset appended to a Content-Type the test chose itself. */
    private static final RestAssuredConfig CONFIG = RestAssuredConfig.config().encoderConfig(
            EncoderConfig.encoderConfig().defaultContentCharset(StandardCharsets.UTF_8)
                    .appendDefaultContentCharsetToContentTypeIfUndefined(false));

    /**
     * As {@link #CONFIG}, and the client sends {@code Expect: 100-continue} and waits before it sends
     * the body: a server that refuses a body on its declared length answers before reading it, so a
     * client that sent the whole body at once would find the connection closed under it.
     */
    static final RestAssuredConfig EXPECT_CONTINUE = CONFIG.httpClient(
            HttpClientConfig.httpClientConfig().setParam("http.protocol.expect-continue", true));

    private final Javalin app;

    private TestServer(Javalin app) {
        this.app = app;
    }

    static TestServer start() {
        return start(Services.bundled());
    }

    /** As {@link #start()}, with other core objects (a smaller budget, say). */
    static TestServer start(Services services) {
        Javalin app = App.create(ServiceConfig.defaults().withPort(0), services);
        app.start();
        return new TestServer(app);
    }

    Javalin app() {
        return app;
    }

    int port() {
        return app.port();
    }

    /** A request to this server, every answer checked by the filter. */
    RequestSpecification request(Filter contract) {
        return given().config(CONFIG).baseUri("http://127.0.0.1").port(port()).filter(contract);
    }

    @Override
    public void close() {
        app.stop();
    }

    /** A test resource as text. */
    static String resource(String name) {
        try (InputStream in = TestServer.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
