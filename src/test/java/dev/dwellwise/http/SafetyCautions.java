package dev.dwellwise.http;

import static org.hamcrest.Matchers.allOf;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItem;

import java.util.List;
import org.hamcrest.Matcher;

/**
 * What an answer's cautions must say wherever a result could hurt someone: it is an estimate to
 * confirm with a measured profile, the coating supplier's data governs cure, hot parts burn (the
 * contact-temperature standard) and ovens fall under the fire codes. Read by phrase, not by the
 * whole text, so the wording can be improved without loosening the check.
 */
final class SafetyCautions {

    /** The phrases, each of which some caution carries. */
    static final List<String> PHRASES = List.of("measured part-temperature profile", "supplier's data sheet",
            "contact burns", "ISO 13732-1", "NFPA 86", "EN 1539", "local codes", "licensed practice");

    private SafetyCautions() {
    }

    /** A list of cautions in which every phrase appears. */
    @SuppressWarnings("unchecked")
    static Matcher<Iterable<? super String>> named() {
        return allOf(PHRASES.stream().map(phrase -> hasItem(containsString(phrase))).toArray(Matcher[]::new));
    }
}
