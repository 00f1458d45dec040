package org.statesum.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.swagger.v3.parser.OpenAPIV3Parser;
import io.swagger.v3.parser.core.models.ParseOptions;
import io.swagger.v3.parser.core.models.SwaggerParseResult;
import java.nio.file.Files;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.statesum.testing.ContractValidator;
import org.statesum.units.EnergyUnit;

/** The contract document itself: valid OpenAPI 3.1, and in step with the code where both list values. */
class ContractDocumentTest {

    @Test
    void theDocumentParsesAsOpenApi31WithoutMessages() throws Exception {
        ParseOptions options = new ParseOptions();
        options.setResolve(true);
        SwaggerParseResult result = new OpenAPIV3Parser().readContents(
                Files.readString(ContractValidator.DOCUMENT), null, options);
        assertTrue(result.getMessages() == null || result.getMessages().isEmpty(), () -> "" + result.getMessages());
        assertNotNull(result.getOpenAPI());
        assertTrue(result.getOpenAPI().getOpenapi().startsWith("3.1"), result.getOpenAPI().getOpenapi());
        for (String path : List.of("/v1/spectrum", "/v1/constants", "/openapi.yaml", "/health/live", "/health/ready")) {
            assertNotNull(result.getOpenAPI().getPaths().get(path), path);
        }
    }

    @Test
    void theEnergyUnitEnumIsTheCodesUnits() {
        List<String> documented = new java.util.ArrayList<>();
        ContractValidator.get().schemaNode("EnergyUnit").path("enum").forEach(n -> documented.add(n.asText()));
        assertEquals(EnergyUnit.symbols(), documented);
    }

    @Test
    void validAndInvalidRequestsAreJudgedAlikeByTheSchemaAndTheService() {
        ContractValidator contract = ContractValidator.get();
        String good = "{\"levels\": {\"energies\": [0, 1], \"degeneracies\": [1, 3]}, \"energyUnit\": \"eV\", "
                + "\"temperatures\": {\"start\": 0, \"stop\": 300, \"count\": 4}, \"outputUnit\": \"kJ/mol\", "
                + "\"particles\": {\"count\": 6.02214076e23, \"statistics\": \"indistinguishable\"}, "
                + "\"basis\": \"per-particle\", \"include\": [\"populations\"]}";
        assertEquals(List.of(), contract.validate("SpectrumRequest", good));
        for (String bad : List.of(
                "{\"levels\": {\"energies\": []}, \"energyUnit\": \"eV\", \"temperatures\": {\"values\": [1]}}",
                "{\"levels\": {\"energies\": [0], \"degeneracies\": [0]}, \"energyUnit\": \"eV\", "
                        + "\"temperatures\": {\"values\": [1]}}",
                "{\"levels\": {\"energies\": [0]}, \"energyUnit\": \"Ry\", \"temperatures\": {\"values\": [1]}}",
                "{\"levels\": {\"energies\": [0]}, \"energyUnit\": \"eV\", \"temperatures\": {\"values\": [-1]}}",
                "{\"levels\": {\"energies\": [0]}, \"energyUnit\": \"eV\", "
                        + "\"temperatures\": {\"start\": 1, \"stop\": 2, \"count\": 2.5}}",
                "{\"levels\": {\"energies\": [0]}, \"energyUnit\": \"eV\", \"temperatures\": {\"values\": [1]}, "
                        + "\"particles\": {\"count\": 1.5, \"statistics\": \"distinguishable\"}}",
                "{\"levels\": {\"energies\": [0]}, \"energyUnit\": \"eV\", \"temperatures\": {\"values\": [1]}, "
                        + "\"extra\": 1}",
                "{\"levels\": {\"energies\": [0], \"degeneracies\": [1], \"logDegeneracies\": [0]}, "
                        + "\"energyUnit\": \"eV\", \"temperatures\": {\"values\": [1]}}")) {
            assertTrue(!contract.validate("SpectrumRequest", bad).isEmpty(), "schema accepts " + bad);
        }
    }
}
