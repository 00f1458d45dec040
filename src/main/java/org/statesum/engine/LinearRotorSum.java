package org.statesum.engine;

/**
 * The exact level sum of a rigid linear rotor, E_J / k_B = theta J (J + 1), g_J = (2J + 1) w(J), with
 * w(J) = {@code evenWeight} for even J and {@code oddWeight} for odd J (nuclear-spin weights, or 1/sigma
 * each for the symmetric-average treatment), summed up to a level N chosen per temperature so that a
 * proven bound on the neglected tail is below {@link #TAIL_TARGET} of the kept sum.
 *
 * <p>Tail bound. With y = theta x (x + 1) / T and f_k(x) = (2x + 1) y^k exp(-y), dy = (theta / T)(2x + 1) dx,
 * so the integral of f_k from N to infinity is (T / theta) Gamma(k + 1, a) with a = theta N (N + 1) / T:
 * (T / theta) e^-a, (T / theta) e^-a (a + 1) and (T / theta) e^-a (a^2 + 2a + 2) for k = 0, 1, 2. For
 * a >= 2k + 2, f_k is decreasing on [N, infinity) (d ln f_k / dx < 0 there since (2x + 1)^2 > 4 y T / theta),
 * so the sum over J > N is at most that integral. Relative to the lowest allowed level J_0 the shifted
 * terms are at most e^{y_0} times the unshifted ones, and w(J) <= max(w). The bounds on ln Z, U, S and C_V
 * follow from Z' -> Z' + tau_0, sum eps t -> + tau_1, sum eps^2 t -> + tau_2 (all terms non-negative):
 * |d ln Z| <= r_0, |d mean| <= r_1 + mean r_0, |d C_V / k| <= r_2 + m_2 r_0 + (2 mean + d mean) d mean,
 * with r_k = tau_k / Z'. The kept sum is evaluated by {@link CanonicalEnsemble} with its rounding bounds.
 *
 * <p>Reference for the sum: G. Herzberg, Molecular Spectra and Molecular Structure I (1950), ch. III;
 * the tail integral is the standard integral test for monotone series.
 */
public final class LinearRotorSum {

    /** The tail kept below this fraction of the kept sum (far below the rounding of the sum itself). */
    public static final double TAIL_TARGET = 0x1.0p-60;
    /**
     * Most levels summed at one temperature (the level set of one temperature then takes ~50 MB);
     * T / theta beyond about 1e10 needs the high-temperature form.
     */
    public static final int MAX_LEVEL = 1_000_000;
    /** Smallest a = theta N (N + 1) / T used: the integral test needs f_2 decreasing (a >= 6). */
    private static final double MIN_TAIL_EXPONENT = 6;

    /** The table (energies measured from J = 0), the highest level kept and the largest relative tail. */
    public record Result(CanonicalTable table, int highestLevel, double largestTailBound) {
    }

    private LinearRotorSum() {
    }

    /**
     * Evaluates the sum at every temperature.
     *
     * @param thetaKelvin the rotational temperature h c B / k_B, K, finite and positive
     * @param evenWeight weight of even J, >= 0
     * @param oddWeight weight of odd J, >= 0; not both zero
     * @param temperaturesKelvin the grid, K; 0 gives the lowest allowed level alone
     * @throws DomainException ROTOR_SUM_TOO_LONG when T / theta needs more than {@link #MAX_LEVEL} levels
     */
    public static Result evaluate(double thetaKelvin, double evenWeight, double oddWeight,
            double[] temperaturesKelvin) {
        if (!(thetaKelvin > 0 && thetaKelvin < Double.POSITIVE_INFINITY && evenWeight >= 0 && oddWeight >= 0
                && evenWeight + oddWeight > 0)) {
            throw new IllegalArgumentException("theta must be positive and the weights non-negative");
        }
        int n = temperaturesKelvin.length;
        Series[] out = {Series.zeros(n), Series.zeros(n), Series.zeros(n), Series.zeros(n), Series.zeros(n)};
        double[] logRel = new double[n];
        double[] top = new double[n];
        int highest = 0;
        double largestTail = 0;
        int j0 = evenWeight > 0 ? 0 : 1;
        double wMax = Math.max(evenWeight, oddWeight);
        double g0 = (2 * j0 + 1) * (j0 % 2 == 0 ? evenWeight : oddWeight);
        for (int j = 0; j < n; j++) {
            Cancellation.checkpoint();
            double t = temperaturesKelvin[j];
            int last = t == 0 ? j0 : highestLevel(thetaKelvin, t, j0, wMax, g0);
            highest = Math.max(highest, last);
            CanonicalTable one = CanonicalEnsemble.evaluate(levels(thetaKelvin, evenWeight, oddWeight, j0, last),
                    new double[] {t}, false);
            double[] tails = t == 0 ? new double[3] : tails(thetaKelvin, t, j0, last, wMax);
            double zRel = Math.exp(one.logRelativePartitionFunction()[0]);
            double r0 = tails[0] / zRel;
            double r1 = tails[1] / zRel;
            double r2 = tails[2] / zRel;
            largestTail = Math.max(largestTail, r0);
            double e0 = thetaKelvin * j0 * (j0 + 1.0);
            double mean = t == 0 ? 0 : (one.internalEnergyKelvin().values()[0] - e0) / t;
            double dMean = r1 + mean * r0;
            double cv = one.heatCapacityOverBoltzmann().values()[0];
            double dCv = r2 + (cv + mean * mean) * r0 + (2 * mean + dMean) * dMean;
            copy(one.logPartitionFunction(), out[0], j, r0);
            copy(one.helmholtzEnergyKelvin(), out[1], j, t * r0);
            copy(one.internalEnergyKelvin(), out[2], j, t * dMean);
            copy(one.entropyOverBoltzmann(), out[3], j, r0 + dMean);
            copy(one.heatCapacityOverBoltzmann(), out[4], j, dCv);
            logRel[j] = one.logRelativePartitionFunction()[0];
            top[j] = one.topLevelPopulation()[0];
        }
        CanonicalTable table = new CanonicalTable(temperaturesKelvin.clone(), out[0], out[1], out[2], out[3],
                out[4], logRel, top, null, null);
        return new Result(table, highest, largestTail);
    }

