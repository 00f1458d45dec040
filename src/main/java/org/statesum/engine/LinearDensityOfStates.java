package org.statesum.engine;

/**
 * The harmonic vibrations of a piecewise-linear density of states g(theta) (modes per kelvin of
 * theta = h nu / k_B, linear between nodes theta_0 &lt; theta_1 &lt; ... with theta_0 &gt;= 0), integrated
 * exactly on every segment. With x = theta / T and the functions of {@link HarmonicModes}:
 * <pre>
 *   E_zp / k = int g theta / 2,          F / k = E_zp / k + T int g ln(1 - e^{-x}),
 *   U / k = E_zp / k + T int g x n,      S / k = int g (x n - ln(1 - e^{-x})),   C_V / k = int g x^2 e^x n^2
 * </pre>
 * On a segment [theta_a, theta_b] of width h with g = g_a + beta (theta - theta_a), beta = (g_b - g_a) / h,
 * int g phi(theta / T) d theta = T (g_a [A_0] + beta T ([A_1] - x_a [A_0])), where A_0 and A_1 are the
 * antiderivatives of phi and x phi in closed form ({@link BoseIntegrals}) and [A] = A(x_b) - A(x_a). So the
 * answer is the integral of the piecewise-linear density itself at every temperature: at T &lt;&lt; theta_1
 * the segment from 0 gives the power law of its own slope, not the exponential die-off of a sum over
 * nodes.
 *
 * <p>Error bounds: each antiderivative carries a rigorous bound (its series' truncation and a running
 * count of its roundings); the bounds are carried through the segment formula (with the cancellation in
 * [A_1] - x_a [A_0] counted term by term), the compensated sum over segments (2 u of the sum of absolute
 * values), a relative error eps of every theta (as in {@link HarmonicModes}: eps U in F, eps (U + T C_V) in
 * U, eps C_V in S, eps (2 C_V + int g x phi_C) in C_V, the last bounded on each segment by x_b times its
 * share of C_V or by 1.6 times its modes, as x^3 e^x n^2 &lt;= 1.6), one
 * rounding of each density value, and doubled for second-order terms.
 *
 * <p>Immutable and thread-safe.
 */
public final class LinearDensityOfStates {

    private static final double U = 0x1.0p-53;
    /** Bound on x^3 e^x / (e^x - 1)^2 over x &gt; 0 (its maximum is 1.52 near x = 2.6). */
    private static final double SPREAD_MAX = 1.6;

    private final double[] theta;
    private final double[] density;
    private final double thetaRelativeError;
    private final double modes;
    private final double zeroPoint;
    private final double zeroPointBound;

    private LinearDensityOfStates(double[] theta, double[] density, double thetaRelativeError) {
        this.theta = theta;
        this.density = density;
        this.thetaRelativeError = thetaRelativeError;
        double n = 0;
        double zp = 0;
        double zpAbs = 0;
        for (int i = 0; i + 1 < theta.length; i++) {
            double h = theta[i + 1] - theta[i];
            n += 0.5 * h * (density[i] + density[i + 1]);
            // int g theta / 2 over the segment, exact for linear g
            double piece = h / 12 * (density[i] * (2 * theta[i] + theta[i + 1])
                    + density[i + 1] * (theta[i] + 2 * theta[i + 1]));
            zp += piece;
            zpAbs += Math.abs(piece);
        }
        this.modes = n;
        this.zeroPoint = zp;
        this.zeroPointBound = 2 * ((thetaRelativeError + 8 * U) * zpAbs + theta.length * U * zpAbs);
    }

    /**
     * @param thetaKelvin nodes h nu / k_B, K, finite, the first &gt;= 0, strictly increasing
     * @param densityPerKelvin g at each node, modes per K, finite and &gt;= 0
     * @param thetaRelativeError relative error already in every theta, &gt;= 0
     * @throws DomainException for nodes out of order, a negative density or lengths that differ
     */
    public static LinearDensityOfStates of(double[] thetaKelvin, double[] densityPerKelvin, double thetaRelativeError) {
        if (thetaKelvin.length != densityPerKelvin.length || thetaKelvin.length < 2) {
            throw new DomainException("invalid-modes", "", "a density needs at least two nodes, one density each");
        }
        for (int i = 0; i < thetaKelvin.length; i++) {
            boolean ordered = i == 0 ? thetaKelvin[0] >= 0 : thetaKelvin[i] > thetaKelvin[i - 1];
            if (!(ordered && thetaKelvin[i] < Double.MAX_VALUE)) {
                throw new DomainException("invalid-modes", "", "density node " + i + " is out of order");
            }
            if (!(densityPerKelvin[i] >= 0 && densityPerKelvin[i] < Double.MAX_VALUE)) {
                throw new DomainException("invalid-modes", "", "density node " + i + " needs a finite density >= 0");
            }
        }
        return new LinearDensityOfStates(thetaKelvin.clone(), densityPerKelvin.clone(), thetaRelativeError);
    }

