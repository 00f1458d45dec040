package org.statesum.engine;

/**
 * The exact canonical partition function Z_N of N non-interacting bosons or fermions on a level set
 * (level i: energy E_i / k_B in K, g_i single-particle states), and its thermodynamics. Z_N is the
 * coefficient of t^N in the generating function
 * <pre>
 *   fermions: prod_i (1 + x_i t)^{g_i},   bosons: prod_i (1 - x_i t)^{-g_i},   x_i = e^{-(E_i - E_0) / T},
 * </pre>
 * times e^{-N E_0 / T} (E_0 the lowest level; e.g. R. K. Pathria and P. D. Beale, Statistical
 * Mechanics, 3rd ed., 2011, sec. 8.1). The product is expanded level by level, one single-particle
 * state at a time: multiplying by (1 + x t) is c'_n = c_n + x c_{n-1} (downwards in n), by
 * 1 / (1 - x t) it is c'_n = c_n + x c'_{n-1} (upwards); a level with more states than N takes its
 * whole factor at once, with the binomial coefficients C(g, k) or C(g + k - 1, k). Every term is
 * positive (no alternating sums, unlike the recursion in Z_1(k beta)), and each c_n is kept as its
 * logarithm, so nothing overflows or underflows at any N.
 *
 * <p>Alongside each c_n, the mean and variance of the energy of its configurations are carried (merged
 * as weighted mixtures about their means, so the heat capacity never comes from a difference of large
 * moments): U_N = N E_0 + mean_N, C_V = var_N / T^2, S = ln Z_N + U_N / T, and the chemical potential
 * mu = F_N - F_{N-1} = E_0 - T (ln c_N - ln c_{N-1}) (common practice for a canonical system).
 *
 * <p>Error bounds: a first-order running bound per coefficient (the rounding of each logarithmic
 * addition, of ln x_i, and of the energies' own relative error), carried through every merge into the
 * mean and variance, doubled for second-order terms.
 *
 * <p>At T = 0: the ground configuration (bosons all in the lowest level; fermions filling the levels
 * from the bottom), S = ln of the number of ways, C_V = 0, F = U = its energy.
 */
public final class QuantumCanonical {

    private static final double U = 0x1.0p-53;

    /** Which quantum statistics. */
    public enum Kind { BOSONS, FERMIONS }

    /**
     * One temperature's answer (energies / k_B in K, entropy and heat capacity in k_B), each with its
     * absolute bound; {@code logZ} is NaN at T = 0 unless the ground configuration has zero energy.
     */
    public record Point(double logZ, double logZBound, double helmholtz, double helmholtzBound, double energy,
            double energyBound, double entropy, double entropyBound, double heatCapacity, double heatCapacityBound,
            double chemicalPotential, double chemicalPotentialBound) {
    }

    private final double[] energies;
    private final double[] degeneracies;
    private final int particles;
    private final Kind kind;
    private final double energyRelativeError;
    private final double lowest;

    private QuantumCanonical(double[] energies, double[] degeneracies, int particles, Kind kind,
            double energyRelativeError) {
        this.energies = energies;
        this.degeneracies = degeneracies;
        this.particles = particles;
        this.kind = kind;
        this.energyRelativeError = energyRelativeError;
        double e0 = Double.POSITIVE_INFINITY;
        for (double e : energies) {
            e0 = Math.min(e0, e);
        }
        this.lowest = e0;
    }

    /**
     * @param energiesKelvin E_i / k_B, K
     * @param degeneracies g_i, positive integers (as doubles, at most 2^53)
     * @param particles N &gt;= 1; for fermions at most sum g_i
     * @throws DomainException for a degeneracy that is not a positive integer, or fermions that do not fit
     */
    public static QuantumCanonical of(double[] energiesKelvin, double[] degeneracies, int particles, Kind kind,
            double energyRelativeError) {
        double states = 0;
        for (int i = 0; i < degeneracies.length; i++) {
            double g = degeneracies[i];
            if (!(g >= 1 && g <= 0x1.0p53 && Math.rint(g) == g)) {
                throw new DomainException("DEGENERACY_NOT_INTEGRAL", "/levels/degeneracies/" + i,
                        "exact quantum statistics counts single-particle states: a degeneracy must be a positive integer");
            }
            states += g;
        }
        if (kind == Kind.FERMIONS && particles > states) {
            throw new DomainException("TOO_MANY_FERMIONS", "/particles/count", particles + " fermions do not fit into "
                    + (long) states + " single-particle states (the sum of the degeneracies)");
        }
        return new QuantumCanonical(energiesKelvin.clone(), degeneracies.clone(), particles, kind, energyRelativeError);
    }

