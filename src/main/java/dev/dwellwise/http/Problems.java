package dev.dwellwise.http;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.dwellwise.job.FieldError;
import io.javalin.http.Context;
import java.util.List;

/** Writes problem details; the one place the error format is made. */
final class Problems {

    private static final String WRITTEN = "dwellwise.problemWritten";
    /** Seconds a client should wait after a 503: long enough for a solve slot to come free. */
    static final String RETRY_AFTER_SECONDS = "1";

    private final ObjectMapper mapper;

    Problems(ObjectMapper mapper) {
        this.mapper = mapper;
    }

    void write(Context ctx, ProblemType type, String detail, List<FieldError> errors) {
        Problem problem = new Problem(type.uri(), type.title(), type.status(), detail, ctx.path(),
                errors.isEmpty() ? null : errors, ctx.attribute(RequestIds.ATTRIBUTE));
        if (type.status() == 503) {
            ctx.header("Retry-After", RETRY_AFTER_SECONDS);
        }
        try {
            ctx.status(type.status()).contentType(MediaTypes.PROBLEM_JSON).result(mapper.writeValueAsBytes(problem));
        } catch (JsonProcessingException e) {
            ctx.status(500).contentType(MediaTypes.PROBLEM_JSON).result("{\"title\":\"Internal error\",\"status\":500}");
        }
        ctx.attribute(WRITTEN, Boolean.TRUE);
    }

    boolean written(Context ctx) {
        return Boolean.TRUE.equals(ctx.attribute(WRITTEN));
    }
}
