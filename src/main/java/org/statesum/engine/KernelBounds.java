package org.statesum.engine;

/**
 * The running error analysis of one {@link CanonicalKernel} evaluation: accumulates, term by term,
 * what the analysis needs and then turns it into absolute bounds on ln Z, beta mu (the mean energy
 * above the dominant level in units of k_B T), S / k_B, C_V / k_B and the populations.
 *
 * <p>Notation: u = 2^-53, n levels, tau_i the exact weight exp(zeta_i) from the exact inputs and t_i the
 * computed one, e-hat_i = e_i + e_m the exponent error of term i (its own rounding and input errors plus
 * the input errors of the dominant level m), phi = expm1(M) / M with M = max e-hat_i + 2 u over the
 * normal terms (phi -> 1; it makes |t_i / tau_i - 1| <= phi (e-hat_i + 2 u) exact rather than first
 * order). Subnormal terms get the absolute bound alpha_i = (1 + 2 u) exp(z_i + e-hat_i) + 2^-1074,
 * which holds whether or not exp underflowed.
 * <ul>
 *   <li>Sum of weights: |sum tau - s| <= K0 = phi sum t (e-hat + 2u) + sum alpha + n u R; so
 *       ln s is off by at most eps / (1 - eps), eps = K0 / s (Higham 2002, eq. 4.3, recursive
 *       summation of non-negative terms).</li>
 *   <li>ln Z adds the input error of level m, 1 ulp of log1p, and the roundings of the double-double
 *       assembly (u |tail| + u |ln Z| + 6 u^2 (|p| + |h| + |L_m|)).</li>
 *   <li>beta mu: the weights enter centred, sum (tau_i - t_i) beta (d_i - mu) / s, bounded by
 *       phi sum t (e-hat + 2u) |q| / s + sum alpha (|v| + |beta mu|) / s; the differences d_i carry
 *       at most u |d_i| + rho (|E_i| + |E_m|) <= T e-hat_i; the signed sum of t_i d_i adds
 *       (n + 1) u sum t |d| and the quotient, the scaling and s (n u R / s + 4 u) |beta mu|.</li>
 *   <li>C_V: centred weights again, sum |tau_i - t_i| (q_i^2 + V) / s; the q_i carry beta errors
 *       of the d_i (2 sum t |q| e-hat / s to first order) and the mean's error enters squared
 *       (V is stationary in the centre); rounding adds ((n + 10) u + n u R / s) V.</li>
 * </ul>
 * Results are multiplied by {@link #SAFETY} to cover products of first-order terms (each below 1e-3
 * relative whenever phi is close to 1), and every sum gets n 2^-1074 per operation for gradual underflow.
 */
final class KernelBounds {

    private static final double U = PreparedLevels.UNIT_ROUNDOFF;
    private static final double ETA = CanonicalKernel.ETA;
    private static final double LN2 = 0.6931471805599453;
    /** e^-750 < 2^-1075: a term below it is invisible even as a subnormal. */
    private static final double UNDERFLOW_EXPONENT = -750;
    /** Covers the neglected products of first-order terms. */
    static final double SAFETY = 1.0625;

    private final int n;
    private final double errM;
    private double sumTE;
    private double maxE;
    private double sumTAbsD;
    private double a0;
    private double a1;
    private double a2;
    private double a1Kelvin;
    private double sumTA;
    private long belowUnderflow;
    private double maxAll;
    private final double errAm;
    /** Input error of ln g_m alone: S = L_m + ln s + beta mu holds E_m only through the weights. */
    private final double errBm;

    double lnZ;
    double reducedMean;
    double entropy;
    double heatCapacity;
    /** The subnormal terms' share of the error of mu in kelvin (in beta units it can underflow). */
    double subnormalMeanKelvin;
    private double phi;
    private double epsS;

    KernelBounds(int n, double errM, double errAm, double errBm) {
        this.errBm = errBm;
        this.n = n;
        this.errM = errM;
        this.errAm = errAm;
    }

    /**
     * The sums over all terms, accumulated by the caller in index order: sum t e-hat, sum t |d|,
     * sum t rho |E_i| (K, 0 for the dominant level), the largest e-hat among the terms with a normal
     * factor (t >= 2^-1022) and the largest e-hat of all.
     */
    void terms(double sumTExponentError, double sumTAbsDifference, double sumTInputErrorKelvin,
            double maxNormalExponentError, double maxExponentError) {
        sumTE = sumTExponentError;
        sumTAbsD = sumTAbsDifference;
        sumTA = sumTInputErrorKelvin;
        maxE = maxNormalExponentError;
        maxAll = maxExponentError;
    }

