package org.statesum.api.gas;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.path.json.JsonPath;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.statesum.testing.TestServer;

/**
 * Standard molar entropies and heat capacities at 298.15 K and 1 bar against the thermochemical tables.
 * Reference values: CODATA Key Values for Thermodynamics (J. D. Cox, D. D. Wagman, V. A. Medvedev,
 * 1989) and NIST-JANAF Thermochemical Tables, 4th ed. (M. W. Chase, 1998); molecular constants from
 * K. P. Huber and G. Herzberg, Constants of Diatomic Molecules (1979) and the NIST CCCBDB (water).
 * All of these numbers are recalled from memory (no table could be opened here); the model values
 * were cross-checked with an independent NumPy evaluation while writing this test.
 */
class IdealGasApiTest {

    private final TestServer server = TestServer.shared();

    static String atom(double mass) {
        return """
                {"mass": {"value": %s, "unit": "u"}, "rotation": {"kind": "atom"},
                 "temperatures": {"values": [298.15]}}""".formatted(mass);
    }

    static String diatomic(double mass, double b, int sigma, double omega, int multiplicity) {
        return """
                {"mass": {"value": %s, "unit": "u"},
                 "rotation": {"kind": "linear", "rotationalConstant": {"value": %s, "unit": "cm-1"}, "symmetryNumber": %d},
                 "vibrations": {"wavenumbers": [%s]}, "electronic": {"multiplicity": %d},
                 "standardState": {"pressure": {"value": 1, "unit": "bar"}},
                 "temperatures": {"values": [298.15]}}""".formatted(mass, b, sigma, omega, multiplicity);
    }

    static final String WATER = """
            {"mass": {"value": 18.01528, "unit": "u"},
             "rotation": {"kind": "nonlinear", "rotationalConstants": {"values": [27.877, 14.512, 9.285], "unit": "cm-1"},
                          "symmetryNumber": 2},
             "vibrations": {"wavenumbers": [3657.05, 1594.75, 3755.93]},
             "temperatures": {"values": [298.15]}}""";

