package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.net.Socket;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

/**
 * Large bodies arriving together cannot run the heap out. Here the budget is 1 MiB: a stalled request
 * declaring 200 kB (counted 8 times, capped at three quarters of the budget) holds 768 KiB; a second
 * request of about 60 kB (480 KiB) does not fit and gets a fast 503 with Retry-After, a small one still
 * fits in the last quarter, and once the stalled one ends the large one is served.
 */
class MemoryBudgetApiTest {

    /** A spectrum body of about 60 kB: some 480 KiB at 8 bytes of heap a byte, more than the 256 KiB left. */
    private static final String LARGE = OpsFixtures.spectrum(7_000, 3);
    private static TestServer server;

    @BeforeAll
    static void start() {
        ServiceConfig defaults = ServiceConfig.defaults();
        server = TestServer.with(defaults.withPort(0).withOperations(defaults.operations()
                .withConcurrency(2, 8, 2_000).withMemoryBudget(1 << 20).withBodyPace(1_500, 1_000)));
    }

    @AfterAll
    static void stop() {
        server.stop();
    }

    @Test
    void whileOneBodyHoldsTheBudgetOthersGetA503AndAfterwardsAreServed() throws Exception {
        try (Socket big = new Socket("localhost", server.port())) {
            OutputStream out = big.getOutputStream();
            out.write(("POST /v1/spectrum HTTP/1.1\r\nHost: localhost\r\nContent-Type: application/json\r\n"
                    + "Content-Length: 200000\r\n\r\n{").getBytes(StandardCharsets.US_ASCII));
            out.flush();
            assertTrue(OpsFixtures.eventually(Duration.ofSeconds(5),
                    () -> OpsFixtures.metric(server.port(), "statesum_memory_reserved_bytes") == 768 * 1024));
            HttpResponse<String> refused = OpsFixtures.post(server.port(), "/v1/spectrum", "application/json",
                    LARGE);
            assertEquals(503, refused.statusCode(), refused.body());
            assertEquals("1", refused.headers().firstValue("Retry-After").orElse(""));
            assertTrue(refused.body().contains("STATESUM_MEMORY_BUDGET_BYTES"), refused.body());
            assertTrue(OpsFixtures.metric(server.port(), "statesum_requests_rejected_total{reason=\"memory\"}") >= 1);
            assertEquals(200, OpsFixtures.post(server.port(), "/v1/spectrum", "application/json",
                    OpsFixtures.smallSpectrum()).statusCode());
        }
        // the stalled body ends (408 or a closed connection) and gives the budget back
        assertTrue(OpsFixtures.eventually(Duration.ofSeconds(10),
                () -> OpsFixtures.metric(server.port(), "statesum_memory_reserved_bytes") == 0));
        HttpResponse<String> served = OpsFixtures.post(server.port(), "/v1/spectrum", "application/json", LARGE);
        assertEquals(200, served.statusCode(), served.body());
    }
}
