package org.statesum.api;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.CompletableFuture;
import java.util.zip.GZIPOutputStream;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import org.statesum.api.request.JsonMediaType;
import org.statesum.testing.BodyMutator;
import org.statesum.testing.ContractValidator;
import org.statesum.testing.TestServer;

/**
 * Mutates the header fields around the bodies, not only the bodies: media types with every kind of
 * parameter and charset, content codings (gzip, gzip followed by other bytes, a cut gzip stream, made-up
 * codings), method overrides, Accept and Accept-Encoding values, origins and request ids, on every
 * POST endpoint (1 500 tries, seven bodies each). No answer may be a 5xx, every 4xx is a problem
 * document that names a place, and a 200 came only with a JSON media type whose charset is UTF-8.
 */
class HeaderFuzzTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final List<String> PATHS = List.of("/v1/spectrum", "/v1/ideal-gas", "/v1/reaction", "/v1/sampled",
            "/v1/crystal", "/v1/quasi-harmonic", "/v1/batch");
    private static final HttpClient CLIENT = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
    private static final String[] TYPES = {"application/json", "APPLICATION/JSON", "application/json ", "text/plain",
        "application/problem+json", "application/x-ndjson", "application/jsonx", "", "*/*", "application/*",
        "multipart/form-data", "application/json, text/plain", "\"application/json\"", "application /json",
        "application/json\t", "application/x-www-form-urlencoded"};
    private static final String[] PARAMETERS = {"", "; charset=utf-8", "; charset=UTF-8", "; charset=\"utf-8\"",
        "; charset=latin-1", "; charset=foo", "; charset=UTF-7", "; charset=iso-8859-1", "; charset=utf-16",
        "; charset=", "; charset", ";", ";;", "; =x", "; charset=utf-8; charset=latin-1", "; boundary=x",
        "; profile=\"a;b\"", "; charset=\"unterminated", "; q=0.5", "; charset=us-ascii", "; charset=\u00e9",
        "; charset=" + "x".repeat(300)};
    private static final String[] CODINGS = {null, null, null, "gzip", "gzip", "x-gzip", "identity", "GZIP", "br",
        "deflate", "gzip, gzip", "", " ", "compress", "gzip;q=1"};
    private static final String[] OVERRIDES = {"GET", "PUT", "DELETE", "PATCH", "HEAD", "OPTIONS", "TRACE", "FOO"};
    private static final String[] ACCEPTS = {"application/json", "*/*", "text/csv", "application/xml", "",
        "application/json;q=0", "image/png, */*;q=0.1", "text/html"};

    @Property(tries = 1500, shrinking = ShrinkingMode.OFF)
    void noHeaderMutationBreaksAnEndpoint(@ForAll long seed) throws Exception {
        Random random = new Random(seed);
        BodyMutator bodies = new BodyMutator(ContractValidator.get().document(), random);
        Map<String, CompletableFuture<HttpResponse<byte[]>>> answers = new LinkedHashMap<>();
        Map<String, String> sent = new LinkedHashMap<>();
        Map<String, String> types = new LinkedHashMap<>();
        for (String path : PATHS) {
            JsonNode schema = ContractValidator.get().document().path("paths").path(path).path("post")
                    .path("requestBody").path("content").path("application/json").path("schema");
            String body = random.nextInt(3) == 0 ? bodies.body(schema) : valid(path);
            HttpRequest.Builder request = HttpRequest.newBuilder(URI.create("http://localhost:"
                    + TestServer.shared().port() + path)).timeout(Duration.ofSeconds(30));
            List<String> said = new ArrayList<>();
            String contentType = pick(random, TYPES) + (random.nextBoolean() ? pick(random, PARAMETERS) : "");
            if (random.nextInt(20) != 0) {
                header(request, said, "Content-Type", contentType);
                types.put(path, contentType);
            }
            byte[] bytes = body.getBytes(StandardCharsets.UTF_8);
            String coding = pick(random, CODINGS);
            if (coding != null) {
                header(request, said, "Content-Encoding", coding);
                if (coding.toLowerCase().contains("gzip")) {
                    bytes = gzip(bytes, random);
                }
            }
            if (random.nextInt(6) == 0) {
                header(request, said, "X-HTTP-Method-Override", pick(random, OVERRIDES));
            }
            if (random.nextInt(4) == 0) {
                header(request, said, "Accept", pick(random, ACCEPTS));
            }
            if (random.nextInt(4) == 0) {
                header(request, said, "Accept-Encoding", random.nextBoolean() ? "gzip" : "br;q=1, *;q=0");
            }
            if (random.nextInt(8) == 0) {
                header(request, said, "Origin", random.nextBoolean() ? "https://elsewhere.example" : "null");
            }
            if (random.nextInt(8) == 0) {
                header(request, said, "X-Request-Id", random.nextBoolean() ? "abc-123" : "bad id \u0007".repeat(20));
            }
            sent.put(path, said + " " + abbreviate(body));
            answers.put(path, CLIENT.sendAsync(request.POST(HttpRequest.BodyPublishers.ofByteArray(bytes)).build(),
                    HttpResponse.BodyHandlers.ofByteArray()));
        }
        for (String path : PATHS) {
            HttpResponse<byte[]> response = answers.get(path).get();
            int status = response.statusCode();
            String media = response.headers().firstValue("Content-Type").orElse("");
            String text = decoded(response);
            String context = path + " answered " + status + " to " + sent.get(path) + ": " + abbreviate(text);
            assertTrue(status < 500, context);
            if (status == 200) {
                String type = types.get(path);
                assertDoesNotThrow(() -> JsonMediaType.require(type), "a 200 only for JSON in UTF-8: " + context);
            }
            if (status >= 400) {
                assertTrue(media.startsWith("application/problem+json"), context);
                assertTrue(JSON.readTree(text).path("errors").size() > 0
                        || status == 429 || status == 503, "a 4xx names a place: " + context);
            }
        }
    }

    /** The answer's content as text, gunzipped when it came gzipped. */
    private static String decoded(HttpResponse<byte[]> response) throws IOException {
        byte[] body = response.body();
        if (response.headers().firstValue("Content-Encoding").orElse("").equals("gzip")) {
            try (java.util.zip.GZIPInputStream in = new java.util.zip.GZIPInputStream(new java.io.ByteArrayInputStream(body))) {
                body = in.readAllBytes();
            }
        }
        return new String(body, StandardCharsets.UTF_8);
    }

    private static void header(HttpRequest.Builder request, List<String> said, String name, String value) {
        try {
            request.header(name, value);
            said.add(name + ": " + value);
        } catch (IllegalArgumentException e) {
            // a value the client itself will not send (control characters): leave the header out
        }
    }

    /** A small valid body for the path, so that most tries reach the endpoint past the header checks. */
    private static String valid(String path) {
        String spectrum = "{\"levels\": {\"energies\": [0, 1]}, \"energyUnit\": \"K\", \"temperatures\": {\"values\": [1]}}";
        return switch (path) {
            case "/v1/spectrum" -> spectrum;
            case "/v1/batch" -> "[{\"id\": \"a\", \"path\": \"/v1/spectrum\", \"body\": " + spectrum + "}]";
            case "/v1/sampled" -> "{\"method\": \"exp\", \"reducedPotentials\": [[0, 1, 2], [0.5, 1.5, 2.5]],"
                    + " \"sampleCounts\": [3, 0]}";
            default -> "{}";
        };
    }

    /** Gzip of {@code data}; one time in four followed by other bytes or cut short. */
    private static byte[] gzip(byte[] data, Random random) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (GZIPOutputStream gz = new GZIPOutputStream(out)) {
            gz.write(data);
        }
        byte[] bytes = out.toByteArray();
        return switch (random.nextInt(8)) {
            case 0 -> java.util.Arrays.copyOf(bytes, bytes.length + 1 + random.nextInt(9)); // zeros after the member
            case 1 -> java.util.Arrays.copyOf(bytes, Math.max(1, bytes.length - 1 - random.nextInt(8))); // cut
            default -> bytes;
        };
    }

    private static String pick(Random random, String[] values) {
        return values[random.nextInt(values.length)];
    }

    private static String abbreviate(String s) {
        return s.length() > 400 ? s.substring(0, 400) + "..." : s;
    }
}
