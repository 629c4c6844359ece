package dev.dwellwise.http;

import java.util.Map;

/**
 * The service's settings, read once from the environment at start and frozen.
 *
 * @param host          interface to listen on ({@code DWELLWISE_HOST}, default 0.0.0.0)
 * @param port          TCP port ({@code PORT}, default 8080)
 * @param maxBodyBytes  the largest request body accepted ({@code DWELLWISE_MAX_BODY_BYTES}, default 1 MiB)
 */
public record ServiceConfig(String host, int port, long maxBodyBytes) {

    public static final int DEFAULT_PORT = 8080;
    public static final long DEFAULT_MAX_BODY_BYTES = 1024 * 1024;

    public static ServiceConfig defaults() {
        return fromEnvironment(Map.of());
    }

    public static ServiceConfig fromEnvironment(Map<String, String> env) {
        return new ServiceConfig(env.getOrDefault("DWELLWISE_HOST", "0.0.0.0"),
                intSetting(env, "PORT", DEFAULT_PORT, 0, 65_535),
                longSetting(env, "DWELLWISE_MAX_BODY_BYTES", DEFAULT_MAX_BODY_BYTES, 1024, 64L * 1024 * 1024));
    }

    public ServiceConfig withPort(int newPort) {
        return new ServiceConfig(host, newPort, maxBodyBytes);
    }

    static int intSetting(Map<String, String> env, String name, int fallback, int min, int max) {
        return (int) longSetting(env, name, fallback, min, max);
    }

    static long longSetting(Map<String, String> env, String name, long fallback, long min, long max) {
        String raw = env.get(name);
        if (raw == null || raw.isBlank()) {
            return fallback;
        }
        try {
            long value = Long.parseLong(raw.trim());
            if (value < min || value > max) {
                throw new IllegalArgumentException(name + " must be from " + min + " to " + max + ", not " + raw);
            }
            return value;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(name + " must be a whole number, not '" + raw + "'", e);
        }
    }
}
