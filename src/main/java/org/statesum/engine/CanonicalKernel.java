package org.statesum.engine;

/**
 * Evaluates one temperature of a prepared level set in four passes over the levels, writing into
 * the columns of a {@link CanonicalColumns}. Not thread-safe: one instance per worker (it owns the
 * scratch array of Boltzmann factors).
 *
 * <p>Algorithm, with beta = 1/T, x_i = beta dE_i, y_i = ln g_i - x_i:
 * <ol>
 *   <li>a = max_i y_i at index m (log-sum-exp shift; the dominant term, not always the ground level
 *       when degeneracies grow fast);</li>
 *   <li>t_i = exp(y_i - a) <= 1, r = sum_{i != m} t_i, s = 1 + r, mean shifted energy
 *       dU = sum t_i dE_i / s; then ln Z' = a + log1p(r), so that ln(1 + 1e-20) keeps its digits;</li>
 *   <li>the variance about that mean, V = sum t_i (beta (dE_i - dU))^2 / s (two-pass, never
 *       &lt;E^2&gt; - &lt;E&gt;^2), giving C_V / k_B = V.</li>
 * </ol>
 * Then ln Z = ln Z' - beta E_0, U = E_0 + dU, S / k_B = ln Z' + beta dU (E_0 cancels exactly),
 * F = E_0 - T ln Z'.
 *
 * <p>The loops are laid out for speed, not in the order of the steps above: the maximum without its
 * index; the exponentials alone (a loop with nothing but beta and a live across the call to exp runs
 * as fast as bare exponentials); r and sum t_i dE_i; then everything that needs dU. Every sum still
 * runs in index order, so the results are the same bits as a single loop per step would give, and
 * the same on every run.
 *
 * <p>Error bounds are a first-order running error analysis (Higham, Accuracy and Stability of
 * Numerical Algorithms, 2nd ed., 2002, ch. 3-4) doubled to cover second-order terms. Each t_i carries a
 * relative error of at most e_i + e_g, with e_i = beta A_i + B_i from {@link PreparedLevels} and
 * e_g = e_m + u|a| + 2u (the shift a and one ulp of exp). A recursive sum of n non-negative terms adds
 * at most gamma = (n + 4) u relative. Weight errors that are common to all terms cancel in normalised
 * averages, so the bounds of U and C_V use the spread of e_i weighted by |dE_i - dU| and its square.
 */
final class CanonicalKernel {

    private static final double U = PreparedLevels.UNIT_ROUNDOFF;
    /** Safety factor over the first-order bound, covering products of two first-order terms. */
    private static final double SECOND_ORDER_FACTOR = 2.0;

    private final PreparedLevels levels;
    private final double[] factors;

    CanonicalKernel(PreparedLevels levels) {
        this.levels = levels;
        this.factors = new double[levels.size];
    }

    void evaluate(double temperature, int column, CanonicalColumns out) {
        if (temperature == 0) {
            evaluateAtZero(column, out);
            return;
        }
        final int n = levels.size;
        final double[] dE = levels.shiftedEnergies;
        final double[] lg = levels.logDegeneracies;
        final double[] errA = levels.energyErrorTerms;
        final double[] errB = levels.logDegeneracyErrorTerms;
        final double beta = 1.0 / temperature;

        // Pass 1: a = max_i y_i. A bare max reduction (no index, no branch) compiles to a tight loop;
        // the index m of the first maximum is found in pass 2, where y_m - a = 0 exactly.
        double a = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            a = Math.max(a, lg[i] - dE[i] * beta);
        }

        // Pass 2: t_i = exp(y_i - a), stored. The loop holds nothing live across the call to exp but
        // beta and a, so it runs as fast as a bare loop of exponentials. x - y = 0 only when x = y in
        // IEEE arithmetic, so the first zero exponent marks the first maximum, the m of the analysis.
        int m = 0;
        for (; m < n; m++) {
            double d = lg[m] - dE[m] * beta - a;
            factors[m] = Math.exp(d);
            if (d == 0) {
                break;
            }
        }
        // Not found only if some y_i is NaN, which the level set's range checks exclude; NaN then flows.
        m = m < n ? m : 0;
        // y_m itself (Math.max may have returned +0 for a -0 maximum; the exponents are unaffected).
        a = lg[m] - dE[m] * beta;
        for (int i = m + 1; i < n; i++) {
            factors[i] = Math.exp(lg[i] - dE[i] * beta - a);
        }

        // Pass 3: r = sum_{i != m} t_i and sum t_i dE_i, each summed in index order as before.
        double r = 0;
        double sumE = 0;
        for (int i = 0; i < m; i++) {
            double t = factors[i];
            r += t;
            sumE += t * dE[i];
        }
        sumE += factors[m] * dE[m];
        for (int i = m + 1; i < n; i++) {
            double t = factors[i];
            r += t;
            sumE += t * dE[i];
        }
        double s = 1 + r;
        double meanShifted = sumE / s;

