package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.RestAssured;
import io.restassured.config.HttpClientConfig;
import io.restassured.config.RestAssuredConfig;
import io.restassured.specification.RequestSpecification;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.util.concurrent.TimeUnit;
import java.net.InetSocketAddress;
import java.net.ConnectException;
import java.nio.charset.StandardCharsets;

/** REST Assured and raw-socket requests to a running service, every one bounded in time. */
public final class Http {

    static final int TIMEOUT_MILLIS = 5_000;

    private static final RestAssuredConfig BOUNDED = RestAssured.config().httpClient(HttpClientConfig.httpClientConfig()
            .setParam("http.connection.timeout", TIMEOUT_MILLIS)
            .setParam("http.socket.timeout", TIMEOUT_MILLIS));

    private Http() {
    }

    static RequestSpecification given(RunningService service) {
        return RestAssured.given().config(BOUNDED).baseUri("http://127.0.0.1").port(service.port());
    }

    /** Sends raw bytes, as a broken client would, and returns everything the server answers until it closes. */
    static String raw(RunningService service, String request) throws IOException {
        return raw(service.port(), request);
    }

    /** {@link #raw(RunningService, String)} to a service on a loopback port. */
    static String raw(int port, String request) throws IOException {
        try (Socket socket = new Socket("127.0.0.1", port)) {
            socket.setSoTimeout(TIMEOUT_MILLIS);
            OutputStream out = socket.getOutputStream();
            out.write(request.getBytes(StandardCharsets.ISO_8859_1));
            out.flush();
            socket.shutdownOutput();
            InputStream in = socket.getInputStream();
            ByteArrayOutputStream answer = new ByteArrayOutputStream();
            in.transferTo(answer);
            return answer.toString(StandardCharsets.ISO_8859_1);
        }
    }

    /** Polls until a connection attempt is refused (bounded): the listening socket is closed. */
    public static void awaitConnectionsRefused(int port) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(Http.TIMEOUT_MILLIS);
        while (true) {
            try (Socket socket = new Socket()) {
                socket.connect(new InetSocketAddress("127.0.0.1", port), 500);
            } catch (ConnectException refused) {
                return;
            } catch (IOException other) {
                // a timeout or reset: not refused yet
            }
            assertTrue(System.nanoTime() < deadline, "port " + port + " still accepts connections");
            Thread.sleep(10);
        }
    }
}
