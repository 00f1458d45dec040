package org.statesum.engine.sampling;

/**
 * Eigenvalues and eigenvectors of a small real symmetric matrix by the cyclic Jacobi method (G. H.
 * Golub, C. F. Van Loan, Matrix Computations, 4th ed., sec. 8.5): plane rotations annihilate the
 * off-diagonal elements sweep by sweep until their norm is below {@link #OFF_DIAGONAL_TOLERANCE}
 * of the matrix norm. It converges quadratically for any symmetric input, including the nearly
 * block-diagonal matrices with subnormal couplings that MBAR produces when states do not overlap
 * (on which the commons-math3 tridiagonal QL iteration can fail to converge). Each eigenvalue is
 * accurate to a small multiple of the unit roundoff times the matrix norm.
 */
final class SymmetricEigen {

    /** Off-diagonal norm, relative to the Frobenius norm, below which the matrix counts as diagonal. */
    static final double OFF_DIAGONAL_TOLERANCE = 1e-17;
    /** Sweeps allowed: Jacobi needs about 6 to 10 for K up to 100. */
    private static final int MAX_SWEEPS = 100;

    /** values[p] with eigenvector column p of vectors: A v_p = values[p] v_p. */
    final double[] values;
    final double[][] vectors;

    private SymmetricEigen(double[] values, double[][] vectors) {
        this.values = values;
        this.vectors = vectors;
    }

    /** Decomposes the symmetric part (A + A^T) / 2 of {@code a}; {@code a} is not changed. */
    static SymmetricEigen of(double[][] a) {
        int k = a.length;
        double[][] m = new double[k][k];
        double[][] v = new double[k][k];
        double norm = 0;
        for (int i = 0; i < k; i++) {
            v[i][i] = 1;
            for (int j = 0; j < k; j++) {
                m[i][j] = 0.5 * (a[i][j] + a[j][i]);
                norm += m[i][j] * m[i][j];
            }
        }
        double threshold = OFF_DIAGONAL_TOLERANCE * OFF_DIAGONAL_TOLERANCE * norm;
        for (int sweep = 0; sweep < MAX_SWEEPS; sweep++) {
            double off = 0;
            for (int p = 0; p < k; p++) {
                for (int q = p + 1; q < k; q++) {
                    off += 2 * m[p][q] * m[p][q];
                }
            }
            if (off <= threshold || off == 0) {
                break;
            }
            for (int p = 0; p < k; p++) {
                for (int q = p + 1; q < k; q++) {
                    if (m[p][q] != 0) {
                        rotate(m, v, p, q);
                    }
                }
            }
        }
        double[] values = new double[k];
        for (int i = 0; i < k; i++) {
            values[i] = m[i][i];
        }
        return new SymmetricEigen(values, v);
    }

    /** One Jacobi rotation that zeroes m[p][q] (Golub and Van Loan, algorithm 8.5.1, sym.schur2). */
    private static void rotate(double[][] m, double[][] v, int p, int q) {
        double tau = (m[q][q] - m[p][p]) / (2 * m[p][q]);
        double t = Math.signum(tau) / (Math.abs(tau) + Math.sqrt(1 + tau * tau));
        if (tau == 0) {
            t = 1;
        } else if (Double.isInfinite(tau)) {
            t = 1 / (2 * tau);
        }
        double c = 1 / Math.sqrt(1 + t * t);
        double s = t * c;
        int k = m.length;
        for (int i = 0; i < k; i++) {
            double mip = m[i][p];
            double miq = m[i][q];
            m[i][p] = c * mip - s * miq;
            m[i][q] = s * mip + c * miq;
        }
        for (int i = 0; i < k; i++) {
            double mpi = m[p][i];
            double mqi = m[q][i];
            m[p][i] = c * mpi - s * mqi;
            m[q][i] = s * mpi + c * mqi;
        }
        for (int i = 0; i < k; i++) {
            double vip = v[i][p];
            double viq = v[i][q];
            v[i][p] = c * vip - s * viq;
            v[i][q] = s * vip + c * viq;
        }
    }
}