    /**
     * One term whose factor t = exp(z) is subnormal or zero (the caller sums every term into
     * {@link #terms}): its exponent error e-hat, v = beta d and d = E_i - E_m in K.
     */
    void smallTerm(double t, double z, double eh, double v, double d) {
        double ad = Math.abs(d);
        double av = Math.abs(v);
        if (t > 0) {
            // Subnormal: exp is within 1 ulp = 2^-1074 of e^z, and e^z within a factor e^(+-e-hat) of tau.
            double alpha = (t + ETA) * Math.expm1(eh) * (1 + 4 * U) + ETA;
            a0 += alpha;
            a1 += alpha * av;
            a2 += alpha * av * av;
            a1Kelvin += alpha * ad;
            return;
        }
        // Underflowed to 0: tau <= e^(z + e-hat); the weighted contributions tau |v|^k are bounded with
        // ln |v| <= (exponent(v) + 1) ln 2, and skipped (one 2^-1074 each) when all lie below e^-750.
        double w = z + eh;
        double lv = (Math.getExponent(v) + 1) * LN2;
        double ld = (Math.getExponent(d) + 1) * LN2;
        if (w + 2 * Math.max(lv, 0) < UNDERFLOW_EXPONENT && w + Math.max(ld, 0) < UNDERFLOW_EXPONENT) {
            belowUnderflow++;
            return;
        }
        double up = 1 + 2 * U;
        a0 += up * Math.exp(w) + ETA;
        a1 += up * Math.exp(w + lv) + ETA;
        a2 += up * Math.exp(w + 2 * lv) + ETA;
        a1Kelvin += up * Math.exp(w + ld) + ETA;
    }

    void finish(double s, double r, double mean, double beta, double variance, double w0, double w1, double w2,
            double w3, double log1pR, double lnZValue, double tail, double p, double entropyValue, double lgm) {
        a0 += belowUnderflow * ETA;
        a1 += belowUnderflow * ETA;
        a2 += belowUnderflow * ETA;
        a1Kelvin += belowUnderflow * ETA;
        double m = maxE + 2 * U;
        phi = m < 0x1.0p-30 ? 1 + m : Math.expm1(m) / m;
        // t_m = exp(0) = 1 exactly: only the other terms (summing to R) carry exp's ulp.
        double k0 = phi * (sumTE + 2 * U * r) + a0 + n * U * r + n * ETA;
        epsS = k0 / s;
        double lnSError = epsS < 0.5 ? epsS / (1 - epsS) : Double.POSITIVE_INFINITY;
        double log1pRounding = 2 * U * Math.abs(log1pR);
        // Not first order: shifting every exponent by at most max e-hat shifts ln sum exp by at most as
        // much, whatever its size; this caps the bound when the inputs are very uncertain.
        double lnSCrude = maxAll + 2 * U + 2 * a0 / s + n * U;
        lnSError = honestMin(lnSError, lnSCrude);
        lnZ = SAFETY * (errM + lnSError + log1pRounding + U * Math.abs(tail) + U * Math.abs(lnZValue)
                + 6 * U * U * (Math.abs(p) + Math.abs(lgm) + Math.abs(lnZValue)));

        double bm = Math.abs(beta * mean);
        double weights = (phi * (w1 + 2 * U * w0) + a1 + a0 * bm) / s;
        // Errors of the differences d_i themselves: u |d_i| + rho (|E_i| + |E_m|), d_m = 0 exact.
        double values = beta * (U * sumTAbsD + sumTA + r * errAm) / s;
        double summation = (n + 1) * U * beta * sumTAbsD / s + (n * U * r / s + 4 * U) * bm + 2 * n * ETA * beta;
        reducedMean = SAFETY * (weights + values + summation);
        double meanRounding = SAFETY * summation;
        subnormalMeanKelvin = SAFETY * (a1Kelvin / s + 2 * n * ETA);

        entropy = SAFETY * (lnSError + log1pRounding + reducedMean + U * Math.abs(lgm + log1pR)
                + U * Math.abs(entropyValue)) + errBm;

        double varSum = variance * s;
        double weightsV = (phi * ((w2 + 2 * U * varSum) + variance * (sumTE + 2 * U * r))
                + 2 * a2 + a0 * (2 * bm * bm + variance)) / s;
        double valuesV = w3 / s;
        double roundingV = ((n + 10) * U + n * U * r / s) * variance + 4 * n * ETA;
        // V is stationary in its centre: a centre off by c adds exactly c^2, and only the rounding of
        // the mean (not the weights, which the centred sums above already cover) moves the centre.
        heatCapacity = SAFETY * (weightsV + valuesV + roundingV + meanRounding * meanRounding);
    }

    /** The smaller of two valid bounds; NaN (an undefined first-order bound) yields the other. */
    static double honestMin(double firstOrder, double crude) {
        return firstOrder <= crude ? firstOrder : crude;
    }

    /** Bound on the population t / s of one term (after {@link #finish}). */
    double population(double t, double z, double eh, double s) {
        double own;
        if (t >= Double.MIN_NORMAL) {
            own = t * phi * (eh + 2 * U);
        } else if (t > 0) {
            own = (t + ETA) * Math.expm1(eh) * (1 + 4 * U) + ETA;
        } else {
            own = (1 + 2 * U) * Math.exp(z + eh) + ETA;
        }
        double pop = t / s;
        return SAFETY * (own / s + pop * (epsS + 2 * U)) + ETA;
    }
}
