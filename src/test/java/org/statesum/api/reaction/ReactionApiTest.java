package org.statesum.api.reaction;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItems;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.path.json.JsonPath;
import org.junit.jupiter.api.Test;
import org.statesum.testing.TestServer;

/**
 * The water-gas shift CO + H2O = CO2 + H2 in the gas phase, against ln K from tabulated Gibbs energies
 * of formation. Every species is anchored at its tabulated enthalpy of formation at 0 K (the electronic
 * energy is set to Delta_f H°(0 K) minus the model's zero-point energy), so the test checks what the
 * rigid-rotor harmonic-oscillator model adds: the thermal enthalpy and the entropy of each species.
 *
 * <p>Source of every tabulated value: NIST-JANAF Thermochemical Tables, 4th ed. (M. W. Chase, 1998),
 * recalled from memory. Delta_f H°(0 K), kJ/mol: CO -113.805, H2O(g) -238.921, CO2 -393.151, H2 0.
 * Delta_f G°, kJ/mol, at 298.15 K: CO -137.163, H2O(g) -228.582, CO2 -394.389; at 1000 K: CO -200.275,
 * H2O(g) -192.590, CO2 -395.886. Hence Delta_r G° = -28.644 kJ/mol (ln K = 11.556) at 298.15 K and
 * -3.021 kJ/mol (ln K = 0.3634) at 1000 K, standard state 1 bar.
 * Molecular constants: Huber and Herzberg (1979) for the diatomics, Herzberg (1945) and the NIST CCCBDB
 * for CO2 and H2O (recalled from memory).
 */
class ReactionApiTest {

    /** kJ/mol per cm-1: h c N_A x 100 cm/m / 1000 (CODATA 2018 exact constants). */
    private static final double KJ_PER_MOL_PER_WAVENUMBER = 6.62607015e-34 * 299792458.0 * 100 * 6.02214076e23 / 1000;
    private static final double R = 8.314462618e-3;

    private final TestServer server = TestServer.shared();

    private static double anchor(double formationEnthalpyAtZero, double... wavenumbers) {
        double zpe = 0;
        for (double w : wavenumbers) {
            zpe += 0.5 * w * KJ_PER_MOL_PER_WAVENUMBER;
        }
        return formationEnthalpyAtZero - zpe;
    }

    static String body(String temperatures) {
        return """
                {"temperatures": %s, "outputUnit": "kJ/mol", "species": [
                  {"name": "CO", "coefficient": -1, "model": "ideal-gas", "input": {
                     "mass": {"value": 28.0101, "unit": "u"},
                     "rotation": {"kind": "linear", "rotationalConstant": {"value": 1.93128, "unit": "cm-1"}, "symmetryNumber": 1},
                     "vibrations": {"wavenumbers": [2169.81]},
                     "electronicEnergy": {"value": %s, "unit": "kJ/mol"}}},
                  {"name": "H2O", "coefficient": -1, "model": "ideal-gas", "input": {
                     "mass": {"value": 18.01528, "unit": "u"},
                     "rotation": {"kind": "nonlinear", "rotationalConstants": {"values": [27.877, 14.512, 9.285], "unit": "cm-1"},
                                  "symmetryNumber": 2},
                     "vibrations": {"wavenumbers": [3657.05, 1594.75, 3755.93]},
                     "electronicEnergy": {"value": %s, "unit": "kJ/mol"}}},
                  {"name": "CO2", "coefficient": 1, "model": "ideal-gas", "input": {
                     "mass": {"value": 44.0095, "unit": "u"},
                     "rotation": {"kind": "linear", "rotationalConstant": {"value": 0.39021, "unit": "cm-1"}, "symmetryNumber": 2},
                     "vibrations": {"wavenumbers": [1333.0, 667.4, 667.4, 2349.1]},
                     "electronicEnergy": {"value": %s, "unit": "kJ/mol"}}},
                  {"name": "H2", "coefficient": 1, "model": "ideal-gas", "input": {
                     "mass": {"value": 2.01588, "unit": "u"},
                     "rotation": {"kind": "linear", "rotationalConstant": {"value": 60.853, "unit": "cm-1"}, "symmetryNumber": 2,
                                  "treatment": "level-sum", "nuclearSpin": {"spin": 0.5}},
                     "vibrations": {"wavenumbers": [4401.21]},
                     "electronicEnergy": {"value": %s, "unit": "kJ/mol"}}}
                ]}""".formatted(temperatures, anchor(-113.805, 2169.81), anchor(-238.921, 3657.05, 1594.75, 3755.93),
                anchor(-393.151, 1333.0, 667.4, 667.4, 2349.1), anchor(0, 4401.21));
    }

    private JsonPath post(String body) {
        return server.request().contentType("application/json").body(body).post("/v1/reaction")
                .then().statusCode(200).extract().jsonPath();
    }

