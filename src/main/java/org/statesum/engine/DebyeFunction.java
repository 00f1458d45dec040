package org.statesum.engine;

import java.math.BigInteger;
import org.apache.commons.math3.fraction.BigFraction;

/**
 * The Debye function of order three, D_3(x) = (3 / x^3) int_0^x t^3 / (e^t - 1) dt, for x &gt;= 0, with a
 * proven bound on its absolute error.
 *
 * <p>Two exact series, each summed until a proven bound on its tail is below a quarter of the unit
 * roundoff of the result:
 * <ul>
 *   <li>x &lt;= {@link #SERIES_SWITCH}: D_3(x) = 1 - 3x/8 + 3 sum_{k&gt;=1} B_{2k} x^{2k} / ((2k + 3) (2k)!)
 *       (Abramowitz and Stegun 27.1.1 with n = 3), convergent for x &lt; 2 pi. Since
 *       |B_{2k}| / (2k)! = 2 zeta(2k) / (2 pi)^{2k} &lt;= 2 zeta(2) / (2 pi)^{2k}, the tail after term K is at
 *       most 6 zeta(2) r^{2K+2} / ((2K + 5)(1 - r^2)) with r = x / (2 pi).</li>
 *   <li>x &gt; {@link #SERIES_SWITCH}: int_0^x = pi^4/15 - sum_{k&gt;=1} e^{-kx} (x^3/k + 3x^2/k^2 + 6x/k^3 + 6/k^4)
 *       (the complement integrated term by term, A&amp;S 27.1.2); the tail after term K is at most
 *       e^{-(K+1)x} (x^3 + 3x^2 + 6x + 6) / (1 - e^{-x}).</li>
 * </ul>
 * Rounding is bounded by a first-order running analysis (gamma_n = n u on sums of magnitudes), doubled
 * for second-order terms. At x = 2 both series need about 16 terms.
 *
 * <p>The Bernoulli numbers are generated exactly (rational recurrence) at class initialisation and
 * rounded once. Thread-safe.
 */
public final class DebyeFunction {

    /** Where the power series gives way to the exponential series: both converge like 0.1^k there. */
    public static final double SERIES_SWITCH = 2.0;

    private static final double U = 0x1.0p-53;
    private static final int TERMS = 24;
    /** B_{2k} / (2k)! for k = 1..TERMS, each rounded once from the exact rational. */
    private static final double[] BERNOULLI_OVER_FACTORIAL = bernoulliOverFactorial(TERMS);
    /** pi^4 / 15 = int_0^inf t^3 / (e^t - 1) dt = 6 zeta(4); within half an ulp. */
    private static final double PI4_OVER_15 = Math.pow(Math.PI, 4) / 15;
    /** Bound on the error of {@link #PI4_OVER_15}: pi rounded, the power and the quotient (4 ulps). */
    private static final double PI4_OVER_15_ERROR = 4 * Math.ulp(PI4_OVER_15);
    private static final double ZETA2 = Math.PI * Math.PI / 6;

    private DebyeFunction() {
    }

    /** D_3(x) and an absolute bound on its numerical error; {@code terms} is the number of series terms used. */
    public record Value(double value, double errorBound, int terms) {
    }

    /**
     * Evaluates D_3(x).
     *
     * @param x theta / T, dimensionless, finite and &gt;= 0 (+infinity gives 0)
     * @throws DomainException for negative or NaN x
     */
    public static Value of(double x) {
        if (!(x >= 0)) {
            throw new DomainException("invalid-argument", "", "the Debye function needs x >= 0");
        }
        if (x == 0) {
            return new Value(1.0, 0.0, 0);
        }
        if (x == Double.POSITIVE_INFINITY) {
            return new Value(0.0, 0.0, 0);
        }
        return x <= SERIES_SWITCH ? powerSeries(x) : exponentialSeries(x);
    }

    /** D_3(x) alone. */
    public static double value(double x) {
        return of(x).value();
    }

    private static Value powerSeries(double x) {
        double r2 = (x / (2 * Math.PI)) * (x / (2 * Math.PI));
        double x2 = x * x;
        double sum = 1.0 - 0.375 * x;
        double magnitude = 1.0 + 0.375 * x;
        double power = 1.0;
        double rPower = 1.0;
        int k = 1;
        double tail = Double.MAX_VALUE;
        for (; k <= TERMS; k++) {
            power *= x2;
            rPower *= r2;
            double term = 3 * BERNOULLI_OVER_FACTORIAL[k - 1] * power / (2 * k + 3);
            sum += term;
            magnitude += Math.abs(term);
            tail = 6 * ZETA2 * rPower * r2 / ((2 * k + 5) * (1 - r2));
            if (tail < 0.25 * U * sum) {
                break;
            }
        }
        int terms = Math.min(k, TERMS);
        // Each term: B/(2k)! (1 u), x^{2k} (2k u), two products and a quotient (3 u); the sum adds (terms + 2) u.
        double rounding = (4 * terms + 8) * U * magnitude;
        return new Value(sum, 2 * rounding + tail, terms);
    }

    private static Value exponentialSeries(double x) {
        double q = Math.exp(-x);
        double x2 = x * x;
        double x3 = x2 * x;
        double tailSum = 0;
        double eK = 1;
        int k = 1;
        double truncation = 0;
        double polynomialAtOne = x3 + 3 * x2 + 6 * x + 6;
        for (; k <= 400; k++) {
            eK *= q;
            if (eK == 0) {
                break;
            }
            double inv = 1.0 / k;
            tailSum += eK * inv * (x3 + inv * (3 * x2 + inv * (6 * x + inv * 6)));
            truncation = eK * q * polynomialAtOne / (1 - q);
            if (truncation < 0.25 * U * (PI4_OVER_15 - tailSum)) {
                break;
            }
        }
        double scale = 3.0 / x3;
        double value = scale * (PI4_OVER_15 - tailSum);
        int terms = k;
        // e^{-kx} by k products of q (q itself 1 ulp, so k u plus k roundings), Horner (8 u),
        // the running sum (k u); then the difference (1 u) and the scale (3 u).
        double tailRounding = (2.0 * terms + 8) * U * tailSum;
        double rounding = scale * (PI4_OVER_15_ERROR + tailRounding + truncation) + 4 * U * Math.abs(value);
        return new Value(value, 2 * rounding, terms);
    }

    private static double[] bernoulliOverFactorial(int count) {
        int max = 2 * count;
        BigFraction[] b = new BigFraction[max + 1];
        b[0] = BigFraction.ONE;
        for (int m = 1; m <= max; m++) {
            // sum_{j=0}^{m} C(m + 1, j) B_j = 0.
            BigFraction s = BigFraction.ZERO;
            BigInteger binomial = BigInteger.ONE;
            for (int j = 0; j < m; j++) {
                s = s.add(b[j].multiply(binomial));
                binomial = binomial.multiply(BigInteger.valueOf(m + 1 - j)).divide(BigInteger.valueOf(j + 1));
            }
            b[m] = s.negate().divide(new BigFraction(BigInteger.valueOf(m + 1)));
        }
        double[] out = new double[count];
        BigInteger factorial = BigInteger.ONE;
        for (int n = 1; n <= max; n++) {
            factorial = factorial.multiply(BigInteger.valueOf(n));
            if (n % 2 == 0) {
                out[n / 2 - 1] = b[n].divide(new BigFraction(factorial)).doubleValue();
            }
        }
        return out;
    }
}
