package dev.dwellwise.http;

import io.javalin.http.Context;
import java.nio.ByteBuffer;
import org.eclipse.jetty.http.HttpFields;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.handler.EventsHandler;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.slf4j.MDC;

/**
 * One access line and one {@code http_server_requests} record per request that reached the app,
 * written when Jetty has completed the request, so that the line says whether the answer arrived.
 * The app's part (route, status, what the solve adds) is taken on the serving thread: from
 * Javalin's request logger ({@link #answered}), or, where Javalin skipped it because copying the
 * answer failed, once the dispatch is over. An answer whose sending failed, a client that closed the
 * connection or timed out before it was sent (its last write did not complete; a failure to read a
 * body the app never needed does not count), is logged and counted with status 499 and
 * {@code answer not delivered}, what Javalin and common practice give a client that went away:
 * its status line may have gone out as 200, but the answer did not arrive.
 *
 * <p>A Jetty handler wrapping the server's handlers. It also takes the request id out of the
 * serving thread's logging context when the dispatch is over, whichever way it ended.
 */
final class AccessLog extends EventsHandler {

    private static final Logger ACCESS = LoggerFactory.getLogger("dwellwise.access");
    /**
     * Request attribute: what the access line adds about the request's solve. One line per request,
     * written after the solve has given its worker back: a log write inside the worker's hold made
     * the other solves wait behind the log's lock (measured: a third of the throughput under load).
     */
    static final String DETAIL = "dwellwise.accessDetail";
    /** The status of an answer that did not arrive: the client went away (common practice). */
    static final int NOT_DELIVERED = 499;
    /** Request attribute: this request's {@link Entry}. */
    private static final String ENTRY = "dwellwise.accessEntry";

    private final ServiceMetrics metrics;

    AccessLog(ServiceMetrics metrics) {
        this.metrics = metrics;
    }

    /**
     * What the line says about the app's handling: filled on the serving thread, read where Jetty
     * completes the request (after the dispatch has returned, maybe on another thread). {@code taken}
     * is written last and read first, so whoever sees it set sees the rest.
     */
    private static final class Entry {
        private Context ctx;
        private volatile boolean taken;
        private String method;
        private String route;
        private String path;
        private int status;
        private String detail;
        private String requestId;
        /** The answer's last write completed: Jetty handed all of it to the connection. */
        private volatile boolean sent;

        void take(Context context) {
            method = ServiceMetrics.method(context.method().name());
            route = App.route(context);
            path = context.path();
            status = context.statusCode();
            detail = context.attribute(DETAIL);
            requestId = context.attribute(RequestIds.ATTRIBUTE);
            taken = true;
        }
    }

    @Override
    protected void onBeforeHandling(Request request) {
        request.setAttribute(ENTRY, new Entry());
    }

    /** At the start of the app's handling (after the request id is assigned). */
    void begin(Context ctx) {
        if (ctx.attribute(ENTRY) instanceof Entry entry) {
            entry.ctx = ctx;
        }
    }

    /** Javalin's request logger: the answer has been handed to Jetty. */
    void answered(Context ctx, float millis) {
        if (ctx.attribute(ENTRY) instanceof Entry entry) {
            entry.take(ctx);
        }
    }

    @Override
    protected void onAfterHandling(Request request, boolean handled, Throwable failure) {
        // the serving thread, the dispatch over: Javalin's logger may have been skipped (an asynchronous
        // route, none today, would log later and is left to do so)
        if (request.getAttribute(ENTRY) instanceof Entry entry && entry.ctx != null && !entry.taken
                && !entry.ctx.req().isAsyncStarted()) {
            entry.take(entry.ctx); // its send failed, so its last write never completes: a 499
        }
        RequestIds.clear();
    }

    @Override
    protected void onResponseWriteComplete(Request request, boolean last, ByteBuffer content, Throwable failure) {
        if (last && failure == null && request.getAttribute(ENTRY) instanceof Entry entry) {
            entry.sent = true;
        }
    }

    @Override
    protected void onComplete(Request request, int status, HttpFields headers, Throwable failure) {
        if (!(request.getAttribute(ENTRY) instanceof Entry entry) || !entry.taken) {
            return; // refused before the app saw it: ProblemErrorHandler wrote its line
        }
        int logged = entry.sent ? entry.status : NOT_DELIVERED;
        double millis = (System.nanoTime() - request.getBeginNanoTime()) / 1e6;
        // counted before the line is written: a test that has seen the line may read the count
        metrics.recordRequest(entry.method, entry.route == null ? ServiceMetrics.UNMATCHED : entry.route, logged,
                millis);
        // may run on another thread than the one that served the request
        String previous = MDC.get(RequestIds.MDC_KEY);
        if (entry.requestId != null) {
            MDC.put(RequestIds.MDC_KEY, entry.requestId);
        }
        try {
            ACCESS.info("{} {} {} {}ms{}{}", entry.method, entry.route == null ? entry.path : entry.route, logged,
                    Math.round(millis), entry.detail == null ? "" : " " + entry.detail,
                    entry.sent ? "" : " answer not delivered");
        } finally {
            if (previous == null) {
                RequestIds.clear();
            } else {
                MDC.put(RequestIds.MDC_KEY, previous);
            }
        }
    }

    /** A request that Jetty refused before the app saw it (see {@link ProblemErrorHandler}). */
    void rejected(String method, int status, String id) {
        String label = "-".equals(method) ? method : ServiceMetrics.method(method);
        ACCESS.info("{} {} {} rejected by the HTTP layer [{}]", label, ServiceMetrics.UNMATCHED, status, id);
        metrics.recordRequest(label, ServiceMetrics.UNMATCHED, status, 0);
    }
}