    private JsonPath post(String body) {
        return server.request().contentType("application/json").body(body).post("/v1/ideal-gas")
                .then().statusCode(200).extract().jsonPath();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        // species, S° J/(mol K) (CODATA Key Values 1989), tolerance. Monatomic: 0.1 (Sackur-Tetrode is
        // exact for them; what remains is rounding of the tables). Molecules: 0.5 (rigid rotor and
        // harmonic oscillator leave out anharmonicity and centrifugal distortion).
        "Ar,  154.846, 0.1",
        "He,  126.153, 0.1",
        "Ne,  146.328, 0.1",
        "N2,  191.609, 0.5",
        "CO,  197.660, 0.5",
        "O2,  205.152, 0.5",
        "H2O, 188.835, 0.5",
    })
    void standardEntropyMatchesTheTables(String species, double reference, double tolerance) {
        String body = switch (species) {
            // Standard atomic weights (IUPAC), recalled from memory.
            case "Ar" -> atom(39.948);
            case "He" -> atom(4.002602);
            case "Ne" -> atom(20.1797);
            // B_e and omega_e in cm-1 from Huber and Herzberg (1979); O2 is a triplet.
            case "N2" -> diatomic(28.0134, 1.99824, 2, 2358.57, 1);
            case "CO" -> diatomic(28.0101, 1.93128, 1, 2169.81, 1);
            case "O2" -> diatomic(31.9988, 1.44563, 2, 1580.19, 3);
            default -> WATER;
        };
        JsonPath answer = post(body);
        assertEquals("J/(mol K)", answer.getString("entropy.unit"));
        double s = answer.getDouble("entropy.values[0]");
        assertEquals(reference, s, tolerance, species);
        double bound = answer.getDouble("entropy.errorBounds[0]");
        assertTrue(bound > 0 && bound < 1e-10, "entropy bound " + bound);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        // C_p° at 298.15 K, J/(mol K), NIST-JANAF (1998), recalled from memory. 0.03: the rigid-rotor
        // harmonic-oscillator value is 7/2 R plus a vibrational part of ~1e-3 R; the tables include
        // anharmonic and rotation-vibration terms of ~0.01-0.02 J/(mol K) here.
        "N2, 29.124",
        "CO, 29.142",
    })
    void heatCapacityMatchesTheTables(String species, double reference) {
        String body = species.equals("N2") ? diatomic(28.0134, 1.99824, 2, 2358.57, 1)
                : diatomic(28.0101, 1.93128, 1, 2169.81, 1);
        JsonPath answer = post(body);
        assertEquals(reference, answer.getDouble("isobaricHeatCapacity.values[0]"), 0.03);
    }

    @Test
    void contributionsAddUpToTheTotals() {
        JsonPath answer = post(WATER);
        for (String q : List.of("enthalpy", "entropy", "gibbsEnergy", "helmholtzEnergy", "internalEnergy",
                "isobaricHeatCapacity", "isochoricHeatCapacity")) {
            double sum = 0;
            for (String part : List.of("translational", "rotational", "vibrational", "electronic")) {
                sum += answer.getDouble("contributions." + part + "." + q + ".values[0]");
            }
            // Four terms of at most ~200 in magnitude: a few ulps.
            assertEquals(answer.getDouble(q + ".values[0]"), sum, 1e-12, q);
        }
        // Translation 3/2 R + R, rotation 3/2 R for a non-linear molecule: C_p = 4 R + a small vibrational part.
        assertEquals(4 * 8.314462618, answer.getDouble("contributions.translational.isobaricHeatCapacity.values[0]")
                + answer.getDouble("contributions.rotational.isobaricHeatCapacity.values[0]"), 1e-9);
    }

    @Test
    void oneMolePerLitreSitsRTln24point79AboveOneBar() {
        // The standard-state conversion (common practice): G(c° = 1 mol/L) - G(p° = 1 bar) = RT ln(c° R T / p°)
        // = RT ln(24.79) = 7.96 kJ/mol at 298.15 K.
        String gas = atom(39.948);
        String solution = gas.replace("\"rotation\"",
                "\"standardState\": {\"concentration\": {\"value\": 1, \"unit\": \"mol/L\"}}, \"rotation\"");
        double r = 8.314462618;
        double expected = r * 298.15 * Math.log(1000 * r * 298.15 / 1e5) / 1000;
        assertEquals(expected, post(solution).getDouble("gibbsEnergy.values[0]") - post(gas).getDouble("gibbsEnergy.values[0]"),
                1e-9);
        assertEquals(7.96, expected, 0.005);
    }

    @Test
    void aTransitionStateDropsItsOneImaginaryMode() {
        String body = WATER.replace("[3657.05, 1594.75, 3755.93]}", "[-812.5, 1594.75, 3755.93], \"transitionState\": true}");
        JsonPath answer = post(body);
        assertEquals(-812.5, answer.getDouble("system.droppedImaginaryWavenumber"), 0);
        assertEquals(2, answer.getInt("system.vibrationalModes"));
    }

    @Test
    void imaginaryModesOfAMinimumAreEachNamed() {
        server.request().contentType("application/json")
                .body(WATER.replace("[3657.05, 1594.75, 3755.93]", "[-20, 1594.75, -3.5]"))
                .post("/v1/ideal-gas")
                .then().statusCode(422).contentType("application/problem+json")
                .body("errors.pointer", hasItems("/vibrations/wavenumbers/0", "/vibrations/wavenumbers/2"))
                .body("errors[0].message", containsString("imaginary"));
    }

    @Test
    void everyBadFieldIsNamedInOneAnswer() {
        server.request().contentType("application/json")
                .body("""
                        {"mass": {"value": -1, "unit": "u"}, "standardState": {"pressure": {"value": 1, "unit": "psi"}},
                         "rotation": {"kind": "linear", "rotationalConstant": {"value": 2, "unit": "cm-1"},
                                      "symmetryNumber": 3, "nuclearSpin": {"spin": 0.3}},
                         "vibrations": {"wavenumbers": [0, 100], "scaleFactor": 7,
                                        "lowFrequency": {"entropy": "magic"}},
                         "electronic": {"multiplicity": 2.5}, "temperatures": {"values": [0, 300]},
                         "colour": "blue"}""")
                .post("/v1/ideal-gas")
                .then().statusCode(422)
                .body("errors.pointer", hasItems("/mass/value", "/standardState/pressure/unit",
                        "/rotation/symmetryNumber", "/rotation/nuclearSpin/spin", "/rotation/nuclearSpin",
                        "/vibrations/scaleFactor", "/vibrations/lowFrequency/entropy",
                        "/electronic/multiplicity", "/temperatures", "/colour"));
    }

    @Test
    void aLevelSumWithNuclearSpinReportsItsTailBound() {
        // H2: B_e = 60.853 cm-1, omega_e = 4401.21 cm-1 (Huber and Herzberg 1979, recalled from memory).
        server.request().contentType("application/json")
                .body("""
                        {"mass": {"value": 2.01588, "unit": "u"},
                         "rotation": {"kind": "linear", "rotationalConstant": {"value": 60.853, "unit": "cm-1"},
                                      "symmetryNumber": 2, "treatment": "level-sum",
                                      "nuclearSpin": {"spin": 0.5, "modification": "normal"}},
                         "vibrations": {"wavenumbers": [4401.21]},
                         "temperatures": {"start": 100, "stop": 1000, "count": 10}}""")
                .post("/v1/ideal-gas")
                .then().statusCode(200)
                .body("precision.rotationTruncationBound", closeTo(8.7e-19, 1e-19))
                .body("precision.rotation", containsString("frozen mixture, odd-J fraction 0.75"))
                // Normal H2 at 1000 K: C_V,rot within 2e-4 R of R (see HydrogenRotationTest).
                .body("contributions.rotational.isochoricHeatCapacity.values[9]", closeTo(8.3145, 0.002))
                .body("zeroPointEnergy.unit", equalTo("kJ/mol"))
                .body("warnings.size()", equalTo(0));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "{\"kind\": \"linear\", \"momentOfInertia\": {\"value\": 1e-300, \"unit\": \"kg*m^2\"}, \"symmetryNumber\": 1}|422",
        "{\"kind\": \"linear\", \"rotationalConstant\": {\"value\": 1e300, \"unit\": \"cm-1\"}, \"symmetryNumber\": 1}|422",
        "{\"kind\": \"nonlinear\", \"rotationalConstants\": {\"values\": [1e-300, 1, 1], \"unit\": \"MHz\"}, \"symmetryNumber\": 1}|422",
        "{\"kind\": \"linear\", \"rotationalConstant\": {\"value\": 20, \"unit\": \"MHz\"}, \"symmetryNumber\": 1, \"treatment\": \"level-sum\"}|422",
        "{\"kind\": \"linear\", \"rotationalConstant\": {\"value\": 1e5, \"unit\": \"cm-1\"}, \"symmetryNumber\": 1, \"treatment\": \"level-sum\"}|200",
    })
    void extremeRotorsAreAnsweredOrRefusedNeverFailed(String rotation, int status) {
        // Extreme inputs end in an answer or a 422, never a 5xx (temperatures at both ends of the range).
        server.request().contentType("application/json")
                .body("""
                        {"mass": {"value": 1e-20, "unit": "u"}, "rotation": %s,
                         "vibrations": {"wavenumbers": [1e-9, 1e6]},
                         "temperatures": {"values": [1e-12, 1e12]}}""".formatted(rotation))
                .post("/v1/ideal-gas")
                .then().statusCode(status);
    }

    @Test
    void theClassicalRotorIsFlaggedWhereItFails() {
        // H2 in the high-temperature form at 100 K: theta / T = 0.88, far outside its range.
        server.request().contentType("application/json")
                .body(diatomic(2.01588, 60.853, 2, 4401.21, 1).replace("[298.15]", "[100, 3000]"))
                .post("/v1/ideal-gas")
                .then().statusCode(200)
                .body("warnings[0].code", equalTo("ROTOR_NOT_CLASSICAL"))
                .body("warnings[0].temperatures", org.hamcrest.Matchers.contains(100.0))
                .body("warnings[0].message", org.hamcrest.Matchers.containsString("\"treatment\": \"level-sum\""));
    }

    @Test
    void aNonlinearRotorFlaggedAsNotClassicalIsNotSentToATreatmentItCannotHave() {
        // water's rotational constants (27.88, 14.51, 9.28 cm-1; recalled from memory) at 5 K
        server.request().contentType("application/json")
                .body("""
                        {"mass": {"value": 18.0106, "unit": "u"}, "rotation": {"kind": "nonlinear",
                          "rotationalConstants": {"values": [27.88, 14.51, 9.28], "unit": "cm-1"}, "symmetryNumber": 2},
                         "temperatures": {"values": [5]}}""")
                .post("/v1/ideal-gas")
                .then().statusCode(200)
                .body("warnings.code", org.hamcrest.Matchers.hasItem("ROTOR_NOT_CLASSICAL"))
                .body("warnings.find { it.code == 'ROTOR_NOT_CLASSICAL' }.message",
                        org.hamcrest.Matchers.allOf(org.hamcrest.Matchers.containsString("no level sum is offered"),
                                org.hamcrest.Matchers.not(org.hamcrest.Matchers.containsString("level-sum"))));
    }
}
