package dev.dwellwise.http;

import io.javalin.http.Context;
import jakarta.servlet.ServletRequest;
import jakarta.servlet.ServletRequestEvent;
import jakarta.servlet.ServletRequestListener;
import org.eclipse.jetty.ee10.servlet.ServletContextRequest;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.slf4j.MDC;

/**
 * One access line and one {@code http_server_requests} record per request, and the request id out
 * of the logging context afterwards, whichever way the request ends.
 *
 * <p>Normally Javalin's request logger calls {@link #answered} once the answer is in Jetty's hands.
 * Javalin skips its request loggers when writing the answer fails (the client went away while a
 * large series was being sent), so the servlet listener, which Jetty calls when the dispatch is
 * over, writes the line of such a request instead. Its status is 499, what Javalin and common
 * practice give a client that closed the connection: the status line may have gone out as 200
 * before the body failed, but the answer did not arrive. Writing bytes already in memory fails
 * only on the connection, so that is the one cause. Only an answer larger than Jetty's output
 * buffer (32 KiB, as sent) fails inside the copy: a smaller one is sent after the loggers have run.
 * The listener runs at the end of every dispatch, so an asynchronous route (none today) would need
 * its line kept back until its last dispatch.
 */
final class AccessLog implements ServletRequestListener {

    private static final Logger ACCESS = LoggerFactory.getLogger("dwellwise.access");
    /**
     * Request attribute: what the access line adds about the request's solve. One line per request,
     * written after the solve has given its worker back: a log write inside the worker's hold made
     * the other solves wait behind the log's lock (measured: a third of the throughput under load).
     */
    static final String DETAIL = "dwellwise.accessDetail";
    /** Request attribute: the request's context while its line is still to be written. */
    private static final String PENDING = "dwellwise.accessPending";

    /** The status of an answer that did not arrive: the client closed the connection (common practice). */
    static final int NOT_DELIVERED = 499;

    private final ServiceMetrics metrics;

    AccessLog(ServiceMetrics metrics) {
        this.metrics = metrics;
    }

    /** At the start of the app's handling (after the request id is assigned). */
    void begin(Context ctx) {
        ctx.attribute(PENDING, ctx);
    }

    /** Javalin's request logger: the answer has been handed to Jetty. */
    void answered(Context ctx, float millis) {
        ctx.attribute(PENDING, null);
        try {
            write(ctx, ctx.statusCode(), millis, "");
        } finally {
            RequestIds.clear();
        }
    }

    /** Jetty's end of the dispatch: writes the line that {@link #answered} did not get to write. */
    @Override
    public void requestDestroyed(ServletRequestEvent event) {
        ServletRequest request = event.getServletRequest();
        if (!(request.getAttribute(PENDING) instanceof Context ctx)) {
            return;
        }
        request.removeAttribute(PENDING);
        String id = ctx.attribute(RequestIds.ATTRIBUTE);
        if (id != null) {
            MDC.put(RequestIds.MDC_KEY, id);
        }
        try {
            ServletContextRequest base = ServletContextRequest.getServletContextRequest(request);
            float millis = base == null ? 0 : (System.nanoTime() - base.getBeginNanoTime()) / 1e6f;
            write(ctx, NOT_DELIVERED, millis, " answer not delivered");
        } finally {
            RequestIds.clear();
        }
    }

    /** A request that Jetty refused before the app saw it (see {@link ProblemErrorHandler}). */
    void rejected(String method, int status, String id) {
        ACCESS.info("{} {} {} rejected by the HTTP layer [{}]", method, ServiceMetrics.UNMATCHED, status, id);
        metrics.recordRequest(method, ServiceMetrics.UNMATCHED, status, 0);
    }

    private void write(Context ctx, int status, float millis, String outcome) {
        String route = App.route(ctx);
        String detail = ctx.attribute(DETAIL);
        ACCESS.info("{} {} {} {}ms{}{}", ctx.method(), route == null ? ctx.path() : route, status,
                Math.round(millis), detail == null ? "" : " " + detail, outcome);
        metrics.recordRequest(ctx.method().name(), route == null ? ServiceMetrics.UNMATCHED : route,
                status, millis);
    }
}
