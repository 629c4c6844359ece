package dev.dwellwise.http;

import dev.dwellwise.thermal.ComputeBudget;
import java.io.IOException;
import java.net.InetAddress;
import java.net.UnknownHostException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * The service's settings, read once from the environment at start, validated, and frozen. A bad
 * value stops the start with a message that names the variable.
 *
 * @param host                 interface to listen on ({@value #HOST}, default 0.0.0.0)
 * @param port                 TCP port ({@value #PORT}, default 8080; 0 picks a free one)
 * @param workerThreads        solves computed at once ({@value #WORKER_THREADS}, default: the CPUs the JVM sees)
 * @param queueSize            solves that may wait for a worker; beyond that, 503 ({@value #QUEUE_SIZE}, default 64)
 * @param maxBodyBytes         the largest request body accepted ({@value #MAX_BODY_BYTES}, default 1 MiB)
 * @param computeBudgetMillis  wall-clock milliseconds one solve may take ({@value #COMPUTE_BUDGET_MS}, default 10 s)
 * @param corsOrigins          browser origins allowed to call the API ({@value #CORS_ORIGINS}, comma-separated, default none)
 * @param apiToken             bearer token required on the API ({@value #API_TOKEN} or a file named by
 *                             {@value #API_TOKEN_FILE}; default none: no authentication)
 * @param shutdownGraceSeconds how long a stop waits for requests in flight ({@value #SHUTDOWN_GRACE_SECONDS}, default 20)
 */
public record ServiceConfig(String host, int port, int workerThreads, int queueSize, long maxBodyBytes,
                            long computeBudgetMillis, List<String> corsOrigins, Optional<String> apiToken,
                            int shutdownGraceSeconds) {

    public static final String PORT = "PORT";
    public static final String HOST = "DWELLWISE_HOST";
    public static final String WORKER_THREADS = "DWELLWISE_WORKER_THREADS";
    public static final String QUEUE_SIZE = "DWELLWISE_QUEUE_SIZE";
    public static final String MAX_BODY_BYTES = "DWELLWISE_MAX_BODY_BYTES";
    public static final String COMPUTE_BUDGET_MS = "DWELLWISE_COMPUTE_BUDGET_MS";
    public static final String CORS_ORIGINS = "DWELLWISE_CORS_ORIGINS";
    public static final String API_TOKEN = "DWELLWISE_API_TOKEN";
    public static final String API_TOKEN_FILE = "DWELLWISE_API_TOKEN_FILE";
    public static final String SHUTDOWN_GRACE_SECONDS = "DWELLWISE_SHUTDOWN_GRACE_SECONDS";
    /** Read by {@code logback.xml}, not here; listed so that deployments may set it. */
    public static final String LOG_LEVEL = "DWELLWISE_LOG_LEVEL";

    /** Every environment variable the service understands. */
    public static final List<String> VARIABLES = List.of(PORT, HOST, WORKER_THREADS, QUEUE_SIZE, MAX_BODY_BYTES,
            COMPUTE_BUDGET_MS, CORS_ORIGINS, API_TOKEN, API_TOKEN_FILE, SHUTDOWN_GRACE_SECONDS, LOG_LEVEL);

    public static final int DEFAULT_PORT = 8080;
    public static final int DEFAULT_QUEUE_SIZE = 64;
    public static final long DEFAULT_MAX_BODY_BYTES = 1024 * 1024;
    public static final int DEFAULT_SHUTDOWN_GRACE_SECONDS = 20;

    private static final String DEFAULT_HOST = "0.0.0.0";
    /** The levels Logback knows by name. */
    private static final List<String> LOG_LEVELS = List.of("ALL", "TRACE", "DEBUG", "INFO", "WARN", "ERROR", "OFF");
    private static final int MIN_TOKEN_LENGTH = 16;
    /** RFC 6750 b64token: what may follow "Bearer " in an Authorization header. */
    private static final Pattern TOKEN = Pattern.compile("[A-Za-z0-9\\-._~+/]+=*");
    /** scheme://host[:port], as a browser sends it in Origin: no path, no trailing slash. */
    private static final Pattern ORIGIN = Pattern.compile("https?://(\\[[0-9a-f:.]+\\]|[a-z0-9.-]+)(:[0-9]{1,5})?");

    public ServiceConfig {
        corsOrigins = List.copyOf(corsOrigins);
    }

    /** The settings with every variable at its default. */
    public static ServiceConfig defaults() {
        return fromEnvironment(Map.of());
    }

    public static ServiceConfig fromEnvironment(Map<String, String> env) {
        checkLogLevel(env.get(LOG_LEVEL));
        return new ServiceConfig(host(env.get(HOST)),
                intSetting(env, PORT, DEFAULT_PORT, 0, 65_535),
                intSetting(env, WORKER_THREADS, Runtime.getRuntime().availableProcessors(), 1, 256),
                intSetting(env, QUEUE_SIZE, DEFAULT_QUEUE_SIZE, 0, 10_000),
                longSetting(env, MAX_BODY_BYTES, DEFAULT_MAX_BODY_BYTES, 1024, 64L * 1024 * 1024),
                longSetting(env, COMPUTE_BUDGET_MS, ComputeBudget.DEFAULT_MAX_MILLIS, 1, 600_000),
                origins(env.get(CORS_ORIGINS)),
                token(env),
                intSetting(env, SHUTDOWN_GRACE_SECONDS, DEFAULT_SHUTDOWN_GRACE_SECONDS, 1, 3_600));
    }

    /** Variables with the service's prefix that it does not know: most likely misspelt. */
    public static List<String> unrecognised(Map<String, String> env) {
        return env.keySet().stream().filter(name -> name.startsWith("DWELLWISE_") && !VARIABLES.contains(name))
                .sorted().toList();
    }

    public ServiceConfig withPort(int newPort) {
        if (newPort < 0 || newPort > 65_535) {
            throw new IllegalArgumentException("the port must be from 0 to 65535, not " + newPort);
        }
        return new ServiceConfig(host, newPort, workerThreads, queueSize, maxBodyBytes, computeBudgetMillis,
                corsOrigins, apiToken, shutdownGraceSeconds);
    }

    /**
     * The longest a stop can take: the grace period for the requests in flight, then at least a
     * second more for the HTTP threads still busy. The orchestrator's grace period must exceed it.
     */
    public int longestStopSeconds() {
        return shutdownGraceSeconds + (HttpServerSettings.POOL_STOP_MIN_MILLIS + 999) / 1000;
    }

    /** Never prints the token. */
    @Override
    public String toString() {
        return "ServiceConfig[host=" + host + ", port=" + port + ", workerThreads=" + workerThreads + ", queueSize="
                + queueSize + ", maxBodyBytes=" + maxBodyBytes + ", computeBudgetMillis=" + computeBudgetMillis
                + ", corsOrigins=" + corsOrigins + ", apiToken=" + (apiToken.isPresent() ? "(set)" : "(none)")
                + ", shutdownGraceSeconds=" + shutdownGraceSeconds + "]";
    }

    static int intSetting(Map<String, String> env, String name, int fallback, int min, int max) {
        return (int) longSetting(env, name, fallback, min, max);
    }

    static long longSetting(Map<String, String> env, String name, long fallback, long min, long max) {
        String raw = env.get(name);
        if (raw == null || raw.isBlank()) {
            return fallback;
        }
        long value;
        try {
            value = Long.parseLong(raw.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(name + " must be a whole number, not '" + raw + "'", e);
        }
        if (value < min || value > max) {
            throw new IllegalArgumentException(name + " must be from " + min + " to " + max + ", not " + raw);
        }
        return value;
    }

    /**
     * An address, or a name this machine resolves. Checked here because an unresolvable one would
     * fail the start later, where Javalin reports every failure to bind as a port already in use.
     */
    private static String host(String raw) {
        if (raw == null || raw.isBlank()) {
            return DEFAULT_HOST;
        }
        String host = raw.trim();
        try {
            InetAddress.getByName(host);
        } catch (UnknownHostException e) {
            throw new IllegalArgumentException(HOST + " must be an address or a name this machine resolves, not '"
                    + raw + "'", e);
        }
        return host;
    }

    /**
     * Logback reads the level itself (logback.xml) and takes a word it does not know for DEBUG: a
     * misspelt WARN would flood the log instead of quieting it.
     */
    private static void checkLogLevel(String raw) {
        if (raw != null && !raw.isBlank() && !LOG_LEVELS.contains(raw.trim().toUpperCase(Locale.ROOT))) {
            throw new IllegalArgumentException(LOG_LEVEL + " must be one of " + String.join(", ", LOG_LEVELS)
                    + ", not '" + raw + "'");
        }
    }

    private static List<String> origins(String raw) {
        List<String> origins = new ArrayList<>();
        if (raw == null) {
            return origins;
        }
        for (String part : raw.split(",")) {
            String origin = part.trim().toLowerCase(Locale.ROOT);
            if (origin.isEmpty()) {
                continue;
            }
            if (!ORIGIN.matcher(origin).matches()) {
                throw new IllegalArgumentException(CORS_ORIGINS + " takes exact origins such as "
                        + "https://dashboard.plant.example or http://localhost:3000 (no path, no wildcard), "
                        + "separated by commas; not '" + part.trim() + "'");
            }
            origins.add(origin);
        }
        return origins;
    }

    private static Optional<String> token(Map<String, String> env) {
        String direct = env.get(API_TOKEN);
        String file = env.get(API_TOKEN_FILE);
        boolean hasDirect = direct != null && !direct.isBlank();
        boolean hasFile = file != null && !file.isBlank();
        if (hasDirect && hasFile) {
            throw new IllegalArgumentException("set " + API_TOKEN + " or " + API_TOKEN_FILE + ", not both");
        }
        if (!hasDirect && !hasFile) {
            return Optional.empty();
        }
        String source = hasDirect ? API_TOKEN : API_TOKEN_FILE + " (" + file.trim() + ")";
        String token = hasDirect ? direct.trim() : readTokenFile(file.trim());
        if (token.length() < MIN_TOKEN_LENGTH || !TOKEN.matcher(token).matches()) {
            throw new IllegalArgumentException("the token from " + source + " must be at least " + MIN_TOKEN_LENGTH
                    + " characters of A-Z a-z 0-9 - . _ ~ + / (optionally ending in =)");
        }
        return Optional.of(token);
    }

    private static String readTokenFile(String file) {
        try {
            // A mounted secret often ends with a newline: the token is the trimmed content.
            return Files.readString(Path.of(file), StandardCharsets.UTF_8).trim();
        } catch (IOException | RuntimeException e) {
            throw new IllegalArgumentException(API_TOKEN_FILE + " names a file that cannot be read: " + file, e);
        }
    }
}
