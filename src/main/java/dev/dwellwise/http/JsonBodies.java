package dev.dwellwise.http;

import com.fasterxml.jackson.annotation.JsonSubTypes;
import com.fasterxml.jackson.annotation.JsonTypeInfo;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.core.exc.StreamReadException;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.exc.InvalidTypeIdException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import com.fasterxml.jackson.databind.exc.PropertyBindingException;
import dev.dwellwise.job.FieldError;
import dev.dwellwise.job.WireJson;
import java.io.IOException;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Reads a request body into a record, translating Jackson's failures into problems that name the
 * field: 400 when the body is not JSON at all, 422 when it is JSON with a wrong or unknown field.
 */
final class JsonBodies {

    private final ObjectMapper mapper;

    JsonBodies(ObjectMapper mapper) {
        this.mapper = mapper;
    }

    <T> T read(byte[] body, Class<T> type) {
        if (body.length == 0) {
            throw new ApiException(ProblemType.UNREADABLE_BODY, "the request body is empty");
        }
        try {
            T value = mapper.readValue(body, type);
            if (value == null) {
                throw new ApiException(ProblemType.UNREADABLE_BODY, "the request body is JSON null");
            }
            return value;
        } catch (StreamConstraintsException e) {
            throw tooComplex();
        } catch (StreamReadException e) {
            throw malformed(e);
        } catch (PropertyBindingException e) {
            throw invalid(e, "unknown property '" + e.getPropertyName() + "'"
                    + (e.getKnownPropertyIds() == null ? "" : "; known here: " + known(e)));
        } catch (InvalidTypeIdException e) {
            throw typeId(e);
        } catch (MismatchedInputException e) {
            if (e.getPath().isEmpty()) {
                throw new ApiException(ProblemType.UNREADABLE_BODY, "the request body must be a JSON object");
            }
            throw invalid(e, "expected " + describe(e.getTargetType()));
        } catch (JsonMappingException e) {
            // Jackson wraps a syntax error met inside a nested object with the path to it: still unreadable
            if (e.getCause() instanceof StreamConstraintsException) {
                throw tooComplex();
            }
            if (e.getCause() instanceof StreamReadException cause) {
                throw malformed(cause);
            }
            throw invalid(e, "invalid value");
        } catch (JsonProcessingException e) {
            throw new ApiException(ProblemType.UNREADABLE_BODY, "malformed JSON");
        } catch (IOException e) {
            throw new ApiException(ProblemType.UNREADABLE_BODY, "the request body could not be read");
        }
    }

    /**
     * A missing or unknown type name of a polymorphic object ({@code cure.kinetics.model}): named
     * by its own field, with the names it may take.
     */
    private static ApiException typeId(InvalidTypeIdException e) {
        Class<?> base = e.getBaseType() == null ? null : e.getBaseType().getRawClass();
        JsonTypeInfo info = base == null ? null : base.getAnnotation(JsonTypeInfo.class);
        JsonSubTypes subtypes = base == null ? null : base.getAnnotation(JsonSubTypes.class);
        if (info == null || subtypes == null) {
            return invalid(e, "invalid value");
        }
        String field = WireJson.path(e.getPath()) + "." + info.property();
        String names = Arrays.stream(subtypes.value()).map(JsonSubTypes.Type::name)
                .collect(Collectors.joining(", "));
        String message = (e.getTypeId() == null ? "is required"
                : "unknown " + info.property() + " '" + e.getTypeId() + "'") + "; one of " + names;
        return new ApiException(ProblemType.INVALID_JOB, field + ": " + message,
                List.of(new FieldError(field, message)));
    }

    private static ApiException malformed(StreamReadException e) {
        return new ApiException(ProblemType.UNREADABLE_BODY, "malformed JSON"
                + (e.getLocation() == null ? "" : " at line " + e.getLocation().getLineNr() + ", column "
                + e.getLocation().getColumnNr()));
    }

    private static ApiException tooComplex() {
        return new ApiException(ProblemType.UNREADABLE_BODY, "the JSON is nested too deeply or holds a value "
                + "that is too long");
    }

    private static ApiException invalid(JsonMappingException e, String message) {
        String field = WireJson.path(e.getPath());
        return new ApiException(ProblemType.INVALID_JOB, field + ": " + message,
                List.of(new FieldError(field, message)));
    }

    private static String known(PropertyBindingException e) {
        return e.getKnownPropertyIds().stream().map(Object::toString).sorted()
                .reduce((a, b) -> a + ", " + b).orElse("");
    }

    private static String describe(Class<?> type) {
        if (type == null) {
            return "a different value";
        }
        if (type == Double.class || type == double.class) {
            return "a number";
        }
        if (type == Integer.class || type == int.class || type == Long.class) {
            return "a whole number";
        }
        if (type == Boolean.class || type == boolean.class) {
            return "true or false";
        }
        if (type == String.class) {
            return "a string";
        }
        if (List.class.isAssignableFrom(type)) {
            return "an array";
        }
        if (type.getName().endsWith("MaterialRef")) {
            return "a material id string or a material object";
        }
        return "an object";
    }
}
