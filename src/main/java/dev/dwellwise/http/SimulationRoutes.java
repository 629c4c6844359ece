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
        Job job = bodies.read(body(ctx, config), Job.class);
        SimulationResult result = solver.simulate(job, "");
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

    /** The request body, after the media type and size checks (415, 413). */
    static byte[] body(Context ctx, ServiceConfig config) {
        if (!MediaTypes.isJson(ctx.contentType())) {
            throw new ApiException(ProblemType.UNSUPPORTED_MEDIA_TYPE, "send the job as application/json, not "
                    + (ctx.contentType() == null ? "a body without a Content-Type" : ctx.contentType()));
        }
        // The long form: Context.contentLength() is an int, -1 for a declared length past 2 GiB.
        long length = ctx.req().getContentLengthLong();
        if (length > config.maxBodyBytes()) {
            throw tooLarge(config);
        }
        byte[] body = ctx.bodyAsBytes();
        if (body.length > config.maxBodyBytes()) {
            throw tooLarge(config);
        }
        return body;
    }

    private static ApiException tooLarge(ServiceConfig config) {
        return new ApiException(ProblemType.BODY_TOO_LARGE, "the body is over the limit of " + config.maxBodyBytes()
                + " bytes");
    }
}