    /** Work of one temperature: (level, particle-count) updates, for compute budgets. */
    public static double cost(double[] degeneracies, double particles) {
        double cost = 0;
        for (double g : degeneracies) {
            cost += Math.min(g, particles) * (particles + 1);
        }
        return cost;
    }

    /** The answer at one temperature (K, 0 or positive). */
    public Point at(double t) {
        return t == 0 ? groundState() : finite(t);
    }

    private Point finite(double t) {
        int n = particles;
        double[] c = new double[n + 1];   // ln c_k
        double[] m = new double[n + 1];   // mean energy above N E_0... of the configurations in c_k, K
        double[] v = new double[n + 1];   // their variance, K^2
        double[] ec = new double[n + 1];  // bounds on ln c_k (relative bound on c_k)
        double[] em = new double[n + 1];
        double[] ev = new double[n + 1];
        java.util.Arrays.fill(c, Double.NEGATIVE_INFINITY);
        c[0] = 0;
        long statesSoFar = 0;
        Runnable stop = Cancellation.current();
        for (int i = 0; i < energies.length; i++) {
            stop.run();
            double delta = energies[i] - lowest; // >= 0
            double deltaBound = (Math.abs(energies[i]) + Math.abs(lowest)) * (energyRelativeError + U);
            double lx = -delta / t;
            double lxBound = (deltaBound / t) + 2 * U * Math.abs(lx);
            double g = degeneracies[i];
            if (g <= n) {
                for (int s = 0; s < (int) g; s++) {
                    statesSoFar++;
                    if (kind == Kind.FERMIONS) {
                        int top = (int) Math.min(n, statesSoFar);
                        for (int k = top; k >= 1; k--) {
                            merge(c, m, v, ec, em, ev, k, c[k - 1] + lx, m[k - 1] + delta, v[k - 1],
                                    ec[k - 1] + lxBound, em[k - 1] + deltaBound, ev[k - 1]);
                        }
                    } else {
                        for (int k = 1; k <= n; k++) {
                            merge(c, m, v, ec, em, ev, k, c[k - 1] + lx, m[k - 1] + delta, v[k - 1],
                                    ec[k - 1] + lxBound, em[k - 1] + deltaBound, ev[k - 1]);
                        }
                    }
                }
            } else {
                // the whole factor at once: sum_k a_k x^k t^k with a_k = C(g, k) or C(g + k - 1, k), k <= n
                // ln a_j by a_j = a_{j-1} (g - j + 1) / j or a_{j-1} (g + j - 1) / j, with its running bound
                double[] la = new double[n + 1];
                double[] laBound = new double[n + 1];
                for (int j = 1; j <= n; j++) {
                    double ratio = kind == Kind.FERMIONS ? (g - j + 1) / j : (g + j - 1) / j;
                    double step = Math.log(ratio);
                    la[j] = la[j - 1] + step;
                    laBound[j] = laBound[j - 1] + U * (3 * Math.abs(step) + 3 + Math.abs(la[j]));
                }
                double[] c0 = c.clone();
                double[] m0 = m.clone();
                double[] v0 = v.clone();
                double[] ec0 = ec.clone();
                double[] em0 = em.clone();
                double[] ev0 = ev.clone();
                for (int k = n; k >= 1; k--) {
                    for (int j = 1; j <= k; j++) {
                        double term = la[j] + j * lx;
                        merge(c, m, v, ec, em, ev, k, c0[k - j] + term, m0[k - j] + j * delta, v0[k - j],
                                ec0[k - j] + laBound[j] + j * lxBound + 2 * U * (Math.abs(term) + Math.abs(c0[k - j])),
                                em0[k - j] + j * deltaBound, ev0[k - j]);
                    }
                }
                statesSoFar += (long) g;
            }
        }
        return point(t, c, m, v, ec, em, ev);
    }

