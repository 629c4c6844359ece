package dev.dwellwise.http;

import java.util.List;
import java.util.Locale;

/** Content negotiation on the Accept header, with q-values, for the few types the service offers. */
final class MediaTypes {

    static final String JSON = "application/json";
    static final String PROBLEM_JSON = "application/problem+json";
    static final String CSV = "text/csv";
    static final String YAML = "application/yaml";
    static final String SVG = "image/svg+xml";

    private MediaTypes() {
    }

    /**
     * The offered type the client accepts most (ties go to the first offered); null when it accepts
     * none. A missing Accept header accepts everything.
     */
    static String choose(String accept, List<String> offered) {
        if (accept == null || accept.isBlank()) {
            return offered.get(0);
        }
        String best = null;
        double bestQ = 0;
        for (String candidate : offered) {
            double q = quality(accept, candidate);
            if (q > bestQ) {
                best = candidate;
                bestQ = q;
            }
        }
        return best;
    }

    /** The q-value the Accept header gives a type; the most specific matching range decides. */
    private static double quality(String accept, String type) {
        String major = type.substring(0, type.indexOf('/'));
        double q = 0;
        int specificity = -1;
        for (String part : accept.split(",")) {
            String[] pieces = part.split(";", -1); // never empty, even for a lone ";"
            String range = pieces[0].trim().toLowerCase(Locale.ROOT);
            int s;
            if (range.equals(type)) {
                s = 2;
            } else if (range.equals(major + "/*")) {
                s = 1;
            } else if (range.equals("*/*")) {
                s = 0;
            } else {
                continue;
            }
            if (s > specificity) {
                specificity = s;
                q = qValue(pieces);
            }
        }
        return q;
    }

    /** The weight (RFC 9110, 12.4.2): its name in any case, a value outside 0 to 1 taken to the nearer end. */
    private static double qValue(String[] pieces) {
        for (int i = 1; i < pieces.length; i++) {
            String p = pieces[i].trim();
            if (p.regionMatches(true, 0, "q=", 0, 2)) {
                try {
                    double q = Double.parseDouble(p.substring(2));
                    return Double.isNaN(q) ? 0 : Math.min(1, Math.max(0, q));
                } catch (NumberFormatException e) {
                    return 0;
                }
            }
        }
        return 1;
    }

    /** Whether a Content-Type header names JSON (application/json or any +json type). */
    static boolean isJson(String contentType) {
        if (contentType == null) {
            return false;
        }
        int parameters = contentType.indexOf(';');
        String base = (parameters < 0 ? contentType : contentType.substring(0, parameters)).trim()
                .toLowerCase(Locale.ROOT);
        return base.equals(JSON) || (base.startsWith("application/") && base.endsWith("+json"));
    }
}
