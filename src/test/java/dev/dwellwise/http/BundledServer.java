package dev.dwellwise.http;

import io.javalin.Javalin;
import io.restassured.filter.Filter;
import io.restassured.specification.RequestSpecification;
import org.junit.jupiter.api.extension.AfterAllCallback;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * The bundled service on a free port for one test class, started before its tests and stopped
 * after them: {@code @RegisterExtension static final BundledServer server = new BundledServer();}.
 */
final class BundledServer implements BeforeAllCallback, AfterAllCallback {

    private TestServer server;

    @Override
    public void beforeAll(ExtensionContext context) {
        server = TestServer.start();
    }

    @Override
    public void afterAll(ExtensionContext context) {
        server.close();
    }

    /** A request whose answer is validated against the whole contract. */
    RequestSpecification request() {
        return request(Contract.strict());
    }

    /** A request whose answer the given filter checks. */
    RequestSpecification request(Filter contract) {
        return server.request(contract);
    }

    int port() {
        return server.port();
    }

    Javalin app() {
        return server.app();
    }
}
