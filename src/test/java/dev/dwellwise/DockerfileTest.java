package dev.dwellwise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.dwellwise.http.ServiceConfig;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The image starts the jar the build makes, the same one the README starts, as a non-root user. */
class DockerfileTest {

    private static DockerfileInstructions docker;
    private static Document pom;

    @BeforeAll
    static void read() throws Exception {
        docker = DockerfileInstructions.read();
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        pom = factory.newDocumentBuilder().parse(Path.of("pom.xml").toFile());
    }

    /** The jar the build leaves: the shaded jar replaces the main artifact, named by finalName. */
    static String builtJar() {
        Element build = (Element) pom.getDocumentElement().getElementsByTagName("build").item(0);
        String finalName = build.getElementsByTagName("finalName").item(0).getTextContent().strip();
        Element shade = plugin("maven-shade-plugin");
        assertEquals(0, shade.getElementsByTagName("shadedArtifactAttached").getLength()
                + shade.getElementsByTagName("shadedClassifierName").getLength(),
                "the shaded jar must be the main artifact, not attached beside it");
        return "target/" + finalName + ".jar";
    }

    private static Element plugin(String artifactId) {
        NodeList plugins = pom.getElementsByTagName("plugin");
        for (int i = 0; i < plugins.getLength(); i++) {
            Element plugin = (Element) plugins.item(i);
            if (artifactId.equals(plugin.getElementsByTagName("artifactId").item(0).getTextContent().strip())) {
                return plugin;
            }
        }
        throw new AssertionError("no " + artifactId + " in pom.xml");
    }

    @Test
    void theShadedJarStartsMain() {
        assertEquals(Main.class.getName(),
                plugin("maven-shade-plugin").getElementsByTagName("mainClass").item(0).getTextContent().strip());
    }

    @Test
    void theImageCopiesTheBuiltJarAndStartsThatJarWithServe() throws IOException {
        String copy = docker.finalStage().stream().filter(i -> i.keyword().equals("COPY"))
                .map(DockerfileInstructions.Instruction::arguments).filter(a -> a.startsWith("--from=build "))
                .findFirst().orElseThrow(() -> new AssertionError("no COPY --from=build in the final stage"));
        String[] parts = copy.split("\\s+");
        String source = parts[1];
        String destination = parts[2];
        String buildDir = docker.all().stream().filter(i -> i.keyword().equals("WORKDIR")).findFirst()
                .orElseThrow().arguments();
        assertEquals(buildDir + "/" + builtJar(), source);

        List<String> entrypoint = execForm("ENTRYPOINT");
        int jar = entrypoint.indexOf("-jar");
        assertTrue(jar > 0, "ENTRYPOINT runs java -jar: " + entrypoint);
        assertEquals("java", entrypoint.get(0));
        assertEquals(destination, entrypoint.get(jar + 1));
        assertEquals(List.of("serve"), execForm("CMD"));
    }

    @Test
    void theReadmeStartsTheSameJar() throws IOException {
        Path readme = Path.of("README.md");
        Assumptions.assumeTrue(Files.exists(readme), "no README.md yet");
        assertTrue(Files.readString(readme).contains("java -jar " + builtJar() + " serve"),
                "README.md starts the service with java -jar " + builtJar() + " serve");
    }

    @Test
    void theBuildRunsOnAJdkAndTheImageOnAJre() {
        List<DockerfileInstructions.Instruction> stages = docker.stages();
        assertEquals(2, stages.size());
        assertTrue(stages.get(0).arguments().endsWith(" AS build"), stages.get(0).arguments());
        assertTrue(stages.get(0).arguments().contains("temurin-17"), stages.get(0).arguments());
        assertTrue(stages.get(1).arguments().matches("eclipse-temurin:17[^ ]*-jre[^ ]*"), stages.get(1).arguments());
    }

    @Test
    void theImageRunsAsANumericNonRootUser() {
        assertTrue(docker.userId() > 0, "USER " + docker.only("USER"));
    }

    @Test
    void theJvmSizesItsHeapFromTheContainerAndExitsOnOutOfMemory() throws IOException {
        List<String> entrypoint = execForm("ENTRYPOINT");
        assertTrue(entrypoint.stream().anyMatch(a -> a.startsWith("-XX:MaxRAMPercentage=")), entrypoint.toString());
        assertTrue(entrypoint.contains("-XX:+ExitOnOutOfMemoryError"), entrypoint.toString());
    }

    @Test
    void theLoadRunStartsTheJarWithTheImagesCollectorAndOutOfMemoryExit() throws IOException {
        // the load figures in the README are the image's: the script must run the JVM the same way
        List<String> jvmFlags = execForm("ENTRYPOINT").stream()
                .filter(a -> a.startsWith("-XX:+Use") || a.equals("-XX:+ExitOnOutOfMemoryError")).toList();
        assertTrue(jvmFlags.stream().anyMatch(a -> a.endsWith("GC")), "the image names its collector: " + jvmFlags);
        String script = Files.readString(Path.of("src/load/run-load.sh"));
        Matcher defaults = Pattern.compile("JAVA_OPTS=\\$\\{JAVA_OPTS:-([^}]*)}")
                .matcher(script);
        assertTrue(defaults.find(), "run-load.sh sets a JAVA_OPTS default");
        List<String> loadFlags = List.of(defaults.group(1).trim().split("\\s+"));
        assertTrue(loadFlags.containsAll(jvmFlags), "run-load.sh " + loadFlags + " vs ENTRYPOINT " + jvmFlags);
    }

    @Test
    void theExposedPortIsThePortTheServiceReadsByDefault() {
        assertEquals("PORT=" + ServiceConfig.DEFAULT_PORT, docker.only("ENV"));
        assertEquals(Integer.toString(ServiceConfig.DEFAULT_PORT), docker.only("EXPOSE"));
    }

    /** An instruction in exec form (a JSON array), which keeps java as PID 1 to receive SIGTERM. */
    private static List<String> execForm(String keyword) throws IOException {
        String arguments = docker.only(keyword);
        assertTrue(arguments.startsWith("["), keyword + " in exec form: " + arguments);
        return List.of(new ObjectMapper().readValue(arguments, String[].class));
    }
}
