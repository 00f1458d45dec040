package org.statesum.engine;

/**
 * Antiderivatives, in closed form, of the harmonic-oscillator functions of x = theta / T and of x times
 * them, the pieces from which a piecewise-linear density of states is integrated exactly. With
 * L_n = Li_n(e^{-x}) (the polylogarithm; L_1 = -ln(1 - e^{-x})) and n = 1 / (e^x - 1):
 * <pre>
 *   phi_F = ln(1 - e^{-x}):       int phi_F   = L_2,                  int x phi_F = x L_2 + L_3
 *   phi_U = x n:                   int phi_U   = -x L_1 - L_2,         int x phi_U = -(x^2 L_1 + 2 x L_2 + 2 L_3)
 *   phi_C = x^2 e^x n^2:           int phi_C   = -x^2 n + 2 int phi_U, int x phi_C = -x^3 n + 3 int x phi_U
 * </pre>
 * (d/dx L_n = -L_{n-1}; the phi_C forms by parts with e^x n^2 = -dn/dx). Checked by differentiation in
 * {@code BoseIntegralsTest}.
 *
 * <p>Numerics. Below {@link #SERIES_SWITCH} the polylogarithms come from their expansion about x = 0
 * (L. Lewin, Polylogarithms and Associated Functions, 1981, eq. 7.35):
 * Li_n(e^{-x}) = (-x)^{n-1} / (n-1)! (H_{n-1} - ln x) + sum_{k != n-1} zeta(n - k) (-x)^k / k!, where
 * zeta(1 - 2m) / (2m + 1)! = (-1)^m 2 zeta(2m) / ((2 pi)^{2m} 2m (2m + 1)); the terms fall by
 * (x / 2 pi)^2 &lt;= 0.06 each. There the functions are kept as A(x) - A(0), so that differences between
 * close small x lose nothing to the constants zeta(2) and zeta(3). At and above the switch they come
 * from Li_n(z) = sum z^k / k^n, z = e^{-x} &lt;= 0.22, and are kept as they are. Each value carries a
 * running bound on its own rounding (terms' relative errors counted term by term) and a proven bound on
 * the series' truncation; {@link Value#minus} combines two values and their bounds.
 *
 * <p>Stateless and thread-safe.
 */
public final class BoseIntegrals {

    private static final double U = 0x1.0p-53;
    /** x below which the expansion about 0 is used; above it the z-series (z &lt;= e^{-1.5} = 0.223). */
    static final double SERIES_SWITCH = 1.5;
    private static final double ZETA2 = Math.PI * Math.PI / 6;
    /** zeta(3), Apery's constant (OEIS A002117), rounded to double. */
    private static final double ZETA3 = 1.2020569031595942;
    /** Terms of the expansion about 0: (1.5 / 2 pi)^(2 x 14) &lt; 1e-34, far below u. */
    private static final int SMALL_TERMS = 14;
    /** c_m = zeta(1 - 2m) / (2m + 1)!, m = 1..SMALL_TERMS (index 0 unused). */
    private static final double[] C = new double[SMALL_TERMS + 1];

    static {
        for (int m = 1; m <= SMALL_TERMS; m++) {
            double zeta = m == 1 ? ZETA2 : zeta(2 * m);
            C[m] = (m % 2 == 0 ? 2 : -2) * zeta / (Math.pow(2 * Math.PI, 2 * m) * (2.0 * m) * (2 * m + 1));
        }
    }

    /** The six antiderivatives, index order below. */
    public static final int F0 = 0;
    public static final int F1 = 1;
    public static final int U0 = 2;
    public static final int U1 = 3;
    public static final int C0 = 4;
    public static final int C1 = 5;
    /** A(0) of each antiderivative (its limit at x -&gt; 0), the constant the small-x form leaves out. */
    private static final double[] AT_ZERO = {ZETA2, ZETA3, -ZETA2, -2 * ZETA3, -2 * ZETA2, -6 * ZETA3};

    private BoseIntegrals() {
    }

    /**
     * The six antiderivatives at one x, each either relative to its value at 0 ({@code nearZero}) or
     * absolute, with absolute error bounds.
     */
    public record Value(boolean nearZero, double[] values, double[] bounds) {

