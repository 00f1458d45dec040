package org.statesum.api.server;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.statesum.api.config.BearerTokens;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

/**
 * The oddities an outside attack tried, each answered as HTTP says: method overrides ignored, OPTIONS
 * 404 where nothing is served, problem documents for OPTIONS * and an HTTP/2 preface, absolute-form
 * targets accepted (RFC 9112 section 3.2.2), gzip with trailing bytes refused, gzip bodies allowed
 * across origins, -0.0 echoed as 0.0.
 */
class ProtocolOdditiesApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String ORIGIN = "https://app.example.org";
    private static TestServer server;

    @BeforeAll
    static void start() {
        ServiceConfig defaults = ServiceConfig.defaults();
        server = TestServer.with(defaults.withPort(0).withOperations(defaults.operations()
                .withAccess(BearerTokens.none(), List.of(ORIGIN))));
    }

    @AfterAll
    static void stop() {
        server.stop();
    }

    private static String head(String answer) {
        return answer.substring(0, answer.indexOf("\r\n"));
    }

    private static JsonNode body(String answer) throws IOException {
        return JSON.readTree(answer.substring(answer.indexOf("\r\n\r\n") + 4));
    }

    @ParameterizedTest
    @ValueSource(strings = {"/v1/spectrum", "/v1/ideal-gas", "/v1/reaction", "/v1/sampled", "/v1/crystal",
        "/v1/quasi-harmonic", "/v1/batch"})
    void anUnknownOrNonUtf8CharsetIs415OnEveryPostEndpoint(String path) throws Exception {
        for (String charset : List.of("latin-1", "foo", "UTF-7", "iso-8859-1", "\"utf-16\"")) {
            HttpResponse<String> answer = OpsFixtures.post(server.port(), path, "application/json; charset=" + charset, "{}");
            assertEquals(415, answer.statusCode(), charset + ": " + answer.body());
            assertEquals("application/problem+json", answer.headers().firstValue("Content-Type").orElse(""));
            assertTrue(JSON.readTree(answer.body()).at("/errors/0/message").asText().contains("charset"), answer.body());
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"X-HTTP-Method-Override", "X-HTTP-Method", "X-Method-Override", "x-http-method-override"})
    void aMethodOverrideIsIgnored(String header) {
        // a GET that asks to be run as a POST stays a GET: 405 on a compute path, nothing computed
        server.request().header(header, "POST").contentType("application/json").body(OpsFixtures.smallSpectrum())
                .get("/v1/spectrum").then().statusCode(405).header("Allow", containsString("POST"));
        // and a POST asking to be a GET still computes as the POST it is
        server.request().header(header, "GET").contentType("application/json").body(OpsFixtures.smallSpectrum())
                .post("/v1/spectrum").then().statusCode(200);
    }

    @Test
    void optionsOnAPathThatServesNothingIs404() {
        server.request().options("/no/such/path").then().statusCode(404).contentType("application/problem+json");
        server.request().header("Origin", ORIGIN).header("Access-Control-Request-Method", "POST")
                .options("/v1/nothing").then().statusCode(404);
    }

    @Test
    void optionsOnAServedPathNamesItsOwnMethods() throws IOException {
        server.request().options("/v1/spectrum").then().statusCode(204).header("Allow", equalTo("POST, OPTIONS"));
        String answer = OpsFixtures.raw(server.port(), "OPTIONS /health/live HTTP/1.1\r\nHost: x\r\nConnection: close\r\n\r\n");
        assertTrue(head(answer).contains(" 204 ") && answer.contains("Allow: GET, HEAD, OPTIONS"), answer);
    }

    @Test
    void aPreflightAllowsGzippedBodies() {
        server.request().header("Origin", ORIGIN).header("Access-Control-Request-Method", "POST")
                .header("Access-Control-Request-Headers", "content-type, content-encoding")
                .options("/v1/spectrum").then().statusCode(204)
                .header("Access-Control-Allow-Headers", containsString("Content-Encoding"))
                .header("Access-Control-Allow-Methods", equalTo("POST, OPTIONS"));
    }

    @Test
    void optionsStarGetsAProblemDocument() throws IOException {
        String answer = OpsFixtures.raw(server.port(), "OPTIONS * HTTP/1.1\r\nHost: x\r\nConnection: close\r\n\r\n");
        assertTrue(answer.contains("Content-Type: application/problem+json"), answer);
        assertEquals(404, body(answer).get("status").asInt(), answer);
    }

    @Test
    void anHttp2PrefaceGetsAProblemDocument() throws IOException {
        String answer = OpsFixtures.raw(server.port(), "PRI * HTTP/2.0\r\n\r\nSM\r\n\r\n");
        assertTrue(head(answer).contains(" 426 "), answer);
        assertTrue(answer.contains("Content-Type: application/problem+json"), answer);
        assertEquals(426, body(answer).get("status").asInt());
    }

    @Test
    void anAbsoluteFormTargetIsServedWhateverTheHostHeaderSays() throws IOException {
        // RFC 9112 section 3.2.2: the server MUST ignore Host and use the target's authority
        String same = OpsFixtures.raw(server.port(), "GET http://localhost:" + server.port()
                + "/health/live HTTP/1.1\r\nHost: localhost:" + server.port() + "\r\nConnection: close\r\n\r\n");
        String other = OpsFixtures.raw(server.port(), "GET http://localhost:" + server.port()
                + "/health/live HTTP/1.1\r\nHost: somewhere.example\r\nConnection: close\r\n\r\n");
        assertTrue(head(same).contains(" 200 "), same);
        assertTrue(head(other).contains(" 200 "), other);
    }

    private static byte[] gzip(byte[] data) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (GZIPOutputStream out = new GZIPOutputStream(bytes)) {
            out.write(data);
        }
        return bytes.toByteArray();
    }

    private static String postGzip(byte[] body) throws IOException {
        ByteArrayOutputStream request = new ByteArrayOutputStream();
        request.write(("POST /v1/spectrum HTTP/1.1\r\nHost: x\r\nContent-Type: application/json\r\n"
                + "Content-Encoding: gzip\r\nConnection: close\r\nContent-Length: " + body.length + "\r\n\r\n")
                .getBytes(StandardCharsets.US_ASCII));
        request.write(body);
        return OpsFixtures.raw(server.port(), request.toByteArray());
    }

    @Test
    void gzipFollowedByOtherBytesIsRefused() throws IOException {
        byte[] good = gzip(OpsFixtures.smallSpectrum().getBytes(StandardCharsets.UTF_8));
        assertTrue(head(postGzip(good)).contains(" 200 "));
        byte[] garbage = new byte[good.length + 5];
        System.arraycopy(good, 0, garbage, 0, good.length);
        System.arraycopy("junk!".getBytes(StandardCharsets.US_ASCII), 0, garbage, good.length, 5);
        String answer = postGzip(garbage);
        assertTrue(head(answer).contains(" 400 "), answer);
        assertTrue(body(answer).get("detail").asText().contains("gzip"), answer);
    }

    @Test
    void gzipMembersOneAfterAnotherAreOneBody() throws IOException {
        byte[] json = OpsFixtures.smallSpectrum().getBytes(StandardCharsets.UTF_8);
        int half = json.length / 2;
        byte[] first = gzip(java.util.Arrays.copyOfRange(json, 0, half));
        byte[] second = gzip(java.util.Arrays.copyOfRange(json, half, json.length));
        byte[] both = new byte[first.length + second.length];
        System.arraycopy(first, 0, both, 0, first.length);
        System.arraycopy(second, 0, both, first.length, second.length);
        assertTrue(head(postGzip(both)).contains(" 200 "), "RFC 1952 section 2.2: a file is a series of members");
    }

    @Test
    void negativeZeroIsTheTemperatureZero() {
        String body = "{\"levels\": {\"energies\": [0, 1], \"degeneracies\": [1, 1]}, \"energyUnit\": \"K\","
                + " \"temperatures\": {\"values\": [-0.0, 2]}}";
        String answer = server.request().contentType("application/json").body(body).post("/v1/spectrum")
                .then().statusCode(200).extract().asString();
        assertTrue(answer.startsWith("{\"temperature\":{\"unit\":\"K\",\"values\":[0.0,2.0]}"), answer);
    }
}
