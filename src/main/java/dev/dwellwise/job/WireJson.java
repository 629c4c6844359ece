package dev.dwellwise.job;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.cfg.CoercionAction;
import com.fasterxml.jackson.databind.cfg.CoercionInputShape;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.type.LogicalType;
import java.util.List;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.StreamWriteFeature;

/**
 * The one JSON mapper of the wire. Strict on input, because a release decision must never rest on
 * a misread field: unknown properties, trailing content, numbers sent as strings, fractions for
 * integers and duplicate keys are all refused. Absent fields are left out of answers.
 */
public final class WireJson {

    private WireJson() {
    }

    public static ObjectMapper create() {
        JsonFactory factory = JsonFactory.builder()
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxNestingDepth(64).maxNumberLength(64).maxStringLength(100_000).build())
                .disable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
                // Jackson's own exact shortest-digit conversions (Schubfach, FastDoubleParser): the
                // JDK 17 ones cost more than the rest of writing an answer
                .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
                .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
                .build();
        ObjectMapper mapper = JsonMapper.builder(factory)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .enable(DeserializationFeature.FAIL_ON_READING_DUP_TREE_KEY)
                .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS)
                .serializationInclusion(JsonInclude.Include.NON_NULL)
                .build();
        for (LogicalType type : new LogicalType[] {LogicalType.Float, LogicalType.Integer, LogicalType.Boolean}) {
            mapper.coercionConfigFor(type).setCoercion(CoercionInputShape.String, CoercionAction.Fail);
            mapper.coercionConfigFor(type).setCoercion(CoercionInputShape.EmptyString, CoercionAction.Fail);
        }
        mapper.coercionConfigFor(LogicalType.Boolean).setCoercion(CoercionInputShape.Integer, CoercionAction.Fail);
        mapper.coercionConfigFor(LogicalType.Textual).setCoercion(CoercionInputShape.Integer, CoercionAction.Fail);
        mapper.coercionConfigFor(LogicalType.Textual).setCoercion(CoercionInputShape.Float, CoercionAction.Fail);
        mapper.coercionConfigFor(LogicalType.Textual).setCoercion(CoercionInputShape.Boolean, CoercionAction.Fail);
        return mapper;
    }

    /** Jackson's reference path as the contract writes it: {@code stages[2].until.seconds}. */
    public static String path(List<JsonMappingException.Reference> refs) {
        StringBuilder out = new StringBuilder();
        for (JsonMappingException.Reference ref : refs) {
            if (ref.getFieldName() != null) {
                if (out.length() > 0) {
                    out.append('.');
                }
                out.append(ref.getFieldName());
            } else if (ref.getIndex() >= 0) {
                out.append('[').append(ref.getIndex()).append(']');
            }
        }
        return out.length() == 0 ? "body" : out.toString();
    }

}
