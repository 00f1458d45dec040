package org.statesum.engine.sampling;

/**
 * Joins pairwise estimates along the chain of neighbouring states 0-1, 1-2, ..., K-2 to K-1: f_k
 * is the sum of the steps below it. Each step uses its own samples (EXP the samples of one state,
 * BAR those of the two), and steps that share a state's samples are treated as independent, the
 * usual approximation; so the variance of f_j - f_i is the sum of the step variances between them.
 */
final class PairChain {

    private PairChain() {
    }

    /** f_k - f_0 from the steps. */
    static double[] values(double[] steps) {
        double[] f = new double[steps.length + 1];
        for (int k = 0; k < steps.length; k++) {
            f[k + 1] = f[k] + steps[k];
        }
        return f;
    }

    /** Error bounds of f_k - f_0: the step bounds plus one rounding of each partial sum. */
    static double[] errorBounds(double[] steps, double[] stepBounds) {
        double[] f = values(steps);
        double[] e = new double[f.length];
        for (int k = 0; k < steps.length; k++) {
            e[k + 1] = e[k] + stepBounds[k] + LogSpace.UNIT_ROUNDOFF * Math.abs(f[k + 1]);
        }
        return e;
    }

    /** Standard deviations of f_j - f_i: the root of the summed step variances between i and j. */
    static double[][] uncertainties(double[] stepVariances) {
        int k = stepVariances.length + 1;
        double[] cumulative = new double[k];
        for (int s = 0; s < stepVariances.length; s++) {
            cumulative[s + 1] = cumulative[s] + stepVariances[s];
        }
        double[][] sd = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                sd[i][j] = Math.sqrt(Math.abs(cumulative[j] - cumulative[i]));
            }
        }
        return sd;
    }
}
