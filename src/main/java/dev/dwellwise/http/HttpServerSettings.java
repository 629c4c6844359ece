package dev.dwellwise.http;

import org.eclipse.jetty.server.HttpConfiguration;
import org.eclipse.jetty.server.Server;
import org.eclipse.jetty.server.handler.GracefulHandler;
import org.eclipse.jetty.util.thread.QueuedThreadPool;

/** How Jetty is set up under Javalin: its thread pool, graceful stop, error pages and headers. */
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

    private HttpServerSettings() {
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
     * flight ({@link GracefulHandler} counts them), then stops; Javalin's stop() runs all of it.
     */
    static void configure(Server server, ServiceConfig config, ProblemErrorHandler errors) {
        server.setStopTimeout(config.shutdownGraceSeconds() * 1000L);
        server.insertHandler(new GracefulHandler());
        server.setErrorHandler(errors);
    }

    static void configure(HttpConfiguration http) {
        http.setSendServerVersion(false);
        http.setSendXPoweredBy(false);
    }
}
