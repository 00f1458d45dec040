package org.statesum.engine;

/**
 * Evaluates one temperature of a prepared level set in five passes over the levels (some of them a
 * few element-wise loops), writing into the columns of a {@link CanonicalColumns}. Not thread-safe:
 * one instance per worker (it owns four scratch arrays of n doubles: the Boltzmann factors, the
 * centred energies and two error terms).
 *
 * <p>Algorithm, with beta = fl(1/T) and L_i = ln g_i:
 * <ol>
 *   <li>the dominant level m = argmax_i (L_i - beta dE_i) (the log-sum-exp shift; not always the
 *       ground level when degeneracies grow fast);</li>
 *   <li>every level relative to m, d_i = E_i - E_m, z_i = (L_i - L_m) - beta d_i, t_i = exp(z_i)
 *       (t_m = 1), R = sum_{i != m} t_i, s = 1 + R, mean mu = sum t_i d_i / s;</li>
 *   <li>q_i = beta (d_i - mu) and V = sum t_i q_i^2 / s (two-pass, never &lt;E^2&gt; - &lt;E&gt;^2).</li>
 * </ol>
 * Then ln Z = (L_m - E_m / T) + log1p(R), with L_m - E_m / T formed in double-double (Dekker's
 * two-sum and an fma product) so that ln Z keeps its digits when ln g and E / k_B T are both large
 * and nearly cancel, and ln(1 + 1e-20) keeps its digits too; F = -T ln Z; U = E_m + mu;
 * S / k_B = L_m + log1p(R) + beta mu (E_m / T cancels analytically); C_V / k_B = V.
 * Measuring every level from the dominant one keeps the differences d_i and L_i - L_m exact or
 * small, so thermally relevant levels lose no digits to a far-away ground level.
 *
 * <p>The loops are laid out for speed rather than in the order of the steps above: (1) the maximum;
 * (2) the exponents z_i in an element-wise loop, then the exponentials alone, in place (a call to exp
 * forces every value live across it to memory, so the loop around it carries nothing but the array);
 * (3) the per-level error terms; (4) the sums that need only the factors; (5) the centred q_i and
 * the per-level error weight of V, then the sums that need the mean. The element-wise loops write one
 * array each at the loop index, so the compiler turns them into vector instructions (it does not
 * vectorise a loop that stores into two arrays); the sums cannot be vectorised without reordering
 * them, so they get as little arithmetic as possible. Every sum still runs in index order, so the
 * results are the bits a single loop per step gives, and the same on every run.
 *
 * <p>Error bounds: a running first-order analysis in the style of Higham (Accuracy and Stability of
 * Numerical Algorithms, 2nd ed., SIAM 2002, ch. 2-4), all in {@link KernelBounds}. Per term, the
 * computed z_i differs from the exact exponent (from the exact inputs) by at most
 * e_i = u (|L_i - L_m| + 3 |beta d_i| + |z_i|) + (input terms of i and m), so t_i = tau_i (1 + eps_i)
 * with |eps_i| <= phi (e_i + 2 u) (exp is within 1 ulp; phi = expm1(M) / M >= 1 with M the largest
 * such exponent error covers the non-linearity of exp when the inputs are uncertain). Terms whose
 * factor is subnormal are bounded absolutely instead: |t_i - tau_i| <= (1 + 2u) exp(z_i + e_i) + 2^-1074.
 */
final class CanonicalKernel {

    private static final double U = PreparedLevels.UNIT_ROUNDOFF;
    /** Smallest positive double: the absolute rounding of any result in the subnormal range is below it. */
    static final double ETA = Double.MIN_VALUE;

    private final PreparedLevels levels;
    /** Per level (scratch): the exponent z_i, then the factor t_i. */
    private final double[] factors;
    /** Per level (scratch): the exponent error e-hat_i of its factor. */
    private final double[] exponentErrors;
    /** Per level (scratch): the error dq_i of q_i, then its weight t_i (2 |q_i| + dq_i) dq_i in C_V. */
    private final double[] differenceErrors;
    /** Per level (scratch): q_i = beta (d_i - mu). */
    private final double[] centred;

    CanonicalKernel(PreparedLevels levels) {
        this.levels = levels;
        this.factors = new double[levels.size];
        this.exponentErrors = new double[levels.size];
        this.differenceErrors = new double[levels.size];
        this.centred = new double[levels.size];
    }

