package org.statesum.deploy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.OperationsConfig;
import org.statesum.testing.ContractValidator;

/**
 * What can be checked of the container image and the Kubernetes manifests without a Docker engine or
 * a cluster: the manifests parse, the probes ask for paths the service serves on the port it listens
 * on, the Service and the autoscaler point at the Deployment, and the image runs the jar Maven builds.
 */
class DeploymentFilesTest {

    private static final Path KUBERNETES = Path.of("docker", "kubernetes");
    private static final Map<String, JsonNode> BY_KIND = new HashMap<>();

    @BeforeAll
    static void parse() throws IOException {
        try (Stream<Path> files = Files.list(KUBERNETES)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".yaml")).toList()) {
                JsonNode doc = new YAMLMapper().readTree(file.toFile());
                assertTrue(doc.hasNonNull("apiVersion") && doc.hasNonNull("kind"), file + " is a manifest");
                BY_KIND.put(doc.get("kind").asText(), doc);
            }
        }
    }

    private static JsonNode container() {
        return BY_KIND.get("Deployment").at("/spec/template/spec/containers/0");
    }

    private static int listeningPort() {
        for (JsonNode env : container().path("env")) {
            if (env.path("name").asText().equals("STATESUM_PORT")) {
                return Integer.parseInt(env.path("value").asText());
            }
        }
        return 8080; // ServiceConfig's default
    }

    @Test
    void everyPartOfTheDeploymentIsThere() {
        assertEquals(List.of("Deployment", "HorizontalPodAutoscaler", "PodDisruptionBudget", "Service"),
                BY_KIND.keySet().stream().sorted().toList());
    }

    @Test
    void probesAskForServedPathsOnTheListeningPort() {
        JsonNode container = container();
        int port = listeningPort();
        JsonNode ports = container.path("ports");
        for (String probe : List.of("readinessProbe", "livenessProbe", "startupProbe")) {
            JsonNode get = container.path(probe).path("httpGet");
            assertFalse(get.isMissingNode(), probe + " is an HTTP probe");
            String path = get.path("path").asText();
            assertFalse(ContractValidator.get().document().path("paths").path(path).path("get").isMissingNode(),
                    probe + " path " + path + " is a GET route of the contract");
            String portRef = get.path("port").asText();
            boolean matches = false;
            for (JsonNode p : ports) {
                matches |= (p.path("name").asText().equals(portRef) || p.path("containerPort").asText().equals(portRef))
                        && p.path("containerPort").asInt() == port;
            }
            assertTrue(matches, probe + " port " + portRef + " is the container port " + port);
        }
        assertEquals("/health/ready", container.at("/readinessProbe/httpGet/path").asText());
        assertTrue(container.at("/resources/requests").has("cpu") && container.at("/resources/requests").has("memory"));
    }

    @Test
    void theServiceTheAutoscalerAndTheBudgetSelectThePods() {
        JsonNode deployment = BY_KIND.get("Deployment");
        JsonNode labels = deployment.at("/spec/template/metadata/labels");
        BY_KIND.get("Service").at("/spec/selector").fields().forEachRemaining(e ->
                assertEquals(e.getValue(), labels.get(e.getKey()), "Service selects the pods"));
        BY_KIND.get("PodDisruptionBudget").at("/spec/selector/matchLabels").fields().forEachRemaining(e ->
                assertEquals(e.getValue(), labels.get(e.getKey()), "the budget selects the pods"));
        JsonNode target = BY_KIND.get("Service").at("/spec/ports/0/targetPort");
        assertTrue(target.asText().equals("http") || target.asInt() == listeningPort(), "Service targets the port");
        JsonNode scaled = BY_KIND.get("HorizontalPodAutoscaler").at("/spec/scaleTargetRef");
        assertEquals("Deployment", scaled.path("kind").asText());
        assertEquals(deployment.at("/metadata/name").asText(), scaled.path("name").asText());
        int grace = deployment.at("/spec/template/spec/terminationGracePeriodSeconds").asInt();
        long drainMillis = OperationsConfig.defaults().shutdownGraceMillis();
        long timeLimitMillis = OperationsConfig.defaults().timeLimitMillis();
        for (JsonNode env : container().path("env")) {
            if (env.path("name").asText().equals("STATESUM_SHUTDOWN_GRACE_MS")) {
                drainMillis = Long.parseLong(env.path("value").asText());
            }
            if (env.path("name").asText().equals("STATESUM_TIME_LIMIT_MS")) {
                timeLimitMillis = Long.parseLong(env.path("value").asText());
            }
        }
        // preStop (5 s), the drain, then the cancelled work's answers (Lifecycle.CANCEL_WAIT_MILLIS, 5 s)
        assertTrue(grace * 1000L > 5_000 + drainMillis + 5_000, "the pod's grace period covers preStop and the drain");
        assertTrue(drainMillis > timeLimitMillis, "a direct job admitted before SIGTERM can finish within the drain");
    }

    @Test
    void theImageRunsTheJarMavenBuildsAsAnUnprivilegedUser() throws IOException {
        String pom = Files.readString(Path.of("pom.xml"));
        Matcher finalName = Pattern.compile("<finalName>([^<]+)</finalName>").matcher(pom);
        assertTrue(finalName.find());
        String jar = finalName.group(1) + ".jar";
        String dockerfile = Files.readString(Path.of("docker", "Dockerfile"));
        Matcher copy = Pattern.compile("COPY --from=build\\S* (?:--chown=\\S+ )?/src/target/(\\S+) (\\S+)")
                .matcher(dockerfile);
        assertTrue(copy.find(), "the runtime stage copies the built jar");
        assertEquals(jar, copy.group(1));
        Matcher entry = Pattern.compile("ENTRYPOINT \\[(.*)]").matcher(dockerfile);
        assertTrue(entry.find());
        List<String> command = Pattern.compile("\"([^\"]*)\"").matcher(entry.group(1)).results()
                .map(m -> m.group(1)).toList();
        assertEquals("java", command.get(0));
        assertEquals(copy.group(2), command.get(command.indexOf("-jar") + 1), "the entry command runs that jar");
        assertTrue(command.stream().anyMatch(a -> a.startsWith("-XX:MaxRAMPercentage")), "heap sized from the container");
        Matcher user = Pattern.compile("(?m)^USER (\\S+)").matcher(dockerfile);
        assertTrue(user.find());
        assertNotEquals("root", user.group(1).split(":")[0]);
        assertNotEquals("0", user.group(1).split(":")[0]);
        assertTrue(dockerfile.contains("HEALTHCHECK") && dockerfile.contains("/health/live"));
        Matcher expose = Pattern.compile("(?m)^EXPOSE (\\d+)").matcher(dockerfile);
        assertTrue(expose.find());
        assertEquals(listeningPort(), Integer.parseInt(expose.group(1)), "the image exposes the port the pods use");
        assertEquals(2, Pattern.compile("(?m)^FROM ").matcher(dockerfile).results().count(), "multi-stage build");
    }
}
