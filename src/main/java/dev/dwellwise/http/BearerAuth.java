package dev.dwellwise.http;

import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Collections;
import java.util.Optional;
import java.util.Set;

/**
 * The optional bearer token (RFC 6750). When configured, every request needs
 * {@code Authorization: Bearer <token>} except the probes and the metrics scrape (the orchestrator
 * and Prometheus carry no token, and neither answer holds plant data), the contract (the same file
 * as in the repository) and OPTIONS (browsers send preflights without credentials). A refusal is a
 * 401 problem with {@code WWW-Authenticate}.
 */
final class BearerAuth {

    static final Set<String> OPEN_PATHS = Set.of("/health/live", "/health/ready", "/metrics", "/openapi.yaml");
    private static final String CHALLENGE = "Bearer realm=\"dwellwise\"";

    /** SHA-256 of the token: comparing digests takes the same time whatever the given token's length. */
    private final Optional<byte[]> expectedDigest;

    BearerAuth(Optional<String> token) {
        this.expectedDigest = token.map(BearerAuth::digest);
    }

    /**
     * Before every routed request: refuses it unless authentication is off, the matched route is
     * open, or the token matches. The route, not the raw path, decides: {@code /metrics/} reaches
     * the same handler as {@code /metrics}.
     */
    void check(Context ctx) {
        String route = App.route(ctx);
        if (expectedDigest.isEmpty() || ctx.method() == HandlerType.OPTIONS
                || route != null && OPEN_PATHS.contains(route)) {
            return;
        }
        if (Collections.list(ctx.req().getHeaders("Authorization")).size() > 1) {
            // which one would count is the server's guess: refuse rather than pick (RFC 6750, 3.1)
            ctx.header("WWW-Authenticate", CHALLENGE + ", error=\"invalid_request\"");
            throw new ApiException(ProblemType.UNAUTHORIZED, "send one Authorization header, not several");
        }
        String header = ctx.header("Authorization");
        if (header == null || !header.regionMatches(true, 0, "Bearer ", 0, 7)) {
            ctx.header("WWW-Authenticate", CHALLENGE);
            throw new ApiException(ProblemType.UNAUTHORIZED, "send the service's token as Authorization: Bearer <token>");
        }
        byte[] given = digest(header.substring(7).trim());
        if (!MessageDigest.isEqual(expectedDigest.get(), given)) {
            ctx.header("WWW-Authenticate", CHALLENGE + ", error=\"invalid_token\"");
            throw new ApiException(ProblemType.UNAUTHORIZED, "the bearer token is not valid");
        }
    }

    private static byte[] digest(String token) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(token.getBytes(StandardCharsets.UTF_8));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every JVM has SHA-256", e);
        }
    }
}
