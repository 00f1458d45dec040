package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

/**
 * Answers are held to the memory budget too (here 2 MiB): one that would not fit in it at all is a
 * 422 on its own and a 422 line in a batch, where the other jobs still answer; and a quasi-harmonic
 * grid of pressures x temperatures is held to the size of a temperature grid before any work.
 */
class AnswerSizeApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static TestServer server;

    @BeforeAll
    static void start() {
        ServiceConfig defaults = ServiceConfig.defaults();
        server = TestServer.with(defaults.withPort(0).withOperations(defaults.operations().withMemoryBudget(2 << 20)));
    }

    @AfterAll
    static void stop() {
        server.stop();
    }

    @Test
    void anAnswerLargerThanTheBudgetIs422AndTheServiceCarriesOn() throws Exception {
        String huge = OpsFixtures.spectrum(20, 40_000); // 40 000 temperatures: an answer of several MB
        HttpResponse<String> refused = OpsFixtures.post(server.port(), "/v1/spectrum", "application/json", huge);
        assertEquals(422, refused.statusCode(), refused.body());
        JsonNode problem = JSON.readTree(refused.body());
        assertEquals("https://statesum.org/problems/answer-too-large", problem.get("type").asText());
        assertTrue(problem.get("detail").asText().contains("STATESUM_MEMORY_BUDGET_BYTES"));
        assertEquals(0, OpsFixtures.metric(server.port(), "statesum_memory_reserved_bytes"));
        HttpResponse<String> fine = OpsFixtures.post(server.port(), "/v1/spectrum", "application/json",
                OpsFixtures.spectrum(20, 1_000));
        assertEquals(200, fine.statusCode());
    }

    @Test
    void inABatchOnlyTheOversizedJobFails() throws Exception {
        String batch = "[" + OpsFixtures.job("small", "/v1/spectrum", OpsFixtures.smallSpectrum()) + ","
                + OpsFixtures.job("huge", "/v1/spectrum", OpsFixtures.spectrum(20, 40_000)) + "]";
        HttpResponse<String> response = OpsFixtures.post(server.port(), "/v1/batch", "application/json", batch);
        assertEquals(200, response.statusCode());
        Map<String, JsonNode> lines = new HashMap<>();
        for (String line : response.body().split("\n")) {
            JsonNode node = JSON.readTree(line);
            lines.put(node.get("id").asText(), node);
        }
        assertEquals(200, lines.get("small").get("status").asInt());
        assertEquals(422, lines.get("huge").get("status").asInt());
        assertEquals("https://statesum.org/problems/answer-too-large", lines.get("huge").at("/problem/type").asText());
        assertEquals(0, OpsFixtures.metric(server.port(), "statesum_memory_reserved_bytes"));
    }

    @Test
    void aQuasiHarmonicGridBeyondTheTemperatureLimitIsRefusedBeforeAnyWork() throws Exception {
        ObjectNode body = (ObjectNode) JSON.readTree(Files.readString(Path.of("examples", "tessaride-alpha-qha.json")));
        ArrayNode pressures = ((ObjectNode) body.get("pressures")).putArray("values");
        for (int i = 0; i < 100; i++) {
            pressures.add(i * 0.1);
        }
        ((ObjectNode) body.get("temperatures")).put("start", 1).put("stop", 1200).put("count", 10_000);
        HttpResponse<String> response = OpsFixtures.post(server.port(), "/v1/quasi-harmonic", "application/json",
                body.toString());
        assertEquals(422, response.statusCode(), response.body());
        assertTrue(response.body().contains("/pressures/values"), response.body());
        assertTrue(response.body().contains("STATESUM_MAX_TEMPERATURES"), response.body());
    }
}
