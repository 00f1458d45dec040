package org.statesum.testing;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Canonical-ensemble quantities of a level set evaluated in 50-digit decimal arithmetic from the exact
 * values of the double inputs (energies E_i / k_B in kelvin, ln g_i exact or g_i whose logarithm is
 * taken here), independently of the engine: the reference against which its error bounds are tested.
 *
 * <p>All sums are taken about the level m with the largest exponent y_i = ln g_i - E_i / T, so that
 * no cancellation of large terms occurs: with z_i = (L_i - L_m) - (E_i - E_m) / T (differences of
 * exact inputs first), w_i = exp(z_i), s = sum w_i, p_i = w_i / s, mu = sum p_i (E_i - E_m) / T:
 * ln Z = L_m - E_m / T + ln s (ln s = log1p(s - 1), exact for tiny s - 1), S / k = L_m + ln s + mu, U = E_m + T mu,
 * C_V / k = sum p_i ((E_i - E_m) / T - mu)^2, F = -T ln Z, ln Z' = ln Z + E_0 / T.
 */
public final class ExactCanonical {

    private static final MathContext MC = ExactMath.MC;

    private final BigDecimal[] energies;
    private final BigDecimal[] logG;

    private ExactCanonical(BigDecimal[] energies, BigDecimal[] logG) {
        this.energies = energies;
        this.logG = logG;
    }

    /** Levels with ln g_i given (taken as exact). */
    public static ExactCanonical ofLogDegeneracies(double[] energiesKelvin, double[] logDegeneracies) {
        BigDecimal[] e = new BigDecimal[energiesKelvin.length];
        BigDecimal[] l = new BigDecimal[energiesKelvin.length];
        for (int i = 0; i < e.length; i++) {
            e[i] = new BigDecimal(energiesKelvin[i]);
            l[i] = new BigDecimal(logDegeneracies[i]);
        }
        return new ExactCanonical(e, l);
    }

    /** Levels with degeneracies g_i > 0 (ln g_i taken here in extended precision). */
    public static ExactCanonical ofDegeneracies(double[] energiesKelvin, double[] degeneracies) {
        BigDecimal[] e = new BigDecimal[energiesKelvin.length];
        BigDecimal[] l = new BigDecimal[energiesKelvin.length];
        for (int i = 0; i < e.length; i++) {
            e[i] = new BigDecimal(energiesKelvin[i]);
            l[i] = ExactMath.log(degeneracies[i]);
        }
        return new ExactCanonical(e, l);
    }

    /** Levels with energies already exact in extended precision (e.g. from an exact unit conversion). */
    public static ExactCanonical of(BigDecimal[] energiesKelvin, BigDecimal[] logDegeneracies) {
        return new ExactCanonical(energiesKelvin.clone(), logDegeneracies.clone());
    }

    /** The quantities at one temperature T > 0 (K). */
    public Point at(double temperatureKelvin) {
        BigDecimal t = new BigDecimal(temperatureKelvin);
        int n = energies.length;
        // Anchor: the largest exponent, found in double and refined in decimal (any near-maximal
        // anchor is correct; the maximum keeps every w_i <= 1 + tiny).
        int m = 0;
        BigDecimal best = null;
        for (int i = 0; i < n; i++) {
            BigDecimal y = logG[i].subtract(energies[i].divide(t, MC), MC);
            if (best == null || y.compareTo(best) > 0) {
                best = y;
                m = i;
            }
        }
        BigDecimal[] w = new BigDecimal[n];
        BigDecimal[] x = new BigDecimal[n];
        BigDecimal s = BigDecimal.ZERO;
        BigDecimal rest = BigDecimal.ZERO;
        BigDecimal sx = BigDecimal.ZERO;
        int lowest = 0;
        for (int i = 0; i < n; i++) {
            x[i] = energies[i].subtract(energies[m]).divide(t, MC);
            w[i] = ExactMath.exp(logG[i].subtract(logG[m]).subtract(x[i], MC));
            s = s.add(w[i], MC);
            rest = i == m ? rest : rest.add(w[i], MC);
            sx = sx.add(w[i].multiply(x[i], MC), MC);
            if (energies[i].compareTo(energies[lowest]) < 0) {
                lowest = i;
            }
        }
        BigDecimal mu = sx.divide(s, MC);
        BigDecimal var = BigDecimal.ZERO;
        BigDecimal[] p = new BigDecimal[n];
        for (int i = 0; i < n; i++) {
            BigDecimal d = x[i].subtract(mu, MC);
            p[i] = w[i].divide(s, MC);
            var = var.add(p[i].multiply(d, MC).multiply(d, MC), MC);
        }
        // s = 1 + rest, since w_m = exp(0) = 1: ln s = log1p(rest) keeps ln(1 + 1e-70) exact.
        BigDecimal lnS = ExactMath.log1p(rest);
        BigDecimal lnZ = logG[m].subtract(energies[m].divide(t, MC), MC).add(lnS, MC);
        BigDecimal entropy = logG[m].add(lnS, MC).add(mu, MC);
        BigDecimal internal = energies[m].add(t.multiply(mu, MC), MC);
        BigDecimal helmholtz = t.negate().multiply(lnZ, MC);
        BigDecimal lnZRel = logG[m].add(lnS, MC).subtract(energies[m].subtract(energies[lowest]).divide(t, MC), MC);
        return new Point(lnZ, helmholtz, internal, entropy, var, lnZRel, p);
    }

    /**
     * Exact values at one temperature (K, k_B units).
     *
     * @param lnZ ln Z
     * @param helmholtzKelvin F / k_B
     * @param internalKelvin U / k_B
     * @param entropy S / k_B
     * @param heatCapacity C_V / k_B
     * @param logRelative ln Z' = ln Z + E_0 / T
     * @param populations p_i
     */
    public record Point(BigDecimal lnZ, BigDecimal helmholtzKelvin, BigDecimal internalKelvin,
            BigDecimal entropy, BigDecimal heatCapacity, BigDecimal logRelative, BigDecimal[] populations) {
    }
}
