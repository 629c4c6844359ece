package dev.dwellwise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dev.dwellwise.http.App;
import dev.dwellwise.http.ServiceConfig;
import dev.dwellwise.http.Services;
import io.javalin.Javalin;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** The manifests in k8s/ agree with each other and with what the service reads and serves. */
class KubernetesManifestsTest {

    private static final Path DIR = Path.of("k8s");
    private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory());
    private static final Set<String> SECRET_SETTINGS = Set.of(ServiceConfig.API_TOKEN, ServiceConfig.API_TOKEN_FILE);

    private static Map<String, JsonNode> byKind;
    private static JsonNode container;
    private static Map<String, String> configMap;

    @BeforeAll
    static void read() throws IOException {
        byKind = new HashMap<>();
        try (Stream<Path> files = Files.list(DIR)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".yaml")).toList()) {
                JsonNode manifest = YAML.readTree(file.toFile());
                byKind.put(manifest.path("kind").asText(), manifest);
            }
        }
        JsonNode containers = byKind.get("Deployment").at("/spec/template/spec/containers");
        assertEquals(1, containers.size());
        container = containers.get(0);
        configMap = new HashMap<>();
        byKind.get("ConfigMap").path("data").fields().forEachRemaining(e -> configMap.put(e.getKey(),
                e.getValue().asText()));
    }

    @Test
    void theKustomizationListsEveryManifestAndNothingElse() throws IOException {
        Set<String> listed = new TreeSet<>();
        byKind.get("Kustomization").path("resources").forEach(r -> listed.add(r.asText()));
        Set<String> present = new TreeSet<>();
        try (Stream<Path> files = Files.list(DIR)) {
            files.map(f -> f.getFileName().toString()).filter(n -> n.endsWith(".yaml"))
                    .filter(n -> !n.equals("kustomization.yaml")).forEach(present::add);
        }
        assertEquals(present, listed);
        assertEquals(Set.of("ConfigMap", "Deployment", "Service", "HorizontalPodAutoscaler", "PodDisruptionBudget",
                "Kustomization"), byKind.keySet());
    }

    @Test
    void theConfigMapCarriesEverySettingTheServiceReadsExceptTheSecretOnes() {
        Set<String> expected = new TreeSet<>(ServiceConfig.VARIABLES);
        expected.removeAll(SECRET_SETTINGS);
        assertEquals(expected, new TreeSet<>(configMap.keySet()));
    }

    @Test
    void theConfigMapIsAValidConfiguration() {
        ServiceConfig config = ServiceConfig.fromEnvironment(configMap);
        assertEquals(containerPort(), config.port());
    }

    @Test
    void theContainerEnvironmentNamesOnlySettingsTheServiceReadsAndTakesTheTokenFromASecret() {
        JsonNode env = container.path("env");
        for (JsonNode variable : env) {
            String name = variable.path("name").asText();
            assertTrue(ServiceConfig.VARIABLES.contains(name), name);
            if (SECRET_SETTINGS.contains(name)) {
                assertTrue(variable.has("valueFrom") && !variable.has("value"), name + " comes from a Secret");
            }
        }
        assertEquals("dwellwise-config", container.at("/envFrom/0/configMapRef/name").asText());
        assertEquals(byKind.get("ConfigMap").at("/metadata/name").asText(),
                container.at("/envFrom/0/configMapRef/name").asText());
    }

    @Test
    @Timeout(20)
    void theProbePathsAreServedOnTheConfiguredPortWithoutTheToken() throws Exception {
        Map<String, String> env = new HashMap<>(configMap);
        env.put(ServiceConfig.PORT, "0");
        env.put(ServiceConfig.HOST, "127.0.0.1");
        env.put(ServiceConfig.API_TOKEN, "probe-test-token-0123456789");
        ServiceConfig config = ServiceConfig.fromEnvironment(env);
        Javalin app = App.create(config, Services.bundled(config)).start();
        try {
            HttpClient client = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
            for (String probe : List.of("startupProbe", "livenessProbe", "readinessProbe")) {
                JsonNode get = container.path(probe).path("httpGet");
                assertEquals("http", get.path("port").asText(), probe + " uses the named port");
                HttpResponse<Void> answer = client.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:"
                        + app.port() + get.path("path").asText())).timeout(Duration.ofSeconds(5)).build(),
                        HttpResponse.BodyHandlers.discarding());
                assertEquals(200, answer.statusCode(), probe + " " + get.path("path").asText());
            }
        } finally {
            app.stop();
        }
        assertEquals("/health/live", container.at("/livenessProbe/httpGet/path").asText());
        assertEquals("/health/ready", container.at("/readinessProbe/httpGet/path").asText());
    }

    @Test
    void theContainerPortIsTheConfiguredPortAndPrometheusScrapesIt() {
        assertEquals("http", container.at("/ports/0/name").asText());
        assertEquals(Integer.parseInt(configMap.get(ServiceConfig.PORT)), containerPort());
        JsonNode annotations = byKind.get("Deployment").at("/spec/template/metadata/annotations");
        assertEquals("/metrics", annotations.path("prometheus.io/path").asText());
        assertEquals(Integer.toString(containerPort()), annotations.path("prometheus.io/port").asText());
    }

    @Test
    void thePodOutlivesThePreStopPauseAndTheServicesOwnGracePeriod() {
        JsonNode command = container.at("/lifecycle/preStop/exec/command");
        assertEquals("sleep", command.get(0).asText());
        int preStop = command.get(1).asInt();
        assertTrue(preStop > 0);
        int stop = ServiceConfig.fromEnvironment(configMap).longestStopSeconds();
        int pod = byKind.get("Deployment").at("/spec/template/spec/terminationGracePeriodSeconds").asInt();
        assertTrue(pod > preStop + stop, pod + " s must exceed " + preStop + " + " + stop + " s");
    }

    @Test
    void theContainerHasRequestsAndLimitsAndNoMoreWorkersThanCpus() {
        JsonNode resources = container.path("resources");
        for (String kind : List.of("requests", "limits")) {
            assertFalse(resources.at("/" + kind + "/cpu").asText().isEmpty(), kind + ".cpu");
            assertFalse(resources.at("/" + kind + "/memory").asText().isEmpty(), kind + ".memory");
        }
        double cpus = Double.parseDouble(resources.at("/limits/cpu").asText());
        assertTrue(Integer.parseInt(configMap.get(ServiceConfig.WORKER_THREADS)) <= cpus);
    }

    @Test
    void theContainerRunsAsTheImagesNonRootUserOnAReadOnlyRootWithAWritableTmp() throws IOException {
        JsonNode pod = byKind.get("Deployment").at("/spec/template/spec");
        assertTrue(pod.at("/securityContext/runAsNonRoot").asBoolean());
        assertEquals(DockerfileInstructions.read().userId(), pod.at("/securityContext/runAsUser").asLong());
        JsonNode security = container.path("securityContext");
        assertTrue(security.path("readOnlyRootFilesystem").asBoolean());
        assertFalse(security.path("allowPrivilegeEscalation").asBoolean(true));
        assertEquals("ALL", security.at("/capabilities/drop/0").asText());
        String tmpVolume = null;
        for (JsonNode mount : container.path("volumeMounts")) {
            if (mount.path("mountPath").asText().equals("/tmp")) {
                tmpVolume = mount.path("name").asText();
            }
        }
        assertTrue(tmpVolume != null, "/tmp is mounted");
        boolean emptyDir = false;
        for (JsonNode volume : pod.path("volumes")) {
            emptyDir |= volume.path("name").asText().equals(tmpVolume) && volume.has("emptyDir");
        }
        assertTrue(emptyDir, "/tmp is an emptyDir");
    }

    @Test
    void theServiceHpaAndPdbSelectTheDeploymentsPods() {
        JsonNode deployment = byKind.get("Deployment");
        JsonNode podLabels = deployment.at("/spec/template/metadata/labels");
        assertLabelsMatch(deployment.at("/spec/selector/matchLabels"), podLabels);
        assertLabelsMatch(byKind.get("Service").at("/spec/selector"), podLabels);
        assertLabelsMatch(byKind.get("PodDisruptionBudget").at("/spec/selector/matchLabels"), podLabels);
        assertEquals(container.at("/ports/0/name").asText(), byKind.get("Service").at("/spec/ports/0/targetPort").asText());

        JsonNode hpa = byKind.get("HorizontalPodAutoscaler");
        assertEquals("autoscaling/v2", hpa.path("apiVersion").asText());
        assertEquals("Deployment", hpa.at("/spec/scaleTargetRef/kind").asText());
        assertEquals(deployment.at("/metadata/name").asText(), hpa.at("/spec/scaleTargetRef/name").asText());
        assertEquals("cpu", hpa.at("/spec/metrics/0/resource/name").asText());
        assertEquals("policy/v1", byKind.get("PodDisruptionBudget").path("apiVersion").asText());
    }

    private static void assertLabelsMatch(JsonNode selector, JsonNode labels) {
        assertTrue(selector.size() > 0, "an empty selector selects everything");
        Set<String> missing = new HashSet<>();
        selector.fields().forEachRemaining(e -> {
            if (!e.getValue().asText().equals(labels.path(e.getKey()).asText())) {
                missing.add(e.getKey());
            }
        });
        assertEquals(Set.of(), missing);
    }

    private static int containerPort() {
        return container.at("/ports/0/containerPort").asInt();
    }
}
