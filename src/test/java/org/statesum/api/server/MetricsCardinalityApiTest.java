package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

/** Whatever a client sends, the meter set stays bounded: made-up methods and paths share one label each. */
class MetricsCardinalityApiTest {

    private static TestServer server;

    @BeforeAll
    static void start() {
        server = TestServer.with(ServiceConfig.defaults().withPort(0));
    }

    @AfterAll
    static void stop() {
        server.stop();
    }

    @Test
    void madeUpMethodsAndPathsAddNoMeters() throws Exception {
        HttpClient client = HttpClient.newHttpClient();
        for (int i = 0; i < 30; i++) {
            HttpResponse<String> response = client.send(HttpRequest.newBuilder(
                    URI.create("http://localhost:" + server.port() + "/random/path/" + i))
                    .method("INVENTED" + i, HttpRequest.BodyPublishers.noBody()).timeout(Duration.ofSeconds(10))
                    .build(), HttpResponse.BodyHandlers.ofString());
            assertTrue(response.statusCode() >= 400 && response.statusCode() < 500, String.valueOf(response.statusCode()));
        }
        String metrics = OpsFixtures.get(server.port(), "/metrics").body();
        assertFalse(metrics.contains("INVENTED"), "a made-up method became a label");
        assertFalse(metrics.contains("/random/path"), "a made-up path became a label");
        long otherSeries = metrics.lines()
                .filter(l -> l.startsWith("http_server_requests_seconds_count{method=\"other\",route=\"unmatched\""))
                .count();
        assertEquals(1, otherSeries, metrics);
    }
}
