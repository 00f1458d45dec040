package org.statesum.api.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.TestServer;

/**
 * One million levels through the real API at the default limits: the body (full-precision
 * energies) fits, and the answer is right. A harmonic ladder E_n = n theta, g = 1, truncated at
 * n = 10^6 where theta n / T > 3000, has ln Z = -ln(1 - exp(-theta / T)) (geometric series; the
 * truncated tail exp(-3000) is far below rounding).
 */
class MillionLevelsApiTest {

    /** theta = E_1 / k_B in K, with all 17 digits so that each energy prints at full length. */
    private static final double THETA_KELVIN = 1.2345678901234567;
    private static final int LEVELS = 1_000_000;

    @Test
    void aMillionLevelsOnThreeTemperaturesAreAnswered() throws Exception {
        StringBuilder body = new StringBuilder(LEVELS * 20 + 200).append("{\"levels\": {\"energies\": [");
        for (int n = 0; n < LEVELS; n++) {
            body.append(n == 0 ? "" : ",").append(n * THETA_KELVIN);
        }
        body.append("]}, \"energyUnit\": \"K\", \"temperatures\": {\"values\": [10, 300, 400]}}");
        byte[] bytes = body.toString().getBytes(StandardCharsets.UTF_8);
        assertTrue(bytes.length > 15_000_000 && bytes.length < ServiceConfig.defaults().maxBodyBytes(),
                "body of " + bytes.length + " bytes");

        String answer = TestServer.shared().request().contentType("application/json").body(bytes)
                .post("/v1/spectrum").then().statusCode(200).extract().asString();
        JsonNode lnZ = new ObjectMapper().readTree(answer).path("logPartitionFunction").path("values");
        double[] t = {10, 300, 400};
        for (int j = 0; j < t.length; j++) {
            double expected = -Math.log1p(-Math.exp(-THETA_KELVIN / t[j]));
            // Each E_n carries one rounding (n theta); 1e-12 relative covers that and the summation.
            assertEquals(expected, lnZ.get(j).doubleValue(), 1e-12 * expected, "T = " + t[j]);
        }
    }
}
