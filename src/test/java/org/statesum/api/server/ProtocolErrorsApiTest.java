package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

/**
 * Requests that Jetty refuses before any route sees them still get an RFC 9457 problem document,
 * never Jetty's HTML error page, and nothing about the server's insides.
 */
class ProtocolErrorsApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    private static String send(String request) throws IOException {
        return OpsFixtures.raw(TestServer.shared().port(), request);
    }

    /** Each request written with ~ for CR LF. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "400 | malformed-request         | NOT-HTTP~~",
        "400 | malformed-request         | GET /health/live HTTP/1.1~~",
        "400 | malformed-request         | POST /v1/spectrum HTTP/1.1~Host: x~Content-Length: many~~",
        "505 | http-version-not-supported | GET /health/live HTTP/7.0~Host: x~~",
        "414 | uri-too-long              | GET /LONG HTTP/1.1~Host: x~~",
        "431 | header-fields-too-large   | GET /health/live HTTP/1.1~Host: x~X-Filler: BIG~~",
    })
    void aRequestJettyRefusesGetsAProblemDocument(int status, String type, String template) throws Exception {
        String request = template.replace("~", "\r\n").replace("LONG", "a".repeat(20_000))
                .replace("BIG", "b".repeat(40_000));
        String answer = send(request);
        assertTrue(answer.startsWith("HTTP/1.1 " + status + " "), answer);
        int split = answer.indexOf("\r\n\r\n");
        String head = answer.substring(0, split).toLowerCase(java.util.Locale.ROOT);
        assertTrue(head.contains("content-type: application/problem+json"), head);
        assertTrue(head.contains("x-content-type-options: nosniff"), head);
        assertTrue(head.contains("cache-control: no-store"), head);
        assertFalse(answer.toLowerCase(java.util.Locale.ROOT).contains("jetty"), answer);
        JsonNode problem = JSON.readTree(answer.substring(split + 4));
        assertEquals("https://statesum.org/problems/" + type, problem.get("type").asText());
        assertEquals(status, problem.get("status").asInt());
        assertTrue(problem.get("errors").isArray());
    }

    @org.junit.jupiter.api.Test
    void onlyAPlainReasonReachesTheDetail() {
        assertEquals("the request is not well-formed HTTP/1.1: No URI", ProtocolErrors.problem(400, "No URI").detail());
        assertEquals("the request is not well-formed HTTP/1.1",
                ProtocolErrors.problem(400, "java.lang.IllegalStateException: <script>").detail());
        assertEquals(418, ProtocolErrors.problem(418, null).status());
        assertEquals(503, ProtocolErrors.problem(503, null).status());
    }
}
