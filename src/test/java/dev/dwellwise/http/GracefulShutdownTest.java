package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.net.ConnectException;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** The stop the shutdown hook runs: no new connections, and every request in flight answered. */
@Timeout(20)
class GracefulShutdownTest {

    private static final int IN_FLIGHT = 3;

    @Test
    void aStopRefusesNewConnectionsAndLetsEveryRequestInFlightComplete() throws Exception {
        Map<String, String> env = Map.of(ServiceConfig.WORKER_THREADS, Integer.toString(IN_FLIGHT),
                ServiceConfig.QUEUE_SIZE, "0", ServiceConfig.SHUTDOWN_GRACE_SECONDS, "10");
        SolveGate gate = new SolveGate(IN_FLIGHT);
        RunningService service = RunningService.start(env, gate.services(RunningService.config(env)));
        try {
            List<CompletableFuture<HttpResponse<String>>> inFlight = new ArrayList<>();
            for (int i = 0; i < IN_FLIGHT; i++) {
                inFlight.add(OverloadTest.post(service));
            }
            assertTrue(gate.awaitEntered(), "every request reached the solver");

            CompletableFuture<Void> stopping = CompletableFuture.runAsync(service::stop);
            Http.awaitConnectionsRefused(service.port());
            assertFalse(stopping.isDone(), "the stop waits for the requests in flight");

            gate.open();
            for (CompletableFuture<HttpResponse<String>> request : inFlight) {
                HttpResponse<String> response = request.get(Http.TIMEOUT_MILLIS, TimeUnit.MILLISECONDS);
                assertEquals(200, response.statusCode());
                assertTrue(response.body().startsWith("{\"verdict\":\"pass\""), response.body());
            }
            stopping.get(Http.TIMEOUT_MILLIS, TimeUnit.MILLISECONDS);
        } finally {
            gate.open();
            service.close();
        }
    }

    @Test
    void aNewRequestOnAConnectionOpenedBeforeTheStopIsNotServedWhileTheStopWaits() throws Exception {
        Map<String, String> env = Map.of(ServiceConfig.WORKER_THREADS, "1", ServiceConfig.QUEUE_SIZE, "0",
                ServiceConfig.SHUTDOWN_GRACE_SECONDS, "10");
        SolveGate gate = new SolveGate(1);
        RunningService service = RunningService.start(env, gate.services(RunningService.config(env)));
        try (Socket keptAlive = new Socket("127.0.0.1", service.port())) {
            keptAlive.setSoTimeout(Http.TIMEOUT_MILLIS);
            assertTrue(exchange(keptAlive).startsWith("HTTP/1.1 200 "));
            CompletableFuture<HttpResponse<String>> held = OverloadTest.post(service);
            assertTrue(gate.awaitEntered());

            CompletableFuture<Void> stopping = CompletableFuture.runAsync(service::stop);
            Http.awaitConnectionsRefused(service.port());
            // Jetty either closes the idle connection or answers 503; it never serves the request.
            String answer = exchange(keptAlive);
            assertTrue(answer.isEmpty() || answer.startsWith("HTTP/1.1 503 ") && answer.contains("Retry-After: "),
                    answer);

            gate.open();
            assertEquals(200, held.get(Http.TIMEOUT_MILLIS, TimeUnit.MILLISECONDS).statusCode());
            stopping.get(Http.TIMEOUT_MILLIS, TimeUnit.MILLISECONDS);
        } finally {
            gate.open();
            service.close();
        }
    }

    /** One keep-alive GET of the liveness probe on an open connection: the head and body of the answer. */
    private static String exchange(Socket socket) throws IOException {
        socket.getOutputStream().write("GET /health/live HTTP/1.1\r\nHost: x\r\n\r\n"
                .getBytes(StandardCharsets.ISO_8859_1));
        InputStream in = socket.getInputStream();
        StringBuilder head = new StringBuilder();
        while (!head.toString().endsWith("\r\n\r\n")) {
            int c = in.read();
            if (c < 0) {
                return head.toString();
            }
            head.append((char) c);
        }
        Matcher length = Pattern.compile("(?i)content-length: (\\d+)").matcher(head);
        byte[] body = in.readNBytes(length.find() ? Integer.parseInt(length.group(1)) : 0);
        return head + new String(body, StandardCharsets.UTF_8);
    }

}