    /** Segments summed per temperature. */
    public int size() {
        return theta.length - 1;
    }

    /** int g d theta: the number of modes. */
    public double modeCount() {
        return modes;
    }

    public double zeroPointEnergyKelvin() {
        return zeroPoint;
    }

    /**
     * The density with every theta multiplied by {@code factor} (&gt; 0) and g divided by it, so that each
     * mode keeps its weight: a Grueneisen rescaling.
     */
    public LinearDensityOfStates scaled(double factor) {
        double[] t = new double[theta.length];
        double[] g = new double[theta.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = theta[i] * factor;
            g[i] = density[i] / factor;
        }
        return new LinearDensityOfStates(t, g, thetaRelativeError + U);
    }

    /** Evaluates the density on a grid of temperatures (K, each 0 or positive). */
    public VibrationalTable evaluate(double[] temperaturesKelvin) {
        int n = temperaturesKelvin.length;
        // temperatures go over the cores when the grid is large (about a millisecond of work or more)
        boolean parallel = (long) n * theta.length >= HarmonicModes.PARALLEL_TERMS / 8;
        return VibrationalTable.tabulate(temperaturesKelvin, parallel, this::evaluateAt, zeroPoint, zeroPointBound);
    }

    /** One temperature into {@code out}: F/k, U/k, S/k, C_V/k, then their four bounds. */
    public void evaluateAt(double temperatureKelvin, double[] out) {
        double t = temperatureKelvin;
        double eps = thetaRelativeError + U;
        if (t == 0) {
            VibrationalTable.atZeroTemperature(zeroPoint, zeroPointBound + 2 * eps * zeroPoint, out);
            return;
        }
        // sums of the segment integrals int g phi d theta for phi_F, phi_U, phi_C, with their bounds
        double[] sum = new double[3];
        double[] comp = new double[3];
        double[] abs = new double[3];
        double[] err = new double[3];
        double[] bound = new double[1];
        double spread = 0; // bounds int g x phi_C: per segment min(x_b, 1.6 / phi_C ...) as below
        BoseIntegrals.Value left = BoseIntegrals.at(theta[0] / t);
        double xa = theta[0] / t;
        for (int i = 0; i + 1 < theta.length; i++) {
            double xb = theta[i + 1] / t;
            BoseIntegrals.Value right = BoseIntegrals.at(xb);
            double h = theta[i + 1] - theta[i];
            double ga = density[i];
            double beta = (density[i + 1] - ga) / h;
            for (int q = 0; q < 3; q++) {
                double d0 = right.minus(left, 2 * q, bound);
                double e0 = bound[0];
                double d1 = right.minus(left, 2 * q + 1, bound);
                double e1 = bound[0];
                double moment = d1 - xa * d0; // int (x - x_a) phi dx
                double piece = t * (ga * d0 + beta * t * moment);
                double scale = t * (ga * Math.abs(d0) + Math.abs(beta) * t * (Math.abs(d1) + xa * Math.abs(d0)));
                err[q] += t * (ga * e0 + Math.abs(beta) * t * (e1 + xa * e0)) + 6 * U * scale;
                double s = sum[q] + piece;
                comp[q] += Math.abs(sum[q]) >= Math.abs(piece) ? (sum[q] - s) + piece : (piece - s) + sum[q];
                sum[q] = s;
                abs[q] += Math.abs(piece);
                if (q == 2) {
                    // int_seg g x phi_C <= min(x_b int_seg g phi_C, 1.6 int_seg g), as x^3 e^x n^2 <= 1.6
                    spread += Math.min(xb * Math.abs(piece), SPREAD_MAX * 0.5 * h * (ga + density[i + 1]));
                }
            }
            left = right;
            xa = xb;
        }
        double logs = sum[0] + comp[0];   // int g ln(1 - e^{-x}) <= 0
        double occ = sum[1] + comp[1];    // int g x n >= 0
        double cap = sum[2] + comp[2];
        for (int q = 0; q < 3; q++) {
            err[q] += 2 * U * abs[q];
        }
        double f = zeroPoint + t * logs;
        double u = zeroPoint + t * occ;
        double s = occ - logs;
        out[0] = f;
        out[1] = u;
        out[2] = s;
        out[3] = cap;
        out[4] = zeroPointBound + 2 * (t * err[0] + 2 * U * Math.abs(f) + eps * Math.abs(u));
        out[5] = zeroPointBound + 2 * (t * err[1] + 2 * U * Math.abs(u) + eps * (Math.abs(u) + t * cap));
        out[6] = 2 * (err[0] + err[1] + 2 * U * (Math.abs(occ) + Math.abs(logs)) + eps * cap);
        out[7] = 2 * (err[2] + U * cap + eps * (2 * cap + 1.01 * spread));
    }
}
