package dev.dwellwise.http;

import io.javalin.compression.CompressionStrategy;
import io.javalin.compression.Gzip;
import java.util.List;
import org.eclipse.jetty.server.HttpConfiguration;
import org.eclipse.jetty.server.Server;
import org.eclipse.jetty.server.handler.GracefulHandler;
import org.eclipse.jetty.util.thread.QueuedThreadPool;

/** How Jetty is set up under Javalin: its thread pool, graceful stop, error pages, headers and compression. */
final class HttpServerSettings {

    /** HTTP threads beyond the admitted solves: probes, scrapes, cheap routes, Jetty's own selectors. */
    static final int HEADROOM_THREADS = 32;
    private static final int MIN_THREADS = 8;
    private static final int IDLE_TIMEOUT_MILLIS = 60_000;
    /**
     * After the graceful phase, Jetty gives its thread pool what is left of the grace period, and at
     * least this long, to finish the threads still busy (Server.doStop in Jetty 12.1).
     */
    static final int POOL_STOP_MIN_MILLIS = 1_000;

    /**
     * Answers from this size on are gzipped for a client that accepts gzip: in practice a series (JSON
     * or CSV) or a chart, not a summary or a short problem. Measured in process on this service's
     * answers: a 2.9 KB summary took 28 µs to gzip at level 1 (37 µs at level 6), about as long as its
     * lumped solve, to save 1.6 KB, a fraction of a millisecond even on a 100 Mbit/s plant network.
     * Javalin's own default is 1500 bytes.
     */
    static final int GZIP_FROM_BYTES = 16 * 1024;
    /**
     * Gzip's fastest level: on a 133 KB series, 1.3 ms to 43 KB against 5.9 ms to 40 KB at Javalin's
     * default level 6; on a 35 KB series, 0.12 ms to 7.5 KB against 0.47 ms to 6.6 KB.
     */
    static final int GZIP_LEVEL = 1;

    /**
     * How long a body or an answer may take before its average rate is judged: pauses in a small job's
     * arrival (a retransmission, a delayed acknowledgement, a client's own stall) add up to well under
     * this, while a trickle below the rate is cut soon after it.
     */
    static final int GRACE_MILLIS = 2000;

    /**
     * The slowest a request body may travel on average once it has been arriving for
     * {@link #GRACE_MILLIS} ({@link BodyRateGuard}): a client on the plant network sends a job of a few
     * kilobytes in milliseconds, while one that trickles it holds a thread (and an admission place) for
     * as long as it keeps a byte coming inside the idle timeout. At this rate the largest body the
     * default limit allows (1 MiB) still has over four minutes.
     */
    static final MinimumRate BODY_RATE = new MinimumRate(4096, GRACE_MILLIS);
    /**
     * The slowest a client may read an answer, counting only the time the answer's writes wait for it
     * ({@link AnswerRateGuard}): 256 kbit/s, far below any plant network or a remote dashboard's link.
     * A summary fits the socket's buffers and is never judged; a 3 MB series that waits has a minute
     * and a half.
     */
    static final MinimumRate ANSWER_RATE = new MinimumRate(32 * 1024, GRACE_MILLIS);

    private HttpServerSettings() {
    }

    static CompressionStrategy compression() {
        CompressionStrategy gzip = new CompressionStrategy(null, new Gzip(GZIP_LEVEL));
        gzip.setDefaultMinSizeForCompression(GZIP_FROM_BYTES);
        // Javalin excludes image/* but SVG, which it matches exactly; Jetty sends the chart with its charset
        gzip.setAllowedMimeTypes(List.of(MediaTypes.SVG, MediaTypes.SVG + ";charset=utf-8"));
        return gzip;
    }

    /**
     * Enough threads for every admitted solve (they run on request threads, see
     * {@link AdmissionControl}) plus headroom. Jetty's job queue stays unbounded, as Jetty asks: it
     * holds connection tasks, not solves, and a full one would drop connections without an answer.
     */
    static QueuedThreadPool threadPool(ServiceConfig config) {
        int max = config.workerThreads() + config.queueSize() + HEADROOM_THREADS;
        QueuedThreadPool pool = new QueuedThreadPool(max, Math.min(MIN_THREADS, max), IDLE_TIMEOUT_MILLIS);
        pool.setName("dwellwise-http");
        return pool;
    }

    /**
     * A stop first closes the listening socket, then waits up to the grace period for the requests in
     * flight ({@link GracefulHandler} counts them), then stops; Javalin's stop() runs all of it. The
     * access log sits inside the graceful handler: a request refused while stopping never reaches it
     * and is logged by the error handler. The rate guards sit inside the access log, so that a body or
     * an answer they cut off is logged (408, 499) like one the client gave up on.
     */
    static void configure(Server server, ServiceConfig config, ProblemErrorHandler errors, AccessLog access) {
        server.setStopTimeout(config.shutdownGraceSeconds() * 1000L);
        server.insertHandler(new BodyRateGuard(BODY_RATE));
        server.insertHandler(new AnswerRateGuard(ANSWER_RATE));
        server.insertHandler(access);
        server.insertHandler(new GracefulHandler());
        server.setErrorHandler(errors);
    }

    static void configure(HttpConfiguration http) {
        http.setSendServerVersion(false);
        http.setSendXPoweredBy(false);
    }
}
