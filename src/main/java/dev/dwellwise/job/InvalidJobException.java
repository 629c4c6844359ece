package dev.dwellwise.job;

import java.util.List;

/** A well-formed request whose values are invalid or beyond the service's limits. */
public final class InvalidJobException extends RuntimeException {

    private final transient List<FieldError> errors;

    public InvalidJobException(List<FieldError> errors) {
        super(errors.isEmpty() ? "invalid job" : errors.get(0).field() + ": " + errors.get(0).message());
        this.errors = List.copyOf(errors);
    }

    public InvalidJobException(String field, String message) {
        this(List.of(new FieldError(field, message)));
    }

    public List<FieldError> errors() {
        return errors;
    }
}
