package dev.dwellwise.http;

import static java.nio.charset.StandardCharsets.US_ASCII;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.job.WireJson;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.SocketException;
import java.util.Arrays;
import java.util.Map;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.io.Content;
import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.server.Server;
import org.eclipse.jetty.server.ServerConnector;
import org.eclipse.jetty.util.Callback;
import org.eclipse.jetty.util.thread.Scheduler;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * {@link AnswerRateGuard} on a bare Jetty server whose connection buffers are small, so that a 1 MiB
 * answer waits on its reader: a reader that keeps up gets all of it, one below the rate is cut off
 * and its server thread freed (its waiting added up over the answer), the server's own pauses inside
 * and between writes do not count against the client, and a watched answer that arrived leaves its
 * kept-alive connection alone. A test-sized rate (512 KiB/s after 0.5 s) keeps each case to seconds.
 */
@Timeout(60)
class AnswerRateGuardTest {

    private static final MinimumRate RATE = new MinimumRate(512 * 1024, 500);
    private static final int ANSWER_BYTES = 1024 * 1024;
    private static final int PIECE_BYTES = 64 * 1024;
    private static final long SERVER_PAUSE_MILLIS = 2500;
    private static final long STALL_IN_WRITE_MILLIS = 600;
    private static final byte[] GET_KEEP_ALIVE = "GET /answer HTTP/1.1\r\nHost: 127.0.0.1\r\n\r\n".getBytes(US_ASCII);

    /** How each answer's writing ended on the server: "written", or the exception its write threw. */
    private final BlockingQueue<Object> outcomes = new ArrayBlockingQueue<>(4);
    private Server server;

    @AfterEach
    void stop() throws Exception {
        if (server != null) {
            server.stop();
        }
    }

    @Test
    void aReaderThatKeepsUpGetsTheWholeAnswer() throws Exception {
        int port = start(Stall.NONE);
        assertEquals(ANSWER_BYTES, bodyBytes(read(port, 0)));
        assertEquals("written", outcomes.poll(10, TimeUnit.SECONDS));
    }

    @Test
    void aTricklingReaderIsCutOffAndTheServerThreadFreed() throws Exception {
        int port = start(Stall.NONE);
        long start = System.nanoTime();
        // 4 KiB every 100 ms, about 40 KiB/s: the whole answer would take 25 s
        byte[] received = read(port, 100);
        long seconds = TimeUnit.NANOSECONDS.toSeconds(System.nanoTime() - start);
        assertTrue(bodyBytes(received) < ANSWER_BYTES / 2, "cut off well before the end: " + bodyBytes(received));
        // allowed: 0.5 s of waiting for the first pieces (the grace), then what the buffers still hold
        assertTrue(seconds < 12, "cut off after " + seconds + " s");
        assertInstanceOf(IOException.class, outcomes.poll(10, TimeUnit.SECONDS), "the blocked write failed");
    }

    @Test
    void aReaderBelowTheRateIsCutOffThoughNoOneWriteWaitsOutTheGrace() throws Exception {
        int port = start(Stall.NONE);
        // 4 KiB every 15 ms, at most 270 KiB/s against 512 KiB/s: each 64 KiB piece waits about
        // 0.25 s, under the 0.5 s grace, so only the answer's waiting added up shows the shortfall
        byte[] received = read(port, 15);
        assertTrue(bodyBytes(received) < ANSWER_BYTES / 2, "cut off well before the end: " + bodyBytes(received));
        assertInstanceOf(IOException.class, outcomes.poll(10, TimeUnit.SECONDS), "the blocked write failed");
    }

    @Test
    void theServersOwnPauseBetweenWritesDoesNotCount() throws Exception {
        // half the answer, then a pause longer than the time allowed for all of it (2 s), then the rest:
        // judged on the time since the first write, a reader that keeps up would be cut off
        int port = start(Stall.BETWEEN_WRITES);
        assertEquals(ANSWER_BYTES, bodyBytes(read(port, 0)));
        assertEquals("written", outcomes.poll(10, TimeUnit.SECONDS));
    }

