package org.statesum.api.solid;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;

import org.junit.jupiter.api.Test;
import org.statesum.testing.TestServer;
import org.statesum.units.PhysicalConstants;

class CrystalApiTest {

    private static final double R = PhysicalConstants.GAS_CONSTANT_J_PER_MOL_K;

    private final TestServer server = TestServer.shared();

    @Test
    void debyeCrystalPerMoleOfAtomsAtItsDebyeTemperature() {
        server.request().contentType("application/json")
                .body("""
                        {"atomsPerFormulaUnit": 2, "vibrations": {"model": "debye", "temperature": 428},
                         "temperatures": {"values": [0, 428]}, "basis": "atom", "outputUnit": "kJ/mol"}""")
                .post("/v1/crystal")
                .then().statusCode(200)
                .body("isochoricHeatCapacity.unit", equalTo("J/(mol K)"))
                // 0.951732135703279 of 3R at T = theta_D (30-digit quadrature, see DebyeSolidTest).
                .body("isochoricHeatCapacity.values[1]", closeTo(0.951732135703279 * 3 * R, 1e-10))
                // Zero-point energy 9/8 R theta_D per mole of atoms (Kittel, ch. 5), in kJ/mol.
                .body("zeroPointEnergy.values[0]", closeTo(9.0 / 8 * R * 428 / 1000, 1e-12))
                .body("precision.debyeFunction", containsString("power series"))
                .body("system.basis", equalTo("atom"));
    }

    @Test
    void einsteinByFrequencyInWavenumbers() {
        // theta_E = h c nu~ / k = 1.438776877 K cm per cm-1 (CODATA 2018 second radiation constant c2): 200 cm-1
        // gives 287.755 K; at T = theta_E, C_V = 0.920673594 of 3R per atom (see HarmonicModesTest).
        server.request().contentType("application/json")
                .body("""
                        {"atomsPerFormulaUnit": 1, "vibrations": {"model": "einstein", "frequency": 200,
                         "frequencyUnit": "cm-1"}, "temperatures": {"values": [287.7553755]}, "outputUnit": "kJ/mol"}""")
                .post("/v1/crystal")
                .then().statusCode(200)
                .body("isochoricHeatCapacity.values[0]", closeTo(0.920673594 * 3 * R, 1e-6));
    }

    @Test
    void unstableModesAreAllNamedAndSmallOnesReported() {
        server.request().contentType("application/json")
                .body("""
                        {"atomsPerFormulaUnit": 1, "vibrations": {"model": "phonons", "frequencyUnit": "THz",
                          "qPoints": [{"weight": 1, "frequencies": [-0.8, 2, 3]}, {"weight": 1, "frequencies": [1, -2.5, 3]}]},
                         "temperatures": {"values": [300]}}""")
                .post("/v1/crystal")
                .then().statusCode(422).contentType("application/problem+json")
                .body("errors.pointer", contains("/vibrations/qPoints/0/frequencies/0",
                        "/vibrations/qPoints/1/frequencies/1"))
                .body("errors[0].message", containsString("dynamically unstable"));
        server.request().contentType("application/json")
                .body("""
                        {"atomsPerFormulaUnit": 1, "vibrations": {"model": "phonons", "frequencyUnit": "THz",
                          "modeTolerance": 0.05, "qPoints": [{"weight": 1, "frequencies": [-0.01, 0, 3]}]},
                         "temperatures": {"values": [300]}}""")
                .post("/v1/crystal")
                .then().statusCode(200)
                .body("warnings.code", contains("ACOUSTIC_MODES_LEFT_OUT", "IMAGINARY_MODES_LEFT_OUT"))
                .body("system.modesLeftOut.nearZeroModes", closeTo(1.0, 0))
                .body("system.modesLeftOut.smallImaginaryModes", closeTo(1.0, 0));
    }

    @Test
    void everyBadFieldIsNamedInOneAnswer() {
        server.request().contentType("application/json")
                .body("""
                        {"atomsPerFormulaUnit": 1.5, "vibrations": {"model": "density-of-states", "frequencyUnit": "GHz",
                          "frequencies": [0, 2, 1], "density": [0, -1, 0]},
                         "temperatures": {"values": [-3]}, "basis": "cell", "colour": "red"}""")
                .post("/v1/crystal")
                .then().statusCode(422)
                .body("errors.pointer", hasItems("/atomsPerFormulaUnit", "/vibrations/frequencyUnit",
                        "/vibrations/frequencies/2", "/vibrations/density/1", "/temperatures/values/0", "/basis",
                        "/colour"));
    }

    @Test
    void aDensityThatFailsItsNormalisationCheckIsNamed() {
        server.request().contentType("application/json")
                .body("""
                        {"atomsPerFormulaUnit": 1, "vibrations": {"model": "density-of-states", "frequencyUnit": "meV",
                          "frequencies": [0, 10, 20], "density": [0, 0.5, 0], "normalisation": "check"},
                         "temperatures": {"values": [300]}}""")
                .post("/v1/crystal")
                .then().statusCode(422)
                .body("errors.pointer", contains("/vibrations/density"));
        server.request().contentType("application/json")
                .body("""
                        {"atomsPerFormulaUnit": 1, "vibrations": {"model": "density-of-states", "frequencyUnit": "meV",
                          "frequencies": [0, 10, 20], "density": [0, 0.5, 0]},
                         "temperatures": {"values": [300]}}""")
                .post("/v1/crystal")
                .then().statusCode(200)
                .body("system.normalisation.factor", closeTo(0.6, 1e-15))
                .body("warnings.code", contains("DENSITY_RESCALED"));
    }

