package org.statesum.models.reaction;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;
import org.statesum.units.PhysicalConstants;

/**
 * A family of members (conformers, polymorphs) taken as one species in equilibrium among themselves:
 * with y_i = ln d_i - G_i / (k T) (d_i equivalent copies of member i) and L = ln sum_i e^{y_i},
 * <pre>
 *   G = -k T L,  p_i = e^{y_i - L},  H = sum p_i H_i,  S = (H - G) / T = sum p_i S_i + S_mix,
 *   S_mix = -k sum p_i ln(p_i / d_i),  C_p = sum p_i C_p,i + sum p_i (H_i - H)^2 / (k T^2)
 * </pre>
 * (the Boltzmann-weighted ensemble; the fluctuation term is taken about the mean, so it never comes
 * from a difference of large moments; e.g. D. A. McQuarrie, Statistical Mechanics, 2000, ch. 7). The
 * log-sum-exp is taken about the largest y_i.
 *
 * <p>Error bounds, first order and doubled: G carries sum p_i b(G_i) and its rounding; p_i carries
 * p_i (b(G_i) + b(G)) / (k T); H carries sum p_i b(H_i) + sum |H_i - H| b(p_i); S carries (b(H) + b(G)) / T;
 * C_p the members' bounds, weighted, and the fluctuation term's first-order change. At T = 0 the lowest
 * G_i take everything (with ties shared by d_i), and C_p's fluctuation term vanishes.
 *
 * @param names the members' names
 * @param degeneracies d_i, positive integers
 * @param members the members' thermodynamics, all in the same standard state
 */
