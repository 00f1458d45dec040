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
}
