package org.statesum.api.sampled;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.lessThan;
import static org.junit.jupiter.api.Assertions.assertEquals;

import io.restassured.path.json.JsonPath;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Random;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.TestServer;

class SampledApiTest {

    private final TestServer server = TestServer.shared();

    /**
     * Two harmonic wells u_k = (kappa_k / 2)(x - c_k)^2, sampled exactly (seeded): f_1 - f_0 =
     * (1/2) ln(kappa_1 / kappa_0) (Gaussian integral; Shirts and Chodera 2008, sec. V.A).
     */
    private static String wells(String method, double[] springs, double[] centres, int perState, String extra) {
        Random random = new Random(42);
        int k = springs.length;
        double[] x = new double[k * perState];
        for (int s = 0; s < k; s++) {
            for (int i = 0; i < perState; i++) {
                x[s * perState + i] = centres[s] + random.nextGaussian() / Math.sqrt(springs[s]);
            }
        }
        StringBuilder json = new StringBuilder("{\"method\": \"" + method + "\", \"reducedPotentials\": [");
        for (int s = 0; s < k; s++) {
            json.append(s == 0 ? "[" : ", [");
            for (int n = 0; n < x.length; n++) {
                double d = x[n] - centres[s];
                json.append(n == 0 ? "" : ",").append(0.5 * springs[s] * d * d);
            }
            json.append(']');
        }
        json.append("], \"sampleCounts\": [");
        for (int s = 0; s < k; s++) {
            json.append(s == 0 ? "" : ", ").append(perState);
        }
        return json.append(']').append(extra).append('}').toString();
    }

    private static final double[] SPRINGS = {1, 2, 4};
    private static final double[] CENTRES = {0, 0.5, 1};

    @Test
    void mbarGivesTheAnalyticDifferencesInKtAndInKilojoulesPerMole() {
        JsonPath answer = server.request().contentType("application/json")
                .body(wells("mbar", SPRINGS, CENTRES, 2000, ", \"temperature\": 300, \"outputUnit\": \"kJ/mol\""))
                .post("/v1/sampled")
                .then().statusCode(200)
                .body("reducedFreeEnergies.unit", equalTo("1"))
                .body("freeEnergies.unit", equalTo("kJ/mol"))
                .body("precision.relativeGradient", lessThan(1e-10))
                .body("warnings", org.hamcrest.Matchers.empty())
                .extract().jsonPath();
        for (int k = 1; k < 3; k++) {
            double f = answer.getDouble("reducedFreeEnergies.values[" + k + "]");
            double sd = answer.getDouble("reducedFreeEnergies.uncertainties[" + k + "]");
            // Analytic (1/2) ln(kappa_k / kappa_0); 4 sd leaves a 6e-5 chance of a false failure.
            assertEquals(0.5 * Math.log(SPRINGS[k]), f, 4 * sd);
            // F = f R T: R = N_A k_B = 8.31446261815324 J/(mol K) (CODATA 2018, exact product), so
            // R T / 1000 in kJ/mol at 300 K; 1e-12 relative covers the conversion's roundings.
            double rt = 8.31446261815324 * 300 / 1000;
            assertEquals(f * rt, answer.getDouble("freeEnergies.values[" + k + "]"), 1e-12 * rt * Math.abs(f));
            assertEquals(f, answer.getDouble("reducedFreeEnergyDifferences.values[0][" + k + "]"), 0);
        }
        assertEquals(answer.getDouble("reducedFreeEnergies.uncertainties[2]"),
                answer.getDouble("reducedFreeEnergyDifferences.uncertainties[0][2]"), 0);
        assertEquals(1.0, answer.getDouble("overlap.matrix[0][0]") + answer.getDouble("overlap.matrix[0][1]")
                + answer.getDouble("overlap.matrix[0][2]"), 1e-9); // rows of O sum to 1 (Shirts and Chodera 2008)
    }

    @Test
    void barAndExponentialAveragingAnswerInTheSameShape() {
        for (String method : new String[] {"bar", "exponential-averaging"}) {
            server.request().contentType("application/json")
                    .body(wells(method, SPRINGS, CENTRES, 2000, ""))
                    .post("/v1/sampled")
                    .then().statusCode(200)
                    .body("method", equalTo(method))
                    // Analytic (1/2) ln 4 = 0.693; 0.1 is about 4 sd of these estimates at 2000 samples.
                    .body("reducedFreeEnergies.values[2]", closeTo(0.5 * Math.log(4), 0.1));
        }
    }

