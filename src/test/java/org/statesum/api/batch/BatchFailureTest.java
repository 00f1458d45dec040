package org.statesum.api.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.Javalin;
import java.net.http.HttpResponse;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.statesum.api.App;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.JsonSupport;
import org.statesum.api.request.Problem;
import org.statesum.api.request.ProblemMapper;
import org.statesum.api.server.BodyReader;
import org.statesum.api.server.ComputeRoutes;
import org.statesum.api.server.Operations;
import org.statesum.testing.OpsFixtures;

/**
 * A job that fails with a Java {@link Error} inside the service (out of memory, a stack overflow) still
 * answers its own line, a bare 500 problem, and the other jobs of the batch are unaffected. No product
 * endpoint throws an Error on demand, so the batch here runs over a test endpoint that does.
 */
class BatchFailureTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private Javalin app;

    @BeforeEach
    void start() {
        ServiceConfig config = ServiceConfig.defaults().withPort(0);
        ObjectMapper mapper = JsonSupport.mapper(config);
        ProblemMapper problems = new ProblemMapper(mapper);
        Operations operations = new Operations(config, mapper, new BodyReader(mapper, config), problems);
        ComputeRoutes routes = new ComputeRoutes()
                .add("/v1/spectrum", App.endpoint(config, "/v1/spectrum"))
                .add("/v1/failing", body -> {
                    throw new StackOverflowError("test endpoint");
                });
        app = Javalin.create(javalin -> {
            javalin.startup.showJavalinBanner = false;
            javalin.jetty.port = 0;
            problems.register(javalin);
            operations.install(javalin, routes, Map.of());
            BatchController.install(javalin, mapper, new BodyReader(mapper, config), routes, operations, problems);
        }).start();
    }

    @AfterEach
    void stop() {
        app.stop();
    }

    @Test
    void aJobEndingInAnErrorAnswersA500LineAndTheOthersTheirResults() throws Exception {
        String batch = "[" + OpsFixtures.job("before", "/v1/spectrum", OpsFixtures.smallSpectrum()) + ","
                + OpsFixtures.job("broken", "/v1/failing", "{}") + ","
                + OpsFixtures.job("after", "/v1/spectrum", OpsFixtures.smallSpectrum()) + "]";
        HttpResponse<String> response = OpsFixtures.post(app.port(), "/v1/batch", "application/json", batch);
        assertEquals(200, response.statusCode());
        Map<String, JsonNode> byId = new HashMap<>();
        for (String line : response.body().split("\n")) {
            JsonNode node = JSON.readTree(line);
            byId.put(node.get("id").asText(), node);
        }
        assertEquals(List.of("after", "before", "broken"), byId.keySet().stream().sorted().toList());
        assertEquals(200, byId.get("before").get("status").asInt());
        assertEquals(200, byId.get("after").get("status").asInt());
        assertEquals(500, byId.get("broken").get("status").asInt());
        assertEquals(500, byId.get("broken").at("/problem/status").asInt());
        assertEquals("Internal error", byId.get("broken").at("/problem/title").asText());
    }

    @Test
    void theSameErrorOnADirectRequestIsABare500Problem() throws Exception {
        HttpResponse<String> response = OpsFixtures.post(app.port(), "/v1/failing", "application/json", "{}");
        assertEquals(500, response.statusCode());
        assertEquals(Problem.MEDIA_TYPE, response.headers().firstValue("Content-Type").orElse(""));
        assertEquals("Internal error", JSON.readTree(response.body()).get("title").asText());
    }
}
