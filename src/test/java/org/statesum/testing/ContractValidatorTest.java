package org.statesum.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/** The contract check itself fails what it should: the suite's guarantee rests on it. */
class ContractValidatorTest {

    private final ContractValidator contract = ContractValidator.get();
    private static final String PROBLEM = "{\"type\": \"https://statesum.org/problems/not-found\", \"title\": "
            + "\"Not found\", \"status\": 404, \"detail\": \"no such resource\", \"errors\": []}";

    @Test
    void aDocumentedProblemPasses() {
        assertEquals(java.util.List.of(), contract.check("/v1/spectrum", "POST", 422, "application/problem+json",
                PROBLEM.replace("404", "422")));
        assertEquals(java.util.List.of(), contract.check("/nowhere", "GET", 404, "application/problem+json", PROBLEM));
    }

    @Test
    void undocumentedStatusMediaTypeOperationAndFieldsFail() {
        assertFalse(contract.check("/v1/spectrum", "POST", 418, "application/problem+json", PROBLEM).isEmpty());
        assertFalse(contract.check("/v1/spectrum", "POST", 422, "text/html", PROBLEM).isEmpty());
        assertFalse(contract.check("/v1/constants", "PUT", 200, "application/json", "{}").isEmpty());
        assertFalse(contract.check("/nowhere", "GET", 404, "text/plain", "not found").isEmpty());
        assertFalse(contract.check("/health/live", "GET", 200, "application/json",
                "{\"status\": \"up\", \"uptime\": 3}").isEmpty());
        assertFalse(contract.check("/v1/spectrum", "POST", 422, "application/problem+json",
                PROBLEM.replace("\"errors\": []", "\"errors\": [{\"pointer\": \"levels\", \"message\": \"x\"}]"))
                .isEmpty(), "a pointer must start with /");
        assertFalse(contract.validate("Problem", PROBLEM.replace("https://statesum.org/problems/not-found",
                "com.example.NotFoundException")).isEmpty());
    }
}
