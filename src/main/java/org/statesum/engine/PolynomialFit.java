package org.statesum.engine;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * A least-squares polynomial y(x) = sum_k c_k x^k of degree d (at most n - 1) through n points, by
 * Householder QR of the Vandermonde matrix in the variable z = (x - mid) / half-range, which keeps it
 * well conditioned (G. H. Golub, C. F. Van Loan, Matrix Computations, 4th ed., 2013, sec. 5.3). Besides
 * values and derivatives it gives their weights w_i, with y(x) = sum_i w_i y_i, so that a caller can
 * bound how far an answer moves when the data move. Immutable.
 */
public final class PolynomialFit {

    private final double mid;
    private final double half;
    private final double[] zCoefficients;
    private final double[][] pseudoInverse;
    private final double maxResidual;

    private PolynomialFit(double mid, double half, double[] zCoefficients, double[][] pseudoInverse, double maxResidual) {
        this.mid = mid;
        this.half = half;
        this.zCoefficients = zCoefficients;
        this.pseudoInverse = pseudoInverse;
        this.maxResidual = maxResidual;
    }

    /**
     * @param x abscissae, at least two distinct
     * @param y ordinates, same length
     * @param degree wanted degree; lowered to n - 1 when there are fewer points
     */
    public static PolynomialFit of(double[] x, double[] y, int degree) {
        int n = x.length;
        int d = Math.min(degree, n - 1);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        double mid = 0.5 * (lo + hi);
        double half = hi > lo ? 0.5 * (hi - lo) : 1.0;
        double[][] vander = new double[n][d + 1];
        for (int i = 0; i < n; i++) {
            double z = (x[i] - mid) / half;
            double power = 1;
            for (int k = 0; k <= d; k++) {
                vander[i][k] = power;
                power *= z;
            }
        }
        RealMatrix a = new Array2DRowRealMatrix(vander, false);
        RealMatrix pinv = new QRDecomposition(a).getSolver().getInverse();
        double[] c = pinv.operate(y);
        double max = 0;
        for (int i = 0; i < n; i++) {
            double r = 0;
            for (int k = d; k >= 0; k--) {
                r = r * ((x[i] - mid) / half) + c[k];
            }
            max = Math.max(max, Math.abs(r - y[i]));
        }
        return new PolynomialFit(mid, half, c, pinv.getData(), max);
    }

    /** Coefficients c_k of x^k (expanded from the scaled variable; for low degrees and small spans only). */
    public double[] coefficients() {
        int d = zCoefficients.length - 1;
        double[] c = new double[d + 1];
        // y = sum_k a_k ((x - mid) / half)^k, expanded binomially.
        for (int k = 0; k <= d; k++) {
            double scale = zCoefficients[k] / Math.pow(half, k);
            for (int j = 0; j <= k; j++) {
                c[j] += scale * binomial(k, j) * Math.pow(-mid, k - j);
            }
        }
        return c;
    }

    public double maxAbsoluteResidual() {
        return maxResidual;
    }

    /** y(x). */
    public double value(double x) {
        return dot(basis(x, false), zCoefficients);
    }

    /** dy/dx at x. */
    public double derivative(double x) {
        return dot(basis(x, true), zCoefficients);
    }

    /** Weights w_i with y(x) = sum_i w_i y_i ({@code derivative}: dy/dx instead). */
    public double[] weights(double x, boolean derivative) {
        double[] b = basis(x, derivative);
        int n = pseudoInverse[0].length;
        double[] w = new double[n];
        for (int k = 0; k < b.length; k++) {
            for (int i = 0; i < n; i++) {
                w[i] += b[k] * pseudoInverse[k][i];
            }
        }
        return w;
    }

    private double[] basis(double x, boolean derivative) {
        int d = zCoefficients.length - 1;
        double z = (x - mid) / half;
        double[] b = new double[d + 1];
        for (int k = 0; k <= d; k++) {
            b[k] = derivative ? (k == 0 ? 0 : k * Math.pow(z, k - 1) / half) : Math.pow(z, k);
        }
        return b;
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    private static double binomial(int n, int k) {
        double r = 1;
        for (int i = 1; i <= k; i++) {
            r = r * (n - k + i) / i;
        }
        return r;
    }
}
