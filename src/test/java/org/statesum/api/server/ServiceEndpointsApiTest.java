package org.statesum.api.server;

import static org.hamcrest.Matchers.allOf;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import org.junit.jupiter.api.Test;
import org.statesum.testing.ContractValidator;
import org.statesum.testing.TestServer;

/** The read-only endpoints, and what unknown paths and methods get. */
class ServiceEndpointsApiTest {

    private final TestServer server = TestServer.shared();

    @Test
    void constantsListTheCodata2018ValuesUnitsAndCautions() {
        server.request().get("/v1/constants").then().statusCode(200).contentType("application/json")
                .body("source", equalTo("CODATA 2018"))
                // CODATA 2018 exact values (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)).
                .body("constants.find { it.symbol == 'k_B' }.value", equalTo(1.380649e-23))
                .body("constants.find { it.symbol == 'h' }.value", equalTo(6.62607015e-34))
                .body("constants.find { it.symbol == 'N_A' }.value", equalTo(6.02214076e23))
                .body("constants.find { it.symbol == 'e' }.value", equalTo(1.602176634e-19))
                .body("constants.find { it.symbol == 'c' }.value", equalTo(299792458.0))
                .body("constants.find { it.symbol == 'R' }.value", closeTo(8.314462618, 5e-10))
                .body("constants.find { it.symbol == 'E_h' }.standardUncertainty", equalTo(8.5e-30))
                .body("constants.find { it.symbol == 'k_B' }.exact", equalTo(true))
                .body("energyUnits.symbol", hasItems("J", "kJ/mol", "kcal/mol", "eV", "meV", "hartree", "cm-1", "K"))
                .body("energyUnits.find { it.symbol == 'kJ/mol' }.entropyUnit", equalTo("J/(mol K)"))
                .body("energyUnits.find { it.symbol == 'K' }.entropyUnit", equalTo("k_B"))
                .body("temperatureUnit", equalTo("K"))
                .body("molarConvention", containsString("per mole of particles"))
                .body("cautions", allOf(containsString("model estimates"), containsString("process safety"),
                        containsString("licensed professional practice")));
    }

    @Test
    void healthProbesAnswerUp() {
        server.request().get("/health/live").then().statusCode(200).contentType("application/json")
                .body("status", equalTo("up"));
        server.request().get("/health/ready").then().statusCode(200).contentType("application/json")
                .body("status", equalTo("up"));
    }

    @Test
    void headAnswersWhatGetWouldWithoutTheContent() {
        for (String path : new String[] {"/v1/constants", "/openapi.yaml", "/health/live", "/health/ready", "/metrics"}) {
            io.restassured.response.Response get = server.request().get(path);
            io.restassured.response.Response head = server.request().head(path);
            assertEquals(get.statusCode(), head.statusCode(), path);
            assertEquals(get.contentType(), head.contentType(), path);
            assertEquals("", head.asString(), path);
            if (!path.equals("/metrics")) { // the meters move between the two requests
                assertEquals(get.header("Content-Length"), head.header("Content-Length"), path);
            }
        }
        // HEAD is not a way into a compute route (RFC 9110: HEAD answers as GET, which they do not serve)
        server.request().head("/v1/spectrum").then().statusCode(405).header("Allow", "POST");
    }

    @Test
    void theContractIsServedAsWritten() throws Exception {
        byte[] served = server.request().get("/openapi.yaml").then().statusCode(200)
                .contentType(startsWith("application/yaml")).extract().asByteArray();
        assertArrayEquals(Files.readAllBytes(ContractValidator.DOCUMENT), served);
    }

    @Test
    void anUnknownPathIsAProblem404() {
        server.request().get("/v1/spectra").then().statusCode(404).contentType("application/problem+json")
                .body("type", equalTo("https://statesum.org/problems/not-found"))
                .body("status", equalTo(404));
        server.request().contentType("application/json").body("{}").post("/v2/spectrum").then().statusCode(404);
    }

    @Test
    void aWrongMethodOnAKnownPathIsAProblem405() {
        server.request().get("/v1/spectrum").then().statusCode(405).contentType("application/problem+json")
                .header("Allow", "POST")
                .body("type", equalTo("https://statesum.org/problems/method-not-allowed"))
                .body("status", equalTo(405));
        server.request().contentType("application/json").body("{}").post("/v1/constants").then().statusCode(405)
                .header("Allow", "GET, HEAD");
        server.request().delete("/health/live").then().statusCode(405);
    }
}
