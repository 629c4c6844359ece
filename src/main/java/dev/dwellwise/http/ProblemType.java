package dev.dwellwise.http;

/** The kinds of problem the service answers with: a stable type URI, a fixed title, a status. */
public enum ProblemType {
    UNREADABLE_BODY("unreadable-body", "The request body is not readable JSON", 400),
    UNAUTHORIZED("unauthorized", "A valid bearer token is required", 401),
    NOT_FOUND("not-found", "No such resource", 404),
    METHOD_NOT_ALLOWED("method-not-allowed", "Method not allowed on this resource", 405),
    NOT_ACCEPTABLE("not-acceptable", "None of the accepted media types can be produced", 406),
    REQUEST_TIMEOUT("request-timeout", "The request body did not arrive in time", 408),
    BODY_TOO_LARGE("body-too-large", "The request body is too large", 413),
    UNSUPPORTED_MEDIA_TYPE("unsupported-media-type", "The request body must be application/json", 415),
    INVALID_JOB("invalid-job", "The job is invalid", 422),
    COMPUTE_LIMIT("compute-limit", "The job is beyond the service's compute limits", 422),
    OVERLOADED("overloaded", "The service is at capacity; retry shortly", 503),
    INTERNAL("internal-error", "Internal error", 500);

    private final String slug;
    private final String title;
    private final int status;

    ProblemType(String slug, String title, int status) {
        this.slug = slug;
        this.title = title;
        this.status = status;
    }

    public String uri() {
        return "urn:dwellwise:problem:" + slug;
    }

    public String title() {
        return title;
    }

    public int status() {
        return status;
    }
}
