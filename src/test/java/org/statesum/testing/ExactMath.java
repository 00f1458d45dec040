package org.statesum.testing;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Extended-precision elementary functions for reference values in tests, written from first
 * principles so that they share nothing with the double code under test: exp by reduction to
 * x = n ln 10 + r, halving r eight times and a Taylor series, then squaring back; ln by
 * ln x = k ln 10 + 2^8 ln(m^(1/2^8)) with m in [1, 10) and the series 2 atanh((y - 1)/(y + 1));
 * ln 10 and pi from atanh and Machin's arctangent series; ln N! exactly for N <= 2000 (the
 * integer N! and one logarithm) and by the Stirling series with ten Bernoulli terms above (remainder
 * below the first omitted term, |B_22| / (22 * 21 * N^21) < 1e-60 for N > 2000).
 *
 * <p>Working precision {@link #MC}: 50 significant digits (66 inside the series); every result is good to 45 or more.
 * Thread-safe (constants are computed once in the class initialiser).
 */
public final class ExactMath {

    /** Precision of every result. */
    public static final MathContext MC = new MathContext(50, RoundingMode.HALF_EVEN);
    /** Guard precision used inside the series. */
    private static final MathContext WORK = new MathContext(66, RoundingMode.HALF_EVEN);
    private static final int HALVINGS = 8;
    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    public static final BigDecimal LN10 = atanhSeries(BigDecimal.valueOf(9).divide(BigDecimal.valueOf(11), WORK))
            .multiply(TWO, WORK);
    public static final BigDecimal PI = atanInverse(5).multiply(BigDecimal.valueOf(16), WORK)
            .subtract(atanInverse(239).multiply(BigDecimal.valueOf(4), WORK), WORK);
    /** Exponents below this give exp(x) < 1e-2171: zero for any double-precision comparison. */
    private static final BigDecimal EXP_FLOOR = BigDecimal.valueOf(-5000);

    private ExactMath() {
    }

    /** exp(x); 0 when x < -5000. */
    public static BigDecimal exp(BigDecimal x) {
        if (x.compareTo(EXP_FLOOR) < 0) {
            return BigDecimal.ZERO;
        }
        BigDecimal n = x.divide(LN10, WORK).setScale(0, RoundingMode.HALF_EVEN);
        BigDecimal r = x.subtract(n.multiply(LN10, WORK), WORK);
        BigDecimal h = r.divide(TWO.pow(HALVINGS), WORK);
        BigDecimal sum = BigDecimal.ONE;
        BigDecimal term = BigDecimal.ONE;
        BigDecimal eps = BigDecimal.ONE.movePointLeft(70);
        for (int k = 1; term.abs().compareTo(eps) > 0; k++) {
            term = term.multiply(h, WORK).divide(BigDecimal.valueOf(k), WORK);
            sum = sum.add(term, WORK);
        }
        for (int i = 0; i < HALVINGS; i++) {
            sum = sum.multiply(sum, WORK);
        }
        return sum.scaleByPowerOfTen(n.intValueExact()).round(MC);
    }

    /** ln x for x > 0. */
    public static BigDecimal log(BigDecimal x) {
        if (x.signum() <= 0) {
            throw new ArithmeticException("log of a non-positive number");
        }
        x = x.round(WORK);
        int k = x.precision() - x.scale() - 1;
        BigDecimal m = x.scaleByPowerOfTen(-k);
        for (int i = 0; i < HALVINGS; i++) {
            m = m.sqrt(WORK);
        }
        BigDecimal z = m.subtract(BigDecimal.ONE).divide(m.add(BigDecimal.ONE), WORK);
        BigDecimal lnM = atanhSeries(z).multiply(TWO.pow(HALVINGS + 1), WORK);
        return LN10.multiply(BigDecimal.valueOf(k), WORK).add(lnM, WORK).round(MC);
    }

    /**
     * ln(1 + r) for r >= 0, keeping the relative precision of a tiny r (ln(1 + 1e-70) = 1e-70 to 50
     * digits): 2 atanh(r / (2 + r)) by its series for r < 1, ln(1 + r) otherwise.
     */
    public static BigDecimal log1p(BigDecimal r) {
        if (r.signum() < 0) {
            throw new ArithmeticException("log1p of a negative number");
        }
        if (r.compareTo(BigDecimal.ONE) >= 0) {
            return log(BigDecimal.ONE.add(r, WORK));
        }
        BigDecimal z = r.divide(TWO.add(r, WORK), WORK);
        return atanhSeries(z).multiply(TWO, WORK).round(MC);
    }

    /** ln of the exact value of a positive double. */
    public static BigDecimal log(double x) {
        return log(new BigDecimal(x));
    }

    /** ln N! for a non-negative integral N (as a double, up to 1e30 and beyond). */
    public static BigDecimal logFactorial(double n) {
        if (n <= 2000) {
            BigInteger f = BigInteger.ONE;
            for (int i = 2; i <= (int) n; i++) {
                f = f.multiply(BigInteger.valueOf(i));
            }
            return log(new BigDecimal(f));
        }
        return stirlingLogFactorial(new BigDecimal(n));
    }

    /** ln N! = ln N + lnGamma(N) with Stirling's series for lnGamma (for N > 2000; exposed for a cross-check). */
    static BigDecimal stirlingLogFactorial(BigDecimal n) {
        // Bernoulli numbers B_2 .. B_20 (Abramowitz and Stegun, Handbook of Mathematical Functions,
        // Table 23.2), as numerator / denominator.
        long[][] bernoulli = {{1, 6}, {-1, 30}, {1, 42}, {-1, 30}, {5, 66}, {-691, 2730}, {7, 6},
            {-3617, 510}, {43867, 798}, {-174611, 330}};
        BigDecimal lnN = log(n);
        BigDecimal half = new BigDecimal("0.5");
        BigDecimal sum = n.subtract(half).multiply(lnN, WORK).subtract(n, WORK)
                .add(half.multiply(log(PI.multiply(TWO, WORK)), WORK), WORK);
        BigDecimal nSquared = n.multiply(n, WORK);
        BigDecimal power = n;
        for (int k = 1; k <= bernoulli.length; k++) {
            BigDecimal b = BigDecimal.valueOf(bernoulli[k - 1][0]).divide(BigDecimal.valueOf(bernoulli[k - 1][1]), WORK);
            BigDecimal denominator = BigDecimal.valueOf(2L * k * (2L * k - 1)).multiply(power, WORK);
            sum = sum.add(b.divide(denominator, WORK), WORK);
            power = power.multiply(nSquared, WORK);
        }
        return sum.add(lnN, WORK).round(MC);
    }

    /** atanh(z) = sum_k z^(2k+1) / (2k+1) for |z| < 1. */
    private static BigDecimal atanhSeries(BigDecimal z) {
        BigDecimal z2 = z.multiply(z, WORK);
        BigDecimal power = z;
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal eps = z.abs().movePointLeft(70);
        for (int k = 0; power.abs().compareTo(eps) > 0; k++) {
            sum = sum.add(power.divide(BigDecimal.valueOf(2L * k + 1), WORK), WORK);
            power = power.multiply(z2, WORK);
        }
        return sum;
    }

    /** arctan(1 / q) by its alternating series. */
    private static BigDecimal atanInverse(int q) {
        BigDecimal x = BigDecimal.ONE.divide(BigDecimal.valueOf(q), WORK);
        BigDecimal x2 = x.multiply(x, WORK);
        BigDecimal power = x;
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal eps = BigDecimal.ONE.movePointLeft(70);
        for (int k = 0; power.compareTo(eps) > 0; k++) {
            BigDecimal term = power.divide(BigDecimal.valueOf(2L * k + 1), WORK);
            sum = k % 2 == 0 ? sum.add(term, WORK) : sum.subtract(term, WORK);
            power = power.multiply(x2, WORK);
        }
        return sum;
    }
}
