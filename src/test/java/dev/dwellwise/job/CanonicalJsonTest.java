package dev.dwellwise.job;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;

/** The canonical form that the input hash is taken of, and the hash itself. */
class CanonicalJsonTest {

    @Test
    void doublesAreWrittenInTheirShortestRoundTripForm() {
        // JDK 17's Double.toString writes 5e22 as 4.9999999999999996E22, 8.41e21 as 8.409999999999999E21
        // and 2^-24 as 5.9604644775390625E-8 (JDK-4511638, fixed in JDK 19; the outputs checked on this
        // JDK 17); the shortest forms that read back to the same doubles are these.
        assertEquals("{\"a\":5.0E22,\"b\":8.41E21,\"c\":5.960464477539063E-8,\"d\":1.2,\"e\":0.9}",
                CanonicalJson.of(Map.of("e", 0.9, "d", 1.2, "c", Math.pow(2, -24), "b", 8.41e21, "a", 5e22)));
        assertEquals(Math.pow(2, -24), Double.parseDouble("5.960464477539063E-8"));
    }

    @Test
    void textIsHashedAsItsUtf8WithCharactersBeyondTheBasicPlaneUnescaped() throws Exception {
        // U+1F525 is four UTF-8 bytes (RFC 3629, section 3), not a surrogate pair written as escapes
        Map<String, Object> stage = new TreeMap<>(Map.of("name", "cure oven \uD83D\uDD25 \u00b0C", "airTemperatureC", 200.0));
        String text = CanonicalJson.of(stage);
        assertEquals("{\"airTemperatureC\":200.0,\"name\":\"cure oven \uD83D\uDD25 \u00b0C\"}", text);
        byte[] expected = MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
        assertEquals(HexFormat.of().formatHex(expected), CanonicalJson.sha256(stage));
    }

    @Test
    void concurrentHashesOfOneValueAgree() throws Exception {
        Map<String, Object> job = Map.of("thicknessMm", 1.2, "emissivity", 0.9);
        String once = CanonicalJson.sha256(job);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Boolean>> runs = pool.invokeAll(List.of(() -> agree(job, once), () -> agree(job, once),
                    () -> agree(job, once), () -> agree(job, once)));
            for (Future<Boolean> run : runs) {
                assertEquals(true, run.get());
            }
        } finally {
            pool.shutdownNow();
        }
    }

    private static boolean agree(Object value, String hash) {
        for (int i = 0; i < 2_000; i++) {
            if (!hash.equals(CanonicalJson.sha256(value))) {
                return false;
            }
        }
        return true;
    }
}