    /**
     * The highest J the sum keeps at this temperature for these weights (for precision reports).
     *
     * @throws DomainException ROTOR_SUM_TOO_LONG as {@link #evaluate}
     */
    public static int highestLevel(double thetaKelvin, double evenWeight, double oddWeight, double temperatureKelvin) {
        int j0 = evenWeight > 0 ? 0 : 1;
        double g0 = (2 * j0 + 1) * (j0 % 2 == 0 ? evenWeight : oddWeight);
        return temperatureKelvin == 0 ? j0
                : highestLevel(thetaKelvin, temperatureKelvin, j0, Math.max(evenWeight, oddWeight), g0);
    }

    /** The smallest N >= J_0 whose tail bound (k = 2, the largest) is below the target. */
    private static int highestLevel(double theta, double t, int j0, double wMax, double g0) {
        double ratio = t / theta;
        double y0 = j0 * (j0 + 1.0) / ratio;
        // Solve y0 + ln(wMax ratio / (target g0)) - a + ln(a^2 + 2a + 2) <= 0 by fixed-point steps
        // (the log term changes slowly, so three steps overshoot the root slightly, which is safe).
        double base = y0 + Math.log(wMax * ratio / (TAIL_TARGET * g0));
        double a = Math.max(MIN_TAIL_EXPONENT, base);
        for (int i = 0; i < 4; i++) {
            a = Math.max(MIN_TAIL_EXPONENT, base + Math.log(a * a + 2 * a + 2) + 1);
        }
        double levels = Math.ceil((-1 + Math.sqrt(1 + 4 * a * ratio)) / 2);
        if (!(levels <= MAX_LEVEL)) {
            throw new DomainException("ROTOR_SUM_TOO_LONG", "/rotation",
                    "T / theta = " + ratio + " needs more than " + MAX_LEVEL
                            + " rotational levels; use the high-temperature form");
        }
        return Math.max(j0 + 1, (int) levels);
    }

    /** tau_0, tau_1, tau_2 (in units of k_B T for the moments) for the levels above {@code last}. */
    private static double[] tails(double theta, double t, int j0, int last, double wMax) {
        double a = theta * last * (last + 1.0) / t;
        double y0 = theta * j0 * (j0 + 1.0) / t;
        double common = wMax * (t / theta) * Math.exp(y0 - a);
        // Rounding of these few operations is covered by the factor 2 (they bound quantities ~1e-18).
        return new double[] {2 * common, 2 * common * (a + 1), 2 * common * (a * a + 2 * a + 2)};
    }

    private static LevelSet levels(double theta, double even, double odd, int j0, int last) {
        int step = even > 0 && odd > 0 ? 1 : 2;
        int count = (last - j0) / step + 1;
        double[] e = new double[count];
        double[] g = new double[count];
        for (int i = 0; i < count; i++) {
            int level = j0 + i * step;
            e[i] = theta * level * (level + 1.0);
            g[i] = (2.0 * level + 1) * (level % 2 == 0 ? even : odd);
        }
        // theta J (J + 1): the product J (J + 1) is exact below 2^53, one rounding for the product with theta.
        return LevelSet.ofDegeneracies(e, g).withEnergyRelativeError(PreparedLevels.UNIT_ROUNDOFF);
    }

    private static void copy(Series from, Series to, int j, double extraBound) {
        to.values()[j] = from.values()[0];
        to.errorBounds()[j] = from.errorBounds()[0] + extraBound;
    }
}