    /**
     * Merges the configurations (ln c = b, mean mb, variance vb, bounds) into entry k: the mixture of two
     * ensembles with weights c_k / (c_k + b) and b / (c_k + b).
     */
    private static void merge(double[] c, double[] m, double[] v, double[] ec, double[] em, double[] ev, int k,
            double b, double mb, double vb, double eb, double emb, double evb) {
        if (b == Double.NEGATIVE_INFINITY) {
            return;
        }
        double a = c[k];
        if (a == Double.NEGATIVE_INFINITY) {
            c[k] = b;
            m[k] = mb;
            v[k] = vb;
            ec[k] = eb + U * Math.abs(b);
            em[k] = emb;
            ev[k] = evb;
            return;
        }
        double hi = Math.max(a, b);
        double lo = Math.min(a, b);
        double r = Math.exp(lo - hi);                   // <= 1
        double sum = hi + Math.log1p(r);
        double wb = Math.exp(b - sum);
        double wa = Math.exp(a - sum);
        double d = m[k] - mb;
        double mean = wa * m[k] + wb * mb;
        double var = wa * v[k] + wb * vb + wa * wb * d * d;
        double ew = wa * wb * (ec[k] + eb) + 4 * U;     // bound on the error of each weight
        double errLog = Math.max(ec[k], eb) + U * Math.abs(sum) + 3 * U;
        double errMean = wa * em[k] + wb * emb + ew * Math.abs(d) + 3 * U * (wa * Math.abs(m[k]) + wb * Math.abs(mb));
        double errVar = wa * ev[k] + wb * evb + ew * (Math.abs(v[k] - vb) + d * d)
                + 2 * wa * wb * Math.abs(d) * (em[k] + emb) + 5 * U * (wa * v[k] + wb * vb + wa * wb * d * d);
        c[k] = sum;
        m[k] = mean;
        v[k] = var;
        ec[k] = errLog;
        em[k] = errMean;
        ev[k] = errVar;
    }

    private Point point(double t, double[] c, double[] m, double[] v, double[] ec, double[] em, double[] ev) {
        int n = particles;
        double shift = n * lowest / t;
        double shiftBound = Math.abs(shift) * (energyRelativeError + 3 * U);
        double logZ = c[n] - shift;
        double logZBound = ec[n] + shiftBound + U * Math.abs(logZ);
        double base = n * lowest;
        double energy = base + m[n];
        double energyBound = em[n] + Math.abs(base) * (energyRelativeError + 2 * U) + U * Math.abs(energy);
        double helmholtz = -t * logZ;
        double helmholtzBound = t * logZBound + U * Math.abs(helmholtz);
        double entropy = c[n] + m[n] / t;
        double entropyBound = ec[n] + em[n] / t + 2 * U * (Math.abs(c[n]) + Math.abs(m[n] / t));
        double cv = v[n] / (t * t);
        double cvBound = ev[n] / (t * t) + 3 * U * cv;
        // mu = F_N - F_{N-1} = E_0 - T (ln c_N - ln c_{N-1}), ln c_0 = 0
        double step = c[n] - c[n - 1];
        double mu = lowest - t * step;
        double muBound = t * (ec[n] + ec[n - 1] + U * Math.abs(step)) + Math.abs(lowest) * (energyRelativeError + U)
                + U * Math.abs(mu);
        return new Point(logZ, 2 * logZBound, helmholtz, 2 * helmholtzBound, energy, 2 * energyBound, entropy,
                2 * entropyBound, cv, 2 * cvBound, mu, 2 * muBound);
    }