public record EnsembleThermo(List<String> names, double[] degeneracies, List<SpeciesThermo> members)
        implements SpeciesThermo {

    private static final double K = PhysicalConstants.BOLTZMANN_J_PER_K;
    private static final double U = 0x1.0p-53;
    /** A member that never reaches this population on the grid is named in a warning. */
    public static final double NEGLIGIBLE_POPULATION = 0.01;

    @Override
    public ThermoResult at(double[] temperaturesKelvin) {
        int m = members.size();
        int n = temperaturesKelvin.length;
        ThermoResult[] results = new ThermoResult[m];
        for (int i = 0; i < m; i++) {
            results[i] = members.get(i).at(temperaturesKelvin);
        }
        double[][] cols = new double[10][n];
        double[][] pop = new double[n][m];
        double[][] popBound = new double[n][m];
        for (int j = 0; j < n; j++) {
            combine(results, j, temperaturesKelvin[j], cols, pop[j], popBound[j]);
        }
        Map<Quantity, Series> series = new LinkedHashMap<>();
        series.put(Quantity.GIBBS_ENERGY, new Series(cols[0], cols[1]));
        series.put(Quantity.ENTHALPY, new Series(cols[2], cols[3]));
        series.put(Quantity.ENTROPY, new Series(cols[4], cols[5]));
        series.put(Quantity.ISOBARIC_HEAT_CAPACITY, new Series(cols[6], cols[7]));
        series.put(Quantity.MIXING_ENTROPY, new Series(cols[8], cols[9]));
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "log-sum-exp of ln d_i - G_i / kT about the largest term; enthalpy spread "
                + "about the mean");
        precision.put("errorAnalysis", "members' bounds carried to first order, doubled");
        precision.put("members", m);
        return new ThermoResult(temperaturesKelvin.clone(), series, precision,
                warnings(results, temperaturesKelvin, pop), new ThermoResult.Populations(pop, popBound));
    }

    private void combine(ThermoResult[] results, int j, double t, double[][] cols, double[] p, double[] pb) {
        int m = results.length;
        double[] g = new double[m];
        double[] gb = new double[m];
        double[] h = new double[m];
        double[] hb = new double[m];
        double[] s = new double[m];
        double[] sb = new double[m];
        double[] cp = new double[m];
        double[] cpb = new double[m];
        for (int i = 0; i < m; i++) {
            Map<Quantity, Series> r = results[i].series();
            g[i] = r.get(Quantity.GIBBS_ENERGY).values()[j];
            gb[i] = r.get(Quantity.GIBBS_ENERGY).errorBounds()[j];
            h[i] = r.get(Quantity.ENTHALPY).values()[j];
            hb[i] = r.get(Quantity.ENTHALPY).errorBounds()[j];
            s[i] = r.get(Quantity.ENTROPY).values()[j];
            sb[i] = r.get(Quantity.ENTROPY).errorBounds()[j];
            cp[i] = r.get(Quantity.ISOBARIC_HEAT_CAPACITY).values()[j];
            cpb[i] = r.get(Quantity.ISOBARIC_HEAT_CAPACITY).errorBounds()[j];
        }
        double gMix;
        double gBound = 0;
        if (t == 0) {
            // the lowest G_i take everything, shared by their copies
            double low = Double.POSITIVE_INFINITY;
            for (double x : g) {
                low = Math.min(low, x);
            }
            double copies = 0;
            for (int i = 0; i < m; i++) {
                copies += g[i] == low ? degeneracies[i] : 0;
            }
            for (int i = 0; i < m; i++) {
                p[i] = g[i] == low ? degeneracies[i] / copies : 0;
                gBound = Math.max(gBound, g[i] == low ? gb[i] : 0);
            }
            gMix = low;
        } else {
            double kt = K * t;
            double[] y = new double[m];
            double top = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < m; i++) {
                y[i] = Math.log(degeneracies[i]) - g[i] / kt;
                top = Math.max(top, y[i]);
            }
            double sum = 0;
            for (int i = 0; i < m; i++) {
                sum += Math.exp(y[i] - top);
            }
            double l = top + Math.log(sum);
            gMix = -kt * l;
            double yErr = 0;
            for (int i = 0; i < m; i++) {
                p[i] = Math.exp(y[i] - l);
                gBound += p[i] * gb[i];
                yErr = Math.max(yErr, 4 * U * (Math.abs(y[i]) + 1));
            }
            gBound += kt * (yErr + (m + 3) * U) + 2 * U * Math.abs(gMix);
        }
        double hMix = 0;
        double hBound = 0;
        double sMember = 0;
        double cpMix = 0;
        double cpBound = 0;
        for (int i = 0; i < m; i++) {
            hMix += p[i] * h[i];
            sMember += p[i] * s[i];
        }
        double spread = 0;
        for (int i = 0; i < m; i++) {
            pb[i] = t == 0 ? 0 : p[i] * (gb[i] + gBound) / (K * t) + 4 * U * p[i];
            double d = h[i] - hMix;
            hBound += p[i] * hb[i] + Math.abs(d) * pb[i];
            spread += p[i] * d * d;
            cpMix += p[i] * cp[i];
            cpBound += p[i] * cpb[i] + Math.abs(cp[i]) * pb[i];
        }
        hBound += 2 * U * Math.abs(hMix) * m;
        double fluctuation = t == 0 ? 0 : spread / (K * t * t);
        double entropy = t == 0 ? sMember + mixingEntropyAtZero(p) : (hMix - gMix) / t;
        double entropyBound = t == 0 ? 0 : (hBound + gBound) / t + 2 * U * Math.abs(entropy);
        if (t == 0) {
            for (int i = 0; i < m; i++) {
                entropyBound += p[i] * sb[i];
            }
        }
        double fluctuationBound = 0;
        if (t > 0) {
            for (int i = 0; i < m; i++) {
                double d = h[i] - hMix;
                fluctuationBound += (pb[i] * d * d + 2 * p[i] * Math.abs(d) * (hb[i] + hBound)) / (K * t * t);
            }
            fluctuationBound += 4 * U * fluctuation;
        }
        double mixing = entropy - sMember;
        double mixingBound = entropyBound;
        for (int i = 0; i < m; i++) {
            mixingBound += p[i] * sb[i] + Math.abs(s[i]) * pb[i];
        }
        cols[0][j] = gMix;
        cols[1][j] = 2 * gBound;
        cols[2][j] = hMix;
        cols[3][j] = 2 * hBound;
        cols[4][j] = entropy;
        cols[5][j] = 2 * entropyBound;
        cols[6][j] = cpMix + fluctuation;
        cols[7][j] = 2 * (cpBound + fluctuationBound + 2 * U * Math.abs(cpMix + fluctuation));
        cols[8][j] = mixing;
        cols[9][j] = 2 * mixingBound;
    }

    /** -k sum p_i ln(p_i / d_i) among the members that share the lowest G at T = 0. */
    private double mixingEntropyAtZero(double[] p) {
        double sum = 0;
        for (int i = 0; i < p.length; i++) {
            if (p[i] > 0) {
                sum -= p[i] * Math.log(p[i] / degeneracies[i]);
            }
        }
        return K * sum;
    }

    private List<Warning> warnings(ThermoResult[] results, double[] t, double[][] pop) {
        List<Warning> out = new ArrayList<>();
        for (int i = 0; i < results.length; i++) {
            for (Warning w : results[i].warnings()) {
                out.add(new Warning(w.code(), "member '" + names.get(i) + "': " + w.message(), w.temperatures()));
            }
        }
        List<String> minor = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            double most = 0;
            for (double[] row : pop) {
                most = Math.max(most, row[i]);
            }
            if (most < NEGLIGIBLE_POPULATION) {
                minor.add(names.get(i));
            }
        }
        if (!minor.isEmpty()) {
            out.add(new Warning("MEMBER_NEGLIGIBLE", "members " + minor + " never reach " + NEGLIGIBLE_POPULATION
                    + " of the population on this grid", new double[0]));
        }
        for (int a = 0; a < names.size(); a++) {
            for (int b = a + 1; b < names.size(); b++) {
                if (alike(results[a], results[b])) {
                    out.add(new Warning("MEMBERS_LOOK_ALIKE", "members '" + names.get(a) + "' and '" + names.get(b)
                            + "' have equal G within their bounds at every temperature: the same structure posted "
                            + "twice? (equivalent copies belong in one member's degeneracy)", new double[0]));
                }
            }
        }
        return out;
    }

    private static boolean alike(ThermoResult a, ThermoResult b) {
        Series ga = a.series().get(Quantity.GIBBS_ENERGY);
        Series gb = b.series().get(Quantity.GIBBS_ENERGY);
        for (int j = 0; j < ga.values().length; j++) {
            if (!(Math.abs(ga.values()[j] - gb.values()[j]) <= ga.errorBounds()[j] + gb.errorBounds()[j])) {
                return false;
            }
        }
        return true;
    }

    @Override
    public String standardState() {
        return members.get(0).standardState();
    }
}
