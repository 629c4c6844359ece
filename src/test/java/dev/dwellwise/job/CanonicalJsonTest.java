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
        // JDK 17's Double.toString writes 7e22 as 7.0000000000000004E22 and 8.41e21 as 8.409999999999999E21
        // (JDK-4511638, fixed in JDK 19; from memory); the shortest forms are 7.0E22 and 8.41E21.
        assertEquals("{\"a\":7.0E22,\"b\":8.41E21,\"c\":1.2,\"d\":0.9}",
                CanonicalJson.of(Map.of("d", 0.9, "c", 1.2, "b", 8.41e21, "a", 7e22)));
    }

    @Test
    void theHashIsTheSha256OfTheCanonicalTextInUtf8() throws Exception {
        Map<String, Object> job = new TreeMap<>(Map.of("name", "cure oven \u00b0C", "airTemperatureC", 200.0,
                "stages", List.of(1.5, 2.25)));
        byte[] expected = MessageDigest.getInstance("SHA-256")
                .digest(CanonicalJson.of(job).getBytes(StandardCharsets.UTF_8));
        assertEquals(HexFormat.of().formatHex(expected), CanonicalJson.sha256(job));
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
