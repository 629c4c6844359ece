package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.List;
import java.util.Locale;

/** What no answer may show: the server, the language, a library's or the service's own class names, a stack trace. */
final class Internals {

    /** Matched without regard to case. */
    private static final List<String> WORDS = List.of("jetty", "javalin", "java.", "jakarta.", "kotlin", "exception",
            "org.eclipse", "com.fasterxml", "dev.dwellwise", "<html", "\tat ");

    private Internals() {
    }

    static void assertNone(String answer) {
        String lower = answer.toLowerCase(Locale.ROOT);
        for (String word : WORDS) {
            assertFalse(lower.contains(word), () -> "'" + word + "' in " + answer);
        }
    }
}