        // Pass 4: the variance about the mean and the weights of the error analysis, in index order.
        double sumA = 0;
        double sumB = 0;
        double variance = 0;
        double w0 = 0;
        double w1 = 0;
        double w2 = 0;
        for (int i = 0; i < n; i++) {
            double t = factors[i];
            sumA += t * errA[i];
            sumB += t * errB[i];
            double q = (dE[i] - meanShifted) * beta;
            double aq = Math.abs(q);
            double e = errA[i] * beta + errB[i];
            double tq = t * q;
            double tq2 = tq * q;
            variance += tq2;
            // t |q| = |t q| exactly, as t >= 0 and rounding is symmetric in sign: one product saved.
            w0 += Math.abs(tq);
            w1 += t * e * aq;
            w2 += e * tq2;
        }
        variance /= s;

        double gamma = (n + 4) * U;
        double epsMean = (beta * sumA + sumB) / s;
        double epsM = beta * errA[m] + errB[m];
        double epsShared = epsM + U * Math.abs(a) + 2 * U;

        double logRelative = a + Math.log1p(r);
        double logRelativeBound = SECOND_ORDER_FACTOR * (epsM + epsMean + (epsShared + gamma) * (r / s)
                + 2 * U * Math.abs(logRelative) + U * Math.abs(a));

        // beta * dU and its bound, in units of k_B T.
        double reducedMean = beta * meanShifted;
        double reducedMeanBound = SECOND_ORDER_FACTOR * ((w1 + epsMean * w0) / s + beta * sumA / s
                + (2 * gamma + 2 * U) * reducedMean);
        double meanShiftedBound = reducedMeanBound * temperature;

        double e0 = levels.groundEnergy;
        double e0Bound = levels.groundEnergyError;

        double lnZ = logRelative - beta * e0;
        double lnZBound = logRelativeBound + beta * e0Bound + 2 * U * Math.abs(beta * e0) + U * Math.abs(lnZ);

        double f = e0 - temperature * logRelative;
        double fBound = e0Bound + temperature * logRelativeBound
                + 2 * U * (Math.abs(e0) + Math.abs(temperature * logRelative)) + U * Math.abs(f);

        double uInt = e0 + meanShifted;
        double uBound = e0Bound + meanShiftedBound + U * Math.abs(uInt);

        double entropy = logRelative + reducedMean;
        double entropyBound = logRelativeBound + reducedMeanBound + 2 * U * Math.abs(entropy);

        double cvBound = SECOND_ORDER_FACTOR * ((w2 / s + epsMean * variance) + 2 * w1 / s
                + 2 * reducedMeanBound * w0 / s + (gamma + 8 * U) * variance);

        out.set(column, lnZ, lnZBound, f, fBound, uInt, uBound, entropy, entropyBound, variance, cvBound,
                logRelative, factors[levels.topIndex] / s);

        if (out.populations != null) {
            double[] p = out.populations[column];
            double[] pb = out.populationBounds[column];
            for (int i = 0; i < n; i++) {
                p[i] = factors[i] / s;
                double e = errA[i] * beta + errB[i];
                pb[i] = SECOND_ORDER_FACTOR * p[i] * (e + epsMean + 2 * epsShared + gamma + U);
            }
        }
    }

    /**
     * The T -> 0 limit: only the levels at exactly E_0 survive. F = U = E_0, S / k_B = ln g_0,
     * C_V = 0; ln Z = ln g_0 - E_0 / k_B T is finite only when E_0 = 0 (NaN otherwise).
     */
    private void evaluateAtZero(int column, CanonicalColumns out) {
        double e0 = levels.groundEnergy;
        double lnG0 = levels.logGroundDegeneracy;
        double lnG0Bound = levels.logGroundDegeneracyError;
        double lnZ = e0 == 0 ? lnG0 : Double.NaN;
        double lnZBound = e0 == 0 ? lnG0Bound : Double.NaN;
        double top = levels.shiftedEnergies[levels.topIndex] == 0
                ? Math.exp(levels.logDegeneracies[levels.topIndex] - lnG0) : 0;
        out.set(column, lnZ, lnZBound, e0, levels.groundEnergyError, e0, levels.groundEnergyError,
                lnG0, lnG0Bound, 0, 0, lnG0, top);
        if (out.populations != null) {
            double[] p = out.populations[column];
            double[] pb = out.populationBounds[column];
            for (int i = 0; i < levels.size; i++) {
                boolean ground = levels.shiftedEnergies[i] == 0;
                p[i] = ground ? Math.exp(levels.logDegeneracies[i] - lnG0) : 0;
                pb[i] = ground ? SECOND_ORDER_FACTOR * p[i] * (lnG0Bound + levels.logDegeneracyErrorTerms[i]
                        + 2 * U) : 0;
            }
        }
    }
}
