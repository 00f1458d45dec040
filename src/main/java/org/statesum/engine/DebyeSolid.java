package org.statesum.engine;

/**
 * The Debye model of one atom (three modes with g(nu) proportional to nu^2 up to the cut-off), in
 * reduced units, with x = theta_D / T:
 * <pre>
 *   E_zp / k = 9 theta / 8
 *   U / k    = 9 theta / 8 + 3 T D_3(x)
 *   F / k    = 9 theta / 8 + T (3 ln(1 - e^{-x}) - D_3(x))
 *   S / k    = 4 D_3(x) - 3 ln(1 - e^{-x})
 *   C_V / k  = 12 D_3(x) - 9 x / (e^x - 1)
 * </pre>
 * (C. Kittel, Introduction to Solid State Physics, 8th ed., ch. 5; D_3 from {@link DebyeFunction}).
 * T = 0 gives the limits F = U = E_zp, S = C_V = 0. High T tends to C_V = 3 k (Dulong-Petit), low T to
 * C_V = (12 pi^4 / 5) k (T / theta)^3.
 *
 * <p>Error bounds: the bound of D_3, the rounding of the elementary functions (a few ulps each, named
 * below) and a relative error {@code thetaRelativeError} of theta, propagated with the exact identities
 * theta dF/dtheta = U, theta dU/dtheta = U - T C_V, theta dS/dtheta = -C_V and
 * |theta dC_V/dtheta| &lt;= (2 + x) C_V; all doubled for second-order terms.
 */
public final class DebyeSolid {

    private static final double U = 0x1.0p-53;

    private DebyeSolid() {
    }

    /**
     * Evaluates one atom of a Debye solid.
     *
     * @param thetaKelvin Debye temperature, K, finite and &gt; 0
     * @param thetaRelativeError relative error already in theta (from unit conversion), &gt;= 0
     * @param temperaturesKelvin grid, K, each 0 or positive and finite
     */
    public static VibrationalTable perAtom(double thetaKelvin, double thetaRelativeError, double[] temperaturesKelvin) {
        if (!(thetaKelvin > 0 && thetaKelvin < Double.MAX_VALUE)) {
            throw new DomainException("invalid-debye-temperature", "", "the Debye temperature must be positive");
        }
        int n = temperaturesKelvin.length;
        double[] f = new double[n];
        double[] fb = new double[n];
        double[] e = new double[n];
        double[] eb = new double[n];
        double[] s = new double[n];
        double[] sb = new double[n];
        double[] c = new double[n];
        double[] cb = new double[n];
        double zp = 1.125 * thetaKelvin;
        double eps = thetaRelativeError + U;
        for (int j = 0; j < n; j++) {
            double t = temperaturesKelvin[j];
            if (t == 0) {
                f[j] = zp;
                e[j] = zp;
                fb[j] = 2 * (eps * zp + U * zp);
                eb[j] = fb[j];
                continue;
            }
            // x = theta / T carries theta's error and one rounding.
            double x = thetaKelvin / t;
            double epsX = eps + U;
            DebyeFunction.Value d = DebyeFunction.of(x);
            double dv = d.value();
            double em = -Math.expm1(-x);
            double log = Math.log(em);
            double occupancyX = x >= 709 ? 0 : x / Math.expm1(x);
            // log(1 - e^{-x}): expm1 (1 ulp), its argument (x u in e^{-x}, counted in epsX) and the log (1 ulp).
            double logErr = 2 * U * Math.abs(log) + 2 * U;
            double occErr = 4 * U * occupancyX;
            e[j] = zp + 3 * t * dv;
            f[j] = zp + t * (3 * log - dv);
            s[j] = 4 * dv - 3 * log;
            c[j] = 12 * dv - 9 * occupancyX;
            c[j] = Math.max(c[j], 0);
            double cv = c[j];
            fb[j] = 2 * (t * (3 * logErr + d.errorBound() + 3 * U * Math.abs(log) + U * dv)
                    + 3 * U * (zp + t * Math.abs(3 * log - dv)) + epsX * e[j]);
            eb[j] = 2 * (3 * t * (d.errorBound() + 2 * U * dv) + 2 * U * e[j] + epsX * (e[j] + t * cv));
            sb[j] = 2 * (4 * d.errorBound() + 3 * logErr + 3 * U * (4 * dv + 3 * Math.abs(log)) + epsX * cv);
            cb[j] = 2 * (12 * d.errorBound() + 9 * occErr + 3 * U * (12 * dv + 9 * occupancyX)
                    + epsX * (2 + x) * cv);
        }
        return new VibrationalTable(temperaturesKelvin.clone(), new Series(f, fb), new Series(e, eb),
                new Series(s, sb), new Series(c, cb), zp, 2 * eps * zp);
    }
}
