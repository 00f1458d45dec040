package org.statesum.api;

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
import org.statesum.testing.TestServer;

/**
 * Large bodies arriving together cannot run the heap out: while one request holds the whole body
 * memory budget (here 1 MiB; its declared 200 kB body counts 8 times), others get a fast 503 with
 * Retry-After, and once it ends the budget is whole again.
 */
class BodyMemoryApiTest {

    private static TestServer server;

    @BeforeAll
    static void start() {
        ServiceConfig defaults = ServiceConfig.defaults();
        server = TestServer.with(defaults.withPort(0).withOperations(defaults.operations()
                .withConcurrency(2, 8, 2_000).withBodyMemory(1 << 20).withBodyPace(1_500, 1_000)));
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
                    () -> OpsFixtures.metric(server.port(), "statesum_body_memory_reserved_bytes") == 1 << 20));
            HttpResponse<String> refused = OpsFixtures.post(server.port(), "/v1/spectrum", "application/json",
                    OpsFixtures.smallSpectrum());
            assertEquals(503, refused.statusCode(), refused.body());
            assertEquals("1", refused.headers().firstValue("Retry-After").orElse(""));
            assertTrue(refused.body().contains("STATESUM_BODY_MEMORY_BYTES"), refused.body());
            assertTrue(OpsFixtures.metric(server.port(), "statesum_requests_rejected_total{reason=\"memory\"}") >= 1);
        }
        // the stalled body ends (408 or a closed connection) and gives the budget back
        assertTrue(OpsFixtures.eventually(Duration.ofSeconds(10),
                () -> OpsFixtures.metric(server.port(), "statesum_body_memory_reserved_bytes") == 0));
        HttpResponse<String> served = OpsFixtures.post(server.port(), "/v1/spectrum", "application/json",
                OpsFixtures.smallSpectrum());
        assertEquals(200, served.statusCode(), served.body());
    }
}
