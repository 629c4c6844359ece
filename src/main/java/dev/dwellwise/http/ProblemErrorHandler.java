package dev.dwellwise.http;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import org.eclipse.jetty.http.HttpFields;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.http.HttpStatus;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.server.handler.ErrorHandler;
import org.eclipse.jetty.util.Callback;

/**
 * Jetty's answer to what never reaches the app (a malformed request line, oversize headers, a bad
 * URI): a problem details body of type {@code about:blank} with the status's reason phrase, the
 * security headers and a request id. Jetty's own page would name Jetty and quote the parser's
 * message; this says nothing about the internals.
 */
final class ProblemErrorHandler extends ErrorHandler {

    private final ObjectMapper mapper;
    private final AccessLog access;

    ProblemErrorHandler(ObjectMapper mapper, AccessLog access) {
        this.mapper = mapper;
        this.access = access;
    }

    /** Errors on a request that Jetty parsed but the app never saw. */
    @Override
    protected void generateResponse(Request request, Response response, int code, String message, Throwable cause,
                                    Callback callback) {
        String id = RequestIds.chosen(request.getHeaders().get(RequestIds.HEADER));
        HttpFields.Mutable headers = response.getHeaders();
        headers.put(HttpHeader.CONTENT_TYPE, MediaTypes.PROBLEM_JSON);
        headers.put(RequestIds.HEADER, id);
        SecurityHeaders.apply(headers::put);
        if (code == HttpStatus.SERVICE_UNAVAILABLE_503) {
            // Jetty's own 503 comes from a stopping server: retry, and another replica will answer.
            headers.put(HttpHeader.RETRY_AFTER, Problems.RETRY_AFTER_SECONDS);
        }
        access.rejected(request.getMethod(), code, id);
        response.write(true, ByteBuffer.wrap(body(code, id)), callback);
    }

    /** Errors found while parsing, before there is a request at all. */
    @Override
    public ByteBuffer badMessageError(int status, String reason, HttpFields.Mutable fields) {
        String id = RequestIds.chosen(null);
        fields.put(HttpHeader.CONTENT_TYPE, MediaTypes.PROBLEM_JSON);
        fields.put(RequestIds.HEADER, id);
        SecurityHeaders.apply(fields::put);
        access.rejected("-", status, id);
        return ByteBuffer.wrap(body(status, id));
    }

    private byte[] body(int status, String id) {
        String title = HttpStatus.getMessage(status);
        Problem problem = new Problem("about:blank", title, status, null, null, null, id);
        try {
            return mapper.writeValueAsBytes(problem);
        } catch (JsonProcessingException e) {
            return ("{\"type\":\"about:blank\",\"status\":" + status + "}").getBytes(StandardCharsets.UTF_8);
        }
    }
}
