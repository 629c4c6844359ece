package dev.dwellwise.http;

import io.javalin.http.Context;
import java.util.UUID;
import java.util.concurrent.ThreadLocalRandom;
import java.util.regex.Pattern;
import org.slf4j.MDC;

/**
 * Gives every request an id: the caller's {@code X-Request-Id} when it is a safe token (so an id
 * made upstream follows the request through the logs), else a new UUID. The id is echoed in the
 * answer, carried in problem details, and put in the logging context for every line logged while
 * the request is served; {@link #clear()} takes it out again when the request is done.
 */
final class RequestIds {

    static final String HEADER = "X-Request-Id";
    static final String ATTRIBUTE = "requestId";
    static final String MDC_KEY = "requestId";
    /** Letters, digits and a few separators: nothing that could forge a log line or a header. */
    private static final Pattern SAFE = Pattern.compile("[A-Za-z0-9._:-]{1,128}");

    private RequestIds() {
    }

    static void assign(Context ctx) {
        String id = chosen(ctx.header(HEADER));
        ctx.attribute(ATTRIBUTE, id);
        ctx.header(HEADER, id);
        MDC.put(MDC_KEY, id);
    }

    /** The caller's id when it is safe, else a fresh one. */
    static String chosen(String given) {
        return given != null && SAFE.matcher(given).matches() ? given : fresh();
    }

    /**
     * A random (version 4) UUID from the thread's own generator. An id must be unique, not secret:
     * {@code UUID.randomUUID()} takes the lock of one shared SecureRandom on every request, and from
     * time to time reads the kernel's random device while holding it.
     */
    static String fresh() {
        ThreadLocalRandom random = ThreadLocalRandom.current();
        long high = (random.nextLong() & ~0xF000L) | 0x4000L; // version 4
        long low = (random.nextLong() & ~0xC000_0000_0000_0000L) | 0x8000_0000_0000_0000L; // IETF variant
        return new UUID(high, low).toString();
    }

    static void clear() {
        MDC.remove(MDC_KEY);
    }
}
