package dev.dwellwise.http;

import dev.dwellwise.job.FieldError;
import java.util.List;

/** A request the HTTP layer refuses before the core sees it; answered as a problem of its type. */
final class ApiException extends RuntimeException {

    private final ProblemType type;
    private final transient List<FieldError> errors;

    ApiException(ProblemType type, String detail) {
        this(type, detail, List.of());
    }

    ApiException(ProblemType type, String detail, List<FieldError> errors) {
        super(detail);
        this.type = type;
        this.errors = List.copyOf(errors);
    }

    ProblemType type() {
        return type;
    }

    List<FieldError> errors() {
        return errors;
    }
}
