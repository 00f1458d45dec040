package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DebyeSolidTest {

    private static final double THETA = 345.0;

    private static double at(double t, java.util.function.Function<VibrationalTable, Series> q) {
        return q.apply(DebyeSolid.perAtom(THETA, 0, new double[] {t})).values()[0];
    }

    @Test
    void heatCapacityAtTheDebyeTemperature() {
        // C_V(T = theta_D) = 0.95173 of 3R (issue text; recalled from memory); 30-digit value
        // 0.951732135703279447 from mpmath quadrature of 4 D_3(1) - 3/(e - 1), computed for this test.
        double cv = at(THETA, VibrationalTable::heatCapacityOverBoltzmann) / 3;
        assertEquals(0.95173, cv, 5e-6);
        assertEquals(0.951732135703279447, cv, 1e-14);
    }

    @Test
    void dulongPetitAtHighTemperature() {
        // C_V -> 3 k per atom (Dulong-Petit, common practice); the next term is -(3/20) x^2 (A&S 27.1.1).
        double t = THETA * 1e4;
        double x = THETA / t;
        assertEquals(3 * (1 - x * x / 20), at(t, VibrationalTable::heatCapacityOverBoltzmann), 1e-12);
    }

    @Test
    void debyeCubeLawAtLowTemperature() {
        // C_V = (12 pi^4 / 5) k (T / theta)^3 for T << theta (Kittel, ch. 5); exact up to e^{-theta/T} terms.
        double t = THETA / 200;
        double law = 12 * Math.pow(Math.PI, 4) / 5 * Math.pow(t / THETA, 3);
        assertEquals(law, at(t, VibrationalTable::heatCapacityOverBoltzmann), 1e-13 * law);
    }

    @Test
    void zeroPointEnergyIsNineEighthsTheta() {
        // E_zp = 9/8 k theta_D per atom (Kittel, ch. 5).
        VibrationalTable t = DebyeSolid.perAtom(THETA, 0, new double[] {0});
        assertEquals(9.0 / 8 * THETA, t.zeroPointEnergyKelvin(), 0);
        assertEquals(9.0 / 8 * THETA, t.helmholtzEnergyKelvin().values()[0], 0);
        assertEquals(0, t.entropyOverBoltzmann().values()[0], 0);
    }

    /**
     * F / k = int_0^theta g(e) [e/2 + T ln(1 - e^{-e/T})] de with g = 9 e^2 / theta^3, theta = 345 K, by
     * 30-digit adaptive quadrature (mpmath 1.3.0, computed for this test): independent of D_3.
     */
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.CsvSource({
        "10, 388.120255699367313848353272977",
        "100, 355.244548064716850103963243886",
        "345, -319.27714508247582184176959976",
        "2000, -12539.6856078404858963853267031"})
    void closedFormsAgreeWithQuadratureOverTheDebyeSpectrumWithinTheirBounds(double t, String reference) {
        double f = new java.math.BigDecimal(reference).doubleValue();
        VibrationalTable table = DebyeSolid.perAtom(THETA, 0, new double[] {t});
        double bound = table.helmholtzEnergyKelvin().errorBounds()[0];
        assertEquals(f, table.helmholtzEnergyKelvin().values()[0], bound + Math.ulp(f), "T=" + t);
        // Not loose by orders of magnitude: within 200 ulps of the scale theta + T.
        assertTrue(bound < 200 * Math.ulp(THETA + t), "bound " + bound);
    }
}
