package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.concurrent.CompletableFuture;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.ContractValidator;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

class OverloadApiTest {

    /** 3e7 (level, temperature) pairs: long enough (tenths of a second or more) to hold the only slot. */
    private static final String SLOW = OpsFixtures.spectrum(3_000, 10_000);

    private static void assertContract(String path, String method, HttpResponse<String> response) {
        assertEquals(java.util.List.of(), ContractValidator.get().check(path, method, response.statusCode(),
                response.headers().firstValue("Content-Type").orElse(null), response.body()));
    }

    @Test
    void beyondTheQueueARequestGetsAFast503WithRetryAfter() throws Exception {
        TestServer server = TestServer.with(ServiceConfig.defaults().withOperations(
                OperationsConfig.defaults().withConcurrency(1, 0, 0)));
        try {
            int port = server.port();
            CompletableFuture<HttpResponse<String>> slow = CompletableFuture.supplyAsync(() -> {
                try {
                    return OpsFixtures.post(port, "/v1/spectrum", "application/json", SLOW);
                } catch (Exception e) {
                    throw new IllegalStateException(e);
                }
            });
            assertTrue(OpsFixtures.eventually(Duration.ofSeconds(10),
                    () -> OpsFixtures.metric(port, "statesum_compute_running") == 1), "the slow job holds the slot");
            // with no queue (STATESUM_MAX_QUEUED_REQUESTS=0) the refusal comes before any wait
            HttpResponse<String> refused = OpsFixtures.post(port, "/v1/spectrum", "application/json",
                    OpsFixtures.smallSpectrum());
            assertEquals(503, refused.statusCode());
            assertEquals("1", refused.headers().firstValue("Retry-After").orElse(""));
            assertTrue(refused.body().contains("/problems/overloaded"), refused.body());
            assertContract("/v1/spectrum", "POST", refused);
            assertEquals(200, slow.get().statusCode(), "the admitted job still completes");
            assertTrue(OpsFixtures.metric(port, "statesum_requests_rejected_total{reason=\"overloaded\"}") >= 1);
            assertEquals(200, OpsFixtures.post(port, "/v1/spectrum", "application/json",
                    OpsFixtures.smallSpectrum()).statusCode(), "service answers again once the slot is free");
        } finally {
            server.stop();
        }
    }

    @Test
    void aJobOverTheTimeLimitStopsAndAnswersAProblem() throws Exception {
        TestServer server = TestServer.with(ServiceConfig.defaults().withOperations(
                OperationsConfig.defaults().withTimeLimit(20)));
        try {
            // 5e8 pairs would take seconds; the time-limit problem can only come from the engine's checkpoint
            server.request().contentType("application/json").body(OpsFixtures.spectrum(10_000, 50_000))
                    .post("/v1/spectrum").then().statusCode(422)
                    .body("type", org.hamcrest.Matchers.endsWith("/time-limit-exceeded"))
                    .body("errors[0].pointer", org.hamcrest.Matchers.equalTo(""));
            assertTrue(OpsFixtures.metric(server.port(),
                    "statesum_compute_seconds_count{endpoint=\"/v1/spectrum\",outcome=\"time-limit\"}") == 1);
            server.request().contentType("application/json").body(OpsFixtures.smallSpectrum())
                    .post("/v1/spectrum").then().statusCode(200);
        } finally {
            server.stop();
        }
    }

    @Test
    void theTimeLimitAlsoStopsCrystalJobs() throws Exception {
        TestServer server = TestServer.with(ServiceConfig.defaults().withOperations(
                OperationsConfig.defaults().withTimeLimit(20)));
        try {
            // 2000 q-points x 9 modes x 50 000 temperatures = 9e8 mode terms (within the budget): seconds, so the
            // problem can only come from the checkpoint between temperatures in HarmonicModes.
            StringBuilder q = new StringBuilder();
            for (int i = 0; i < 2000; i++) {
                q.append(i == 0 ? "" : ",").append("{\"weight\": 1, \"frequencies\": [1, 2, 3, 4, 5, 6, 7, 8, ")
                        .append(9 + i * 1e-3).append("]}");
            }
            String body = "{\"atomsPerFormulaUnit\": 3, \"vibrations\": {\"model\": \"phonons\", "
                    + "\"frequencyUnit\": \"THz\", \"qPoints\": [" + q + "]}, "
                    + "\"temperatures\": {\"start\": 1, \"stop\": 2000, \"count\": 50000}}";
            server.request().contentType("application/json").body(body)
                    .post("/v1/crystal").then().statusCode(422)
                    .body("type", org.hamcrest.Matchers.endsWith("/time-limit-exceeded"));
        } finally {
            server.stop();
        }
    }

    @Test
    void stoppingFinishesWorkInFlightWhileRefusingNewWork() throws Exception {
        TestServer server = TestServer.with(ServiceConfig.defaults());
        int port = server.port();
        CompletableFuture<HttpResponse<String>> inFlight = CompletableFuture.supplyAsync(() -> {
            try {
                return OpsFixtures.post(port, "/v1/spectrum", "application/json", SLOW);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        assertTrue(OpsFixtures.eventually(Duration.ofSeconds(10),
                () -> OpsFixtures.metric(port, "statesum_compute_running") == 1));
        CompletableFuture<Void> stopping = CompletableFuture.runAsync(server::stop);
        assertTrue(OpsFixtures.eventually(Duration.ofSeconds(5),
                () -> OpsFixtures.get(port, "/health/ready").statusCode() == 503), "readiness fails at once");
        HttpResponse<String> ready = OpsFixtures.get(port, "/health/ready");
        if (ready.statusCode() == 503) {
            assertContract("/health/ready", "GET", ready);
        }
        HttpResponse<String> refused = OpsFixtures.post(port, "/v1/spectrum", "application/json",
                OpsFixtures.smallSpectrum());
        if (!inFlight.isDone()) {
            assertEquals(503, refused.statusCode());
            assertTrue(refused.body().contains("/problems/shutting-down"), refused.body());
        }
        HttpResponse<String> finished = inFlight.get();
        assertEquals(200, finished.statusCode(), "the request in flight completes");
        stopping.get();
    }
}
