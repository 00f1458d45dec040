package org.statesum.testing;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Reference evaluations in 40-digit decimal arithmetic, independent of the production code: exp and
 * ln from {@link ExactMath}, and the canonical moments of a level set summed term by term
 * (the fluctuation formula {@code <E^2> - <E>^2}, safe here because every term carries 40 digits).
 */
public final class HighPrecision {

    public static final MathContext MC = new MathContext(40, RoundingMode.HALF_EVEN);

    private HighPrecision() {
    }

    /** e^x, from the 50-digit reference {@link ExactMath#exp}. */
    public static BigDecimal exp(BigDecimal x) {
        return ExactMath.exp(x);
    }

    /** ln a for a > 0, from the 50-digit reference {@link ExactMath#log}. */
    public static BigDecimal log(BigDecimal a) {
        return ExactMath.log(a);
    }

    /**
     * ln Z' (relative to the lowest level), U / k_B (K) and C_V / k_B of levels E_i / k_B = e[i] (K)
     * with weights g[i], at T (K): {lnZrel, U, Cv} as doubles.
     */
    public static double[] moments(double[] e, double[] g, double t) {
        BigDecimal temperature = new BigDecimal(t);
        double min = Double.POSITIVE_INFINITY;
        for (double v : e) {
            min = Math.min(min, v);
        }
        BigDecimal e0 = new BigDecimal(min);
        BigDecimal z = BigDecimal.ZERO;
        BigDecimal m1 = BigDecimal.ZERO;
        BigDecimal m2 = BigDecimal.ZERO;
        for (int i = 0; i < e.length; i++) {
            BigDecimal eps = new BigDecimal(e[i]).subtract(e0).divide(temperature, MC);
            BigDecimal w = new BigDecimal(g[i]).multiply(exp(eps.negate()), MC);
            z = z.add(w, MC);
            m1 = m1.add(w.multiply(eps, MC), MC);
            m2 = m2.add(w.multiply(eps, MC).multiply(eps, MC), MC);
        }
        BigDecimal mean = m1.divide(z, MC);
        BigDecimal cv = m2.divide(z, MC).subtract(mean.multiply(mean, MC), MC);
        double u = mean.multiply(temperature, MC).add(e0, MC).doubleValue();
        return new double[] {Math.log(z.doubleValue()), u, cv.doubleValue()};
    }
}
