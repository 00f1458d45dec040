package org.statesum.api.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.restassured.response.Response;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

class BatchApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    private static List<JsonNode> lines(Response response) throws Exception {
        List<JsonNode> lines = new ArrayList<>();
        for (String line : response.asString().split("\n")) {
            if (!line.isBlank()) {
                lines.add(JSON.readTree(line));
            }
        }
        return lines;
    }

    @Test
    void aFailingJobAnswersItsOwnProblemLineAndTheOthersTheirResults() throws Exception {
        String batch = "[" + OpsFixtures.job("good-1", "/v1/spectrum", OpsFixtures.smallSpectrum()) + ","
                + OpsFixtures.job("no-such-path", "/v1/nowhere", "{}") + ","
                + OpsFixtures.job("bad-body", "/v1/spectrum", "{\"levels\":{\"energies\":[0,\"x\"]}}") + ","
                + OpsFixtures.job("good-2", "/v1/spectrum", OpsFixtures.smallSpectrum()) + "]";
        Response response = TestServer.shared().request().contentType("application/json").body(batch)
                .post("/v1/batch");
        assertEquals(200, response.statusCode());
        assertTrue(response.contentType().startsWith("application/x-ndjson"));
        List<JsonNode> lines = lines(response);
        assertEquals(4, lines.size());
        for (JsonNode line : lines) {
            switch (line.get("id").asText()) {
                case "good-1", "good-2" -> {
                    assertEquals(200, line.get("status").asInt());
                    // ln Z of levels {0, 1 K} at T = 1 K: ln(1 + e^-1) = 0.3132616875182228 (exact expression)
                    assertEquals(0.3132616875182228,
                            line.at("/result/logPartitionFunction/values/0").asDouble(), 1e-15);
                }
                case "no-such-path" -> {
                    assertEquals(404, line.get("status").asInt());
                    assertEquals("/path", line.at("/problem/errors/0/pointer").asText());
                }
                case "bad-body" -> {
                    assertEquals(422, line.get("status").asInt());
                    List<String> pointers = new ArrayList<>();
                    line.at("/problem/errors").forEach(e -> pointers.add(e.get("pointer").asText()));
                    assertTrue(pointers.containsAll(List.of("/body/levels/energies/1", "/body/energyUnit",
                            "/body/temperatures")), pointers.toString());
                }
                default -> throw new AssertionError("unexpected line " + line);
            }
        }
    }

    @Test
    void aBrokenEnvelopeFailsTheWholeBatchNamingEveryBadField() {
        String batch = "[" + OpsFixtures.job("a", "/v1/spectrum", "{}") + "," + OpsFixtures.job("a", "/v1/spectrum",
                "{}") + ",{\"path\":\"/v1/spectrum\",\"body\":{}}, 7]";
        TestServer.shared().request().contentType("application/json").body(batch).post("/v1/batch")
                .then().statusCode(422).contentType("application/problem+json")
                .body("errors.pointer", org.hamcrest.Matchers.hasItems("/1/id", "/2/id", "/3"));
    }

    @Test
    void linesComeAsJobsFinishNotAsTheyWereSent() throws Exception {
        TestServer server = TestServer.with(ServiceConfig.defaults().withOperations(
                OperationsConfig.defaults().withConcurrency(2, 8, 2_000).withBatchParallelism(2)));
        try {
            // The first job does ~1e4 times the work of the others: with two running at once, both small
            // ones finish while it is still running, so its line comes last.
            String batch = "[" + OpsFixtures.job("slow", "/v1/spectrum", OpsFixtures.spectrum(2_000, 10_000)) + ","
                    + OpsFixtures.job("quick-1", "/v1/spectrum", OpsFixtures.smallSpectrum()) + ","
                    + OpsFixtures.job("quick-2", "/v1/spectrum", OpsFixtures.smallSpectrum()) + "]";
            List<JsonNode> lines = lines(server.request().contentType("application/json").body(batch)
                    .post("/v1/batch"));
            assertEquals(List.of("quick-1", "quick-2", "slow"),
                    lines.stream().map(l -> l.get("id").asText()).toList());
        } finally {
            server.stop();
        }
    }

    @Test
    void oneJobAtATimeAnswersInTheOrderSent() throws Exception {
        TestServer server = TestServer.with(ServiceConfig.defaults().withOperations(
                OperationsConfig.defaults().withBatchParallelism(1)));
        try {
            String batch = IntStream.range(0, 12).mapToObj(i -> OpsFixtures.job("job-" + i, "/v1/spectrum",
                    i % 3 == 0 ? OpsFixtures.spectrum(200, 200) : OpsFixtures.smallSpectrum()))
                    .collect(Collectors.joining(",", "[", "]"));
            List<JsonNode> lines = lines(server.request().contentType("application/json").body(batch)
                    .post("/v1/batch"));
            assertEquals(IntStream.range(0, 12).mapToObj(i -> "job-" + i).toList(),
                    lines.stream().map(l -> l.get("id").asText()).toList());
        } finally {
            server.stop();
        }
    }

    @Test
    void aClientThatDisconnectsStopsTheRemainingJobs() throws Exception {
        TestServer server = TestServer.with(ServiceConfig.defaults().withOperations(
                OperationsConfig.defaults().withBatchParallelism(1)));
        try {
            int jobs = 60;
            String batch = IntStream.range(0, jobs).mapToObj(i -> OpsFixtures.job("job-" + i, "/v1/spectrum",
                    OpsFixtures.spectrum(500, 1_000))).collect(Collectors.joining(",", "[", "]"));
            byte[] body = batch.getBytes(StandardCharsets.UTF_8);
            try (Socket socket = new Socket("localhost", server.port())) {
                OutputStream out = socket.getOutputStream();
                out.write(("POST /v1/batch HTTP/1.1\r\nHost: localhost\r\nContent-Type: application/json\r\n"
                        + "Content-Length: " + body.length + "\r\nConnection: close\r\n\r\n")
                        .getBytes(StandardCharsets.US_ASCII));
                out.write(body);
                out.flush();
                BufferedReader in = new BufferedReader(new InputStreamReader(socket.getInputStream(),
                        StandardCharsets.UTF_8));
                String line;
                do {
                    line = in.readLine();
                } while (line != null && !line.contains("\"id\":\"job-0\""));
                assertTrue(line != null, "the first job's line arrived before the others were computed");
            }
            int port = server.port();
            assertTrue(OpsFixtures.eventually(Duration.ofSeconds(20),
                    () -> OpsFixtures.metric(port, "statesum_compute_admitted") == 0
                            && OpsFixtures.metric(port, "statesum_batch_jobs_total{outcome=\"cancelled\"}") > 0),
                    "the batch ended after the client left");
            double answered = OpsFixtures.metric(port, "statesum_batch_jobs_total{outcome=\"answered\"}");
            double cancelled = OpsFixtures.metric(port, "statesum_batch_jobs_total{outcome=\"cancelled\"}");
            // A closed connection shows on the first or second write after it; a job or two in flight
            // may finish meanwhile. Most of the 60 never run.
            assertTrue(answered <= 10, "answered " + answered);
            assertEquals(jobs, answered + cancelled, 1.0);
        } finally {
            server.stop();
        }
    }
}
