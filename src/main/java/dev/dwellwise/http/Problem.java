package dev.dwellwise.http;

import dev.dwellwise.job.FieldError;
import java.util.List;

/**
 * An RFC 9457 problem details answer ({@code application/problem+json}).
 *
 * @param type      a stable URI per kind of problem
 * @param title     the same for every occurrence of the type
 * @param status    the HTTP status
 * @param detail    this occurrence
 * @param instance  the request path
 * @param errors    the fields at fault, where there are any
 * @param requestId the request's id, to find it in the logs
 */
public record Problem(String type, String title, int status, String detail, String instance,
                      List<FieldError> errors, String requestId) {
}
