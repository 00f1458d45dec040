package org.statesum.models.gas;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.statesum.testing.HighPrecision;

/**
 * The error bounds of the harmonic vibrational part against a 40-digit evaluation of the same
 * formulas from the same (double) theta: never exceeded, and within a factor 1e4 of the true error or
 * of 1e-15 relative, whichever is larger (not loose by orders of magnitude beyond that).
 */
class VibrationBoundsTest {

    @ParameterizedTest
    @CsvSource({
        "5,     3000",   // x ~ 0.0024: classical limit, ln x dominates S
        "200,   298.15",
        "1600,  298.15",
        "4000,  100",    // x ~ 58: exponentially small thermal parts
        "3000,  2",      // x ~ 2158: underflow to exactly zero
    })
    void boundsHoldAgainstExtendedPrecision(double nu, double t) {
        GasPart part = Vibrations.of(new double[] {nu}, LowFrequency.harmonic()).evaluate(new double[] {t});
        double theta = nu * Vibrations.KELVIN_PER_WAVENUMBER;
        BigDecimal x = new BigDecimal(theta).divide(new BigDecimal(t), HighPrecision.MC);
        BigDecimal ex = HighPrecision.exp(x);
        BigDecimal em1 = ex.subtract(BigDecimal.ONE, HighPrecision.MC);
        BigDecimal u = new BigDecimal(theta).multiply(new BigDecimal("0.5"), HighPrecision.MC)
                .add(new BigDecimal(theta).divide(em1, HighPrecision.MC), HighPrecision.MC);
        BigDecimal s = x.divide(em1, HighPrecision.MC).subtract(
                HighPrecision.log(BigDecimal.ONE.subtract(BigDecimal.ONE.divide(ex, HighPrecision.MC), HighPrecision.MC)),
                HighPrecision.MC);
        BigDecimal half = x.divide(em1, HighPrecision.MC);
        BigDecimal cv = half.multiply(half, HighPrecision.MC).multiply(ex, HighPrecision.MC);
        check(u.doubleValue(), part.internalEnergyKelvin().values()[0], part.internalEnergyKelvin().errorBounds()[0]);
        check(s.doubleValue(), part.entropy().values()[0], part.entropy().errorBounds()[0]);
        check(cv.doubleValue(), part.heatCapacity().values()[0], part.heatCapacity().errorBounds()[0]);
    }

    private static void check(double reference, double value, double bound) {
        double error = Math.abs(value - reference);
        assertTrue(error <= bound, "error " + error + " exceeds bound " + bound + " (reference " + reference + ")");
        assertTrue(bound <= Math.max(1e4 * error, 1e-15 * Math.abs(reference) * 1e2) || bound <= 1e-300,
                "bound " + bound + " loose against error " + error + " (reference " + reference + ")");
    }
}
