package dev.dwellwise.http;

import java.util.Map;
import java.util.function.BiConsumer;

/**
 * Headers on every answer. The service answers JSON, CSV, YAML and Prometheus text, never a page:
 * nothing may be sniffed into HTML, framed, cached by a shared cache (a result is one plant's
 * release decision), or leak the URL to another site.
 */
final class SecurityHeaders {

    static final Map<String, String> HEADERS = Map.of(
            "X-Content-Type-Options", "nosniff",
            "Cache-Control", "no-store",
            "Referrer-Policy", "no-referrer",
            "Content-Security-Policy", "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'",
            "X-Frame-Options", "DENY");

    private SecurityHeaders() {
    }

    static void apply(BiConsumer<String, String> setHeader) {
        HEADERS.forEach(setHeader);
    }
}
