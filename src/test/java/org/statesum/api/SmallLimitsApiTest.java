package org.statesum.api;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItems;

import io.restassured.response.Response;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.TestServer;

/** A server started with small limits applies each of them, and says which one was hit. */
class SmallLimitsApiTest {

    private static TestServer server;

    @BeforeAll
    static void start() {
        server = TestServer.with(new ServiceConfig(0, 2048, 8, 100, 10, 5, 20, 6));
    }

    @AfterAll
    static void stop() {
        server.stop();
    }

    @Test
    void aSmallRequestIsStillAnswered() {
        post("{\"levels\": {\"energies\": [0, 1]}, \"energyUnit\": \"K\", \"temperatures\": {\"values\": [1, 2]}}")
                .then().statusCode(200);
    }

    @Test
    void theBodyLimitApplies() {
        post("{\"levels\": {\"energies\": [" + "0,".repeat(1500) + "0]}}").then().statusCode(413)
                .body("detail", containsString("limit of 2048 bytes"));
    }

    @Test
    void theNestingLimitApplies() {
        post("{\"levels\": " + "[".repeat(9) + "]".repeat(9) + "}").then().statusCode(400)
                .body("detail", containsString("nesting deeper than 8 levels"));
    }

    @Test
    void theStringLimitApplies() {
        post("{\"energyUnit\": \"" + "e".repeat(101) + "\"}").then().statusCode(400)
                .body("detail", containsString("a string longer than 100 characters"));
    }

    @Test
    void theLevelAndTemperatureLimitsApply() {
        post("{\"levels\": {\"energies\": [" + "0,".repeat(10) + "0]}, \"energyUnit\": \"K\", "
                + "\"temperatures\": {\"start\": 1, \"stop\": 2, \"count\": 6}}")
                .then().statusCode(422)
                .body("errors.pointer", hasItems("/levels/energies", "/temperatures/count"))
                .body("errors.message", hasItems("has 11 elements; the limit is 10", "must be an integer from 1 to 5"));
    }

    @Test
    void theComputeBudgetApplies() {
        post("{\"levels\": {\"energies\": [0, 1, 2, 3, 4]}, \"energyUnit\": \"K\", "
                + "\"temperatures\": {\"values\": [1, 2, 3, 4, 5]}}")
                .then().statusCode(422)
                .body("errors[0].message", containsString("25 exceeds the compute budget of 20 pairs"));
    }

    @Test
    void thePopulationLimitApplies() {
        post("{\"levels\": {\"energies\": [0, 1, 2]}, \"energyUnit\": \"K\", "
                + "\"temperatures\": {\"values\": [1, 2, 3]}, \"include\": [\"populations\"]}")
                .then().statusCode(422)
                .body("errors.pointer", hasItems("/include"))
                .body("errors[0].message", containsString("limit of 6"));
    }

    private Response post(String body) {
        return server.request().contentType("application/json").body(body).post("/v1/spectrum");
    }
}
