package dev.dwellwise.job;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The canonical form of a job and its SHA-256: keys sorted, absent values left out, every double
 * in its shortest round-trip form (Jackson's Schubfach writer), the text as UTF-8. Two requests that
 * differ only in key order, white space or spelt-out defaults hash the same, which is what the MES
 * stores beside a release.
 *
 * <p>Why Jackson's writer and not the JDK's: JDK 17's {@code Double.toString} is not always the
 * shortest form (5e22 comes out as 4.9999999999999996E22, 2^-24 with seventeen digits) and JDK 19
 * changed it, so a hash built on it would change with the runtime. The two agree on every decimal
 * of up to six significant digits between 1e-12 and 1e16 and on random doubles of ordinary size;
 * a job holding one of the others (a pre-exponential factor of 5e22, say) hashes differently from
 * before this form was adopted.
 */
public final class CanonicalJson {

    private static final ObjectMapper MAPPER = JsonMapper.builder(JsonFactory.builder()
                    .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER).build())
            .enable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .serializationInclusion(JsonInclude.Include.NON_NULL)
            .build();

    /** Copied per hash: looking the algorithm up among the providers costs more than cloning it. */
    private static final MessageDigest SHA_256;

    static {
        try {
            SHA_256 = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    private CanonicalJson() {
    }

    public static String of(Object value) {
        try {
            return MAPPER.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a bound job always serialises", e);
        }
    }

    /**
     * SHA-256 of the canonical text's UTF-8, hex. Through a String on purpose: Jackson's byte writer
     * would escape characters beyond the Basic Multilingual Plane (an emoji in a stage name) and so
     * change the hashes the MES has stored.
     */
    public static String sha256(Object value) {
        return HexFormat.of().formatHex(newDigest().digest(of(value).getBytes(StandardCharsets.UTF_8)));
    }

    private static MessageDigest newDigest() {
        try {
            return (MessageDigest) SHA_256.clone();
        } catch (CloneNotSupportedException e) {
            try {
                return MessageDigest.getInstance("SHA-256");
            } catch (NoSuchAlgorithmException missing) {
                throw new IllegalStateException("every Java runtime has SHA-256", missing);
            }
        }
    }
}