        /**
         * this(x_b) - other(x_a) for antiderivative {@code i}: the integral over [x_a, x_b]; its bound in
         * {@code boundOut[0]}.
         */
        public double minus(Value other, int i, double[] boundOut) {
            double a = other.values[i];
            double b = values[i];
            double bound = bounds[i] + other.bounds[i];
            if (nearZero == other.nearZero) {
                double d = b - a;
                boundOut[0] = bound + U * Math.abs(d);
                return d;
            }
            // one of the two is relative to A(0): bring it back (its constant rounded: u/2 relative)
            double c = AT_ZERO[i];
            double d = nearZero ? (b + c) - a : b - (a + c);
            boundOut[0] = bound + U * Math.abs(c) + 2 * U * (Math.abs(c) + Math.abs(a) + Math.abs(b));
            return d;
        }
    }

    /** The antiderivatives at x (0 &lt;= x &lt;= +infinity). */
    public static Value at(double x) {
        double[] v = new double[6];
        double[] e = new double[6];
        if (x == 0) {
            return new Value(true, v, e); // A(0) - A(0) = 0 exactly
        }
        if (x >= SERIES_SWITCH) {
            far(x, v, e);
            return new Value(false, v, e);
        }
        near(x, v, e);
        return new Value(true, v, e);
    }

    /** z-series: Li_n(z) = sum z^k / k^n, z = e^{-x}, with n = 1 / (e^x - 1) = z / (1 - z). */
    static void far(double x, double[] v, double[] e) {
        double z = Math.exp(-x);
        if (z == 0) {
            return; // every antiderivative is 0 to far below the smallest double
        }
        double l1 = 0;
        double l2 = 0;
        double l3 = 0;
        double err1 = 0;
        double err2 = 0;
        double err3 = 0;
        double zk = 1;
        for (int k = 1; k <= 60; k++) {
            zk *= z; // relative error <= k (u of exp) + (k - 1) u of the products
            double t1 = zk / k;
            double t2 = t1 / k;
            double t3 = t2 / k;
            l1 += t1;
            l2 += t2;
            l3 += t3;
            err1 += (2 * k + 3) * t1; // this term's own error, and one rounding of the running sum
            err2 += (2 * k + 4) * t2;
            err3 += (2 * k + 5) * t3;
            if (t1 < 0x1.0p-60 * l1) {
                break; // the rest is below z^k / (1 - z) times this term: under 2^-58 of the sum
            }
        }
        double tail = 2 * 0x1.0p-60; // of each sum, relative: z^{K+1} / (1 - z) with z <= 0.223
        err1 = U * err1 + tail * l1;
        err2 = U * err2 + tail * l2;
        err3 = U * err3 + tail * l3;
        double n = z / (1 - z); // <= 3 u relative
        combine(x, l1, l2, l3, n, err1, err2, err3, 3 * U * n, v, e);
    }

    /** Expansion about 0, each function without its value at 0. */
    static void near(double x, double[] v, double[] e) {
        double lnx = Math.log(x);
        double x2 = x * x;
        // sums over m >= 1 of c_m x^{2m+1} (for Li_2) and c_m x^{2m+2} / (2m + 2) (for Li_3)
        double s2 = 0;
        double s3 = 0;
        double abs2 = 0;
        double p = x * x2;
        for (int m = 1; m <= SMALL_TERMS; m++) {
            double t = C[m] * p;
            s2 += t;
            s3 += t * x / (2 * m + 2);
            abs2 += (2 * m + 6) * Math.abs(t);
            p *= x2;
        }
        // Li_2 - zeta(2) = -x + x ln x - x^2 / 4 - s2 ; Li_3 - zeta(3) = -zeta(2) x + x^2 (3/2 - ln x) / 2 + x^3 / 12 + s3
        double xlnx = x * lnx;
        double r2 = -x + xlnx - 0.25 * x2 - s2;
        double r3 = -ZETA2 * x + 0.5 * x2 * (1.5 - lnx) + x2 * x / 12 + s3;
        double err2 = U * (3 * Math.abs(x) + 4 * Math.abs(xlnx) + x2 + 2 * Math.abs(r2) + abs2);
        double err3 = U * (3 * ZETA2 * x + 4 * x2 * (1.5 + Math.abs(lnx)) + x2 * x + 2 * Math.abs(r3) + abs2 * x);
        double l1 = -Math.log(-Math.expm1(-x)); // <= 3 u relative (expm1, log, and the log's argument)
        double err1 = 3 * U * Math.abs(l1) + U;
        double em1 = Math.expm1(x);
        double n = 1 / em1;
        // the constants zeta(2), zeta(3) are left out of L_2 and L_3: combine's affine forms carry them
        // as A(0), so they are subtracted here term by term (their coefficients are 1, x, 2 x, ...)
        combineNear(x, l1, r2, r3, n, err1, err2, err3, 3 * U * n, v, e);
    }

