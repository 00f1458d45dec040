package org.statesum.api.ranking;

import static org.hamcrest.Matchers.hasItems;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.statesum.testing.TestServer;

/**
 * POST /v1/ranking against closed forms. Two-level candidates: a level at Delta with degeneracy g against
 * a non-degenerate one at 0 (G_1 = Delta - kT ln g, G_0 = 0 per particle) exchange places at
 * T = Delta / (k ln g) (common practice: equal G).
 */
class RankingApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private final TestServer server = TestServer.shared();

    private static String level(String name, double energyKelvin, int degeneracy) {
        return "{\"name\": \"" + name + "\", \"model\": \"spectrum\", \"input\": {\"levels\": {\"energies\": ["
                + energyKelvin + "], \"degeneracies\": [" + degeneracy + "]}, \"energyUnit\": \"K\"}}";
    }

    @Test
    void aDegenerateHigherLevelTakesOverAtDeltaOverKLnG() throws Exception {
        JsonNode answer = JSON.readTree(server.request().contentType("application/json")
                .body("{\"candidates\": [" + level("ground", 0, 1) + ", " + level("spread", 300, 4)
                        + "], \"temperatures\": {\"start\": 50, \"stop\": 500, \"count\": 10}, \"outputUnit\": \"K\"}")
                .post("/v1/ranking").then().statusCode(200).extract().asString());
        double expected = 300 / Math.log(4); // 216.4 K
        JsonNode exchange = answer.at("/exchanges/0");
        assertEquals(expected, exchange.get("temperature").asDouble(), exchange.get("errorBound").asDouble() + 1e-9);
        assertEquals("ground", exchange.get("lowerBelow").asText());
        assertEquals(1, answer.at("/exchanges").size());
        // below: ground first with the gap Delta - T ln g (K units); above: spread first
        assertEquals("ground", answer.at("/ranking/0/mostStable").asText());
        assertEquals(300 - 50 * Math.log(4), answer.at("/ranking/0/gaps/values/1").asDouble(), 1e-10);
        assertTrue(answer.at("/ranking/0/certain").asBoolean());
        assertEquals("spread", answer.at("/ranking/9/mostStable").asText());
    }

    @Test
    void candidatesEqualWithinTheirBoundsAreATieNotAnOrder() throws Exception {
        JsonNode answer = JSON.readTree(server.request().contentType("application/json")
                .body("{\"candidates\": [" + level("a", 10, 2) + ", " + level("b", 10, 2)
                        + "], \"temperatures\": {\"values\": [100]}}")
                .post("/v1/ranking").then().statusCode(200).extract().asString());
        assertFalse(answer.at("/ranking/0/certain").asBoolean());
        assertEquals(2, answer.at("/ranking/0/tiedWithMostStable").size());
        assertEquals(0, answer.at("/exchanges").size());
    }

    @Test
    void anEnsembleCanBeACandidate() throws Exception {
        // an ensemble of the two levels against the same two levels as one spectrum: tied everywhere
        String members = "[{\"name\": \"g\", \"model\": \"spectrum\", \"input\": {\"levels\": {\"energies\": [0]},"
                + " \"energyUnit\": \"K\"}}, {\"name\": \"e\", \"model\": \"spectrum\", \"degeneracy\": 3, \"input\":"
                + " {\"levels\": {\"energies\": [40]}, \"energyUnit\": \"K\"}}]";
        JsonNode answer = JSON.readTree(server.request().contentType("application/json")
                .body("{\"candidates\": [{\"name\": \"family\", \"model\": \"ensemble\", \"input\": {\"members\": "
                        + members + "}}, {\"name\": \"levels\", \"model\": \"spectrum\", \"input\": {\"levels\": "
                        + "{\"energies\": [0, 40], \"degeneracies\": [1, 3]}, \"energyUnit\": \"K\"}}], "
                        + "\"temperatures\": {\"values\": [10, 100]}}")
                .post("/v1/ranking").then().statusCode(200).extract().asString());
        for (int j = 0; j < 2; j++) {
            assertEquals(2, answer.at("/ranking/" + j + "/tiedWithMostStable").size(), answer.toString());
        }
    }

    @Test
    void badCandidatesAreAllNamed() {
        server.request().contentType("application/json")
                .body("{\"candidates\": [" + level("a", 0, 1) + ", {\"name\": \"a\", \"model\": \"ideal-gas\","
                        + " \"input\": {}}], \"temperatures\": {\"values\": [100]}}")
                .post("/v1/ranking").then().statusCode(422)
                .body("errors.pointer", hasItems("/candidates/1/name"));
        server.request().contentType("application/json")
                .body("{\"candidates\": [" + level("a", 0, 1) + "], \"temperatures\": {\"values\": [100]}}")
                .post("/v1/ranking").then().statusCode(422)
                .body("errors.pointer", hasItems("/candidates"));
    }
}
