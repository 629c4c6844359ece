package dev.dwellwise.http;

import static java.nio.charset.StandardCharsets.ISO_8859_1;
import static java.nio.charset.StandardCharsets.UTF_8;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Clients that send their bodies slowly neither starve the probes nor hold a thread for long: a
 * request takes its admission place before its body is read, so past the workers and the queue it
 * gets 503 at once, and a body that trickles in below the minimum rate gets a 408 problem.
 */
@Timeout(30)
class SlowClientsTest {

    /** More than the HTTP threads of one worker and one queue place (1 + 1 + the headroom). */
    private static final int CLIENTS = 1 + 1 + HttpServerSettings.HEADROOM_THREADS + 6;

    @Test
    void slowBodiesGet503Or408WhileTheProbesAreAnswered() throws Exception {
        try (RunningService service = RunningService.start(Map.of(ServiceConfig.WORKER_THREADS, "1",
                ServiceConfig.QUEUE_SIZE, "1"))) {
            List<Socket> clients = new ArrayList<>();
            try {
                for (int i = 0; i < CLIENTS; i++) {
                    Socket socket = new Socket("127.0.0.1", service.port());
                    socket.setSoTimeout(Http.TIMEOUT_MILLIS);
                    socket.getOutputStream().write(("POST /v1/simulations HTTP/1.1\r\nHost: x\r\nContent-Type: "
                            + "application/json\r\nContent-Length: 4000\r\n\r\n{").getBytes(ISO_8859_1));
                    clients.add(socket);
                }
                // every thread the slow bodies could take would leave the probe unanswered
                Http.given(service).get("/health/live").then().statusCode(200);

                // a byte each 0.3 s, far below the minimum rate, for longer than the grace period
                long rounds = HttpServerSettings.GRACE_MILLIS / 300 + 2;
                for (int round = 0; round < rounds; round++) {
                    Thread.sleep(300);
                    for (Socket client : clients) {
                        try {
                            client.getOutputStream().write(' ');
                        } catch (IOException refusedAlready) {
                            // a 503 may have closed the connection
                        }
                    }
                }
                int timedOut = 0;
                for (Socket client : clients) {
                    String answer = answerOf(client);
                    if (answer.startsWith("HTTP/1.1 408 ")) {
                        assertTrue(answer.contains(ProblemType.REQUEST_TIMEOUT.uri()), answer);
                        assertTrue(answer.toLowerCase(Locale.ROOT)
                                .contains("content-type: application/problem+json"), answer);
                        timedOut++;
                    } else {
                        assertTrue(answer.startsWith("HTTP/1.1 503 ") && answer.contains(ProblemType.OVERLOADED.uri()),
                                answer);
                    }
                }
                // the worker's and the queue's places were held by the two that were read
                assertEquals(2, timedOut);
                Http.given(service).get("/health/live").then().statusCode(200);
            } finally {
                for (Socket client : clients) {
                    client.close();
                }
            }
        }
    }

    /**
     * A small job that arrives in pieces with pauses between them (a retransmission, a delayed
     * acknowledgement, a client's own stall) is answered, chunked or not: the rate is judged only
     * after the grace period. Jetty's servlet-input rate check refused this 492-byte job after a
     * 0.2 s pause (rate times time above the bytes so far, with no allowance).
     */
    @ParameterizedTest(name = "chunked {0}")
    @ValueSource(booleans = {false, true})
    void aSmallBodyWithPausesInsideTheGracePeriodIsAnswered(boolean chunked) throws Exception {
        byte[] body = Workloads.PANEL.getBytes(UTF_8);
        int third = body.length / 3;
        try (RunningService service = RunningService.start(Map.of());
                Socket client = postHead(service, chunked ? "Transfer-Encoding: chunked" : "Content-Length: " + body.length)) {
            OutputStream out = client.getOutputStream();
            int[] cuts = {0, third, 2 * third, body.length};
            for (int i = 0; i < 3; i++) {
                byte[] piece = Arrays.copyOfRange(body, cuts[i], cuts[i + 1]);
                if (chunked) {
                    out.write((Integer.toHexString(piece.length) + "\r\n").getBytes(ISO_8859_1));
                }
                out.write(piece);
                if (chunked) {
                    out.write("\r\n".getBytes(ISO_8859_1));
                }
                out.flush();
                if (i < 2) {
                    Thread.sleep(HttpServerSettings.GRACE_MILLIS / 3); // two pauses: most of the grace
                }
            }
            if (chunked) {
                out.write("0\r\n\r\n".getBytes(ISO_8859_1));
                out.flush();
            }
            String answer = new String(client.getInputStream().readAllBytes(), ISO_8859_1);
            assertTrue(answer.startsWith("HTTP/1.1 200 "), answer);
            assertTrue(answer.contains("\"verdict\":"), answer);
        }
    }

    /**
     * Past the grace period the body's average rate decides: a 16 KiB job (padded with whitespace)
     * sent a KiB at a time over more than the grace period is answered at 6.8 KiB/s and refused at
     * 2.6 KiB/s, either side of the 4 KiB/s minimum.
     */
    @ParameterizedTest(name = "a KiB every {0} ms gives {1}")
    @CsvSource({"150, 200", "390, 408"})
    void pastTheGracePeriodTheAverageRateDecides(long pauseMillis, int status) throws Exception {
        StringBuilder padded = new StringBuilder(Workloads.PANEL);
        while (padded.length() < 16 * 1024) {
            padded.append(' ');
        }
        byte[] body = padded.toString().getBytes(UTF_8);
        try (RunningService service = RunningService.start(Map.of());
                Socket client = postHead(service, "Content-Length: " + body.length)) {
            OutputStream out = client.getOutputStream();
            try {
                for (int from = 0; from < body.length; from += 1024) {
                    out.write(body, from, Math.min(1024, body.length - from));
                    out.flush();
                    Thread.sleep(pauseMillis);
                }
            } catch (IOException refused) {
                // the 408 closed the connection before the rest was sent
            }
            String answer = new String(client.getInputStream().readAllBytes(), ISO_8859_1);
            assertTrue(answer.startsWith("HTTP/1.1 " + status + " "), answer);
        }
    }

    /** A connection with the head of a job's POST sent, the body framed as given, each write sent at once. */
    private static Socket postHead(RunningService service, String framing) throws IOException {
        Socket client = new Socket("127.0.0.1", service.port());
        client.setSoTimeout(Http.TIMEOUT_MILLIS);
        client.setTcpNoDelay(true);
        client.getOutputStream().write(("POST /v1/simulations HTTP/1.1\r\nHost: x\r\nContent-Type: application/json\r\n"
                + framing + "\r\nConnection: close\r\n\r\n").getBytes(ISO_8859_1));
        return client;
    }

    /** The status line and headers, and the body once the answer is complete or the connection closes. */
    private static String answerOf(Socket client) throws IOException {
        InputStream in = client.getInputStream();
        ByteArrayOutputStream answer = new ByteArrayOutputStream();
        byte[] buffer = new byte[4096];
        long deadline = System.nanoTime() + Http.TIMEOUT_MILLIS * 1_000_000L;
        while (System.nanoTime() < deadline) {
            int read;
            try {
                read = in.read(buffer);
            } catch (IOException reset) {
                break; // the server closed after answering
            }
            if (read < 0) {
                break;
            }
            answer.write(buffer, 0, read);
            String text = answer.toString(ISO_8859_1);
            if (text.contains("\r\n\r\n") && text.trim().endsWith("}")) {
                break;
            }
        }
        return answer.toString(ISO_8859_1);
    }
}
