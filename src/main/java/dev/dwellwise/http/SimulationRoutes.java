package dev.dwellwise.http;

import com.fasterxml.jackson.core.JsonProcessingException;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.Limits;
import dev.dwellwise.report.SeriesCsv;
import dev.dwellwise.report.SeriesSvg;
import dev.dwellwise.report.SimulationResult;
import io.javalin.http.Context;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.TimeoutException;

/** {@code POST /v1/simulations}: a job in, the result out as JSON or, on request, the series as CSV or an SVG chart. */
final class SimulationRoutes {

    /** Request attribute: where the job sits in the body, for field paths ("" or "job."). */
    static final String JOB_PREFIX = "dwellwise.jobPrefix";

    private static final List<String> OFFERED = List.of(MediaTypes.JSON, MediaTypes.CSV, MediaTypes.SVG);

    private final Services services;
    private final Solver solver;
    private final JsonBodies bodies;
    private final ServiceConfig config;

    SimulationRoutes(Services services, Solver solver, JsonBodies bodies, ServiceConfig config) {
        this.services = services;
        this.solver = solver;
        this.bodies = bodies;
        this.config = config;
    }

    void simulate(Context ctx) throws JsonProcessingException {
        String produce = negotiate(ctx, OFFERED);
        checkBody(ctx, config);
        Job job;
        SimulationResult result;
        try (AdmissionControl.Place place = solver.admit()) {
            job = bodies.read(readBody(ctx, config), Job.class);
            result = solver.simulate(place, job, "");
        }
        ctx.attribute(AccessLog.DETAIL, Solver.accessDetail(result));
        if (!MediaTypes.JSON.equals(produce) && result.series() == null) {
            throw new ApiException(ProblemType.NOT_ACCEPTABLE, produce + " renders the series, and the job "
                    + "set output.series to false");
        }
        if (MediaTypes.CSV.equals(produce)) {
            ctx.contentType(MediaTypes.CSV + "; charset=utf-8")
                    .result(SeriesCsv.render(result.series()).getBytes(StandardCharsets.UTF_8));
            return;
        }
        if (MediaTypes.SVG.equals(produce)) {
            Limits limits = job.limits() == null ? Limits.NONE : job.limits();
            ctx.contentType(MediaTypes.SVG).result(SeriesSvg.render(result, limits).getBytes(StandardCharsets.UTF_8));
            return;
        }
        ctx.contentType(MediaTypes.JSON).result(services.mapper().writeValueAsBytes(result));
    }

    /** The media type to answer with; 406 when the client accepts none of the offered ones. */
    static String negotiate(Context ctx, List<String> offered) {
        String chosen = MediaTypes.choose(ctx.header("Accept"), offered);
        if (chosen == null) {
            throw new ApiException(ProblemType.NOT_ACCEPTABLE, "this resource answers with "
                    + String.join(" or ", offered));
        }
        return chosen;
    }

    /** What the headers say about the body, before it is read: its media type, coding and declared size (415, 413). */
    static void checkBody(Context ctx, ServiceConfig config) {
        if (!MediaTypes.isJson(ctx.contentType())) {
            throw new ApiException(ProblemType.UNSUPPORTED_MEDIA_TYPE, "send the job as application/json, not "
                    + (ctx.contentType() == null ? "a body without a Content-Type" : ctx.contentType()));
        }
        String coding = ctx.header("Content-Encoding");
        if (coding != null && !coding.isBlank() && !coding.trim().equalsIgnoreCase("identity")) {
            // RFC 9110, 15.5.16: refuse a coding the service does not decode, and say which it takes
            ctx.header("Accept-Encoding", "identity");
            throw new ApiException(ProblemType.UNSUPPORTED_MEDIA_TYPE, "send the body uncompressed, not with "
                    + "Content-Encoding " + coding.trim());
        }
        // The long form: Context.contentLength() is an int, -1 for a declared length past 2 GiB.
        long length = ctx.req().getContentLengthLong();
        if (length > config.maxBodyBytes()) {
            throw tooLarge(config);
        }
    }

    /**
     * The body, read in the request's admission place (see {@link AdmissionControl}); 413 past the
     * limit, 408 when it stalls for the idle timeout or comes slower than the minimum rate
     * ({@link BodyRateGuard}).
     */
    static byte[] readBody(Context ctx, ServiceConfig config) {
        byte[] body;
        try {
            body = ctx.bodyAsBytes();
        } catch (Exception e) { // Javalin passes on the stream's IOException undeclared
            if (timedOut(e)) {
                throw new ApiException(ProblemType.REQUEST_TIMEOUT, "the body did not arrive in time: it stalled, or "
                        + "averaged under " + HttpServerSettings.BODY_RATE.bytesPerSecond() + " bytes a second after "
                        + HttpServerSettings.BODY_RATE.graceMillis() / 1000 + " s");
            }
            throw e; // rethrown as it came: the other read failures are mapped in App
        }
        if (body.length > config.maxBodyBytes()) {
            throw tooLarge(config);
        }
        return body;
    }

    /**
     * Jetty fails a read that stalled, and {@link BodyRateGuard} one that came too slowly, with an
     * IOException caused by a TimeoutException.
     */
    private static boolean timedOut(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof TimeoutException) {
                return true;
            }
        }
        return false;
    }

    private static ApiException tooLarge(ServiceConfig config) {
        return new ApiException(ProblemType.BODY_TOO_LARGE, "the body is over the limit of " + config.maxBodyBytes()
                + " bytes");
    }
}
