package org.statesum.engine.sampling;

import java.util.List;
import java.util.Map;

/**
 * Dimensionless free energies f_k = -ln Z_k (in units of k_B T of each state) relative to state 0,
 * with two kinds of error kept apart: the statistical uncertainty (one asymptotic standard deviation,
 * from the finite sample) and the numerical error bound (solver residual and rounding, which more
 * samples do not reduce).
 *
 * @param method the estimator that produced the values
 * @param values f_k - f_0, k = 0..K-1 (so values[0] = 0)
 * @param differenceUncertainties [i][j]: standard deviation of f_j - f_i (symmetric, zero diagonal)
 * @param errorBounds bound on the numerical error of values[k]; 0 for state 0
 * @param overlap MBAR diagnostics, or null for the pairwise estimators
 * @param pairs the pairwise estimators' diagnostics, one a neighbouring pair; empty for MBAR
 * @param precision how the numbers were computed (solver, iterations, residual)
 * @param warnings conditions the caller should know about, naming states
 */
public record FreeEnergyEstimate(
        String method,
        double[] values,
        double[][] differenceUncertainties,
        double[] errorBounds,
        Overlap overlap,
        List<PairOverlap> pairs,
        Map<String, Object> precision,
        List<SampleWarning> warnings) {

    /**
     * MBAR diagnostics.
     *
     * @param matrix O_ij = N_j sum_n W_in W_jn: the probability that a sample drawn from the pool
     *        according to state i is attributed to state j (rows sum to 1 for sampled states)
     * @param secondLargestEigenvalue 1 minus the spectral gap of O; near 1 the states split into
     *        groups that do not exchange samples
     * @param effectiveSampleSizes Kish's effective number of samples for each state, 1 / sum_n W_kn^2
     */
    public record Overlap(double[][] matrix, double secondLargestEigenvalue, double[] effectiveSampleSizes) {
    }

    /**
     * How well one pair of neighbouring states overlaps, as the pairwise estimators see it.
     *
     * @param lower the pair's first state
     * @param samples the samples the estimate averaged over (EXP: those of the state averaged over;
     *        BAR: both states')
     * @param effectiveSampleSize EXP: Kish's effective number of the exponential weights e^{-w},
     *        (sum e^{-w})^2 / sum e^{-2w}, between 1 (one sample carries the average) and the sample
     *        count; NaN for BAR
     * @param overlap BAR: the smaller off-diagonal element of the pair's two-state overlap matrix,
     *        O_AB = (1 / n_A) sum_n 1 / (2 + 2 cosh(M + w_n - df)) over both states' samples (the same
     *        matrix MBAR reports); NaN for EXP
     */
    public record PairOverlap(int lower, int samples, double effectiveSampleSize, double overlap) {
    }

    /** A warning about particular states (indices from 0). */
    public record SampleWarning(String code, String message, int[] states) {
    }

    /** [i][j] = f_j - f_i. */
    public double[][] differences() {
        int k = values.length;
        double[][] d = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                d[i][j] = values[j] - values[i];
            }
        }
        return d;
    }

    /** [i][j]: bound on the numerical error of f_j - f_i, the two bounds plus the subtraction's rounding. */
    public double[][] differenceErrorBounds() {
        int k = values.length;
        double[][] d = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                d[i][j] = i == j ? 0 : errorBounds[i] + errorBounds[j]
                        + LogSpace.UNIT_ROUNDOFF * Math.abs(values[j] - values[i]);
            }
        }
        return d;
    }

    /** Standard deviation of f_k - f_0. */
    public double[] uncertainties() {
        return differenceUncertainties[0].clone();
    }
}
