package org.statesum.models.gas;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.statesum.testing.HighPrecision;
import org.statesum.units.PhysicalConstants;

/** The Sackur-Tetrode entropy and its bound against a 40-digit evaluation from the same inputs. */
class TranslationBoundsTest {

    /** pi to 40 digits (common knowledge). */
    private static final BigDecimal PI = new BigDecimal("3.141592653589793238462643383279502884197");

    @ParameterizedTest
    @CsvSource({"4.002602, 1e5, 298.15", "39.948, 1e5, 1", "500, 1e-3, 5000", "2.01588, 1e9, 20"})
    void boundHoldsAndIsTight(double massU, double pressure, double t) {
        double mass = massU * PhysicalConstants.ATOMIC_MASS_CONSTANT_KG;
        GasPart part = Translation.of(mass, StandardState.pressure(pressure)).evaluate(new double[] {t});
        BigDecimal k = new BigDecimal(PhysicalConstants.BOLTZMANN_J_PER_K);
        BigDecimal h = new BigDecimal(PhysicalConstants.PLANCK_J_S);
        BigDecimal temperature = new BigDecimal(t);
        BigDecimal kt = k.multiply(temperature, HighPrecision.MC);
        // S / k_B = ln(k T / p) + 3/2 ln(2 pi m k T / h^2) + 5/2
        BigDecimal volume = kt.divide(new BigDecimal(pressure), HighPrecision.MC);
        BigDecimal thermal = BigDecimal.valueOf(2).multiply(PI, HighPrecision.MC).multiply(new BigDecimal(mass), HighPrecision.MC)
                .multiply(kt, HighPrecision.MC).divide(h.multiply(h, HighPrecision.MC), HighPrecision.MC);
        double reference = HighPrecision.log(volume).add(new BigDecimal("1.5").multiply(HighPrecision.log(thermal),
                HighPrecision.MC), HighPrecision.MC).add(new BigDecimal("2.5"), HighPrecision.MC).doubleValue();
        double error = Math.abs(part.entropy().values()[0] - reference);
        double bound = part.entropy().errorBounds()[0];
        assertTrue(error <= bound, "error " + error + " bound " + bound);
        // Not loose by orders of magnitude: within 1e3 ulps of |S| (terms of size ~100 with ~16 u each).
        assertTrue(bound <= 1e3 * Math.ulp(Math.abs(reference)) + 1e-13, "bound " + bound);
    }
}
