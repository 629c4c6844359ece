package dev.dwellwise.job;

/** One invalid value: the field's path in the request ({@code stages[1].until}) and what is wrong. */
public record FieldError(String field, String message) {
}
