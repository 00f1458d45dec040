package org.statesum.api;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.statesum.testing.TestServer;

/**
 * Answers in every output unit, checked through the API against published conversion factors:
 * CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)): 1 hartree = 27.211386245988 eV,
 * 1 eV = 8065.543937 cm-1 = 96.485332 kJ/mol = 11604.51812 K, e = 1.602176634e-19 J (exact),
 * R = 8.314462618 J/(mol K); and the thermochemical calorie, 4.184 J (exact by definition).
 * Energies follow the output unit; entropy and heat capacity follow it per kelvin (k_B for K).
 */
class AnswerUnitsApiTest {

    /** A three-level set in eV, with degeneracies, on three temperatures. */
    private static final String LEVELS = "{\"levels\": {\"energies\": [0, 0.01, 0.025], \"degeneracies\": [1, 3, 5]}, "
            + "\"energyUnit\": \"eV\", \"temperatures\": {\"values\": [50, 300, 1000]}";

    private final TestServer server = TestServer.shared();

    private static final ObjectMapper JSON = new ObjectMapper();

    private JsonNode answer(String extra) {
        return post(LEVELS + extra + "}");
    }

    private static double at(JsonNode answer, String series, int j) {
        return answer.path(series).path("values").path(j).doubleValue();
    }

    private static String unit(JsonNode answer, String series) {
        return answer.path(series).path("unit").asText();
    }

    /**
     * The quoted factors carry 8 to 14 significant digits; the tolerance is half a unit in the last
     * quoted digit, relative, plus the answers' own rounding (far smaller).
     */
    @ParameterizedTest(name = "{0}: energies x {1}, entropies in {3} x {2}")
    @CsvSource({
        "J,        1.602176634e-19,             1.602176634e-19,             J/K,         1e-15",
        "meV,      1000,                        1000,                        meV/K,       1e-15",
        "hartree,  0.036749322175655,           0.036749322175655,           hartree/K,   1e-13",
        "cm-1,     8065.543937,                 8065.543937,                 cm-1/K,      1e-10",
        "K,        11604.51812,                 11604.51812,                 k_B,         1e-9",
        "kJ/mol,   96.485332,                   96485.332,                   J/(mol K),   6e-9",
        "kcal/mol, 23.060547801147,             23060.547801147,             cal/(mol K), 6e-9"})
    void everyOutputUnitIsTheElectronvoltAnswerTimesThePublishedFactor(String unit, double energyFactor,
            double entropyFactor, String entropyUnit, double relativeTolerance) {
        // 1 / 27.211386245988 = 0.036749322175655 (to the 14 digits of the quoted factor);
        // 96.485332 / 4.184 = 23.060547801147 (the calorie is exact).
        JsonNode eV = answer("");
        JsonNode other = answer(", \"outputUnit\": \"" + unit + "\"");
        assertEquals(unit, unit(other, "helmholtzEnergy"));
        assertEquals(unit, unit(other, "internalEnergy"));
        assertEquals(entropyUnit, unit(other, "entropy"));
        assertEquals(entropyUnit, unit(other, "isochoricHeatCapacity"));
        assertEquals("1", unit(other, "logPartitionFunction"));
        for (int j = 0; j < 3; j++) {
            check(eV, other, "helmholtzEnergy", j, energyFactor, relativeTolerance);
            check(eV, other, "internalEnergy", j, energyFactor, relativeTolerance);
            check(eV, other, "entropy", j, entropyFactor, relativeTolerance);
            check(eV, other, "isochoricHeatCapacity", j, entropyFactor, relativeTolerance);
            assertEquals(at(eV, "logPartitionFunction", j),
                    at(other, "logPartitionFunction", j), 0.0);
        }
    }

    private static void check(JsonNode eV, JsonNode other, String series, int j, double factor, double tolerance) {
        double expected = at(eV, series, j) * factor;
        double actual = at(other, series, j);
        assertEquals(expected, actual, Math.abs(expected) * tolerance + 1e-300, series + "[" + j + "]");
    }

