package org.statesum.api;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
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

    @Test
    void theMolarExampleStartsAtRLn2() throws Exception {
        // Ground doublet: S(T -> 0) = R ln 2, R = 8.314462618 J/(mol K) (CODATA 2018).
        TestServer.shared().request().contentType("application/json")
                .body(Files.readString(Path.of("examples", "impurity-levels-molar.json"))).post("/v1/spectrum")
                .then().statusCode(200)
                .body("entropy.unit", equalTo("J/(mol K)"))
                .body("entropy.values[0]", closeTo(8.314462618 * Math.log(2), 1e-8));
    }
}