    /**
     * The fraction of the N particles in each level, n_i / N, at T &gt; 0, and its bounds: {fractions,
     * bounds}. Bosons: n_i = g_i sum_{k=1..N} x_i^k Z_{N-k} / Z_N, every term positive. Fermions: each
     * state of level i is occupied with probability x_i Z'_{N-1} / Z_N, Z' the generating function without
     * that one state, formed as (levels below i) x (1 + x_i t)^{g_i - 1} x (levels above i) from stored
     * prefix products and a running suffix product, so again only positive terms (the textbook sum over
     * k alternates for fermions). Work as {@link #cost} (twice for fermions); memory (levels + 1) x (N + 1)
     * numbers for fermions.
     */
    public double[][] populations(double t) {
        if (t == 0) {
            return groundPopulations();
        }
        int n = particles;
        int levels = energies.length;
        double[] lx = new double[levels];
        double[] lxBound = new double[levels];
        for (int i = 0; i < levels; i++) {
            double delta = energies[i] - lowest;
            lx[i] = -delta / t;
            lxBound[i] = (Math.abs(energies[i]) + Math.abs(lowest)) * (energyRelativeError + U) / t + 2 * U * Math.abs(lx[i]);
        }
        double[] fraction = new double[levels];
        double[] bound = new double[levels];
        Runnable stop = Cancellation.current();
        if (kind == Kind.BOSONS) {
            double[][] full = {start(n), new double[n + 1]};
            for (int i = 0; i < levels; i++) {
                stop.run();
                times(full, lx[i], lxBound[i], degeneracies[i]);
            }
            double[] c = full[0];
            double[] e = full[1];
            for (int i = 0; i < levels; i++) {
                double sum = 0;
                double err = 0;
                for (int k = 1; k <= n; k++) {
                    double exponent = k * lx[i] + c[n - k] - c[n];
                    double term = Math.exp(exponent);
                    sum += term;
                    err += term * (e[n - k] + e[n] + k * lxBound[i] + 3 * U * (Math.abs(exponent) + 1));
                }
                fraction[i] = degeneracies[i] * sum / n;
                bound[i] = 2 * (degeneracies[i] * (err + n * U * sum) / n + 2 * U * fraction[i]);
            }
            return new double[][] {fraction, bound};
        }
        double[][][] prefix = new double[levels + 1][][];
        prefix[0] = new double[][] {start(n), new double[n + 1]};
        for (int i = 0; i < levels; i++) {
            stop.run();
            prefix[i + 1] = new double[][] {prefix[i][0].clone(), prefix[i][1].clone()};
            times(prefix[i + 1], lx[i], lxBound[i], degeneracies[i]);
        }
        double cn = prefix[levels][0][n];
        double en = prefix[levels][1][n];
        double[][] suffix = {start(n), new double[n + 1]};
        for (int i = levels - 1; i >= 0; i--) {
            stop.run();
            double[][] without = {prefix[i][0].clone(), prefix[i][1].clone()};
            times(without, lx[i], lxBound[i], degeneracies[i] - 1);
            // [t^{N-1}] of without x suffix, in logarithms
            double log = Double.NEGATIVE_INFINITY;
            double err = 0;
            for (int k = 0; k <= n - 1; k++) {
                double term = without[0][k] + suffix[0][n - 1 - k];
                if (term == Double.NEGATIVE_INFINITY) {
                    continue;
                }
                double hi = Math.max(log, term);
                double lo = Math.min(log, term);
                log = lo == Double.NEGATIVE_INFINITY ? hi : hi + Math.log1p(Math.exp(lo - hi));
                err = Math.max(err, without[1][k] + suffix[1][n - 1 - k]) + U * Math.abs(log) + 3 * U;
            }
            double exponent = lx[i] + log - cn;
            double p = log == Double.NEGATIVE_INFINITY ? 0 : Math.exp(exponent);
            fraction[i] = degeneracies[i] * p / n;
            double rel = err + en + lxBound[i] + 3 * U * (Math.abs(exponent) + 1);
            bound[i] = 2 * (fraction[i] * rel + 2 * U * fraction[i]);
            times(suffix, lx[i], lxBound[i], degeneracies[i]);
        }
        return new double[][] {fraction, bound};
    }

    /**
     * T = 0: bosons share the lowest energy's levels, fermions fill the levels from the bottom, the last
     * energy reached shared among its levels by their states; exact fractions (one rounding each).
     */
    private double[][] groundPopulations() {
        int levels = energies.length;
        double[] fraction = new double[levels];
        double left = particles;
        double e = lowest;
        while (left > 0) {
            double states = 0;
            double next = Double.POSITIVE_INFINITY;
            for (int i = 0; i < levels; i++) {
                if (energies[i] == e) {
                    states += degeneracies[i];
                } else if (energies[i] > e) {
                    next = Math.min(next, energies[i]);
                }
            }
            double put = kind == Kind.BOSONS ? left : Math.min(states, left);
            for (int i = 0; i < levels; i++) {
                if (energies[i] == e) {
                    fraction[i] = put * degeneracies[i] / states / particles;
                }
            }
            left -= put;
            e = next;
        }
        double[] bound = new double[levels];
        for (int i = 0; i < levels; i++) {
            bound[i] = 4 * U * fraction[i];
        }
        return new double[][] {fraction, bound};
    }

    /** The log coefficients of the constant 1 (and their zero bounds) for degrees 0..n. */
    private static double[] start(int n) {
        double[] c = new double[n + 1];
        java.util.Arrays.fill(c, Double.NEGATIVE_INFINITY);
        c[0] = 0;
        return c;
    }

