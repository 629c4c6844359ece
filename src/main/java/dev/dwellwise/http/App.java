package dev.dwellwise.http;

import com.fasterxml.jackson.core.JsonProcessingException;
import dev.dwellwise.cure.CureComputationException;
import dev.dwellwise.job.FieldError;
import dev.dwellwise.job.InvalidJobException;
import dev.dwellwise.thermal.ComputeLimitExceededException;
import io.javalin.Javalin;
import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import io.javalin.http.HttpResponseException;
import io.javalin.json.JavalinJackson;
import java.io.IOException;
import java.util.List;
import org.eclipse.jetty.util.thread.QueuedThreadPool;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The app factory: every route, exception mapper, the request logger and the server settings,
 * declared in one place. Returns the app unstarted; {@code Main} starts it on the configured port,
 * tests on port 0. Its {@code stop()} is graceful: it stops accepting, lets the requests in flight
 * finish within the configured grace period, then stops.
 *
 * <p>Every request passes, in order: a request id, the security headers, CORS (which answers
 * OPTIONS itself), routing, the bearer token; {@link AccessLog} writes the access line, records
 * the request's metrics and clears the id.
 */
public final class App {

    private static final Logger LOG = LoggerFactory.getLogger(App.class);

    private App() {
    }

    public static Javalin create(ServiceConfig config, Services services) {
        QueuedThreadPool httpThreads = HttpServerSettings.threadPool(config);
        ServiceMetrics metrics = new ServiceMetrics(httpThreads);
        AccessLog access = new AccessLog(metrics);
        ProblemErrorHandler jettyErrors = new ProblemErrorHandler(services.mapper(), access);
        Problems problems = new Problems(services.mapper());
        AdmissionControl admission = new AdmissionControl(config.workerThreads(), config.queueSize(),
                config.computeBudgetMillis(), metrics.registry());
        Solver solver = new Solver(services.simulator(), admission, metrics.registry());
        SimulationRoutes simulations = new SimulationRoutes(services, solver, new JsonBodies(services.mapper()),
                config);
        LibraryRoutes library = new LibraryRoutes(services);
        ReleaseRoutes releases = new ReleaseRoutes(services, solver, new JsonBodies(services.mapper()), config);
        CorsPolicy cors = new CorsPolicy(config.corsOrigins());
        BearerAuth auth = new BearerAuth(config.apiToken());
        return Javalin.create(cfg -> {
            cfg.startup.showJavalinBanner = false;
            cfg.startup.showOldJavalinVersionWarning = false;
            cfg.http.maxRequestSize = config.maxBodyBytes();
            cfg.http.defaultContentType = MediaTypes.JSON;
            cfg.http.prefer405over404 = true;
            cfg.http.compressionStrategy = HttpServerSettings.compression();
            cfg.jetty.host = config.host();
            cfg.jetty.port = config.port();
            cfg.jetty.threadPool = httpThreads;
            cfg.jetty.modifyServer(server -> HttpServerSettings.configure(server, config, jettyErrors, access));
            cfg.jetty.modifyHttpConfiguration(HttpServerSettings::configure);
            cfg.jetty.modifyServletContextHandler(context -> context.setErrorHandler(jettyErrors));
            cfg.events.serverStopped(metrics::close);
            cfg.jsonMapper(new JavalinJackson(services.mapper(), false));
            cfg.requestLogger.http(access::answered);

            cfg.routes.before(ctx -> {
                RequestIds.assign(ctx);
                access.begin(ctx);
                SecurityHeaders.apply(ctx::header);
                cors.apply(ctx);
                if (ctx.method() == HandlerType.OPTIONS) {
                    cors.options(ctx);
                    ctx.skipRemainingHandlers();
                }
            });
            // After routing, so a refusal is counted under its route; a path with no route gets its
            // 404 without a token, which tells nothing that the contract does not.
            cfg.routes.beforeMatched(auth::check);

            cfg.routes.get("/health/live", ctx -> ctx.json(new Health("up")));
            cfg.routes.get("/health/ready", ctx -> ctx.json(new Health("ready")));
            cfg.routes.get("/metrics", ctx -> ctx.contentType(ServiceMetrics.CONTENT_TYPE).result(metrics.scrape()));
            cfg.routes.get("/openapi.yaml", ctx -> ctx.contentType(MediaTypes.YAML).result(services.openApi()));
            cfg.routes.get("/v1/materials", library::materials);
            cfg.routes.get("/v1/materials/{id}", library::material);
            cfg.routes.get("/v1/examples", library::examples);
            cfg.routes.get("/v1/examples/{id}", library::example);
            cfg.routes.post("/v1/simulations", simulations::simulate);
            cfg.routes.post("/v1/release-checks", releases::release);

            cfg.routes.exception(ApiException.class, (e, ctx) -> problems.write(ctx, e.type(), e.getMessage(),
                    e.errors()));
            cfg.routes.exception(InvalidJobException.class, (e, ctx) -> problems.write(ctx, ProblemType.INVALID_JOB,
                    summary(e.errors()), e.errors()));
            cfg.routes.exception(ComputeLimitExceededException.class, (e, ctx) -> problems.write(ctx,
                    ProblemType.COMPUTE_LIMIT, e.getMessage(), List.of(new FieldError(limitField(ctx, e),
                            e.getMessage() + advice(e.limit())))));
            cfg.routes.exception(CureComputationException.class, (e, ctx) -> problems.write(ctx,
                    ProblemType.COMPUTE_LIMIT, e.getMessage(), List.of(new FieldError(jobPrefix(ctx) + "cure",
                            e.getMessage() + "; check the cure spec's parameters against the coating's data"))));
            cfg.routes.exception(HttpResponseException.class, (e, ctx) -> {
                allowHeader(e, ctx);
                problems.write(ctx, fromStatus(e.getStatus()), e.getMessage(), List.of());
            });
            // Reading the body failed under the handler: the connection ended early or the chunked
            // framing was broken. The client's fault, and nothing for an operator to look at.
            cfg.routes.exception(IOException.class, (e, ctx) -> problems.write(ctx, ProblemType.UNREADABLE_BODY,
                    "the request body could not be read: the connection ended early or its framing is broken",
                    List.of()));
            cfg.routes.exception(JsonProcessingException.class, (e, ctx) -> problems.write(ctx,
                    ProblemType.UNREADABLE_BODY, "malformed JSON", List.of()));
            cfg.routes.exception(Exception.class, (e, ctx) -> {
                LOG.error("unhandled error on {} {}", ctx.method(), ctx.path(), e);
                problems.write(ctx, ProblemType.INTERNAL, "an internal error occurred; quote the request id "
                        + "to the service's operators", List.of());
            });
            cfg.routes.error(404, ctx -> {
                if (!problems.written(ctx)) {
                    problems.write(ctx, ProblemType.NOT_FOUND, "no resource at " + ctx.path(), List.of());
                }
            });
            cfg.routes.error(405, ctx -> {
                if (!problems.written(ctx)) {
                    problems.write(ctx, ProblemType.METHOD_NOT_ALLOWED, ctx.method() + " is not allowed on "
                            + ctx.path(), List.of());
                }
            });
        });
    }