    @Test
    void aGzipBodyGivesTheSameAnswer() throws IOException {
        String json = wells("mbar", SPRINGS, CENTRES, 500, "");
        double plain = server.request().contentType("application/json").body(json).post("/v1/sampled")
                .then().statusCode(200).extract().jsonPath().getDouble("reducedFreeEnergies.values[2]");
        server.request().contentType("application/json").header("Content-Encoding", "gzip").body(gzip(json))
                .post("/v1/sampled")
                .then().statusCode(200).body("reducedFreeEnergies.values[2]", equalTo(plain));
    }

    @Test
    void aGzipBombIsRefusedWith413() throws IOException {
        TestServer small = TestServer.with(ServiceConfig.fromEnvironment(
                java.util.Map.of("STATESUM_MAX_BODY_BYTES", String.valueOf(1 << 20),
                        "STATESUM_MAX_STREAMED_BODY_BYTES", String.valueOf(1 << 20))));
        try {
            // 16 MiB of blanks inflate from about 16 KiB: the limits (1 MiB) apply to the inflated size,
            // on the streamed route and on the routes that read the whole body.
            byte[] bomb = gzip("{\"method\": \"mbar\"" + " ".repeat(16 << 20) + "}");
            small.request().contentType("application/json").header("Content-Encoding", "gzip").body(bomb)
                    .post("/v1/sampled")
                    .then().statusCode(413).contentType("application/problem+json")
                    .body("detail", containsString("STATESUM_MAX_STREAMED_BODY_BYTES"));
            small.request().contentType("application/json").header("Content-Encoding", "gzip").body(bomb)
                    .post("/v1/spectrum")
                    .then().statusCode(413).contentType("application/problem+json")
                    .body("detail", containsString("STATESUM_MAX_BODY_BYTES"));
        } finally {
            small.stop();
        }
    }

    @Test
    void anUnknownContentCodingIs415AndBrokenGzipIs400() {
        server.request().contentType("application/json").header("Content-Encoding", "br").body("{}")
                .post("/v1/sampled").then().statusCode(415);
        server.request().contentType("application/json").header("Content-Encoding", "gzip")
                .body("not gzip".getBytes(StandardCharsets.UTF_8))
                .post("/v1/sampled").then().statusCode(400);
    }

    @Test
    void everyBadFieldIsNamedInOneAnswer() {
        server.request().contentType("application/json")
                .body("""
                        {"method": "mbar", "direction": "reverse",
                         "reducedPotentials": [[0, 1, "x"], [0, 1]], "sampleCounts": [2, -1],
                         "temperature": -5, "extra": 1}""")
                .post("/v1/sampled")
                .then().statusCode(422).contentType("application/problem+json")
                .body("errors.pointer", hasItems("/direction", "/reducedPotentials/0/2", "/sampleCounts/1",
                        "/temperature", "/extra"));
        server.request().contentType("application/json")
                .body("""
                        {"method": "bar", "reducedPotentials": [[0, 1, 2], [0, 1]], "sampleCounts": [3, 0]}""")
                .post("/v1/sampled")
                .then().statusCode(422)
                .body("errors.pointer", hasItems("/reducedPotentials/1", "/sampleCounts/1"));
    }

    @Test
    void statesThatDoNotOverlapAreNamed() {
        // Centre 40 is 40 standard deviations from the others: no sample of one well reaches it.
        server.request().contentType("application/json")
                .body(wells("mbar", new double[] {1, 1, 1}, new double[] {0, 0.5, 40}, 200, ""))
                .post("/v1/sampled")
                .then().statusCode(200)
                .body("warnings.code", contains("STATES_DO_NOT_OVERLAP"))
                .body("warnings[0].states", contains(2))
                .body("overlap.secondLargestEigenvalue", closeTo(1.0, 1e-6));
    }

    @Test
    void theExampleFileAnswersForEveryMethod() throws IOException {
        String example = java.nio.file.Files.readString(java.nio.file.Path.of("examples/solvation-windows.json"));
        for (String method : new String[] {"mbar", "bar", "exponential-averaging"}) {
            server.request().contentType("application/json")
                    .body(example.replace("\"mbar\"", "\"" + method + "\""))
                    .post("/v1/sampled")
                    .then().statusCode(200)
                    .body("method", equalTo(method))
                    .body("freeEnergyDifferences.values[1][1]", equalTo(0.0))
                    .body("freeEnergies.temperature.value", equalTo(298.15));
        }
    }

    private static byte[] gzip(String text) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (GZIPOutputStream out = new GZIPOutputStream(bytes)) {
            out.write(text.getBytes(StandardCharsets.UTF_8));
        }
        return bytes.toByteArray();
    }
}