    /**
     * The audit's case: a nu^2 density on 49 nodes from 0 to 12 THz. Far below the first node the answer is
     * the first segment's own power law, g = g_1 theta / theta_1 giving S = 3 zeta(3) (g_1 / theta_1) k_B T^2
     * (int x phi_S dx = int x^2 n dx - int x ln(1 - e^{-x}) dx = 2 zeta(3) + zeta(3), over x &gt; 0; common
     * practice), where a sum over nodes would fall off as e^{-theta_1 / T}.
     */
    @Test
    void aDensityOfStatesFollowsItsFirstSegmentFarBelowItsFirstNode() throws Exception {
        StringBuilder nu = new StringBuilder();
        StringBuilder g = new StringBuilder();
        for (int i = 0; i < 49; i++) {
            double f = 12.0 * i / 48;
            nu.append(i == 0 ? "" : ",").append(f);
            g.append(i == 0 ? "" : ",").append(9 * f * f / (12.0 * 12 * 12)); // 3 modes per THz^3 / 3
        }
        String body = "{\"atomsPerFormulaUnit\": 1, \"vibrations\": {\"model\": \"density-of-states\","
                + " \"frequencyUnit\": \"THz\", \"frequencies\": [" + nu + "], \"density\": [" + g + "], \"normalisation\": \"check\"},"
                + " \"temperatures\": {\"values\": [0.001, 0.1]}, \"outputUnit\": \"kJ/mol\"}";
        com.fasterxml.jackson.databind.JsonNode answer = new com.fasterxml.jackson.databind.ObjectMapper().readTree(
                server.request().contentType("application/json").body(body).post("/v1/crystal")
                        .then().statusCode(200).extract().asString());
        double kelvinPerThz = org.statesum.units.FrequencyUnit.bySymbol("THz").orElseThrow().toKelvin(1.0);
        double theta1 = 0.25 * kelvinPerThz;
        double g1PerKelvin = 9 * 0.25 * 0.25 / (12.0 * 12 * 12) / kelvinPerThz;
        double zeta3 = 1.2020569031595942; // Apery's constant (OEIS A002117)
        double r = org.statesum.units.PhysicalConstants.GAS_CONSTANT_J_PER_MOL_K;
        double[] temperatures = {0.001, 0.1};
        for (int j = 0; j < 2; j++) {
            double t = temperatures[j];
            double expected = 3 * zeta3 * g1PerKelvin / theta1 * t * t * r; // J/(mol K)
            double s = answer.at("/entropy/values/" + j).asDouble();
            double bound = answer.at("/entropy/errorBounds/" + j).asDouble();
            // the next correction is of order e^{-theta_1 / T} (theta_1 = 12 K): e^-120 at 0.1 K
            org.junit.jupiter.api.Assertions.assertEquals(expected, s, 1e-9 * expected, "S at " + t + " K");
            org.junit.jupiter.api.Assertions.assertTrue(bound < 1e-9 * s, "the bound is useful at " + t + " K: " + bound);
        }
    }

    /**
     * A q-point mesh whose Gamma point has three zero acoustic modes: they are left out, and the answer says
     * what that costs. Classical limit of the kept modes (common practice): C_V -&gt; (kept modes) k_B, here
     * (6 - 3 / 4) of the Dulong-Petit 6 k_B for 2 atoms, the Gamma point carrying a quarter of the weight.
     */
    @Test
    void theAcousticModesLeftOutAtGammaAreCountedInTheHighTemperatureLimit() throws Exception {
        com.fasterxml.jackson.databind.JsonNode answer = new com.fasterxml.jackson.databind.ObjectMapper().readTree(
                server.request().contentType("application/json")
                        .body("""
                        {"atomsPerFormulaUnit": 2, "vibrations": {"model": "phonons", "frequencyUnit": "THz",
                          "qPoints": [{"weight": 1, "frequencies": [0, 0, 0, 4, 5, 6]},
                                      {"weight": 3, "frequencies": [1.5, 2, 2.5, 4.2, 5.1, 6.3]}]},
                         "temperatures": {"values": [1.0e6]}, "outputUnit": "kJ/mol"}""")
                        .post("/v1/crystal").then().statusCode(200).extract().asString());
        double cv = answer.at("/isochoricHeatCapacity/values/0").asDouble();
        // at 1e6 K every kept mode is classical to (theta / T)^2 / 12 < 1e-8 relative
        org.junit.jupiter.api.Assertions.assertEquals(5.25 * R, cv, 1e-7 * cv);
        String message = answer.at("/warnings/0/message").asText();
        org.junit.jupiter.api.Assertions.assertTrue(message.contains("C_V tends to 5.25 k_B per formula unit, 0.875 of"),
                message);
    }
}
