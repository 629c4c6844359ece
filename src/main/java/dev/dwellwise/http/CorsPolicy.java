package dev.dwellwise.http;

import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import java.util.List;
import java.util.Set;

/**
 * Cross-origin access for the plant dashboard: an exact allowlist of origins. An allowed origin
 * gets {@code Access-Control-Allow-Origin} naming it (never {@code *}, since requests carry a bearer
 * token); any other origin gets no CORS header at all, so the browser withholds the answer.
 * Preflights ({@code OPTIONS} with {@code Access-Control-Request-Method}) are answered here with 204,
 * before authentication: browsers send them without credentials. The methods a preflight may use
 * are those of its path.
 */
final class CorsPolicy {

    static final String ALLOWED_HEADERS = "Authorization, Content-Type, Accept, X-Request-Id";
    /** Headers a page may read from an answer besides the simple ones. */
    static final String EXPOSED_HEADERS = "X-Request-Id, Retry-After, WWW-Authenticate";
    static final String MAX_AGE_SECONDS = "600";

    private final Set<String> origins;

    CorsPolicy(List<String> origins) {
        this.origins = Set.copyOf(origins);
    }

    /** Before every request: the CORS headers of an allowed origin. */
    void apply(Context ctx) {
        if (origins.isEmpty()) {
            return;
        }
        // The answer depends on Origin whatever it is: caches must key on it.
        ctx.header("Vary", "Origin");
        String origin = ctx.header("Origin");
        if (origin == null || !origins.contains(origin)) {
            return;
        }
        ctx.header("Access-Control-Allow-Origin", origin);
        if (isPreflight(ctx)) {
            // the methods come with the answer to the OPTIONS (options), which knows the path's
            ctx.header("Access-Control-Allow-Headers", ALLOWED_HEADERS);
            ctx.header("Access-Control-Max-Age", MAX_AGE_SECONDS);
        } else {
            ctx.header("Access-Control-Expose-Headers", EXPOSED_HEADERS);
        }
    }

    /**
     * An OPTIONS on a path the service has: 204 with the path's methods ({@code Allow}, and for a
     * preflight of an allowed origin {@code Access-Control-Allow-Methods}), plus the preflight headers
     * set by {@link #apply}.
     */
    void options(Context ctx, String methods) {
        ctx.header("Allow", methods);
        if (isPreflight(ctx) && origins.contains(ctx.header("Origin"))) {
            ctx.header("Access-Control-Allow-Methods", methods);
        }
        ctx.status(204);
    }

    static boolean isPreflight(Context ctx) {
        return ctx.method() == HandlerType.OPTIONS && ctx.header("Access-Control-Request-Method") != null;
    }
}