    @Test
    void theServersOwnStallInsideAWriteDoesNotCount() throws Exception {
        // the first write stalls in the server (as a collection or a descheduled thread would) for
        // longer than the 0.5 s its first piece is allowed: counted as waiting, it would cut off a
        // reader that keeps up, and shrink what every later write is allowed
        int port = start(Stall.INSIDE_FIRST_WRITE);
        assertEquals(ANSWER_BYTES, bodyBytes(read(port, 0)));
        assertEquals("written", outcomes.poll(10, TimeUnit.SECONDS));
    }

    @Test
    void aWatchedAnswerThatArrivedLeavesItsConnectionToTheNextRequest() throws Exception {
        // every piece waits on these small buffers, so each write has a timer; once the answer is
        // in, none of them may close the kept-alive connection under the next request
        int port = start(Stall.NONE);
        try (Socket socket = smallBufferedSocket(port)) {
            OutputStream out = socket.getOutputStream();
            InputStream in = socket.getInputStream();
            out.write(GET_KEEP_ALIVE);
            out.flush();
            assertEquals(ANSWER_BYTES, readAnswer(in));
            assertEquals("written", outcomes.poll(10, TimeUnit.SECONDS));
            Thread.sleep(RATE.allowedNanos(ANSWER_BYTES) / 1_000_000 + 500); // past every timer's time
            out.write(GET_KEEP_ALIVE);
            out.flush();
            assertEquals(ANSWER_BYTES, readAnswer(in));
            assertEquals("written", outcomes.poll(10, TimeUnit.SECONDS));
        }
    }

    @Test
    void aWriteReportedCompleteOnlyAfterTheCutEndsTheAnswerAsFailed() throws Exception {
        // the last write's completion is reported 3 s late, past its allowance (2 s at most): by then
        // the guard has closed the connection, so the answer must end failed, never as delivered
        int port = start(Stall.LAST_COMPLETION_REPORTED_LATE);
        read(port, 0);
        assertInstanceOf(IOException.class, outcomes.poll(10, TimeUnit.SECONDS), "the late success was turned down");
    }

    @Test
    void theServiceHasBothGuardsInsideItsAccessLog() {
        Server configured = new Server();
        ServiceConfig config = RunningService.config(Map.of());
        try (ServiceMetrics metrics = new ServiceMetrics(HttpServerSettings.threadPool(config))) {
            AccessLog access = new AccessLog(metrics);
            HttpServerSettings.configure(configured, config, new ProblemErrorHandler(WireJson.create(), access), access);
            // inside the access log, a cut-off transfer is logged (499, 408) like one the client gave up on
            assertNotNull(access.getDescendant(AnswerRateGuard.class));
            assertNotNull(access.getDescendant(BodyRateGuard.class));
        }
    }

    /** Where the server stalls of its own accord while it writes the answer, or Jetty reports late. */
    private enum Stall { NONE, BETWEEN_WRITES, INSIDE_FIRST_WRITE, LAST_COMPLETION_REPORTED_LATE }

    /** Starts a server with the guard around a handler that writes the answer in pieces. */
    private int start(Stall stall) throws Exception {
        server = new Server();
        ServerConnector connector = new ServerConnector(server);
        connector.setHost("127.0.0.1");
        connector.setPort(0);
        connector.setAcceptedSendBufferSize(8 * 1024);
        server.addConnector(connector);
        AnswerRateGuard guard = new AnswerRateGuard(RATE);
        guard.setHandler(new PiecewiseAnswer(stall == Stall.BETWEEN_WRITES));
        if (stall == Stall.INSIDE_FIRST_WRITE || stall == Stall.LAST_COMPLETION_REPORTED_LATE) {
            // outside the guard, so that the guard's writes pass through it
            InterceptedWrites outside = new InterceptedWrites(stall == Stall.INSIDE_FIRST_WRITE
                    ? AnswerRateGuardTest::stalledFirstWrite : AnswerRateGuardTest::lateLastCompletion);
            outside.setHandler(guard);
            server.setHandler(outside);
        } else {
            server.setHandler(guard);
        }
        server.start();
        return connector.getLocalPort();
    }

    private static Socket smallBufferedSocket(int port) throws IOException {
        Socket socket = new Socket();
        socket.setReceiveBufferSize(4 * 1024);
        socket.connect(new InetSocketAddress("127.0.0.1", port), 5000);
        socket.setSoTimeout(20_000);
        return socket;
    }

