package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ServiceConfigTest {

    @Test
    void anEmptyEnvironmentGivesTheDocumentedDefaults() {
        ServiceConfig config = ServiceConfig.defaults();
        assertEquals("0.0.0.0", config.host());
        assertEquals(8080, config.port());
        assertEquals(Runtime.getRuntime().availableProcessors(), config.workerThreads());
        assertEquals(64, config.queueSize());
        assertEquals(1024 * 1024, config.maxBodyBytes());
        assertEquals(10_000, config.computeBudgetMillis());
        assertEquals(List.of(), config.corsOrigins());
        assertEquals(Optional.empty(), config.apiToken());
        assertEquals(20, config.shutdownGraceSeconds());
    }

    @Test
    void everyVariableIsRead() {
        ServiceConfig config = ServiceConfig.fromEnvironment(Map.of(
                "PORT", "9000", "DWELLWISE_HOST", "127.0.0.1", "DWELLWISE_WORKER_THREADS", "3",
                "DWELLWISE_QUEUE_SIZE", "0", "DWELLWISE_MAX_BODY_BYTES", "4096", "DWELLWISE_COMPUTE_BUDGET_MS", "250",
                "DWELLWISE_CORS_ORIGINS", " https://dash.plant.example , http://localhost:3000 ",
                "DWELLWISE_API_TOKEN", "s3cret-token-of-the-line", "DWELLWISE_SHUTDOWN_GRACE_SECONDS", "5"));
        assertEquals(9000, config.port());
        assertEquals("127.0.0.1", config.host());
        assertEquals(3, config.workerThreads());
        assertEquals(0, config.queueSize());
        assertEquals(4096, config.maxBodyBytes());
        assertEquals(250, config.computeBudgetMillis());
        assertEquals(List.of("https://dash.plant.example", "http://localhost:3000"), config.corsOrigins());
        assertEquals(Optional.of("s3cret-token-of-the-line"), config.apiToken());
        assertEquals(5, config.shutdownGraceSeconds());
    }

    @Test
    void aValueOutOfRangeIsRefusedNamingTheVariable() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ServiceConfig.fromEnvironment(Map.of("DWELLWISE_WORKER_THREADS", "0")));
        assertTrue(e.getMessage().startsWith("DWELLWISE_WORKER_THREADS must be from 1"), e.getMessage());
    }

    @Test
    void aNonNumberIsRefusedNamingTheVariable() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ServiceConfig.fromEnvironment(Map.of("DWELLWISE_QUEUE_SIZE", "lots")));
        assertTrue(e.getMessage().startsWith("DWELLWISE_QUEUE_SIZE must be a whole number"), e.getMessage());
    }

    @Test
    void aHostThatIsNeitherAnAddressNorAResolvableNameIsRefused() {
        // before this check, Javalin reported the failed bind as a port already in use (exit 1)
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ServiceConfig.fromEnvironment(Map.of("DWELLWISE_HOST", "not a host")));
        assertTrue(e.getMessage().startsWith("DWELLWISE_HOST must be an address"), e.getMessage());
        assertEquals("127.0.0.1", ServiceConfig.fromEnvironment(Map.of("DWELLWISE_HOST", " 127.0.0.1 ")).host());
        assertEquals("0.0.0.0", ServiceConfig.fromEnvironment(Map.of("DWELLWISE_HOST", " ")).host());
    }

    @Test
    void aLogLevelLogbackDoesNotKnowIsRefused() {
        // Logback would take it for DEBUG: a misspelt WARN floods the log
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ServiceConfig.fromEnvironment(Map.of("DWELLWISE_LOG_LEVEL", "WARNING")));
        assertTrue(e.getMessage().startsWith("DWELLWISE_LOG_LEVEL must be one of"), e.getMessage());
        for (String level : List.of("warn", "INFO", " error ", "OFF")) {
            ServiceConfig.fromEnvironment(Map.of("DWELLWISE_LOG_LEVEL", level)); // accepted, as Logback takes them
        }
    }

    @Test
    void anOriginWithAPathOrAWildcardIsRefused() {
        for (String bad : List.of("https://dash.plant.example/", "*", "dash.plant.example", "https://*.plant.example")) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> ServiceConfig.fromEnvironment(Map.of("DWELLWISE_CORS_ORIGINS", bad)), bad);
            assertTrue(e.getMessage().startsWith("DWELLWISE_CORS_ORIGINS"), e.getMessage());
        }
    }

    @Test
    void theTokenIsReadFromAMountedFileWithoutItsTrailingNewline(@TempDir Path dir) throws IOException {
        Path file = Files.writeString(dir.resolve("token"), "mounted-secret-token-0123\n");
        ServiceConfig config = ServiceConfig.fromEnvironment(Map.of("DWELLWISE_API_TOKEN_FILE", file.toString()));
        assertEquals(Optional.of("mounted-secret-token-0123"), config.apiToken());
    }

    @Test
    void aTokenAndATokenFileTogetherAreRefused(@TempDir Path dir) throws IOException {
        Path file = Files.writeString(dir.resolve("token"), "mounted-secret-token-0123");
        assertThrows(IllegalArgumentException.class, () -> ServiceConfig.fromEnvironment(Map.of(
                "DWELLWISE_API_TOKEN", "another-secret-token-456", "DWELLWISE_API_TOKEN_FILE", file.toString())));
    }

    @Test
    void aMissingTokenFileIsRefused(@TempDir Path dir) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ServiceConfig.fromEnvironment(
                Map.of("DWELLWISE_API_TOKEN_FILE", dir.resolve("absent").toString())));
        assertTrue(e.getMessage().startsWith("DWELLWISE_API_TOKEN_FILE"), e.getMessage());
    }

    @Test
    void aShortTokenIsRefusedWithoutQuotingIt() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ServiceConfig.fromEnvironment(Map.of("DWELLWISE_API_TOKEN", "short")));
        assertFalse(e.getMessage().contains("short"), e.getMessage());
    }

    @Test
    void theTokenNeverAppearsInTheTextOfTheConfig() {
        ServiceConfig config = ServiceConfig.fromEnvironment(Map.of("DWELLWISE_API_TOKEN", "s3cret-token-of-the-line"));
        assertFalse(config.toString().contains("s3cret"), config.toString());
    }

    @Test
    void misspeltVariablesWithThePrefixAreReported() {
        assertEquals(List.of("DWELLWISE_WORKERS"), ServiceConfig.unrecognised(Map.of(
                "DWELLWISE_WORKERS", "4", "DWELLWISE_QUEUE_SIZE", "8", "HOME", "/root")));
    }
}
