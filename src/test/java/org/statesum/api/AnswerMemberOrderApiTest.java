package org.statesum.api;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.statesum.testing.TestServer;

/**
 * The same request gives the same bytes in every JVM: every amount is written "unit" first. Built
 * with Map.of, the quasi-harmonic and sampled temperatures and pressures came out in an order that
 * changed from one JVM start to the next.
 */
class AnswerMemberOrderApiTest {

    private static String post(String path, String example) throws Exception {
        return TestServer.shared().request().contentType("application/json")
                .body(Files.readString(Path.of("examples", example))).post(path).then().statusCode(200)
                .extract().asString();
    }

    @Test
    void quasiHarmonicAmountsComeUnitFirst() throws Exception {
        String answer = post("/v1/quasi-harmonic", "tessaride-alpha-qha.json");
        assertTrue(answer.startsWith("{\"temperature\":{\"unit\":\"K\",\"values\":["), answer.substring(0, 80));
        assertTrue(answer.contains("\"pressure\":{\"unit\":\"GPa\",\"value\":"), answer.substring(0, 400));
    }

    @Test
    void sampledTemperatureComesUnitFirst() throws Exception {
        String answer = post("/v1/sampled", "solvation-windows.json");
        assertTrue(answer.contains("\"temperature\":{\"unit\":\"K\",\"value\":"), answer);
    }
}