    /**
     * Multiplies the log-coefficient array {@code poly[0]} (bounds in {@code poly[1]}) by the factor of
     * {@code states} single-particle states with ln x = {@code lx}: (1 + x t)^states or (1 - x t)^-states.
     */
    private void times(double[][] poly, double lx, double lxBound, double states) {
        double[] c = poly[0];
        double[] e = poly[1];
        int n = c.length - 1;
        if (states <= n) {
            for (int s = 0; s < (int) states; s++) {
                if (kind == Kind.FERMIONS) {
                    for (int k = n; k >= 1; k--) {
                        add(c, e, k, c[k - 1] + lx, e[k - 1] + lxBound);
                    }
                } else {
                    for (int k = 1; k <= n; k++) {
                        add(c, e, k, c[k - 1] + lx, e[k - 1] + lxBound);
                    }
                }
            }
            return;
        }
        double[] c0 = c.clone();
        double[] e0 = e.clone();
        double la = 0;
        double laBound = 0;
        double[] a = new double[n + 1];
        double[] ab = new double[n + 1];
        for (int j = 1; j <= n; j++) {
            double step = Math.log(kind == Kind.FERMIONS ? (states - j + 1) / j : (states + j - 1) / j);
            la += step;
            laBound += U * (3 * Math.abs(step) + 3 + Math.abs(la));
            a[j] = la;
            ab[j] = laBound;
        }
        for (int k = n; k >= 1; k--) {
            for (int j = 1; j <= k; j++) {
                double term = a[j] + j * lx;
                add(c, e, k, c0[k - j] + term, e0[k - j] + ab[j] + j * lxBound + 2 * U * Math.abs(term));
            }
        }
    }

    /** c_k += e^b in logarithms, with the running bound. */
    private static void add(double[] c, double[] e, int k, double b, double eb) {
        if (b == Double.NEGATIVE_INFINITY) {
            return;
        }
        double a = c[k];
        if (a == Double.NEGATIVE_INFINITY) {
            c[k] = b;
            e[k] = eb + U * Math.abs(b);
            return;
        }
        double hi = Math.max(a, b);
        double sum = hi + Math.log1p(Math.exp(Math.min(a, b) - hi));
        e[k] = Math.max(e[k], eb) + U * Math.abs(sum) + 3 * U;
        c[k] = sum;
    }

    /** T = 0: the ground configuration and its number of ways. */
    private Point groundState() {
        Integer[] order = new Integer[energies.length];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (p, q) -> Double.compare(energies[p], energies[q]));
        double energy;
        double lnWays;
        double mu;
        if (kind == Kind.BOSONS) {
            // every boson in the lowest level (levels at the same energy pool their states)
            double g = 0;
            for (int i : order) {
                if (energies[i] == lowest) {
                    g += degeneracies[i];
                }
            }
            energy = particles * lowest;
            lnWays = logBinomial(g + particles - 1, particles);
            mu = lowest;
        } else {
            long left = particles;
            energy = 0;
            lnWays = 0;
            mu = lowest;
            int j = 0;
            while (left > 0) {
                double e = energies[order[j]];
                double g = 0;
                while (j < order.length && energies[order[j]] == e) {
                    g += degeneracies[order[j]];
                    j++;
                }
                long put = (long) Math.min(g, left);
                energy += put * e;
                lnWays += logBinomial(g, put);
                left -= put;
                mu = e; // the energy of the last particle added
            }
        }
        double energyBound = 2 * (Math.abs(energy) * (energyRelativeError + particles * U));
        double logZ = energy == 0 ? lnWays : Double.NaN;
        double waysBound = 2 * 16 * U * (Math.abs(lnWays) + 1);
        return new Point(logZ, energy == 0 ? waysBound : Double.NaN, energy, energyBound, energy, energyBound, lnWays,
                waysBound, 0, 0, mu, 2 * Math.abs(mu) * (energyRelativeError + U));
    }

    /**
     * ln C(a, k) for integral a &gt;= k &gt;= 0: sum_{j=1..k'} ln((a - k' + j) / j) with k' = min(k, a - k), a sum
     * of positive terms (lnGamma differences would cancel for a &gt;&gt; k).
     */
    static double logBinomial(double a, double k) {
        double small = Math.min(k, a - k);
        double sum = 0;
        for (double j = 1; j <= small; j++) {
            sum += Math.log((a - small + j) / j);
        }
        return sum;
    }
}