    void evaluate(double temperature, int column, CanonicalColumns out) {
        if (temperature == 0) {
            evaluateAtZero(column, out);
            return;
        }
        final int n = levels.size;
        final double[] dE = levels.shiftedEnergies;
        final double[] en = levels.energies;
        final double[] lg = levels.logDegeneracies;
        final double[] errA = levels.energyErrorTerms;
        final double[] errB = levels.logDegeneracyErrorTerms;
        final double beta = 1.0 / temperature;

        // Pass 1: m = argmax_i (L_i - beta dE_i), the first index on ties. The update is rarely taken,
        // so its branch is well predicted and the loop runs at the speed of the loads.
        double a = Double.NEGATIVE_INFINITY;
        int m = 0;
        for (int i = 0; i < n; i++) {
            double y = lg[i] - dE[i] * beta;
            if (y > a) {
                a = y;
                m = i;
            }
        }

        // m maximises the computed y_i, not the exact one; but a level can compete with the maximum only
        // when |ln g| and beta dE are below about 2e12 (LevelSet caps |ln g| at 1e12), where y carries
        // at most 3e12 u < 1e-3: so every z_i below is at most 1e-3 and t_i <= 1.001, no overflow.
        final double lgm = lg[m];
        final double em = en[m];
        final double[] factors = this.factors;
        // Pass 2: the exponents z_i (vectorised), then the factors t_i = exp(z_i) in place. With only
        // the array live across the call to exp, that loop runs as fast as bare exponentials.
        for (int i = 0; i < n; i++) {
            factors[i] = (lg[i] - lgm) - (en[i] - em) * beta;
        }
        for (int i = 0; i < n; i++) {
            factors[i] = Math.exp(factors[i]);
        }

        // Pass 3: per level, the exponent error e-hat_i of its factor (exactly 0 for i = m: z_m = 0,
        // t_m = 1) and the error dq_i of q_i from the error of d_i (0 for i = m: d_m = 0 exactly),
        // element-wise and branch-free.
        final double[] eh = exponentErrors;
        final double errM = errB[m] + beta * errA[m];
        final double errAm = errA[m];
        for (int i = 0; i < n; i++) {
            double dl = lg[i] - lgm;
            double v = (en[i] - em) * beta;
            eh[i] = U * (Math.abs(dl) + 3 * Math.abs(v) + Math.abs(dl - v)) + errB[i] + beta * errA[i] + errM;
        }
        eh[m] = 0;
        final double[] dqs = differenceErrors;
        for (int i = 0; i < n; i++) {
            dqs[i] = U * Math.abs((en[i] - em) * beta) + beta * (errA[i] + errAm);
        }
        dqs[m] = 0;

        // Pass 4: R, sum t_i d_i and the per-term sums of the error analysis, in index order. Level m
        // adds exactly +0 to each of them (R leaves it out; d_m = 0 and e-hat_m = 0 null the others),
        // so its factor is 0 during this pass and the loop needs no test for it. Terms with a subnormal
        // or zero factor are counted here and handed to the bounds afterwards, also in index order, so
        // that this loop holds no call. The maximum of e-hat over the normal factors is the maximum
        // over all when every factor is normal; otherwise it takes a loop of its own.
        KernelBounds b = new KernelBounds(n, errM, errAm, errB[m]);
        factors[m] = 0;
        double r = 0;
        double sumD = 0;
        double sumTE = 0;
        double sumTAbsD = 0;
        double maxAll = 0;
        int small = -1; // level m is counted
        for (int i = 0; i < n; i++) {
            double t = factors[i];
            double d = en[i] - em;
            double e = eh[i];
            r += t;
            sumD += t * d;
            sumTE += t * e;
            sumTAbsD += t * Math.abs(d);
            // The largest e-hat; the test is nearly always false, so well predicted (e-hat >= 0 and the
            // maximum starts at 0, as Math.max from 0 would give).
            if (e > maxAll) {
                maxAll = e;
            }
            small += t >= Double.MIN_NORMAL ? 0 : 1;
        }
        double maxE = small == 0 ? maxAll : 0;
        for (int i = 0; small > 0 && i < n; i++) {
            if (factors[i] >= Double.MIN_NORMAL && eh[i] > maxE) {
                maxE = eh[i];
            }
        }
        for (int i = 0; small > 0 && i < n; i++) {
            double t = factors[i];
            if (!(t >= Double.MIN_NORMAL) && i != m) {
                double d = en[i] - em;
                double v = d * beta;
                b.smallTerm(t, (lg[i] - lgm) - v, eh[i], v, d);
                small--;
            }
        }
        // sum t_i rho |E_i| (in index order as well): exactly +0 when the energies are exact, then skipped.
        double sumTA = 0;
        for (int i = 0; levels.energiesInexact && i < n; i++) {
            sumTA += factors[i] * (i == m ? 0 : errA[i]);
        }
        factors[m] = 1;
        b.terms(sumTE, sumTAbsD, sumTA, maxE, maxAll);
        double s = 1 + r;
        double mean = sumD / s;

        // Pass 5: q_i and the weight t_i (2 |q_i| + dq_i) dq_i of dq_i in C_V (dq_i changes q_i^2 by
        // (2 |q_i| + dq_i) dq_i), element-wise; then the moments about the mean and their error
        // weights, in index order.
        final double[] qs = centred;
        for (int i = 0; i < n; i++) {
            qs[i] = ((en[i] - em) - mean) * beta;
        }
        for (int i = 0; i < n; i++) {
            dqs[i] = factors[i] * (2 * Math.abs(qs[i]) + dqs[i]) * dqs[i];
        }
        double variance = 0;
        double w0 = 0;
        double w1 = 0;
        double w2 = 0;
        double w3 = 0;
        for (int i = 0; i < n; i++) {
            double t = factors[i];
            double q = qs[i];
            double aq = Math.abs(q);
            double q2 = q * q;
            double e = eh[i];
            variance += t * q2;
            w0 += t * aq;
            w1 += t * e * aq;
            w2 += t * e * q2;
            w3 += dqs[i];
        }
        variance /= s;

        double log1pR = Math.log1p(r);
        // L_m - E_m / T in double-double: p + pe = E_m * beta exactly (fma), E_m * betaLow the part of
        // E_m / T that beta = fl(1/T) misses (1 - T beta is exact by fma), h + he = L_m - p exactly.
        double p = em * beta;
        double pe = Math.fma(em, beta, -p);
        double betaLow = Math.fma(-temperature, beta, 1.0) * beta;
        double h = lgm - p;
        double hv = h - lgm;
        double he = (lgm - (h - hv)) + (-p - hv);
        double tail = ((he - pe) - em * betaLow) + log1pR;
        double lnZ = h + tail;
        double reducedMean = beta * mean;
        double entropy = (lgm + log1pR) + reducedMean;
        double uInt = em + mean;
        double f = -(temperature * lnZ);
        double logRelative = (lgm - levels.shiftedEnergies[m] * beta) + log1pR;

        b.finish(s, r, mean, beta, variance, w0, w1, w2, w3, log1pR, lnZ, tail, p, entropy, lgm);
        double lnZBound = b.lnZ;
        double fBound = (1 + 2 * U) * temperature * lnZBound + U * Math.abs(f);
        double uBound = b.reducedMean * temperature * (1 + 2 * U) + b.subnormalMeanKelvin + levels.energyErrorTerms[m]
                + U * Math.abs(uInt);
        // Crude but always valid: U within the energy range, S / k_B between min ln g and ln sum g,
        // C_V / k_B between 0 and (range / 2T)^2 (Popoviciu's inequality), each widened by the input
        // errors and a few roundings. They take over when the first-order bounds are not finite.
        double lo = levels.groundEnergy - levels.groundEnergyError;
        double hi = levels.energies[levels.topIndex] + levels.energyErrorTerms[levels.topIndex];
        uBound = KernelBounds.honestMin(uBound, (1 + 4 * U) * Math.max(uInt - lo, hi - uInt));
        double sLo = levels.minLogDegeneracy - levels.maxLogDegeneracyError;
        double sHi = levels.logTotalDegeneracy + levels.maxLogDegeneracyError
                + (levels.size + 4) * U * Math.abs(levels.logTotalDegeneracy);
        double sBound = KernelBounds.honestMin(b.entropy, (1 + 4 * U) * Math.max(entropy - sLo, sHi - entropy));
        double halfRange = 0.5 * beta * (hi - lo) * (1 + 4 * U);
        double cvBound = KernelBounds.honestMin(b.heatCapacity,
                Math.max(variance, halfRange * halfRange * (1 + 4 * U) - variance));
        out.set(column, lnZ, lnZBound, f, fBound, uInt, uBound, entropy, sBound, variance, cvBound,
                logRelative, factors[levels.topIndex] / s);

        if (out.populations != null) {
            double[] pop = out.populations[column];
            double[] pb = out.populationBounds[column];
            for (int i = 0; i < n; i++) {
                pop[i] = factors[i] / s;
                double z = (lg[i] - lgm) - (en[i] - em) * beta;
                pb[i] = KernelBounds.honestMin(b.population(factors[i], z, exponentErrors[i], s),
                        Math.max(pop[i], 1 - pop[i]));
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
                // p_i = exp(ln g_i - ln g_0): exponent error lnG0Bound + input error of ln g_i + the
                // subtraction; exp within 1 ulp.
                pb[i] = ground ? 1.0625 * p[i] * (lnG0Bound + levels.logDegeneracyErrorTerms[i]
                        + U * Math.abs(levels.logDegeneracies[i] - lnG0) + 2 * U) + ETA : 0;
            }
        }
    }
}
