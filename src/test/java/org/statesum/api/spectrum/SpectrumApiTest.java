package org.statesum.api.spectrum;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;

import org.junit.jupiter.api.Test;
import org.statesum.testing.TestServer;

class SpectrumApiTest {

    private final TestServer server = TestServer.shared();

    @Test
    void twoLevelSystemAnswersWithEverySeriesAndItsUnit() {
        server.request().contentType("application/json")
                .body("""
                        {"levels": {"energies": [0, 1], "degeneracies": [1, 1]}, "energyUnit": "K",
                         "temperatures": {"values": [0.41678]}}""")
                .post("/v1/spectrum")
                .then().statusCode(200)
                .body("entropy.unit", equalTo("k_B"))
                // Two-level Schottky maximum, C_V = 0.43923 k_B at kT/D = 0.41678 (textbook result;
                // re-derived by root finding in the engine tests).
                .body("isochoricHeatCapacity.values[0]", closeTo(0.43923, 5e-6));
    }

    @Test
    void everyBadFieldIsNamedInOneAnswer() {
        server.request().contentType("application/json")
                .body("""
                        {"levels": {"energies": [0, "x"], "degeneracies": [1, -1, 3]}, "energyUnit": "Q",
                         "temperatures": {"start": 5, "stop": 1, "count": 0},
                         "particles": {"count": 1.5, "statistics": "indistinguishable"}}""")
                .post("/v1/spectrum")
                .then().statusCode(422).contentType("application/problem+json")
                .body("errors.pointer", hasItems("/levels/energies/1", "/levels/degeneracies/1", "/energyUnit",
                        "/temperatures/start", "/temperatures/count", "/particles/count"));
    }

    @Test
    void wrongMediaTypeIs415() {
        server.request().contentType("text/plain").body("{}").post("/v1/spectrum")
                .then().statusCode(415).body("errors.pointer", contains(""));
    }
}