    /** One answer on a kept-alive connection, read at full speed: its body's length, -1 if it ended early. */
    private static int readAnswer(InputStream in) throws IOException {
        StringBuilder head = new StringBuilder();
        while (!head.toString().endsWith("\r\n\r\n")) {
            int b = in.read();
            if (b < 0) {
                return -1;
            }
            head.append((char) b);
        }
        Matcher length = Pattern.compile("(?im)^content-length:\\s*(\\d+)").matcher(head);
        assertTrue(length.find(), head.toString());
        int expected = Integer.parseInt(length.group(1));
        byte[] piece = new byte[4096];
        int read = 0;
        while (read < expected) {
            int n = in.read(piece, 0, Math.min(piece.length, expected - read));
            if (n < 0) {
                return -1;
            }
            read += n;
        }
        return read;
    }

    /** A GET of the answer on a socket with a small receive buffer, reading 4 KiB at a time. */
    private static byte[] read(int port, long pauseMillis) throws IOException, InterruptedException {
        try (Socket socket = smallBufferedSocket(port)) {
            OutputStream out = socket.getOutputStream();
            out.write("GET /answer HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: close\r\n\r\n".getBytes(US_ASCII));
            out.flush();
            InputStream in = socket.getInputStream();
            byte[] all = new byte[ANSWER_BYTES + 4096];
            int length = 0;
            byte[] piece = new byte[4096];
            try {
                for (int n; (n = in.read(piece)) > 0; ) {
                    System.arraycopy(piece, 0, all, length, Math.min(n, all.length - length));
                    length = Math.min(all.length, length + n);
                    if (pauseMillis > 0) {
                        Thread.sleep(pauseMillis);
                    }
                }
            } catch (SocketException reset) {
                // the server closed the connection with bytes unread: what was read stands
            }
            return Arrays.copyOf(all, length);
        }
    }

    /** The answer's bytes after its header block. */
    private static int bodyBytes(byte[] received) {
        for (int i = 3; i < received.length; i++) {
            if (received[i - 3] == '\r' && received[i - 2] == '\n' && received[i - 1] == '\r' && received[i] == '\n') {
                return received.length - i - 1;
            }
        }
        return 0;
    }

    /** Writes {@link #ANSWER_BYTES} in blocking pieces, as the servlet output does, and records how it ended. */
    private final class PiecewiseAnswer extends Handler.Abstract {

        private final boolean pauseHalfway;

        PiecewiseAnswer(boolean pauseHalfway) {
            this.pauseHalfway = pauseHalfway;
        }

        @Override
        public boolean handle(Request request, Response response, Callback callback) {
            response.getHeaders().put(HttpHeader.CONTENT_LENGTH, ANSWER_BYTES);
            byte[] piece = new byte[PIECE_BYTES];
            Arrays.fill(piece, (byte) 'x');
            try (OutputStream out = Content.Sink.asOutputStream(response)) {
                for (int written = 0; written < ANSWER_BYTES; written += PIECE_BYTES) {
                    if (pauseHalfway && written == ANSWER_BYTES / 2) {
                        Thread.sleep(SERVER_PAUSE_MILLIS);
                    }
                    out.write(piece);
                }
            } catch (IOException | InterruptedException e) { // closing the stream writes the last, empty piece
                outcomes.add(e);
                callback.failed(e);
                return true;
            }
            outcomes.add("written");
            callback.succeeded();
            return true;
        }
    }

    /** The first write of the answer stalls in the server before it goes on. */
    private static InterceptedWrites.Write stalledFirstWrite(Request request, InterceptedWrites.Write onward) {
        boolean[] first = {true};
        return (last, content, written) -> {
            if (first[0]) {
                first[0] = false;
                InterceptedWrites.stall(STALL_IN_WRITE_MILLIS);
            }
            onward.write(last, content, written);
        };
    }

    /** The last write's success is reported 3 s after it happened. */
    private static InterceptedWrites.Write lateLastCompletion(Request request, InterceptedWrites.Write onward) {
        Scheduler scheduler = request.getComponents().getScheduler();
        return (last, content, written) -> onward.write(last, content, !last ? written : Callback.from(
                () -> scheduler.schedule(written::succeeded, 3, TimeUnit.SECONDS), written::failed));
    }
}
