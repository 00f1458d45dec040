package org.statesum.engine;

/**
 * A set of weighted harmonic modes (Einstein oscillators, phonon branches on a q-point mesh, or the
 * nodes of a quadrature over a density of states), in reduced units: mode i has theta_i = h nu_i / k_B
 * (K) and weight w_i &gt;= 0. With x = theta / T and n = 1 / (e^x - 1):
 * <pre>
 *   E_zp / k = sum w theta / 2
 *   F / k    = E_zp / k + T sum w ln(1 - e^{-x})
 *   U / k    = E_zp / k + sum w theta n
 *   S / k    = sum w (x n - ln(1 - e^{-x}))
 *   C_V / k  = sum w x^2 n (1 + n)
 * </pre>
 * (the quantum harmonic oscillator; e.g. D. A. McQuarrie, Statistical Mechanics, 2000, ch. 11).
 *
 * <p>Numerics: one exp per mode and term; 1 - e^{-x} by expm1 below x = 0.1 and as 1 - e^{-x} above
 * (&lt;= 10 u relative); ln(1 - e^{-x}) by log where |ln| &gt;= ln(4/3) and by an atanh series where e^{-x} &lt;= 1/4,
 * so it keeps its relative accuracy (&lt;= 16 u) at every x; n = e^{-x} / (1 - e^{-x}) (&lt;= 12 u). Terms of one
 * sum share their sign, so compensated (Neumaier) summation leaves an error of 2 u |sum| plus the terms'
 * own errors: at most 18 u for ln(1 - e^{-x}) and x n, 16 u for theta n and 32 u for the heat-capacity term,
 * counted in ulps of each weighted term. A relative error eps of every theta (unit conversion) adds eps U to F,
 * eps (U + T C_V) to U, eps C_V to S and eps sum w (2 + x) c to C_V (see {@link DebyeSolid}). All bounds
 * are doubled for second-order terms. Modes with e^{-x} = 0 contribute exactly nothing thermally.
 *
 * <p>Immutable and thread-safe.
 */
public final class HarmonicModes {

    private static final double U = 0x1.0p-53;
    /**
     * Below this x, 1 - e^{-x} comes from expm1; above it 1 - e^{-x} loses at most u e / (1 - e) &lt;= 10 u
     * relative (e^{-0.1} = 0.905), cheaper than expm1 in the hot loop.
     */
    private static final double EXPM1_BELOW = 0.1;
    /**
     * Above this e^{-x}, ln(1 - e) = log(1 - e) keeps |ln| &gt;= ln(4/3), so the rounding of 1 - e (u absolute)
     * costs at most 4 u relative; below it a short series does better (see {@link #logOneMinus}).
     */
    private static final double SERIES_BELOW = 0.25;
    /** (mode, temperature) terms above which a grid is split over the cores: about a millisecond of work. */
    public static final long PARALLEL_TERMS = 100_000;

    private final double[] theta;
    private final double[] weight;
    private final double thetaRelativeError;
    private final double zeroPoint;
    private final double zeroPointBound;

    private HarmonicModes(double[] theta, double[] weight, double thetaRelativeError) {
        this.theta = theta;
        this.weight = weight;
        this.thetaRelativeError = thetaRelativeError;
        double zp = 0;
        double c = 0;
        for (int i = 0; i < theta.length; i++) {
            double v = 0.5 * weight[i] * theta[i];
            double t = zp + v;
            c += Math.abs(zp) >= Math.abs(v) ? (zp - t) + v : (v - t) + zp;
            zp = t;
        }
        this.zeroPoint = zp + c;
        this.zeroPointBound = 2 * ((thetaRelativeError + 4 * U) * zeroPoint);
    }

    /**
     * @param thetaKelvin mode temperatures h nu / k_B, K, each finite and &gt; 0
     * @param weights weights, each finite and &gt;= 0, same length
     * @param thetaRelativeError relative error already in every theta, &gt;= 0
     * @throws DomainException for a non-positive theta, a negative weight or lengths that differ
     */
    public static HarmonicModes of(double[] thetaKelvin, double[] weights, double thetaRelativeError) {
        if (thetaKelvin.length != weights.length) {
            throw new DomainException("invalid-modes", "", "mode temperatures and weights differ in length");
        }
        for (int i = 0; i < thetaKelvin.length; i++) {
            if (!(thetaKelvin[i] > 0 && thetaKelvin[i] < Double.MAX_VALUE)) {
                throw new DomainException("invalid-modes", "", "mode " + i + " needs a positive finite frequency");
            }
            if (!(weights[i] >= 0 && weights[i] < Double.MAX_VALUE)) {
                throw new DomainException("invalid-modes", "", "mode " + i + " needs a finite weight >= 0");
            }
        }
        return new HarmonicModes(thetaKelvin.clone(), weights.clone(), thetaRelativeError);
    }