    @Test
    void aTwofoldGroundLevelHasEntropyRLn2PerMole() {
        // S = k_B ln 2 per particle; per mole R ln 2 with R = 8.314462618 J/(mol K) (CODATA 2018),
        // 5.763172... J/(mol K); in cal/(mol K) divided by 4.184; in k_B, ln 2.
        String body = "{\"levels\": {\"energies\": [0], \"degeneracies\": [2]}, \"energyUnit\": \"K\", "
                + "\"temperatures\": {\"values\": [300]}, \"outputUnit\": ";
        assertEquals(8.314462618 * Math.log(2), entropy(body + "\"kJ/mol\"}"), 5e-10 * 5.77);
        assertEquals(8.314462618 * Math.log(2) / 4.184, entropy(body + "\"kcal/mol\"}"), 5e-10 * 1.38);
        assertEquals(Math.log(2), entropy(body + "\"K\"}"), 4 * Math.ulp(1.0));
    }

    @Test
    void molarUnitsArePerMoleOfParticlesOnEitherBasis() {
        // Levels 0, 1, 2 kJ/mol: the heat capacity peaks near 60 K, inside the grid, so the answer
        // also locates the maximum, which must follow the same convention.
        String system = "{\"levels\": {\"energies\": [0, 1, 2]}, \"energyUnit\": \"kJ/mol\", "
                + "\"temperatures\": {\"values\": [20, 60, 400]}, "
                + "\"particles\": {\"count\": 1000, \"statistics\": \"distinguishable\"}, \"basis\": ";
        JsonNode total = post(system + "\"total\"}");
        JsonNode perParticle = post(system + "\"per-particle\"}");
        JsonNode totalEv = post(system + "\"total\", \"outputUnit\": \"eV\"}");
        JsonNode perParticleEv = post(system + "\"per-particle\", \"outputUnit\": \"eV\"}");
        for (String series : new String[] {"helmholtzEnergy", "internalEnergy", "entropy", "isochoricHeatCapacity"}) {
            for (int j = 0; j < 3; j++) {
                String path = series + "[" + j + "]";
                double molar = at(perParticle, series, j);
                // Two extra roundings (1/N and the product) at most: 4 ulps of headroom.
                assertEquals(molar, at(total, series, j), 4 * Math.ulp(molar), path);
                // A per-particle unit keeps the basis: the total is N times the per-particle value.
                double totalEnergy = at(totalEv, series, j);
                assertEquals(1000 * at(perParticleEv, series, j), totalEnergy, 1e-12 * Math.abs(totalEnergy), path);
            }
        }
    }

    @Test
    void theHeatCapacityMaximumFollowsTheMolarConvention() {
        String system = "{\"levels\": {\"energies\": [0, 1]}, \"energyUnit\": \"kJ/mol\", "
                + "\"temperatures\": {\"values\": [20, 50, 100]}, "
                + "\"particles\": {\"count\": 1000, \"statistics\": \"distinguishable\"}, \"basis\": ";
        JsonNode total = post(system + "\"total\"}").path("heatCapacityMaximum").path("isochoricHeatCapacity");
        JsonNode perParticle = post(system + "\"per-particle\"}").path("heatCapacityMaximum")
                .path("isochoricHeatCapacity");
        // Two-level (Schottky) maximum: C_V = 0.43923 k_B per particle (as in SpectrumApiTest), so
        // 0.43923 R = 3.6520 J/(mol K) with R = 8.314462618 J/(mol K) (CODATA 2018).
        assertEquals(0.43923 * 8.314462618, perParticle.path("value").doubleValue(), 5e-5);
        assertEquals(perParticle.path("value").doubleValue(), total.path("value").doubleValue(),
                1e-12 * perParticle.path("value").doubleValue());
    }

    private JsonNode post(String body) {
        try {
            return JSON.readTree(server.request().contentType("application/json").body(body).post("/v1/spectrum")
                    .then().statusCode(200).extract().asString());
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private double entropy(String body) {
        return at(post(body), "entropy", 0);
    }
}
