package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.zip.GZIPInputStream;
import org.junit.jupiter.api.Test;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

/** Large answers are gzipped for clients that accept it, and only for them; the JSON is the same. */
class AnswerEncodingApiTest {

    private static final HttpClient CLIENT = HttpClient.newHttpClient(); // sends no Accept-Encoding of its own

    private static HttpResponse<byte[]> post(String body, String acceptEncoding) throws Exception {
        HttpRequest.Builder request = HttpRequest.newBuilder(
                URI.create("http://localhost:" + TestServer.shared().port() + "/v1/spectrum"))
                .header("Content-Type", "application/json").timeout(Duration.ofSeconds(30))
                .POST(HttpRequest.BodyPublishers.ofString(body));
        if (acceptEncoding != null) {
            request.header("Accept-Encoding", acceptEncoding);
        }
        return CLIENT.send(request.build(), HttpResponse.BodyHandlers.ofByteArray());
    }

    @Test
    void aLargeAnswerIsGzippedWhenAcceptedAndInflatesToTheSameJson() throws Exception {
        String body = OpsFixtures.spectrum(50, 400); // 400 temperatures: an answer of tens of kilobytes
        HttpResponse<byte[]> plain = post(body, null);
        HttpResponse<byte[]> packed = post(body, "br;q=1, gzip;q=0.8");
        assertEquals(200, plain.statusCode());
        assertEquals(200, packed.statusCode());
        assertFalse(plain.headers().firstValue("Content-Encoding").isPresent());
        assertEquals("gzip", packed.headers().firstValue("Content-Encoding").orElse(""));
        assertEquals("Accept-Encoding", packed.headers().firstValue("Vary").orElse(""));
        assertEquals("Accept-Encoding", plain.headers().firstValue("Vary").orElse(""));
        assertTrue(plain.body().length >= AnswerEncoding.MIN_BYTES);
        assertTrue(packed.body().length < plain.body().length / 2, packed.body().length + " of " + plain.body().length);
        try (GZIPInputStream in = new GZIPInputStream(new ByteArrayInputStream(packed.body()))) {
            assertArrayEquals(plain.body(), in.readAllBytes());
        }
    }

    @Test
    void aSmallAnswerOrARefusedGzipGoesUncompressed() throws Exception {
        HttpResponse<byte[]> small = post(OpsFixtures.smallSpectrum(), "gzip");
        assertFalse(small.headers().firstValue("Content-Encoding").isPresent());
        assertFalse(small.headers().firstValue("Vary").isPresent());
        HttpResponse<byte[]> refused = post(OpsFixtures.spectrum(50, 400), "gzip;q=0, identity");
        assertFalse(refused.headers().firstValue("Content-Encoding").isPresent());
    }

    @Test
    void acceptEncodingIsReadWithItsQualityValues() {
        assertTrue(AnswerEncoding.acceptsGzip("gzip"));
        assertTrue(AnswerEncoding.acceptsGzip("deflate, GZIP"));
        assertTrue(AnswerEncoding.acceptsGzip("*"));
        assertTrue(AnswerEncoding.acceptsGzip("x-gzip;q=0.1"));
        assertFalse(AnswerEncoding.acceptsGzip(null));
        assertFalse(AnswerEncoding.acceptsGzip(""));
        assertFalse(AnswerEncoding.acceptsGzip("identity"));
        assertFalse(AnswerEncoding.acceptsGzip("gzip;q=0"));
        assertFalse(AnswerEncoding.acceptsGzip("gzip;q=zero"));
        assertFalse(AnswerEncoding.acceptsGzip("br, deflate"));
    }
}
