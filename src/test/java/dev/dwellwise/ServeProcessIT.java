package dev.dwellwise;

import dev.dwellwise.http.Http;
import dev.dwellwise.http.Workloads;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.net.ConnectException;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * The packaged jar as the orchestrator runs it: started as a process, stopped with SIGTERM
 * while requests are in flight. With one worker, three long jobs
 * (each a second or more of computing) run one after another, so when the signal comes the
 * last one has at least two solves to wait for: in flight on any machine, without a sleep.
 */
@Timeout(40)
class ServeProcessIT {

    private static final int JOBS = 3;
    private static final Pattern SERVING = Pattern.compile("serving on port (\\d+)");

    private final HttpClient client = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1)
            .connectTimeout(Duration.ofSeconds(5)).build();
    private final List<String> output = new CopyOnWriteArrayList<>();
    private Process process;
    private Thread reader;
    private int port;

    @BeforeEach
    void startTheJar() throws Exception {
        Path jar = Path.of(System.getProperty("dwellwise.jar", "target/dwellwise.jar"));
        assertTrue(Files.isRegularFile(jar), jar + " is built");
        ProcessBuilder builder = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-jar", jar.toString(), "serve").redirectErrorStream(true);
        builder.environment().put("PORT", "0");
        builder.environment().put("DWELLWISE_HOST", "127.0.0.1");
        builder.environment().put("DWELLWISE_WORKER_THREADS", "1");
        builder.environment().put("DWELLWISE_QUEUE_SIZE", Integer.toString(JOBS - 1));
        builder.environment().put("DWELLWISE_SHUTDOWN_GRACE_SECONDS", "20");
        process = builder.start();
        CompletableFuture<Integer> serving = new CompletableFuture<>();
        reader = new Thread(() -> {
            try (BufferedReader lines = new BufferedReader(new InputStreamReader(process.getInputStream(),
                    StandardCharsets.UTF_8))) {
                for (String line = lines.readLine(); line != null; line = lines.readLine()) {
                    output.add(line);
                    Matcher m = SERVING.matcher(line);
                    if (m.find()) {
                        serving.complete(Integer.parseInt(m.group(1)));
                    }
                }
            } catch (IOException e) {
                serving.completeExceptionally(e);
            }
            serving.completeExceptionally(new IllegalStateException("exited before serving: " + output));
        }, "jar-output");
        reader.setDaemon(true);
        reader.start();
        port = serving.get(20, TimeUnit.SECONDS);
    }

    @AfterEach
    void killTheJarIfStillRunning() {
        if (process.isAlive()) {
            process.destroyForcibly();
        }
    }

    @Test
    void sigtermLetsEveryRequestInFlightFinishRefusesNewConnectionsAndExitsZero() throws Exception {
        assertEquals(200, get("/health/ready").statusCode());
        List<CompletableFuture<HttpResponse<String>>> inFlight = new ArrayList<>();
        for (int i = 0; i < JOBS; i++) {
            inFlight.add(client.sendAsync(HttpRequest.newBuilder(uri("/v1/simulations"))
                    .timeout(Duration.ofSeconds(25)).header("Content-Type", "application/json")
                    .POST(HttpRequest.BodyPublishers.ofString(Workloads.LONG_SOLVE)).build(), HttpResponse.BodyHandlers.ofString()));
        }
        awaitMetric("dwellwise_solves_waiting " + (JOBS - 1) + ".0");

        // SIGTERM, as kill -TERM; through the handle, since Process.destroy() also closes the output pipe.
        assertTrue(process.toHandle().destroy());
        Http.awaitConnectionsRefused(port);
        assertFalse(inFlight.stream().allMatch(CompletableFuture::isDone), "solves still run after the socket closed");

        for (CompletableFuture<HttpResponse<String>> request : inFlight) {
            HttpResponse<String> answer = request.get(20, TimeUnit.SECONDS);
            assertEquals(200, answer.statusCode(), answer.body());
            assertTrue(answer.body().startsWith("{\"verdict\":\"pass\""), answer.body());
        }
        assertTrue(process.waitFor(15, TimeUnit.SECONDS), "the process exits");
        assertEquals(0, process.exitValue(), String.join("\n", output));
        reader.join(TimeUnit.SECONDS.toMillis(5)); // the output pipe is read to its end
        assertTrue(output.stream().anyMatch(line -> line.endsWith("stopped")), String.join("\n", output));
    }

    /** Polls the metrics (bounded) until a line reads as given. */
    private void awaitMetric(String line) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
        while (!get("/metrics").body().contains("\n" + line + "\n")) {
            assertTrue(System.nanoTime() < deadline, "never saw " + line);
            Thread.sleep(10);
        }
    }


    private HttpResponse<String> get(String path) throws Exception {
        return client.send(HttpRequest.newBuilder(uri(path)).timeout(Duration.ofSeconds(5)).build(),
                HttpResponse.BodyHandlers.ofString());
    }

    private URI uri(String path) {
        return URI.create("http://127.0.0.1:" + port + path);
    }
}
