package org.statesum.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Re-derives every energy-unit factor from the CODATA 2018 constants in 40-digit decimal
 * arithmetic and bounds the rounding of the double in ulps, and checks the derived factors against
 * the conversion factors CODATA 2018 publishes (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021),
 * table of energy equivalents).
 */
class EnergyUnitTest {

    private static final MathContext MC = new MathContext(40);
    private static final BigDecimal K_B = new BigDecimal("1.380649e-23");
    private static final BigDecimal H = new BigDecimal("6.62607015e-34");
    private static final BigDecimal N_A = new BigDecimal("6.02214076e23");
    private static final BigDecimal E = new BigDecimal("1.602176634e-19");
    private static final BigDecimal C = new BigDecimal("299792458");
    /** Hartree energy, J (CODATA 2018, standard uncertainty 8.5e-30 J). */
    private static final BigDecimal E_H = new BigDecimal("4.3597447222071e-18");

    /** |value - exact| in units in the last place of value. */
    private static double ulps(double value, BigDecimal exact) {
        return new BigDecimal(value).subtract(exact).abs().divide(new BigDecimal(Math.ulp(value)), MC).doubleValue();
    }

    static BigDecimal exactJoules(EnergyUnit unit) {
        return switch (unit) {
            case JOULE -> BigDecimal.ONE;
            case KILOJOULE_PER_MOLE -> new BigDecimal(1000).divide(N_A, MC);
            case KILOCALORIE_PER_MOLE -> new BigDecimal(4184).divide(N_A, MC);
            case ELECTRONVOLT -> E;
            case MILLIELECTRONVOLT -> E.divide(new BigDecimal(1000), MC);
            case HARTREE -> E_H;
            case WAVENUMBER -> H.multiply(C).multiply(new BigDecimal(100));
            case KELVIN -> K_B;
        };
    }

    @ParameterizedTest(name = "{0}: joules per unit within {1} ulp")
    @CsvSource({
        // exact decimal constants: the nearest double, half an ulp
        "JOULE, 0.5", "ELECTRONVOLT, 0.5", "KELVIN, 0.5", "HARTREE, 0.5",
        // one division of exact operands, correctly rounded: half an ulp
        "KILOJOULE_PER_MOLE, 0.5", "KILOCALORIE_PER_MOLE, 0.5",
        // e (rounded) / 1000 (one more rounding)
        "MILLIELECTRONVOLT, 1.0",
        // h (rounded) x c, then x 100: three roundings
        "WAVENUMBER, 1.5"})
    void joulesPerUnitReDerived(EnergyUnit unit, double budgetUlps) {
        double ulps = ulps(unit.joulesPerUnit(), exactJoules(unit));
        assertTrue(ulps <= budgetUlps, unit + ": " + ulps + " ulp");
        // The factor's error and the rounding of one product stay within the declared relative error
        // (an ulp is at most 2^-52 of the value).
        assertTrue((ulps + 0.5) * Math.ulp(1.0) <= EnergyUnit.conversionRelativeError(), "declared conversion error");
    }

    @ParameterizedTest(name = "{0}: entropy factor within {1} ulp")
    @CsvSource({
        // 1 / joulesPerUnit (scale 1): the factor's rounding carried through plus one division
        "JOULE, 0.5", "ELECTRONVOLT, 1.5", "MILLIELECTRONVOLT, 2.0", "HARTREE, 1.5", "WAVENUMBER, 2.5", "KELVIN, 1.5",
        // 1 / joulesPerUnit x 1000 (J per kJ, cal per kcal): one more rounding
        "KILOJOULE_PER_MOLE, 2.0", "KILOCALORIE_PER_MOLE, 2.0"})
    void entropyFactorReDerived(EnergyUnit unit, double budgetUlps) {
        BigDecimal scale = unit.molar() ? new BigDecimal(1000) : BigDecimal.ONE;
        BigDecimal exact = scale.divide(exactJoules(unit), MC);
        double ulps = ulps(unit.entropyFromJoulesPerKelvin(1.0), exact);
        assertTrue(ulps <= budgetUlps, unit + ": " + ulps + " ulp");
    }

    @Test
    void derivedFactorsMatchThePublishedCodataEquivalents() {
        // CODATA 2018 energy equivalents, quoted to the digits given; tolerance half a unit in the
        // last quoted digit.
        double eV = EnergyUnit.ELECTRONVOLT.joulesPerUnit();
        assertEquals(27.211386245988, EnergyUnit.HARTREE.joulesPerUnit() / eV, 0.5e-12);
        assertEquals(8065.543937, eV / EnergyUnit.WAVENUMBER.joulesPerUnit(), 0.5e-6);
        assertEquals(96.485332, eV / EnergyUnit.KILOJOULE_PER_MOLE.joulesPerUnit(), 0.5e-6);
        assertEquals(11604.51812, eV / EnergyUnit.KELVIN.joulesPerUnit(), 0.5e-5);
        assertEquals(8.314462618, PhysicalConstants.GAS_CONSTANT_J_PER_MOL_K, 0.5e-9);
        // Thermochemical calorie, exactly 4.184 J (definition).
        assertEquals(4.184, EnergyUnit.KILOCALORIE_PER_MOLE.joulesPerUnit()
                / EnergyUnit.KILOJOULE_PER_MOLE.joulesPerUnit(), 4.184 * 2 * Math.ulp(1.0));
    }

    @Test
    void gasConstantIsTheRoundedExactProduct() {
        assertTrue(ulps(PhysicalConstants.GAS_CONSTANT_J_PER_MOL_K, N_A.multiply(K_B)) <= 1.5);
    }

    @Test
    void entropyUnitsFollowTheEnergyUnit() {
        String[][] pairs = {{"J", "J/K"}, {"kJ/mol", "J/(mol K)"}, {"kcal/mol", "cal/(mol K)"}, {"eV", "eV/K"},
            {"meV", "meV/K"}, {"hartree", "hartree/K"}, {"cm-1", "cm-1/K"}, {"K", "k_B"}};
        assertEquals(pairs.length, EnergyUnit.values().length);
        for (String[] pair : pairs) {
            assertEquals(pair[1], EnergyUnit.bySymbol(pair[0]).orElseThrow().entropySymbol());
        }
    }
}
