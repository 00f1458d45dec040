package org.statesum.api.server;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;

import io.restassured.response.Response;
import java.io.InputStream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.TestServer;
import org.statesum.testing.LeakChecks;

/**
 * The limits that protect the service: body size (declared or streamed, on a server with a 48 MiB
 * limit), and at the defaults nesting,
 * string, name and number length, the compute budget and the populations limit. Each answer is a
 * 4xx problem that names the limit, never a 5xx.
 */
class BodyLimitsApiTest {

    private static final long FIFTY_MIB = 50L << 20;
    /** A deployment with a 48 MiB limit for tree-parsed bodies (the default is 64 MiB). */
    private static final ServiceConfig FORTY_EIGHT_MIB = new ServiceConfig(0, 48L << 20, 32, 4096, 2_000_000, 100_000,
            1_000_000_000L, 1_000_000L);

    private final TestServer server = TestServer.shared();
    private static TestServer limited;

    @BeforeAll
    static void start() {
        limited = TestServer.with(FORTY_EIGHT_MIB);
    }

    @AfterAll
    static void stop() {
        limited.stop();
    }

    @Test
    void aFiftyMebibyteBodyWithContentLengthIs413() {
        byte[] body = new byte[(int) FIFTY_MIB];
        java.util.Arrays.fill(body, (byte) ' ');
        limited.request().contentType("application/json").body(body).post("/v1/spectrum")
                .then().statusCode(413).contentType("application/problem+json")
                .body("type", equalTo("https://statesum.org/problems/body-too-large"))
                .body("detail", containsString(String.valueOf(FORTY_EIGHT_MIB.maxBodyBytes())))
                .body("detail", containsString("STATESUM_MAX_BODY_BYTES"));
    }

    @Test
    void aFiftyMebibyteChunkedBodyIs413WithoutBeingHeldInMemory() {
        // Streamed without Content-Length (chunked); the server stops reading one byte past the limit.
        limited.request().contentType("application/json").body(new Spaces(FIFTY_MIB)).post("/v1/spectrum")
                .then().statusCode(413).contentType("application/problem+json")
                .body("type", equalTo("https://statesum.org/problems/body-too-large"));
    }

    @Test
    void tenThousandDeepNestingIs400NamingTheLimit() {
        String deep = "{\"levels\": " + "[".repeat(10_000) + "]".repeat(10_000) + "}";
        Response answer = post(deep);
        answer.then().statusCode(400).contentType("application/problem+json")
                .body("detail", containsString("nesting deeper than 32 levels"))
                .body("detail", containsString("STATESUM_MAX_NESTING_DEPTH"));
        LeakChecks.assertNoInternals(answer);
    }

    @Test
    void aHugeStringIs400NamingTheLimit() {
        post("{\"energyUnit\": \"" + "k".repeat(1 << 20) + "\"}")
                .then().statusCode(400)
                .body("detail", containsString("a string longer than 4096 characters (STATESUM_MAX_STRING_LENGTH)"));
    }

    @Test
    void aHugeMemberNameIs400NamingTheLimit() {
        post("{\"" + "k".repeat(1 << 20) + "\": 1}")
                .then().statusCode(400)
                .body("detail", containsString("a member name longer than 4096 characters"));
    }

    @Test
    void aThousandDigitNumberIs400() {
        post("{\"energyUnit\": " + "9".repeat(2000) + "}")
                .then().statusCode(400)
                .body("detail", containsString("a number longer than 1000 characters"));
    }

    @Test
    void aJobOverTheComputeBudgetIs422StatingTheBudget() {
        // 20 000 levels x 100 000 temperatures = 2e9 pairs > 1e9.
        String energies = "[" + "1,".repeat(19_999) + "1]";
        post(LeakChecks.spectrumRequest("{\"energies\": " + energies + "}", "\"K\"",
                "{\"start\": 1, \"stop\": 1000, \"count\": 100000}", ""))
                .then().statusCode(422)
                .body("errors.pointer", hasItems(""))
                .body("errors[0].message", containsString("2000000000"))
                .body("errors[0].message", containsString("compute budget of 1000000000 pairs"));
    }

    @Test
    void populationsBeyondTheLimitAre422() {
        // 1001 levels x 1000 temperatures = 1 001 000 populations > 1 000 000.
        String energies = "[" + "1,".repeat(1000) + "1]";
        post(LeakChecks.spectrumRequest("{\"energies\": " + energies + "}", "\"K\"",
                "{\"start\": 1, \"stop\": 1000, \"count\": 1000}", ", \"include\": [\"populations\"]"))
                .then().statusCode(422)
                .body("errors.pointer", hasItems("/include"))
                .body("errors[0].message", containsString("limit of 1000000 (STATESUM_MAX_POPULATION_CELLS)"));
    }

    private Response post(String body) {
        return server.request().contentType("application/json").body(body).post("/v1/spectrum");
    }

    /** An input stream of {@code size} spaces, produced on demand (nothing held in memory). */
    private static final class Spaces extends InputStream {

        private long left;

        Spaces(long size) {
            left = size;
        }

        @Override
        public int read() {
            if (left <= 0) {
                return -1;
            }
            left--;
            return ' ';
        }

        @Override
        public int read(byte[] b, int off, int len) {
            if (left <= 0) {
                return -1;
            }
            int n = (int) Math.min(len, left);
            java.util.Arrays.fill(b, off, off + n, (byte) ' ');
            left -= n;
            return n;
        }
    }
}
