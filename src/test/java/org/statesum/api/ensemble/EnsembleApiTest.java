package org.statesum.api.ensemble;

import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.statesum.testing.TestServer;
import org.statesum.units.PhysicalConstants;

/** POST /v1/ensemble, and ensembles as reaction species, against closed forms and the spectrum endpoint. */
class EnsembleApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final double R = PhysicalConstants.GAS_CONSTANT_J_PER_MOL_K;
    private final TestServer server = TestServer.shared();

    private JsonNode post(String path, String body) throws Exception {
        return JSON.readTree(server.request().contentType("application/json").body(body).post(path)
                .then().statusCode(200).extract().asString());
    }

    /** A member that is one level at {@code energy} kJ/mol. */
    private static String level(String name, double energy, int degeneracy) {
        return "{\"name\": \"" + name + "\", \"model\": \"spectrum\", \"degeneracy\": " + degeneracy
                + ", \"input\": {\"levels\": {\"energies\": [" + energy + "]}, \"energyUnit\": \"kJ/mol\"}}";
    }

    @Test
    void twoMembersWithEqualFreeEnergiesMixWithExactlyRLnTwo() throws Exception {
        JsonNode answer = post("/v1/ensemble", "{\"members\": [" + level("a", 1.5, 1) + ", " + level("b", 1.5, 1)
                + "], \"temperatures\": {\"values\": [0, 100, 1000]}}");
        for (int j = 0; j < 3; j++) {
            // R ln 2: each member has S = 0 (one level), so the ensemble's entropy is the mixing entropy
            assertEquals(R * Math.log(2), answer.at("/mixingEntropy/values/" + j).asDouble(), 1e-12);
            assertEquals(R * Math.log(2), answer.at("/entropy/values/" + j).asDouble(), 1e-12);
            assertEquals(0.5, answer.at("/populations/values/" + j + "/0").asDouble(), 1e-15);
        }
        assertTrue(answer.at("/warnings").toString().contains("MEMBERS_LOOK_ALIKE"), answer.at("/warnings").toString());
    }

    @Test
    void anEnsembleOfSingleLevelsIsTheSpectrumOfThoseLevels() throws Exception {
        // G = -RT ln sum d_i e^{-E_i / RT} is the spectrum's F; C_p is all fluctuation (each member's is 0)
        String grid = "\"temperatures\": {\"values\": [50, 150, 300, 900]}";
        JsonNode ensemble = post("/v1/ensemble", "{\"members\": [" + level("ground", 0, 1) + ", "
                + level("mid", 1.2, 3) + ", " + level("top", 3.0, 2) + "], " + grid + "}");
        JsonNode spectrum = post("/v1/spectrum", "{\"levels\": {\"energies\": [0, 1.2, 3.0], \"degeneracies\": [1, 3, 2]},"
                + " \"energyUnit\": \"kJ/mol\", \"outputUnit\": \"kJ/mol\", " + grid + "}");
        for (int j = 0; j < 4; j++) {
            String[][] pairs = {{"gibbsEnergy", "helmholtzEnergy"}, {"enthalpy", "internalEnergy"},
                {"entropy", "entropy"}, {"isobaricHeatCapacity", "isochoricHeatCapacity"}};
            for (String[] pair : pairs) {
                double a = ensemble.at("/" + pair[0] + "/values/" + j).asDouble();
                double ab = ensemble.at("/" + pair[0] + "/errorBounds/" + j).asDouble();
                double b = spectrum.at("/" + pair[1] + "/values/" + j).asDouble();
                double bb = spectrum.at("/" + pair[1] + "/errorBounds/" + j).asDouble();
                assertEquals(b, a, ab + bb, pair[0] + " at " + j);
                assertTrue(ab < 1e-10 * Math.max(1, Math.abs(a)), pair[0] + " bound " + ab);
            }
            // the populations are the spectrum's level populations, copies included
        }
        // only the members' own notes (a one-level set is "truncated" by construction), named by member
        for (JsonNode w : ensemble.at("/warnings")) {
            assertEquals("LEVEL_SET_TRUNCATED", w.get("code").asText());
            assertTrue(w.get("message").asText().startsWith("member '"), w.toString());
        }
    }

    @Test
    void theEntropyIsMinusTheSlopeOfG() throws Exception {
        double h = 1e-3;
        JsonNode answer = post("/v1/ensemble", "{\"members\": [" + level("a", 0, 2) + ", " + level("b", 2.0, 5)
                + "], \"temperatures\": {\"values\": [" + (400 - h) + ", 400, " + (400 + h) + "]}}");
        double slope = (answer.at("/gibbsEnergy/values/2").asDouble() - answer.at("/gibbsEnergy/values/0").asDouble())
                / (2 * h);
        // central difference: truncation ~ h^2 G''' / 6, rounding ~ 1e-16 |G| / h: 1e-9 kJ/(mol K) covers both
        assertEquals(answer.at("/entropy/values/1").asDouble() / 1000, -slope, 1e-9);
    }

    @Test
    void anEnsembleIsASpeciesOfAReaction() throws Exception {
        // the ensemble against the level set it equals: the reaction Gibbs energy is 0 within the bounds
        String members = "[" + level("ground", 0, 1) + ", " + level("mid", 1.2, 3) + "]";
        JsonNode reaction = post("/v1/reaction", "{\"species\": [{\"name\": \"family\", \"coefficient\": -1, "
                + "\"model\": \"ensemble\", \"input\": {\"members\": " + members + "}}, {\"name\": \"levels\", "
                + "\"coefficient\": 1, \"model\": \"spectrum\", \"input\": {\"levels\": {\"energies\": [0, 1.2], "
                + "\"degeneracies\": [1, 3]}, \"energyUnit\": \"kJ/mol\"}}], \"temperatures\": {\"values\": [300]}}");
        assertEquals(0, reaction.at("/gibbsEnergy/values/0").asDouble(), reaction.at("/gibbsEnergy/errorBounds/0").asDouble());
    }

    @Test
    void everyBadFieldOfAnEnsembleIsNamed() {
        server.request().contentType("application/json")
                .body("{\"members\": [{\"name\": \"a\", \"model\": \"spectrum\", \"degeneracy\": 2.5, \"input\": "
                        + "{\"levels\": {\"energies\": [\"x\"]}, \"energyUnit\": \"kJ/mol\"}}, {\"name\": \"a\", "
                        + "\"model\": \"ideal-gas\", \"input\": {}}], \"temperatures\": {\"values\": [300]}}")
                .post("/v1/ensemble").then().statusCode(422)
                .body("errors.pointer", hasItems("/members/0/degeneracy", "/members/0/input/levels/energies/0",
                        "/members/1/name"));
        server.request().contentType("application/json")
                .body("{\"members\": [], \"temperatures\": {\"values\": [-1]}}")
                .post("/v1/ensemble").then().statusCode(422)
                .body("errors.pointer", hasItems("/members", "/temperatures/values/0"));
    }

    @Test
    void aMemberThatNeverMattersIsNamed() {
        server.request().contentType("application/json")
                .body("{\"members\": [" + level("low", 0, 1) + ", " + level("high", 50, 1)
                        + "], \"temperatures\": {\"values\": [300]}}")
                .post("/v1/ensemble").then().statusCode(200)
                .body("warnings.code", hasItem("MEMBER_NEGLIGIBLE"))
                .body("warnings.find { it.code == 'MEMBER_NEGLIGIBLE' }.message",
                        org.hamcrest.Matchers.containsString("high"));
        server.request().contentType("application/json")
                .body("{\"members\": [" + level("low", 0, 1) + "], \"temperatures\": {\"values\": [300]}}")
                .post("/v1/ensemble").then().statusCode(200)
                .body("system.members", hasItem("low"));
    }
}
