package org.statesum.models.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Low-frequency treatments of one mode at 298.15 K against an independent NumPy evaluation of the
 * published formulas (Grimme, Chem. Eur. J. 18 (2012) 9955, eqs. 4-6 with omega_0 = 100 cm-1, alpha = 4,
 * B_av = 1e-44 kg m^2; Li et al., J. Phys. Chem. C 119 (2015) 1840 for the energy), done while writing
 * this test with the CODATA 2018 constants.
 */
class LowFrequencyTest {

    private static final double T = 298.15;

    private static GasPart one(double nu, LowFrequency treatment) {
        return Vibrations.of(new double[] {nu}, treatment).evaluate(new double[] {T});
    }

    @ParameterizedTest
    @CsvSource({
        // nu (cm-1), S_HO / k_B, S quasi-RRHO / k_B, U_HO / k_B (K, with ZPE), U Head-Gordon / k_B (K)
        "10,  4.0313152848972535, 2.586720850386245,  298.207856743356,   149.08991179449487",
        "50,  2.4242025729773475, 1.820694521038594,  299.5950731495905,  157.9291219499759",
        "100, 1.7382800244955985, 1.58741080351164,   303.91356644430164, 226.4942832221508",
        "300, 0.7130127367249813, 0.7151385415204907, 348.4903863341908,  346.05849137889584",
    })
    void matchesThePublishedFormulas(double nu, double sHarmonic, double sQuasi, double uHarmonic, double uQuasi) {
        LowFrequency both = new LowFrequency(true, true, 100, 4, 1e-44, 0);
        // 1e-12 relative: both sides are double evaluations of the same closed forms with a few roundings
        // each; the NumPy ln(1 - e^-x) and expm1 paths differ from ours by a few ulps.
        assertEquals(sHarmonic, one(nu, LowFrequency.harmonic()).entropy().values()[0], 1e-12 * sHarmonic);
        assertEquals(sQuasi, one(nu, both).entropy().values()[0], 1e-12 * sQuasi);
        assertEquals(uHarmonic, one(nu, LowFrequency.harmonic()).internalEnergyKelvin().values()[0], 1e-12 * uHarmonic);
        assertEquals(uQuasi, one(nu, both).internalEnergyKelvin().values()[0], 1e-12 * uQuasi);
    }

    @Test
    void theFloorRaisesLowModesBeforeAnythingElse() {
        // Raising to 100 cm-1 (Ribeiro, Marenich, Cramer, Truhlar 2011) makes a 10 cm-1 mode a 100 cm-1 mode.
        LowFrequency floor = new LowFrequency(false, false, 100, 4, 1e-44, 100);
        Vibrations v = Vibrations.of(new double[] {10, 40, 250}, floor);
        assertEquals(2, v.raisedCount());
        // S_HO / k_B of a 100 cm-1 mode at 298.15 K: the independent NumPy value of the table above
        assertEquals(1.7382800244955985, one(10, floor).entropy().values()[0], 1e-12);
    }
}
