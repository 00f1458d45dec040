package org.statesum.models.gas;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.statesum.testing.HighPrecision;

/**
 * The error bounds of the vibrational part, plain and interpolated, against a 40-digit evaluation of
 * the same formulas from the same (double) theta: never exceeded, and within a factor 1e4 of the true error or
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

    /**
     * The same with both low-frequency interpolations (Grimme 2012 entropy, Li et al. 2015 energy; the
     * published defaults omega_0 = 100 cm^-1, alpha = 4, B_av = 1e-44 kg m^2), the free rotor evaluated
     * in 40 digits from the exact SI values of h, c and k_B.
     */
    @ParameterizedTest
    @CsvSource({
        "10,   298.15", // w = 1e-4: nearly a free rotor
        "100,  298.15", // w = 1/2
        "300,  50",     // w = 0.988
        "1600, 1000",   // w = 0.99998
    })
    void interpolatedBoundsHoldAgainstExtendedPrecision(double nu, double t) {
        LowFrequency low = new LowFrequency(true, true, LowFrequency.DEFAULT_CUTOFF, LowFrequency.DEFAULT_ALPHA,
                LowFrequency.DEFAULT_AVERAGE_MOMENT, 0);
        GasPart part = Vibrations.of(new double[] {nu}, low).evaluate(new double[] {t});
        java.math.MathContext mc = HighPrecision.MC;
        double theta = nu * Vibrations.KELVIN_PER_WAVENUMBER;
        BigDecimal temperature = new BigDecimal(t);
        BigDecimal x = new BigDecimal(theta).divide(temperature, mc);
        BigDecimal ex = HighPrecision.exp(x);
        BigDecimal em1 = ex.subtract(BigDecimal.ONE, mc);
        BigDecimal uHo = new BigDecimal(theta).multiply(new BigDecimal("0.5"), mc)
                .add(new BigDecimal(theta).divide(em1, mc), mc);
        BigDecimal sHo = x.divide(em1, mc).subtract(
                HighPrecision.log(BigDecimal.ONE.subtract(BigDecimal.ONE.divide(ex, mc), mc)), mc);
        BigDecimal half = x.divide(em1, mc);
        BigDecimal cHo = half.multiply(half, mc).multiply(ex, mc);
        // w = 1 / (1 + (omega_0 / nu)^alpha)
        BigDecimal ratio = new BigDecimal(100).divide(new BigDecimal(nu), mc);
        BigDecimal w = BigDecimal.ONE.divide(BigDecimal.ONE.add(ratio.pow(4, mc), mc), mc);
        BigDecimal oneMinusW = BigDecimal.ONE.subtract(w, mc);
        // free rotor: mu = h / (8 pi^2 f), f = 100 nu c; mu' = mu B / (mu + B); S / k = 1/2 + 1/2 ln(8 pi^3 mu' k T / h^2)
        BigDecimal h = new BigDecimal("6.62607015e-34");
        BigDecimal k = new BigDecimal("1.380649e-23");
        BigDecimal c = new BigDecimal("299792458");
        BigDecimal b = new BigDecimal(LowFrequency.DEFAULT_AVERAGE_MOMENT);
        BigDecimal pi = org.statesum.testing.ExactMath.PI;
        BigDecimal pi2 = pi.multiply(pi, mc);
        BigDecimal f = new BigDecimal(nu).multiply(new BigDecimal(100), mc).multiply(c, mc);
        BigDecimal mu = h.divide(new BigDecimal(8).multiply(pi2, mc).multiply(f, mc), mc);
        BigDecimal reduced = mu.multiply(b, mc).divide(mu.add(b, mc), mc);
        BigDecimal argument = new BigDecimal(8).multiply(pi2, mc).multiply(pi, mc).multiply(reduced, mc)
                .multiply(k, mc).multiply(temperature, mc).divide(h.multiply(h, mc), mc);
        BigDecimal sFr = new BigDecimal("0.5").add(new BigDecimal("0.5").multiply(HighPrecision.log(argument), mc), mc);
        BigDecimal u = w.multiply(uHo, mc).add(oneMinusW.multiply(temperature, mc).multiply(new BigDecimal("0.5"), mc), mc);
        BigDecimal s = w.multiply(sHo, mc).add(oneMinusW.multiply(sFr, mc), mc);
        BigDecimal cv = w.multiply(cHo, mc).add(oneMinusW.multiply(new BigDecimal("0.5"), mc), mc);
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
