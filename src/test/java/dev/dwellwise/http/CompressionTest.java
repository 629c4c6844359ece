package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.Optional;
import java.util.zip.GZIPInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * Gzip only where it pays: a series or a chart for a client that accepts gzip, not a summary (see
 * {@link HttpServerSettings#GZIP_FROM_BYTES}). The JDK's client is used because it does not
 * decompress by itself, so the test sees what went over the wire.
 */
@Timeout(30)
class CompressionTest {

    /** The panel with its series sampled every second: about 35 KB of JSON. */
    private static final String SERIES = seriesEvery(1);
    private static final HttpClient CLIENT = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1)
            .connectTimeout(Duration.ofMillis(Http.TIMEOUT_MILLIS)).build();
    @RegisterExtension
    static final BundledServer SERVER = new BundledServer();

    @Test
    void aSummaryGoesPlainEvenToAClientThatAcceptsGzip() throws Exception {
        HttpResponse<byte[]> answer = post(Workloads.PANEL, "gzip");
        assertEquals(200, answer.statusCode());
        assertEquals(Optional.empty(), answer.headers().firstValue("Content-Encoding"));
        assertTrue(answer.body().length < HttpServerSettings.GZIP_FROM_BYTES, answer.body().length + " bytes");
        assertTrue(new String(answer.body(), StandardCharsets.UTF_8).startsWith("{\"verdict\""));
    }

    @Test
    void aSeriesIsGzippedForAClientThatAcceptsItAndUnpacksToThePlainAnswer() throws Exception {
        HttpResponse<byte[]> plain = post(SERIES, null);
        HttpResponse<byte[]> packed = post(SERIES, "gzip, deflate");
        assertEquals(200, plain.statusCode());
        assertEquals(200, packed.statusCode());
        assertTrue(plain.body().length > 2 * HttpServerSettings.GZIP_FROM_BYTES, plain.body().length + " bytes");
        assertEquals(Optional.empty(), plain.headers().firstValue("Content-Encoding"));
        assertEquals(Optional.of("gzip"), packed.headers().firstValue("Content-Encoding"));
        assertArrayEquals(plain.body(), gunzip(packed.body()));
        // columns of numbers compress well even at the fastest level (measured: to about a fifth)
        assertTrue(packed.body().length < plain.body().length / 3, packed.body().length + " bytes");
    }

    @Test
    void theThresholdFallsAtSixteenKibibytesOfAnswer() throws Exception {
        // series answers on both sides of the threshold, within a factor of two of it
        boolean below = false;
        boolean above = false;
        for (double sampleSeconds : new double[] {1.6, 2.0, 2.2, 2.4, 2.8, 3.5, 4.5}) {
            String job = seriesEvery(sampleSeconds);
            int size = post(job, null).body().length;
            boolean packed = post(job, "gzip").headers().firstValue("Content-Encoding").isPresent();
            assertEquals(size >= HttpServerSettings.GZIP_FROM_BYTES, packed, size + " bytes");
            below |= !packed && size >= HttpServerSettings.GZIP_FROM_BYTES / 2;
            above |= packed && size < 2 * HttpServerSettings.GZIP_FROM_BYTES;
        }
        assertTrue(below && above, "answers on both sides of the threshold");
    }

    @Test
    void aLargeCsvSeriesAndAnSvgChartAreGzippedToo() throws Exception {
        for (String type : new String[] {"text/csv", "image/svg+xml"}) {
            HttpResponse<byte[]> plain = post(seriesEvery(0.25), null, type);
            HttpResponse<byte[]> packed = post(seriesEvery(0.25), "gzip", type);
            assertEquals(200, packed.statusCode(), type);
            assertTrue(plain.body().length >= HttpServerSettings.GZIP_FROM_BYTES, type + ": " + plain.body().length);
            assertEquals(Optional.of("gzip"), packed.headers().firstValue("Content-Encoding"), type);
            assertArrayEquals(plain.body(), gunzip(packed.body()), type);
        }
    }

    private static String seriesEvery(double sampleSeconds) {
        return Workloads.PANEL.replace("\"output\": { \"series\": false }",
                "\"output\": { \"series\": true, \"sampleSeconds\": " + sampleSeconds + " }");
    }

    private static HttpResponse<byte[]> post(String job, String acceptEncoding) throws IOException, InterruptedException {
        return post(job, acceptEncoding, "application/json");
    }

    private static HttpResponse<byte[]> post(String job, String acceptEncoding, String accept)
            throws IOException, InterruptedException {
        HttpRequest.Builder request = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + SERVER.app().port() + "/v1/simulations"))
                .timeout(Duration.ofMillis(Http.TIMEOUT_MILLIS))
                .header("Content-Type", "application/json")
                .header("Accept", accept)
                .POST(HttpRequest.BodyPublishers.ofString(job));
        if (acceptEncoding != null) {
            request.header("Accept-Encoding", acceptEncoding);
        }
        return CLIENT.send(request.build(), HttpResponse.BodyHandlers.ofByteArray());
    }

    private static byte[] gunzip(byte[] packed) throws IOException {
        try (GZIPInputStream in = new GZIPInputStream(new ByteArrayInputStream(packed))) {
            return in.readAllBytes();
        }
    }
}
