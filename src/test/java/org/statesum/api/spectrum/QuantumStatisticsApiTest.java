package org.statesum.api.spectrum;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;

import org.junit.jupiter.api.Test;
import org.statesum.testing.TestServer;

/** Exact Bose-Einstein and Fermi-Dirac counting on POST /v1/spectrum, and Boltzmann counting held to its range. */
class QuantumStatisticsApiTest {

    private final TestServer server = TestServer.shared();

    private static String body(String levels, double count, String statistics, String extra) {
        return "{\"levels\": " + levels + ", \"energyUnit\": \"K\", \"temperatures\": {\"values\": [0, 0.5, 2]},"
                + " \"particles\": {\"count\": " + count + ", \"statistics\": \"" + statistics + "\"}" + extra + "}";
    }

    @Test
    void boltzmannCountingFarOutsideTheDiluteLimitIsRefusedNamingTheWayOut() {
        // the audit's case: a mole on six states gave S = -3.2e25 k_B with only a warning
        server.request().contentType("application/json")
                .body(body("{\"energies\": [0, 1, 2, 3, 4, 5]}", 6.02e23, "indistinguishable", ""))
                .post("/v1/spectrum").then().statusCode(422)
                .body("errors.pointer", contains("/particles/statistics"))
                .body("detail", containsString("fermi-dirac"));
    }

    @Test
    void twoFermionsOnTwoStatesHaveOneConfiguration() {
        // both states filled: Z = e^{-(0 + 1) / T}, S = 0, U = 1 K, C_V = 0, mu = F_2 - F_1
        server.request().contentType("application/json")
                .body(body("{\"energies\": [0, 1]}", 2, "fermi-dirac", ", \"outputUnit\": \"K\""))
                .post("/v1/spectrum").then().statusCode(200)
                .body("system.statistics", equalTo("fermi-dirac"))
                .body("logPartitionFunction.values[1]", closeTo(-2.0, 1e-14))
                .body("entropy.values[1]", closeTo(0.0, 1e-14))
                .body("internalEnergy.values[2]", closeTo(1.0, 1e-14))
                .body("isochoricHeatCapacity.values[2]", closeTo(0.0, 1e-14))
                // F_1 = -T ln(1 + e^{-1/T}); mu = 1 - F_1 at T = 2 K
                .body("chemicalPotential.values[2]", closeTo(1 + 2 * Math.log1p(Math.exp(-0.5)), 1e-13));
    }

    @Test
    void exactStatisticsNamesEveryFieldItCannotTake() {
        server.request().contentType("application/json")
                .body(body("{\"energies\": [0, 1], \"degeneracies\": [1, 2.5]}", 2, "fermi-dirac", ""))
                .post("/v1/spectrum").then().statusCode(422)
                .body("errors.pointer", hasItems("/levels/degeneracies/1"));
        server.request().contentType("application/json")
                .body(body("{\"energies\": [0, 1], \"degeneracies\": [1, 2]}", 4, "fermi-dirac", ""))
                .post("/v1/spectrum").then().statusCode(422)
                .body("errors.pointer", contains("/particles/count"))
                .body("errors[0].message", containsString("do not fit into 3"));
        server.request().contentType("application/json")
                .body(body("{\"energies\": [0, 1], \"logDegeneracies\": [0, 1]}", 2, "bose-einstein", ""))
                .post("/v1/spectrum").then().statusCode(422)
                .body("errors.pointer", contains("/levels/logDegeneracies"));
        server.request().contentType("application/json")
                .body(body("{\"energies\": [0, 1]}", 2e6, "bose-einstein", ""))
                .post("/v1/spectrum").then().statusCode(422)
                .body("errors.pointer", contains("/particles/count"));
    }

    @Test
    void populationsAreTheFractionOfTheParticlesInEachLevel() {
        // 2 fermions on a singly degenerate level 0 and a doubly degenerate level at 1 K, T = 2 K:
        // Z = 2 x + x^2 with x = e^{-1/2} (one particle up: 2 ways; both up: 1), <n_up> = (2 x + 2 x^2) / Z
        double x = Math.exp(-0.5);
        double up = (2 * x + 2 * x * x) / (2 * x + x * x) / 2;
        server.request().contentType("application/json")
                .body(body("{\"energies\": [0, 1], \"degeneracies\": [1, 2]}", 2, "fermi-dirac",
                        ", \"include\": [\"populations\"]"))
                .post("/v1/spectrum").then().statusCode(200)
                .body("populations.values[2][1]", closeTo(up, 1e-15))
                .body("populations.values[2][0]", closeTo(1 - up, 1e-15))
                .body("populations.values[0][0]", closeTo(0.5, 0));
    }

    @Test
    void bosonsAtZeroTemperatureAllSitInTheGroundLevel() {
        // 4 bosons on a doubly degenerate ground level: C(5, 4) = 5 ways, S(0) = ln 5; mu(0) = E_0 = 0
        server.request().contentType("application/json")
                .body(body("{\"energies\": [0, 3], \"degeneracies\": [2, 1]}", 4, "bose-einstein", ""))
                .post("/v1/spectrum").then().statusCode(200)
                .body("entropy.values[0]", closeTo(Math.log(5), 1e-14))
                .body("chemicalPotential.values[0]", closeTo(0.0, 0));
    }
}
