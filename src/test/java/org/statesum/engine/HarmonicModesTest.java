package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class HarmonicModesTest {

    private static HarmonicModes einstein(double theta, double weight) {
        return HarmonicModes.of(new double[] {theta}, new double[] {weight}, 0);
    }

    @Test
    void einsteinHeatCapacityAtItsOwnTemperature() {
        // C_V(T = theta_E) = x^2 e^x / (e^x - 1)^2 at x = 1: 0.92067 of 3R (issue text; recalled from memory);
        // 0.920673594207792319 from 30-digit evaluation (mpmath 1.3.0, computed for this test).
        VibrationalTable t = einstein(280, 3).evaluate(new double[] {280});
        double cv = t.heatCapacityOverBoltzmann().values()[0] / 3;
        assertEquals(0.92067, cv, 5e-6);
        assertEquals(0.920673594207792319, cv, 4e-16);
        assertEquals(0.920673594207792319 * 3, t.heatCapacityOverBoltzmann().values()[0],
                t.heatCapacityOverBoltzmann().errorBounds()[0] + Math.ulp(2.76));
    }

    @Test
    void dulongPetitAndZeroPointLimits() {
        HarmonicModes m = einstein(500, 3);
        VibrationalTable hot = m.evaluate(new double[] {5e6});
        // C_V -> 3 k (Dulong-Petit, common practice); the correction is -x^2/12 per mode, x = 1e-4.
        assertEquals(3 * (1 - 1e-8 / 12), hot.heatCapacityOverBoltzmann().values()[0], 1e-13);
        VibrationalTable cold = m.evaluate(new double[] {0});
        assertEquals(750, cold.zeroPointEnergyKelvin(), 0);
        assertEquals(750, cold.helmholtzEnergyKelvin().values()[0], 0);
        assertEquals(0, cold.heatCapacityOverBoltzmann().values()[0], 0);
    }

    @Test
    void deepColdGivesExactZerosRatherThanNaN() {
        VibrationalTable t = einstein(1e7, 1).evaluate(new double[] {1e-12});
        assertEquals(0, t.entropyOverBoltzmann().values()[0], 0);
        assertEquals(0, t.heatCapacityOverBoltzmann().values()[0], 0);
        assertEquals(5e6, t.internalEnergyKelvin().values()[0], 0);
    }

    @Test
    void theShortSeriesForLnOneMinusMatchesLog1p() {
        // log1p (fdlibm, within 1 ulp) as the reference; the series claims 5 u relative on [0, 1/4].
        for (int i = 0; i <= 1000; i++) {
            double e = 0.25 * i / 1000 * (i % 2 == 0 ? 1 : Math.pow(10, -i % 17));
            double reference = Math.log1p(-e);
            assertEquals(reference, HarmonicModes.logOneMinus(e), 6 * Math.ulp(1.0) / 2 * Math.abs(reference)
                    + Math.ulp(reference), "e=" + e);
        }
    }
}
