package dev.dwellwise.http;

import com.fasterxml.jackson.core.JsonProcessingException;
import dev.dwellwise.cure.CureComputationException;
import dev.dwellwise.job.FieldError;
import dev.dwellwise.job.InvalidJobException;
import dev.dwellwise.thermal.ComputeLimitExceededException;
import io.javalin.Javalin;
import io.javalin.config.RouterConfig;
import io.javalin.http.Context;
import io.javalin.http.Handler;
import io.javalin.http.HandlerType;
import io.javalin.http.HttpResponseException;
import io.javalin.json.JavalinJackson;
import io.javalin.router.matcher.PathParser;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.BiConsumer;
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
    /** Request attribute: the route template of a HEAD's or an OPTIONS's path, or absent. */
    private static final String ROUTE_OF_PATH = "dwellwise.routeOfPath";

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

            RouteTable table = new RouteTable(cfg.router);
            cfg.routes.before(ctx -> {
                RequestIds.assign(ctx);
                if (ctx.method() == HandlerType.HEAD || ctx.method() == HandlerType.OPTIONS) {
                    String template = table.template(ctx.path());
                    if (template != null) {
                        ctx.attribute(ROUTE_OF_PATH, template);
                    }
                }
                access.begin(ctx);
                SecurityHeaders.apply(ctx::header);
                cors.apply(ctx);
                if (ctx.method() == HandlerType.OPTIONS) {
                    String methods = table.allowed(ctx.path());
                    if (methods == null) {
                        throw new ApiException(ProblemType.NOT_FOUND, "no resource at " + ctx.path());
                    }
                    cors.options(ctx, methods);
                    ctx.skipRemainingHandlers();
                }
            });
            // After routing, so a refusal is counted under its route; a path with no route gets its
            // 404 without a token, which tells nothing that the contract does not.
            cfg.routes.beforeMatched(auth::check);

            BiConsumer<String, Handler> get = (path, handler) -> {
                cfg.routes.get(path, handler);
                table.add(HandlerType.GET, path);
            };
            BiConsumer<String, Handler> post = (path, handler) -> {
                cfg.routes.post(path, handler);
                table.add(HandlerType.POST, path);
            };
            get.accept("/health/live", ctx -> ctx.json(new Health("up")));
            get.accept("/health/ready", ctx -> ctx.json(new Health("ready")));
            get.accept("/metrics", ctx -> ctx.contentType(ServiceMetrics.CONTENT_TYPE).result(metrics.scrape()));
            get.accept("/openapi.yaml", ctx -> ctx.contentType(MediaTypes.YAML).result(services.openApi()));
            get.accept("/v1/materials", library::materials);
            get.accept("/v1/materials/{id}", library::material);
            get.accept("/v1/examples", library::examples);
            get.accept("/v1/examples/{id}", library::example);
            post.accept("/v1/simulations", simulations::simulate);
            post.accept("/v1/release-checks", releases::release);

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

    /**
     * The matched route template ({@code /v1/materials/{id}}), or null where none matched; for a HEAD
     * or an OPTIONS, the template of the path's routes.
     */
    static String route(Context ctx) {
        if (ctx.method() == HandlerType.HEAD || ctx.method() == HandlerType.OPTIONS) {
            return ctx.attribute(ROUTE_OF_PATH);
        }
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

    /**
     * The routes, matched as Javalin's router matches them, for what Javalin does not route itself:
     * it answers a HEAD from the GET route of its path without running it (so the HEAD matches no
     * route of its own), and the app answers OPTIONS before routing. This names the route a HEAD or
     * an OPTIONS stands for (for the token's open paths, the metrics and the access line) and the
     * methods a path offers (RFC 9110, 9.3.7).
     */
    private static final class RouteTable {

        private final RouterConfig router;
        /** In the order of registration: the first that matches wins, as in Javalin's router. */
        private final List<Route> routes = new CopyOnWriteArrayList<>();

        private record Route(HandlerType method, String template, PathParser parser) {
        }

        RouteTable(RouterConfig router) {
            this.router = router;
        }

        void add(HandlerType method, String template) {
            routes.add(new Route(method, template, new PathParser(template, router)));
        }

        /** The template of the first route that matches the path, or null. */
        String template(String path) {
            return routes.stream().filter(r -> r.parser().matches(path)).map(Route::template).findFirst()
                    .orElse(null);
        }

        /** The {@code Allow} value of the path (a GET brings HEAD, and OPTIONS is always there), or null for none. */
        String allowed(String path) {
            List<String> methods = new ArrayList<>();
            for (Route route : routes) {
                if (route.parser().matches(path) && !methods.contains(route.method().name())) {
                    methods.add(route.method().name());
                    if (route.method() == HandlerType.GET) {
                        methods.add(HandlerType.HEAD.name());
                    }
                }
            }
            if (methods.isEmpty()) {
                return null;
            }
            methods.add(HandlerType.OPTIONS.name());
            return String.join(", ", methods);
        }
    }

    /** The body of the health probes. */
    public record Health(String status) {
    }
}
