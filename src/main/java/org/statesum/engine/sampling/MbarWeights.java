package org.statesum.engine.sampling;

import java.util.stream.IntStream;
import org.statesum.engine.Cancellation;

/**
 * Sums over the samples with the MBAR weights W_kn = exp(f_k - u_kn - ln D_n), ln D_n = ln sum_i N_i
 * exp(f_i - u_in): the free energy of a state from them (also one that was never sampled), and the
 * products M = W^T W that the covariance needs.
 */
final class MbarWeights {

    private MbarWeights() {
    }

    /** -f_k = ln sum_n exp(-u_kn - ln D_n), in blocks added in order. */
    static double logSumExp(double[] row, double[] logD) {
        int n = row.length;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            max = Math.max(max, -row[i] - logD[i]);
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += Math.exp(-row[i] - logD[i] - max);
        }
        return max + Math.log(sum);
    }

    /** M_ij = sum_n W_in W_jn over all states, W_kn = exp(f_k - u_kn - ln D_n), blocks in parallel. */
    static double[][] products(double[][] u, double[] f, double[] logD) {
        int k = u.length;
        int n = logD.length;
        int blocks = (n + MbarPass.BLOCK - 1) / MbarPass.BLOCK;
        double[][][] partial = new double[blocks][][];
        Runnable stop = Cancellation.current();
        IntStream.range(0, blocks).parallel().forEach(b -> {
            stop.run(); // a cooperative stop between blocks of samples; see Cancellation
            double[][] m = new double[k][k];
            double[] w = new double[k];
            for (int s = b * MbarPass.BLOCK; s < Math.min(n, (b + 1) * MbarPass.BLOCK); s++) {
                for (int i = 0; i < k; i++) {
                    w[i] = Math.exp(f[i] - u[i][s] - logD[s]);
                }
                for (int i = 0; i < k; i++) {
                    for (int j = 0; j <= i; j++) {
                        m[i][j] += w[i] * w[j];
                    }
                }
            }
            partial[b] = m;
        });
        double[][] m = new double[k][k];
        for (double[][] part : partial) {
            for (int i = 0; i < k; i++) {
                for (int j = 0; j <= i; j++) {
                    m[i][j] += part[i][j];
                }
            }
        }
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < i; j++) {
                m[j][i] = m[i][j];
            }
        }
        return m;
    }
}