    @Test
    void waterGasShiftEquilibriumConstantMatchesTheTables() {
        JsonPath answer = post(body("{\"values\": [298.15, 1000, 1200]}"));
        // Tolerance 0.03 at 298.15 K and 0.05 at 1000 K in ln K (3 % and 5 % in K): anharmonicity, the
        // Fermi resonance of CO2 and rotation-vibration coupling, left out by the model, shift each
        // species' G by up to ~0.1 kJ/mol at 1000 K, that is ~0.01-0.04 in ln K.
        assertEquals(11.556, answer.getDouble("logEquilibriumConstant.values[0]"), 0.03);
        assertEquals(0.3634, answer.getDouble("logEquilibriumConstant.values[1]"), 0.05);
        assertEquals(-28.644, answer.getDouble("gibbsEnergy.values[0]"), 0.08);
        assertEquals("kJ/mol", answer.getString("gibbsEnergy.unit"));
        assertEquals("1", answer.getString("logEquilibriumConstant.unit"));
        // G = H - T S for the reaction too (within rounding of quantities ~40 kJ/mol).
        for (int j = 0; j < 3; j++) {
            double t = answer.getDouble("temperature.values[" + j + "]");
            assertEquals(answer.getDouble("gibbsEnergy.values[" + j + "]"), answer.getDouble("enthalpy.values[" + j + "]")
                    - t * answer.getDouble("entropy.values[" + j + "]") / 1000, 1e-9);
            double lnK = -answer.getDouble("gibbsEnergy.values[" + j + "]") / (R * t);
            assertEquals(lnK, answer.getDouble("logEquilibriumConstant.values[" + j + "]"), 1e-9 * Math.abs(lnK) + 1e-12);
        }
        assertTrue(answer.getString("system.species[0].standardState").contains("p = 100000.0 Pa"));
    }

    @Test
    void theSignChangeIsFoundBetweenGridPointsAndIsARoot() {
        JsonPath answer = post(body("{\"start\": 800, \"stop\": 1400, \"count\": 4}"));
        assertEquals(1, answer.getList("signChanges").size());
        double root = answer.getDouble("signChanges[0].temperature");
        // An independent NumPy/SciPy (brentq) evaluation of the same model, written with this test: 1092.95 K.
        assertEquals(1092.95, root, 0.05);
        assertEquals("negative-to-positive", answer.getString("signChanges[0].direction"));
        assertTrue(answer.getDouble("signChanges[0].errorBound") < 1e-4);
        // Re-evaluating the reaction at the root gives a Gibbs energy of zero to within its slope times
        // the solver tolerance (|dG/dT| = |Delta_r S| ~ 0.03 kJ/(mol K) times 1e-6 K) plus its bound.
        JsonPath at = post(body("{\"values\": [" + root + "]}"));
        double bound = at.getDouble("gibbsEnergy.errorBounds[0]");
        assertEquals(0, at.getDouble("gibbsEnergy.values[0]"), 1e-7 + bound);
    }

    @Test
    void errorsInsideSpeciesAreNamedUnderTheirSpecies() {
        String bad = body("{\"values\": [300]}")
                .replace("\"value\": 28.0101", "\"value\": -28")
                .replace("\"value\": 60.853", "\"value\": -60.853")
                .replace("\"model\": \"ideal-gas\", \"input\": {\n     \"mass\": {\"value\": 44.0095",
                        "\"model\": \"liquid\", \"input\": {\n     \"mass\": {\"value\": 44.0095")
                .replace("\"coefficient\": 1, \"model\": \"ideal-gas\", \"input\": {\n     \"mass\": {\"value\": 2.01588",
                        "\"coefficient\": 0, \"model\": \"ideal-gas\", \"input\": {\"temperatures\": {\"values\": [1]},\n     \"mass\": {\"value\": 2.01588");
        server.request().contentType("application/json").body(bad).post("/v1/reaction")
                .then().statusCode(422)
                .body("errors.pointer", hasItems("/species/0/input/mass/value", "/species/2/model",
                        "/species/3/coefficient", "/species/3/input/temperatures",
                        "/species/3/input/rotation/rotationalConstant/value"))
                .body("errors.size()", org.hamcrest.Matchers.equalTo(5))
                .body("detail", containsString("fields are invalid"));
    }

    @Test
    void aLevelSetSpeciesJoinsAReaction() {
        // A two-level "isomerisation" A -> B written as two spectrum species: Delta_r G = F_B - F_A, exact.
        JsonPath answer = post("""
                {"temperatures": {"values": [100, 300]}, "outputUnit": "K", "species": [
                  {"name": "A", "coefficient": -1, "model": "spectrum",
                   "input": {"levels": {"energies": [0]}, "energyUnit": "K"}},
                  {"name": "B", "coefficient": 1, "model": "spectrum",
                   "input": {"levels": {"energies": [200], "degeneracies": [2]}, "energyUnit": "K"}}]}""");
        // Delta_r G / k_B = 200 K - T ln 2; sign change at T = 200 / ln 2 = 288.539 K.
        assertEquals(200 - 100 * Math.log(2), answer.getDouble("gibbsEnergy.values[0]"), 1e-10);
        assertEquals(200 / Math.log(2), answer.getDouble("signChanges[0].temperature"), 1e-5);
    }
}