    public int size() {
        return theta.length;
    }

    /** E_zp / k_B, K. */
    public double zeroPointEnergyKelvin() {
        return zeroPoint;
    }

    /** This set with every theta multiplied by {@code factor} (&gt; 0), adding one rounding to each. */
    public HarmonicModes scaled(double factor) {
        double[] t = new double[theta.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = theta[i] * factor;
        }
        return new HarmonicModes(t, weight, thetaRelativeError + U);
    }

    /** Evaluates the modes on a grid of temperatures (K, each 0 or positive). */
    public VibrationalTable evaluate(double[] temperaturesKelvin) {
        int n = temperaturesKelvin.length;
        // temperatures go over the cores when the grid is large (about a millisecond of work or more)
        boolean parallel = (long) n * theta.length >= PARALLEL_TERMS;
        return VibrationalTable.tabulate(temperaturesKelvin, parallel, this::evaluateAt, zeroPoint, zeroPointBound);
    }

    /**
     * ln(1 - e) for 0 &lt;= e &lt;= 1/4 as -2 atanh(z) = -2 (z + z^3/3 + z^5/5 + ...), z = e / (2 - e) &lt;= 1/7: the
     * terms fall by z^2 &lt;= 1/49 each, so ten of them leave a tail below 1e-17 relative; all terms share a sign
     * and the result carries at most 5 u relative (z: 2 u, the sum and product: 3 u).
     */
    static double logOneMinus(double e) {
        double z = e / (2 - e);
        double z2 = z * z;
        double s = 1.0 / 21;
        for (int k = 19; k >= 1; k -= 2) {
            s = s * z2 + 1.0 / k;
        }
        return -2 * z * s;
    }

    /**
     * Evaluates one temperature into {@code out}: F/k, U/k, S/k, C_V/k, then their four bounds.
     *
     * @param temperatureKelvin 0 or positive, K
     * @param out an array of at least 8 elements
     */
    public void evaluateAt(double temperatureKelvin, double[] out) {
        double t = temperatureKelvin;
        double eps = thetaRelativeError + U;
        if (t == 0) {
            VibrationalTable.atZeroTemperature(zeroPoint, zeroPointBound + 2 * eps * zeroPoint, out);
            return;
        }
        double inverseT = 1.0 / t;
        double logSum = 0;
        double logC = 0;
        double occSum = 0;
        double occC = 0;
        double capSum = 0;
        double capC = 0;
        double spread = 0;
        for (int i = 0; i < theta.length; i++) {
            double x = theta[i] * inverseT;
            double e = Math.exp(-x);
            if (e == 0) {
                continue;
            }
            double em;
            double l;
            if (x < EXPM1_BELOW) {
                em = -Math.expm1(-x);
                l = Math.log(em);
            } else if (e > SERIES_BELOW) {
                em = 1 - e;
                l = Math.log(em);
            } else {
                em = 1 - e;
                l = logOneMinus(e);
            }
            double occ = e / em;
            double w = weight[i];
            double lv = w * l;
            double nv = w * theta[i] * occ;
            double cv = w * x * x * occ * (1 + occ);
            double s1 = logSum + lv;
            logC += logSum <= lv ? (logSum - s1) + lv : (lv - s1) + logSum;
            logSum = s1;
            double s2 = occSum + nv;
            occC += occSum >= nv ? (occSum - s2) + nv : (nv - s2) + occSum;
            occSum = s2;
            double s3 = capSum + cv;
            capC += capSum >= cv ? (capSum - s3) + cv : (cv - s3) + capSum;
            capSum = s3;
            spread += x * cv;
        }
        double logs = logSum + logC;
        double thermal = occSum + occC;
        double cap = capSum + capC;
        double f = zeroPoint + t * logs;
        double u = zeroPoint + thermal;
        double s = thermal * inverseT - logs;
        double absLog = -logs;
        out[0] = f;
        out[1] = u;
        out[2] = s;
        out[3] = cap;
        out[4] = zeroPointBound + 2 * (20 * U * t * absLog + U * Math.abs(f) + eps * u);
        out[5] = zeroPointBound + 2 * (18 * U * thermal + U * u + eps * (u + t * cap));
        out[6] = 2 * (20 * U * (thermal * inverseT + absLog) + eps * cap);
        out[7] = 2 * (34 * U * cap + eps * (2 * cap + spread));
    }
}
