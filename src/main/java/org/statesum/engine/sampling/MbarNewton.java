package org.statesum.engine.sampling;

import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;

/**
 * The Newton step of the MBAR solve (Shirts and Chodera 2008, appendix C): with the gradient
 * g_i = -N_i (S_i - 1) and the Hessian of the convex objective H = diag(N_i S_i) - P (P from
 * {@link MbarPass}), the step solves H d = g by Cholesky with the first state held fixed; and the
 * rounding slack that the line search's test of the objective allows.
 */
final class MbarNewton {

    /** Objective increase tolerated as rounding, relative to the magnitude of its terms. */
    static final double OBJECTIVE_SLACK = 1e-12;

    private MbarNewton() {
    }

    /** The Newton step with the first state fixed, or null when the Hessian is not positive definite. */
    static double[] step(MbarPass.Sums cur, double[] counts) {
        int ks = counts.length;
        if (ks == 1) {
            return new double[1];
        }
        int r = ks - 1;
        double[][] h = new double[r][r];
        double[] g = new double[r];
        for (int i = 0; i < r; i++) {
            g[i] = -counts[i + 1] * (cur.s()[i + 1] - 1);
            for (int j = 0; j < r; j++) {
                h[i][j] = (i == j ? counts[i + 1] * cur.s()[i + 1] : 0) - cur.p()[i + 1][j + 1];
            }
        }
        try {
            double[] d = new CholeskyDecomposition(new Array2DRowRealMatrix(h, false), 1e-10, 1e-14)
                    .getSolver().solve(new ArrayRealVector(g, false)).toArray();
            double[] step = new double[ks];
            System.arraycopy(d, 0, step, 1, r);
            for (double v : step) {
                if (!Double.isFinite(v)) {
                    return null;
                }
            }
            return step;
        } catch (MathIllegalArgumentException e) {
            return null;
        }
    }

    static double slack(MbarPass.Sums cur, double[] f, double[] counts, int n) {
        double scale = Math.abs(cur.objective()) + n;
        for (int i = 0; i < f.length; i++) {
            scale += counts[i] * Math.abs(f[i]);
        }
        return OBJECTIVE_SLACK * scale;
    }
}