    /** The matched route template ({@code /v1/materials/{id}}), or null where none matched. */
    static String route(Context ctx) {
        try {
            io.javalin.router.Endpoint endpoint = ctx.endpoints().matchedHttpEndpoint();
            return endpoint == null ? null : endpoint.path;
        } catch (RuntimeException e) {
            return null;
        }
    }

    /** A 405 must name the methods the path offers (RFC 9110, 15.5.6); Javalin puts them in the details. */
    private static void allowHeader(HttpResponseException e, Context ctx) {
        String methods = e.getDetails().getOrDefault("availableMethods", e.getDetails().get("Available methods"));
        if (e.getStatus() == 405 && methods != null) {
            ctx.header("Allow", methods);
        }
    }

    private static String summary(List<FieldError> errors) {
        FieldError first = errors.get(0);
        return first.field() + ": " + first.message()
                + (errors.size() > 1 ? " (and " + (errors.size() - 1) + " more)" : "");
    }

    /** The JSON path of the job in this request: the job is the body, or nested under {@code job}. */
    private static String jobPrefix(Context ctx) {
        String prefix = ctx.attribute(SimulationRoutes.JOB_PREFIX);
        return prefix == null ? "" : prefix;
    }

    private static String advice(ComputeLimitExceededException.Limit limit) {
        return switch (limit) {
            case SAMPLES -> "; raise output.sampleSeconds or set output.series to false";
            case UNRESOLVED -> "; check the job for a near-massless layer or an extreme convection coefficient";
            default -> "; shorten the stages or give them smaller maxSeconds";
        };
    }

    private static String limitField(Context ctx, ComputeLimitExceededException e) {
        return jobPrefix(ctx) + (e.limit() == ComputeLimitExceededException.Limit.SAMPLES
                ? "output.sampleSeconds" : "stages");
    }

    private static ProblemType fromStatus(int status) {
        for (ProblemType type : ProblemType.values()) {
            if (type.status() == status) {
                return type;
            }
        }
        return status >= 500 ? ProblemType.INTERNAL : ProblemType.UNREADABLE_BODY;
    }

    /** The body of the health probes. */
    public record Health(String status) {
    }
}
