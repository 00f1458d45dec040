package org.statesum.api.sampled;

import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.path.json.JsonPath;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.statesum.testing.TestServer;

/**
 * Overlap diagnostics of the pairwise estimators, and answers that keep their schema for extreme
 * reduced potentials. Two wells u_k = (x - c_k)^2 / 2 of equal width have f_1 - f_0 = 0 exactly
 * (Gaussian integral) wherever their centres are.
 */
class SampledOverlapApiTest {

    private final TestServer server = TestServer.shared();

    /** Two unit wells {@code gap} apart, {@code n} exact (seeded) samples of each. */
    private static String wells(String method, double gap, int n) {
        Random random = new Random(7);
        double[] x = new double[2 * n];
        for (int i = 0; i < 2 * n; i++) {
            x[i] = (i < n ? 0 : gap) + random.nextGaussian();
        }
        StringBuilder json = new StringBuilder("{\"method\": \"" + method + "\", \"reducedPotentials\": [");
        for (int s = 0; s < 2; s++) {
            json.append(s == 0 ? "[" : ", [");
            for (int i = 0; i < x.length; i++) {
                double d = x[i] - s * gap;
                json.append(i == 0 ? "" : ",").append(0.5 * d * d);
            }
            json.append(']');
        }
        return json.append("], \"sampleCounts\": [" + n + ", " + n + "]}").toString();
    }

    @Test
    void exponentialAveragingOverWellsEightWidthsApartIsFlagged() {
        // the audit's case: EXP answered 10.73 +- 0.77 with no warning; the truth is 0
        JsonPath answer = server.request().contentType("application/json").body(wells("exponential-averaging", 8, 1000))
                .post("/v1/sampled").then().statusCode(200)
                .body("warnings.code", contains("STATES_DO_NOT_OVERLAP"))
                .body("warnings[0].states", contains(0, 1))
                .body("pairs[0].states", contains(0, 1))
                .body("pairs[0].samples", equalTo(1000))
                .extract().jsonPath();
        assertTrue(answer.getDouble("pairs[0].effectiveSampleSize") < 10, answer.prettify());
    }

    @Test
    void barOverWellsEightWidthsApartIsFlagged() {
        JsonPath answer = server.request().contentType("application/json").body(wells("bar", 8, 1000))
                .post("/v1/sampled").then().statusCode(200)
                .body("warnings.code", hasItem("STATES_DO_NOT_OVERLAP"))
                .extract().jsonPath();
        assertTrue(answer.getDouble("pairs[0].overlap") < 0.03, answer.prettify());
    }

    @ParameterizedTest
    @ValueSource(strings = {"exponential-averaging", "bar"})
    void wellOverlappingWellsAreNotFlagged(String method) {
        JsonPath answer = server.request().contentType("application/json").body(wells(method, 0.5, 1000))
                .post("/v1/sampled").then().statusCode(200)
                .body("warnings", empty())
                .extract().jsonPath();
        if (method.equals("exponential-averaging")) {
            // shifted by 0.5 sigma: the weights e^{-w} have an effective size of n e^{-0.25} (lognormal, common practice)
            double ess = answer.getDouble("pairs[0].effectiveSampleSize");
            assertTrue(ess > 600 && ess <= 1000, "" + ess);
        } else {
            // the two-state overlap of unit Gaussians 0.5 apart is near 1/2 (equal counts)
            double overlap = answer.getDouble("pairs[0].overlap");
            assertTrue(overlap > 0.35 && overlap <= 0.5, "" + overlap);
        }
    }

    @Test
    void barWithSamplesThatShareNoWeightIsA422NotANullUncertainty() {
        // the audit's request: answered "uncertainties": [0.0, null] with an error bound of 4e301
        server.request().contentType("application/json")
                .body("{\"method\":\"bar\",\"reducedPotentials\":[[0.1,0.4,-576566.7605548006,2.0],"
                        + "[0.5,0.3,0.2,2147483648]],\"sampleCounts\":[2,2]}")
                .post("/v1/sampled").then().statusCode(422)
                .body("errors.pointer", contains("/reducedPotentials"))
                .body("detail", org.hamcrest.Matchers.containsString("do not overlap"));
    }

    private static final double[] EXTREMES = {0, 1e-300, -1e-300, 1, -1, 700, -700, 745.2, 1e5, -576566.76, 2147483648.0,
        -2147483648.0, 1e15, 1e300, -1e300, 1.7e308, -1.7e308};

    /**
     * Extreme reduced potentials for every estimator: the answer is a 200 that matches the contract (every
     * number finite: the validator refuses a null) or a 422 problem, never a 5xx.
     */
    @Property(tries = 300, shrinking = ShrinkingMode.OFF)
    void extremeReducedPotentialsGiveAnAnswerOrAProblem(@ForAll long seed) {
        Random random = new Random(seed);
        int states = 2 + random.nextInt(2);
        int[] counts = new int[states];
        int total = 0;
        for (int s = 0; s < states; s++) {
            counts[s] = 2 + random.nextInt(3);
            total += counts[s];
        }
        StringBuilder u = new StringBuilder("[");
        for (int s = 0; s < states; s++) {
            u.append(s == 0 ? "[" : ",[");
            for (int n = 0; n < total; n++) {
                double v = random.nextInt(3) == 0 ? random.nextGaussian() * Math.pow(10, random.nextInt(12))
                        : EXTREMES[random.nextInt(EXTREMES.length)];
                u.append(n == 0 ? "" : ",").append(v);
            }
            u.append(']');
        }
        u.append(']');
        StringBuilder c = new StringBuilder("[");
        for (int s = 0; s < states; s++) {
            c.append(s == 0 ? "" : ",").append(counts[s]);
        }
        c.append(']');
        for (String method : new String[] {"exponential-averaging", "bar", "mbar"}) {
            String extra = method.startsWith("exp") && random.nextBoolean() ? ", \"direction\": \"reverse\"" : "";
            String body = "{\"method\":\"" + method + "\",\"reducedPotentials\":" + u + ",\"sampleCounts\":" + c + extra + "}";
            int status = server.request().contentType("application/json").body(body).post("/v1/sampled")
                    .then().extract().statusCode();
            assertTrue(status == 200 || status == 422, status + " for " + body);
        }
    }
}
