package org.statesum.engine.sampling;

import java.util.Arrays;

/**
 * The asymptotic covariance of the MBAR free energies and the overlap diagnostics, from the K x K
 * matrix M = W^T W (M_ij = sum_n W_in W_jn) and the counts N = diag(N_k).
 *
 * <p>Shirts and Chodera 2008, eq. (D6)-(D8): Theta = W^T (I - W N W^T)^+ W. With the thin singular
 * value decomposition W = U Sigma V^T this is Theta = V Sigma (I - Sigma V^T N V Sigma)^+ Sigma V^T,
 * and V, Sigma^2 are the eigenvectors and eigenvalues of M, so the N-long dimension never appears.
 * Eigenproblems by {@link SymmetricEigen}. The pseudo-inverse drops eigenvalues below
 * {@link #PSEUDO_INVERSE_CUTOFF} of the largest: the shift
 * of all f_k by one constant is always such a null direction. var(f_j - f_i) = Theta_ii + Theta_jj - 2
 * Theta_ij.
 */
final class MbarCovariance {

    /** Relative eigenvalue cut-off of the pseudo-inverse: well above rounding (~1e-16 K), far below data. */
    static final double PSEUDO_INVERSE_CUTOFF = 1e-10;

    private MbarCovariance() {
    }

    /** Standard deviations of f_j - f_i, [i][j]. */
    static double[][] differenceUncertainties(double[][] m, double[] counts) {
        int k = m.length;
        SymmetricEigen mEigen = SymmetricEigen.of(m);
        double[] sigma = new double[k];
        double[][] v = mEigen.vectors;
        for (int i = 0; i < k; i++) {
            sigma[i] = Math.sqrt(Math.max(0, mEigen.values[i]));
        }
        // A = I - Sigma V^T N V Sigma
        double[][] a = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                double s = 0;
                for (int l = 0; l < k; l++) {
                    s += v[l][i] * counts[l] * v[l][j];
                }
                a[i][j] = (i == j ? 1 : 0) - sigma[i] * s * sigma[j];
            }
        }
        double[][] aPlus = pseudoInverse(a);
        // Theta = V Sigma A+ Sigma V^T
        double[][] inner = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                inner[i][j] = sigma[i] * aPlus[i][j] * sigma[j];
            }
        }
        // Theta = V (inner V^T), two K^3 products.
        double[][] right = new double[k][k];
        for (int p = 0; p < k; p++) {
            for (int j = 0; j < k; j++) {
                double s = 0;
                for (int q = 0; q < k; q++) {
                    s += inner[p][q] * v[j][q];
                }
                right[p][j] = s;
            }
        }
        double[][] theta = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                double s = 0;
                for (int p = 0; p < k; p++) {
                    s += v[i][p] * right[p][j];
                }
                theta[i][j] = s;
            }
        }
        double[][] sd = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                sd[i][j] = i == j ? 0 : Math.sqrt(Math.max(0, theta[i][i] + theta[j][j] - 2 * theta[i][j]));
            }
        }
        return sd;
    }

    /** O_ij = M_ij N_j. */
    static double[][] overlap(double[][] m, double[] counts) {
        int k = m.length;
        double[][] o = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                o[i][j] = m[i][j] * counts[j];
            }
        }
        return o;
    }

    /**
     * The second-largest eigenvalue of O, from the symmetric similar matrix N^1/2 M N^1/2 (same
     * eigenvalues, all real and in [0, 1]).
     */
    static double secondLargestEigenvalue(double[][] m, double[] counts) {
        int k = m.length;
        double[][] s = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                s[i][j] = Math.sqrt(counts[i]) * m[i][j] * Math.sqrt(counts[j]);
            }
        }
        double[] eigenvalues = SymmetricEigen.of(s).values;
        Arrays.sort(eigenvalues);
        return Math.min(1, Math.max(0, eigenvalues[k - 2]));
    }

    private static double[][] pseudoInverse(double[][] a) {
        int k = a.length;
        SymmetricEigen eigen = SymmetricEigen.of(a);
        double largest = 0;
        for (int i = 0; i < k; i++) {
            largest = Math.max(largest, Math.abs(eigen.values[i]));
        }
        double[][] v = eigen.vectors;
        double[][] plus = new double[k][k];
        for (int p = 0; p < k; p++) {
            double lambda = eigen.values[p];
            if (Math.abs(lambda) <= PSEUDO_INVERSE_CUTOFF * largest) {
                continue;
            }
            for (int i = 0; i < k; i++) {
                for (int j = 0; j < k; j++) {
                    plus[i][j] += v[i][p] * v[j][p] / lambda;
                }
            }
        }
        return plus;
    }
}
