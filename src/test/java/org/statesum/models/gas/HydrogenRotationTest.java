package org.statesum.models.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.statesum.testing.HighPrecision;

/**
 * Rotational heat capacity of H2 (nuclear spin 1/2; para = even J with weight 1, ortho = odd J with
 * weight 3) against an independent 40-digit evaluation and the published qualitative features
 * (D. A. McQuarrie, Statistical Mechanics, 1976, section 6-5 and its figure of C_rot for H2).
 */
class HydrogenRotationTest {

    /** theta_rot of H2 from B_e = 60.853 cm^-1 (K. P. Huber and G. Herzberg, Constants of Diatomic
     *  Molecules, 1979; recalled from memory) times c_2 = 1.438776877 cm K. */
    private static final double THETA = 60.853 * Vibrations.KELVIN_PER_WAVENUMBER;

    private static double cv(NuclearSpin spin, double t) {
        return new LinearRotor(THETA, 2, true, spin).evaluate(new double[] {t}).heatCapacity().values()[0];
    }

    private static double cvBound(NuclearSpin spin, double t) {
        return new LinearRotor(THETA, 2, true, spin).evaluate(new double[] {t}).heatCapacity().errorBounds()[0];
    }

    /** C_V / k_B of the J levels of one parity (or all) with the given weights, 40 digits, J <= 60. */
    private static double reference(double evenWeight, double oddWeight, double t) {
        int count = 61;
        double[] e = new double[count];
        double[] g = new double[count];
        int n = 0;
        for (int j = 0; j < count; j++) {
            double w = j % 2 == 0 ? evenWeight : oddWeight;
            if (w > 0) {
                e[n] = THETA * j * (j + 1.0);
                g[n++] = (2 * j + 1) * w;
            }
        }
        return HighPrecision.moments(java.util.Arrays.copyOf(e, n), java.util.Arrays.copyOf(g, n), t)[2];
    }

    @ParameterizedTest
    @ValueSource(doubles = {15, 50, 100, 175, 300, 600, 1000})
    void everyModificationMatchesTheHighPrecisionSum(double t) {
        NuclearSpin para = new NuclearSpin(0.5, false, false, 0);
        NuclearSpin ortho = new NuclearSpin(0.5, false, false, 1);
        NuclearSpin equilibrium = new NuclearSpin(0.5, false, true, 0);
        NuclearSpin normal = new NuclearSpin(0.5, false, false, 0.75);
        double refPara = reference(1, 0, t);
        double refOrtho = reference(0, 3, t);
        // 1e-12: the bounds are ~1e-15 relative; the reference carries ~35 digits (J <= 60 leaves a tail
        // below e^-3000 at these temperatures).
        assertEquals(refPara, cv(para, t), 1e-12);
        assertEquals(refOrtho, cv(ortho, t), 1e-12);
        assertEquals(reference(1, 3, t), cv(equilibrium, t), 1e-12);
        assertEquals(0.25 * refPara + 0.75 * refOrtho, cv(normal, t), 1e-12);
        assertTrue(Math.abs(cv(equilibrium, t) - reference(1, 3, t)) <= cvBound(equilibrium, t));
    }

    @Test
    void equilibriumHydrogenPeaksWellAboveTheClassicalLimit() {
        double max = 0;
        double at = 0;
        for (double t = 10; t <= 1000; t += 1) {
            double c = cv(new NuclearSpin(0.5, false, true, 0), t);
            if (c > max) {
                max = c;
                at = t;
            }
        }
        // Qualitative feature (McQuarrie, section 6-5): a maximum above R, from the ortho-para
        // conversion (J = 0 -> 1, 2 theta = 175 K, weight ratio 9). Its height and place, 2.07 R near
        // 50 K, are from an independent NumPy sum over J <= 79 done while writing this test.
        assertTrue(max > 1, "maximum " + max);
        assertEquals(2.068, max, 0.002);
        assertEquals(50, at, 2);
    }

    @Test
    void normalHydrogenRisesToTheClassicalLimitWithoutAPronouncedPeak() {
        // The normal (3:1, frozen) curve rises monotonically to within 1e-3 of R with no low-temperature
        // peak (McQuarrie, section 6-5: the curve that matches the measured heat capacity); every curve
        // tends to R at high T (1 + (theta / T)^2 / 45 + ... at T >> theta).
        NuclearSpin normal = new NuclearSpin(0.5, false, false, 0.75);
        assertTrue(cv(normal, 50) < cv(normal, 100));
        assertTrue(cv(normal, 100) < cv(normal, 200));
        double peak = 0;
        for (double t = 10; t <= 1000; t += 5) {
            peak = Math.max(peak, cv(normal, t));
        }
        assertTrue(peak < 1.001, "peak " + peak);
        double x = THETA / 5000;
        assertEquals(1 + x * x / 45, cv(new NuclearSpin(0.5, false, true, 0), 5000), 1e-6);
    }

    @Test
    void paraAndOrthoHaveTheTextbookWeights() {
        NuclearSpin h2 = new NuclearSpin(0.5, false, true, 0);
        assertEquals(0.25, h2.evenWeight(), 0);
        assertEquals(0.75, h2.oddWeight(), 0);
        assertEquals(0.75, h2.normalOddFraction(), 0);
        // N2 (I = 1, boson): ortho (even J) : para = 2 : 1 (McQuarrie, section 6-5).
        NuclearSpin n2 = new NuclearSpin(1, false, true, 0);
        assertEquals(2.0, n2.evenWeight() / n2.oddWeight(), 1e-15);
        // 16O2 (I = 0, Sigma_g^-): odd J only.
        NuclearSpin o2 = new NuclearSpin(0, true, true, 0);
        assertEquals(0.0, o2.evenWeight(), 0);
        assertEquals(1.0, o2.oddWeight(), 0);
    }
}