    /** The six antiderivatives from L_1, L_2, L_3 and n, absolute (the far form). */
    private static void combine(double x, double l1, double l2, double l3, double n, double e1, double e2,
            double e3, double en, double[] v, double[] e) {
        double x2 = x * x;
        double x3 = x2 * x;
        v[F0] = l2;
        e[F0] = e2;
        v[F1] = x * l2 + l3;
        e[F1] = x * e2 + e3 + 2 * U * (x * l2 + l3);
        v[U0] = -x * l1 - l2;
        e[U0] = x * e1 + e2 + 2 * U * (x * l1 + l2);
        double u1 = x2 * l1 + 2 * x * l2 + 2 * l3;
        v[U1] = -u1;
        e[U1] = x2 * e1 + 2 * x * e2 + 2 * e3 + 4 * U * u1;
        v[C0] = -x2 * n + 2 * v[U0];
        e[C0] = x2 * en + 2 * e[U0] + 3 * U * (x2 * n + 2 * Math.abs(v[U0]));
        v[C1] = -x3 * n + 3 * v[U1];
        e[C1] = x3 * en + 3 * e[U1] + 4 * U * (x3 * n + 3 * Math.abs(v[U1]));
    }

    /**
     * The six antiderivatives minus their values at 0, from L_1, r_2 = L_2 - zeta(2), r_3 = L_3 - zeta(3)
     * and n (the near form): A - A(0) = A(L_2 = zeta(2) + r_2, L_3 = zeta(3) + r_3) - A(0), the constants
     * cancelling exactly on paper; x L_1 and x^2 n (which tend to 0 and to x) are kept.
     */
    private static void combineNear(double x, double l1, double r2, double r3, double n, double e1, double e2,
            double e3, double en, double[] v, double[] e) {
        double x2 = x * x;
        double x3 = x2 * x;
        v[F0] = r2;
        e[F0] = e2;
        // x L_2 + L_3 - zeta(3) = x (zeta(2) + r_2) + r_3
        v[F1] = x * ZETA2 + x * r2 + r3;
        e[F1] = x * e2 + e3 + 3 * U * (x * ZETA2 + x * Math.abs(r2) + Math.abs(r3));
        // -x L_1 - L_2 + zeta(2) = -x L_1 - r_2
        v[U0] = -x * l1 - r2;
        e[U0] = x * e1 + e2 + 2 * U * (x * l1 + Math.abs(r2));
        // -(x^2 L_1 + 2 x L_2 + 2 L_3) + 2 zeta(3) = -(x^2 L_1 + 2 x (zeta(2) + r_2) + 2 r_3)
        double u1 = x2 * l1 + 2 * x * ZETA2 + 2 * x * r2 + 2 * r3;
        v[U1] = -u1;
        e[U1] = x2 * e1 + 2 * x * e2 + 2 * e3 + 5 * U * (x2 * l1 + 2 * x * ZETA2 + 2 * x * Math.abs(r2) + 2 * Math.abs(r3));
        // -x^2 n + 2 (int phi_U) - (-2 zeta(2)) = -x^2 n + 2 (int phi_U - A_U0(0))
        v[C0] = -x2 * n + 2 * v[U0];
        e[C0] = x2 * en + 2 * e[U0] + 3 * U * (x2 * n + 2 * Math.abs(v[U0]));
        v[C1] = -x3 * n + 3 * v[U1];
        e[C1] = x3 * en + 3 * e[U1] + 4 * U * (x3 * n + 3 * Math.abs(v[U1]));
    }

    /**
     * zeta(s) for even s &gt;= 4: the closed forms pi^4 / 90, pi^6 / 945, pi^8 / 9450, pi^10 / 93555 (Euler;
     * NIST DLMF 25.6.1) up to s = 10, above it the sum of j^-s to j = 40 (the rest is below 40^{1-s} / (s - 1)
     * &lt; 1e-19 for s &gt;= 12).
     */
    private static double zeta(int s) {
        double pi2 = Math.PI * Math.PI;
        switch (s) {
            case 4: return pi2 * pi2 / 90;
            case 6: return pi2 * pi2 * pi2 / 945;
            case 8: return pi2 * pi2 * pi2 * pi2 / 9450;
            case 10: return pi2 * pi2 * pi2 * pi2 * pi2 / 93555;
            default:
                double sum = 0;
                for (int j = 40; j >= 1; j--) {
                    sum += Math.pow(j, -s);
                }
                return sum;
        }
    }
}
