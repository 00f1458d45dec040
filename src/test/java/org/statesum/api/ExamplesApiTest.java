package org.statesum.api;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.statesum.testing.ContractValidator;
import org.statesum.testing.TestServer;

/** The files in examples/ are valid requests by the contract and are answered. */
class ExamplesApiTest {

    @ParameterizedTest
    @ValueSource(strings = {"impurity-levels.json", "impurity-levels-molar.json"})
    void everyExampleIsAValidRequestAndIsAnswered(String name) throws Exception {
        String body = Files.readString(Path.of("examples", name));
        assertEquals(List.of(), ContractValidator.get().validate("SpectrumRequest", body));
        TestServer.shared().request().contentType("application/json").body(body).post("/v1/spectrum")
                .then().statusCode(200);
    }

    /** The README's conformer table and ranking (demo scenario: invented molecules, demo values). */
    @Test
    void theConformerAndRankingExamplesAnswerWhatTheReadmeSays() throws Exception {
        String family = Files.readString(Path.of("examples", "kestrel-a-conformers.json"));
        assertEquals(List.of(), ContractValidator.get().validate("EnsembleRequest", family));
        TestServer.shared().request().contentType("application/json").body(family).post("/v1/ensemble")
                .then().statusCode(200)
                .body("gibbsEnergy.values[1]", closeTo(49.5938, 5e-5))
                .body("mixingEntropy.values[1]", closeTo(9.9033, 5e-5))
                .body("populations.values[1][1]", closeTo(0.495, 5e-4));
        String ranking = Files.readString(Path.of("examples", "kestrel-a-ranking.json"));
        assertEquals(List.of(), ContractValidator.get().validate("RankingRequest", ranking));
        TestServer.shared().request().contentType("application/json").body(ranking).post("/v1/ranking")
                .then().statusCode(200)
                .body("exchanges[0].temperature", closeTo(321.462, 5e-4))
                .body("exchanges[0].lowerBelow", equalTo("kestrel-A ring isomer"))
                .body("ranking[0].mostStable", equalTo("kestrel-A ring isomer"))
                .body("ranking[12].mostStable", equalTo("kestrel-A family"));
        assertTrue(Files.readString(Path.of("README.md")).contains("**321.462 K**"));
    }

    @Test
    void theMolarExampleStartsAtRLn2() throws Exception {
        // Ground doublet: S(T -> 0) = R ln 2, R = 8.314462618 J/(mol K) (CODATA 2018).
        TestServer.shared().request().contentType("application/json")
                .body(Files.readString(Path.of("examples", "impurity-levels-molar.json"))).post("/v1/spectrum")
                .then().statusCode(200)
                .body("entropy.unit", equalTo("J/(mol K)"))
                .body("entropy.values[0]", closeTo(8.314462618 * Math.log(2), 1e-8));
    }

    /**
     * The README's table for the blowing-agent scenario (invented molecules, demo values): the examples
     * must keep answering what the README says, to the digits it prints.
     */
    @ParameterizedTest
    @org.junit.jupiter.params.provider.CsvSource({
        "decomposition-kestrel-a.json, 8.30, -6.22, 357.148",
        "decomposition-kestrel-b.json, 3.65, -10.94, 325.052",
    })
    void theBlowingAgentExamplesAnswerWhatTheReadmeSays(String name, double g300, double g400, double crossing)
            throws Exception {
        String body = Files.readString(Path.of("examples", name));
        assertEquals(List.of(), ContractValidator.get().validate("ReactionRequest", body));
        TestServer.shared().request().contentType("application/json").body(body).post("/v1/reaction")
                .then().statusCode(200)
                .body("gibbsEnergy.unit", equalTo("kJ/mol"))
                .body("temperature.values[0]", closeTo(300.0, 0))
                .body("gibbsEnergy.values[0]", closeTo(g300, 0.005))
                .body("temperature.values[2]", closeTo(400.0, 0))
                .body("gibbsEnergy.values[2]", closeTo(g400, 0.005))
                .body("signChanges[0].temperature", closeTo(crossing, 0.0005))
                .body("signChanges[0].direction", equalTo("positive-to-negative"));
        String readme = Files.readString(Path.of("README.md"));
        org.junit.jupiter.api.Assertions.assertTrue(readme.contains(String.format(java.util.Locale.ROOT, "%.3f K", crossing)), name);
    }
}
