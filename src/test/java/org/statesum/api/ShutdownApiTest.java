package org.statesum.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.Javalin;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.statesum.api.batch.BatchController;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.JsonSupport;
import org.statesum.api.request.ProblemMapper;
import org.statesum.api.server.BodyReader;
import org.statesum.api.server.ComputeRoutes;
import org.statesum.api.server.Operations;
import org.statesum.engine.Cancellation;
import org.statesum.testing.OpsFixtures;

/**
 * Stopping with work that outlasts the grace period: at the grace deadline the work is cancelled, so a
 * direct request gets a whole 503 {@code shutting-down} answer (status line, Retry-After, problem), and
 * a batch answers a line for every job, the unfinished ones as 503 problems, in a stream that ends
 * properly. The endpoint {@code /v1/endless} computes until it is told to stop.
 */
class ShutdownApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final long GRACE_MILLIS = 600;
    private Javalin app;
    private final HttpClient client = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();

    @BeforeEach
    void start() {
        ServiceConfig defaults = ServiceConfig.defaults();
        ServiceConfig config = defaults.withPort(0).withOperations(defaults.operations()
                .withConcurrency(2, 8, 2_000).withBatchParallelism(2).withShutdownGrace(GRACE_MILLIS));
        ObjectMapper mapper = JsonSupport.mapper(config);
        ProblemMapper problems = new ProblemMapper(mapper);
        BodyReader bodies = new BodyReader(mapper, config);
        Operations operations = new Operations(config, mapper, bodies, problems);
        ComputeRoutes routes = new ComputeRoutes()
                .add("/v1/spectrum", App.endpoint(config, "/v1/spectrum"))
                .add("/v1/endless", body -> {
                    while (true) {
                        Cancellation.checkpoint();
                        Thread.onSpinWait();
                    }
                });
        app = Javalin.create(javalin -> {
            javalin.startup.showJavalinBanner = false;
            javalin.jetty.port = 0;
            problems.register(javalin);
            operations.install(javalin, routes, Map.of());
            BatchController.install(javalin, mapper, bodies, routes, operations, problems);
        }).start();
    }

    @AfterEach
    void stop() {
        app.stop();
    }

    private CompletableFuture<HttpResponse<String>> post(String path, String body) {
        return client.sendAsync(HttpRequest.newBuilder(URI.create("http://localhost:" + app.port() + path))
                .header("Content-Type", "application/json").timeout(Duration.ofSeconds(30))
                .POST(HttpRequest.BodyPublishers.ofString(body)).build(), HttpResponse.BodyHandlers.ofString());
    }

    /** Stops the server on another thread once the work has begun; returns when it has stopped. */
    private void stopWhileBusy() throws Exception {
        assertTrue(OpsFixtures.eventually(Duration.ofSeconds(10),
                () -> OpsFixtures.metric(app.port(), "statesum_compute_running") >= 1), "the work began");
        Thread stopper = new Thread(app::stop);
        stopper.start();
        stopper.join(30_000);
    }

    @Test
    void aDirectRequestStillRunningAtTheGraceDeadlineGetsAWhole503() throws Exception {
        CompletableFuture<HttpResponse<String>> answer = post("/v1/endless", "{}");
        stopWhileBusy();
        HttpResponse<String> response = answer.get();
        assertEquals(503, response.statusCode(), response.body());
        assertTrue(response.headers().firstValue("Retry-After").isPresent());
        JsonNode problem = JSON.readTree(response.body());
        assertEquals("https://statesum.org/problems/shutting-down", problem.get("type").asText());
    }

    @Test
    void aBatchAnswersALineForEveryJobAndEndsItsStream() throws Exception {
        StringBuilder jobs = new StringBuilder("[");
        for (int i = 0; i < 2; i++) {
            jobs.append(OpsFixtures.job("endless-" + i, "/v1/endless", "{}")).append(',');
        }
        for (int i = 0; i < 6; i++) {
            jobs.append(OpsFixtures.job("quick-" + i, "/v1/spectrum", OpsFixtures.smallSpectrum())).append(i < 5 ? "," : "]");
        }
        CompletableFuture<HttpResponse<String>> answer = post("/v1/batch", jobs.toString());
        stopWhileBusy();
        HttpResponse<String> response = answer.get(); // a cut stream would fail here
        assertEquals(200, response.statusCode());
        Map<String, JsonNode> lines = new HashMap<>();
        for (String line : response.body().split("\n")) {
            JsonNode node = JSON.readTree(line);
            lines.put(node.get("id").asText(), node);
        }
        assertEquals(8, lines.size(), response.body());
        for (int i = 0; i < 2; i++) {
            JsonNode line = lines.get("endless-" + i);
            assertEquals(503, line.get("status").asInt(), line.toString());
            assertEquals("https://statesum.org/problems/shutting-down", line.at("/problem/type").asText());
        }
        for (int i = 0; i < 6; i++) {
            int status = lines.get("quick-" + i).get("status").asInt();
            assertTrue(status == 200 || status == 503, "a job not started before the deadline says so: " + status);
        }
    }
}
