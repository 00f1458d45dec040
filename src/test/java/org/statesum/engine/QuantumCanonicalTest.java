package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.statesum.testing.ExactMath;

/**
 * Exact canonical Bose-Einstein and Fermi-Dirac statistics against brute-force enumeration of every
 * N-particle configuration (BigDecimal, 50 digits) on 40 random small systems, and against the
 * Boltzmann limit Z_1^N / N! at high temperature and low density.
 */
class QuantumCanonicalTest {

    private static final MathContext MC = new MathContext(50);

    /** {ln Z, U, S, C_V} by enumeration: configurations as occupation vectors of the single-particle states. */
    private static BigDecimal[] brute(double[] stateEnergies, int n, boolean fermions, double t) {
        List<Double> configurations = new ArrayList<>();
        enumerate(stateEnergies, 0, n, fermions, 0, configurations);
        BigDecimal bt = new BigDecimal(t);
        double emin = configurations.stream().mapToDouble(Double::doubleValue).min().orElseThrow();
        BigDecimal z = BigDecimal.ZERO;
        BigDecimal e1 = BigDecimal.ZERO;
        for (double e : configurations) {
            BigDecimal w = ExactMath.exp(new BigDecimal(emin).subtract(new BigDecimal(e)).divide(bt, MC));
            z = z.add(w, MC);
            e1 = e1.add(w.multiply(new BigDecimal(e), MC), MC);
        }
        BigDecimal mean = e1.divide(z, MC);
        BigDecimal var = BigDecimal.ZERO;
        for (double e : configurations) {
            BigDecimal w = ExactMath.exp(new BigDecimal(emin).subtract(new BigDecimal(e)).divide(bt, MC));
            BigDecimal d = new BigDecimal(e).subtract(mean, MC);
            var = var.add(w.multiply(d.multiply(d, MC), MC), MC);
        }
        var = var.divide(z, MC);
        BigDecimal lnZ = ExactMath.log(z).subtract(new BigDecimal(emin).divide(bt, MC), MC);
        BigDecimal s = lnZ.add(mean.divide(bt, MC), MC);
        return new BigDecimal[] {lnZ, mean, s, var.divide(bt.multiply(bt, MC), MC)};
    }

    private static void enumerate(double[] states, int from, int left, boolean fermions, double energy, List<Double> out) {
        if (left == 0) {
            out.add(energy);
            return;
        }
        for (int s = from; s < states.length; s++) {
            enumerate(states, fermions ? s + 1 : s, left - 1, fermions, energy + states[s], out);
        }
    }

    private static void assertWithin(BigDecimal exact, double value, double bound, String what) {
        // less 1e-40: the 50-digit reference's own rounding (a variance of exactly 0 comes out near 1e-96)
        double error = Math.max(0, Math.abs(new BigDecimal(value).subtract(exact, MC).doubleValue()) - 1e-40);
        assertTrue(error <= bound, what + ": " + value + " vs " + exact + ", error " + error + " > bound " + bound);
        assertTrue(bound <= 1e-11 * Math.max(1, Math.abs(exact.doubleValue())), what + ": bound " + bound + " loose");
    }

    @Test
    void fortyRandomSmallSystemsMatchEnumeration() {
        Random random = new Random(2026);
        for (int c = 0; c < 40; c++) {
            boolean fermions = c % 2 == 0;
            int levels = 1 + random.nextInt(4);
            double[] e = new double[levels];
            double[] g = new double[levels];
            List<Double> states = new ArrayList<>();
            for (int i = 0; i < levels; i++) {
                e[i] = Math.round(random.nextDouble() * 50) / 10.0 - 1; // some negative, some equal
                g[i] = 1 + random.nextInt(3);
                for (int k = 0; k < g[i]; k++) {
                    states.add(e[i]);
                }
            }
            int n = 1 + random.nextInt(fermions ? states.size() : 5);
            double[] stateEnergies = states.stream().mapToDouble(Double::doubleValue).toArray();
            QuantumCanonical q = QuantumCanonical.of(e, g, n,
                    fermions ? QuantumCanonical.Kind.FERMIONS : QuantumCanonical.Kind.BOSONS, 0);
            for (double t : new double[] {0.2, 1, 7, 300}) {
                QuantumCanonical.Point p = q.at(t);
                BigDecimal[] exact = brute(stateEnergies, n, fermions, t);
                String what = (fermions ? "fermions" : "bosons") + " case " + c + " N=" + n + " T=" + t;
                assertWithin(exact[0], p.logZ(), p.logZBound(), what + " ln Z");
                assertWithin(exact[1], p.energy(), p.energyBound(), what + " U");
                assertWithin(exact[2], p.entropy(), p.entropyBound(), what + " S");
                assertWithin(exact[3], p.heatCapacity(), p.heatCapacityBound() + 1e-300, what + " C_V");
                // mu = F_N - F_{N-1}
                double previous = n == 1 ? 0 : -t * brute(stateEnergies, n - 1, fermions, t)[0].doubleValue();
                double mu = -t * exact[0].doubleValue() - previous;
                assertEquals(mu, p.chemicalPotential(), p.chemicalPotentialBound() + 1e-12 * Math.abs(mu) + 1e-12,
                        what + " mu");
            }
        }
    }

    /** Mean number of particles in each level by enumeration (double sums of a few configurations). */
    private static double[] bruteOccupations(double[] e, double[] g, int n, boolean fermions, double t) {
        List<Integer> stateLevel = new ArrayList<>();
        for (int i = 0; i < e.length; i++) {
            for (int k = 0; k < g[i]; k++) {
                stateLevel.add(i);
            }
        }
        double[] occ = new double[e.length];
        double[] z = new double[1];
        double emin = Double.POSITIVE_INFINITY;
        for (double x : e) {
            emin = Math.min(emin, x);
        }
        walk(stateLevel, e, 0, n, fermions, new int[e.length], t, n * emin, occ, z);
        for (int i = 0; i < occ.length; i++) {
            occ[i] /= z[0] * n;
        }
        return occ;
    }

    private static void walk(List<Integer> states, double[] e, int from, int left, boolean fermions, int[] counts,
            double t, double shift, double[] occ, double[] z) {
        if (left == 0) {
            double energy = 0;
            for (int i = 0; i < counts.length; i++) {
                energy += counts[i] * e[i];
            }
            double w = Math.exp(-(energy - shift) / t);
            z[0] += w;
            for (int i = 0; i < counts.length; i++) {
                occ[i] += w * counts[i];
            }
            return;
        }
        for (int s = from; s < states.size(); s++) {
            counts[states.get(s)]++;
            walk(states, e, fermions ? s + 1 : s, left - 1, fermions, counts, t, shift, occ, z);
            counts[states.get(s)]--;
        }
    }

    @Test
    void levelPopulationsMatchEnumerationAndSumToOne() {
        Random random = new Random(99);
        for (int c = 0; c < 24; c++) {
            boolean fermions = c % 2 == 1;
            int levels = 2 + random.nextInt(3);
            double[] e = new double[levels];
            double[] g = new double[levels];
            int states = 0;
            for (int i = 0; i < levels; i++) {
                e[i] = Math.round(random.nextDouble() * 40) / 10.0;
                g[i] = 1 + random.nextInt(3);
                states += (int) g[i];
            }
            int n = 1 + random.nextInt(fermions ? states : 4);
            QuantumCanonical q = QuantumCanonical.of(e, g, n,
                    fermions ? QuantumCanonical.Kind.FERMIONS : QuantumCanonical.Kind.BOSONS, 0);
            for (double t : new double[] {0.3, 1, 10}) {
                double[][] p = q.populations(t);
                double[] exact = bruteOccupations(e, g, n, fermions, t);
                double total = 0;
                for (int i = 0; i < levels; i++) {
                    // the enumeration's own double sums: 1e-14 of each value on top of the bound
                    assertEquals(exact[i], p[0][i], p[1][i] + 1e-14 * exact[i] + 1e-300,
                            (fermions ? "fermions" : "bosons") + " case " + c + " level " + i + " T=" + t);
                    assertTrue(p[1][i] <= 1e-12 * Math.max(p[0][i], 1e-300) + 1e-300, "bound " + p[1][i]);
                    total += p[0][i];
                }
                assertEquals(1, total, 1e-12);
            }
        }
        // T = 0: 3 fermions on {0 (g 2), 1 (g 3)}: 2/3 at 0, 1/3 at 1
        double[][] f = QuantumCanonical.of(new double[] {0, 1}, new double[] {2, 3}, 3, QuantumCanonical.Kind.FERMIONS, 0)
                .populations(0);
        assertEquals(2.0 / 3, f[0][0], 1e-16);
        assertEquals(1.0 / 3, f[0][1], 1e-16);
    }

    @Test
    void aLevelWithMoreStatesThanParticlesTakesItsWholeFactorAndAgrees() {
        // 3 particles on levels with 2 and 5 states: the 5-state level goes through the binomial branch
        double[] e = {0, 1.3};
        double[] g = {2, 5};
        double[] states = {0, 0, 1.3, 1.3, 1.3, 1.3, 1.3};
        for (QuantumCanonical.Kind kind : QuantumCanonical.Kind.values()) {
            QuantumCanonical.Point p = QuantumCanonical.of(e, g, 3, kind, 0).at(0.9);
            BigDecimal[] exact = brute(states, 3, kind == QuantumCanonical.Kind.FERMIONS, 0.9);
            assertWithin(exact[0], p.logZ(), p.logZBound(), kind + " ln Z");
            assertWithin(exact[3], p.heatCapacity(), p.heatCapacityBound(), kind + " C_V");
        }
    }

    @Test
    void atZeroTemperatureTheGroundConfigurationCounts() {
        // fermions: 3 on levels {0 (g 2), 1 (g 3)}: two at 0, one among the three at 1: S = ln 3, U = 1
        QuantumCanonical.Point f = QuantumCanonical.of(new double[] {0, 1}, new double[] {2, 3}, 3,
                QuantumCanonical.Kind.FERMIONS, 0).at(0);
        assertEquals(Math.log(3), f.entropy(), 1e-15);
        assertEquals(1, f.energy(), 0);
        assertEquals(1, f.chemicalPotential(), 0);
        // bosons: 3 on a doubly degenerate ground level: C(4, 3) = 4 ways
        QuantumCanonical.Point b = QuantumCanonical.of(new double[] {0, 1}, new double[] {2, 3}, 3,
                QuantumCanonical.Kind.BOSONS, 0).at(0);
        assertEquals(Math.log(4), b.entropy(), 1e-15);
        assertEquals(0, b.energy(), 0);
        assertEquals(Math.log(4), b.logZ(), 1e-15);
    }

    @Test
    void atHighTemperatureAndLowDensityBothApproachBoltzmannCounting() {
        // 5 particles on 20 000 states (levels 0..1999 K, g = 10) at 1e6 K: Z_1 ~ 2e4, corrections ~ N^2 / (2 Z_1)
        int levels = 2000;
        double[] e = new double[levels];
        double[] g = new double[levels];
        for (int i = 0; i < levels; i++) {
            e[i] = i;
            g[i] = 10;
        }
        double t = 1e6;
        double lnZ1 = 0;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < levels; i++) {
            max = Math.max(max, Math.log(g[i]) - e[i] / t);
        }
        for (int i = 0; i < levels; i++) {
            lnZ1 += Math.exp(Math.log(g[i]) - e[i] / t - max);
        }
        lnZ1 = max + Math.log(lnZ1);
        double boltzmann = 5 * lnZ1 - Math.log(120);
        double zeta = 5 * 4 / 2.0 / Math.exp(lnZ1); // relative size of the exchange correction, ~ N (N - 1) / (2 Z_1)
        for (QuantumCanonical.Kind kind : QuantumCanonical.Kind.values()) {
            double lnZ = QuantumCanonical.of(e, g, 5, kind, 0).at(t).logZ();
            assertEquals(boltzmann, lnZ, 2 * zeta, kind + "");
            // bosons above, fermions below the Boltzmann value (bunching and exclusion)
            assertTrue(kind == QuantumCanonical.Kind.BOSONS ? lnZ > boltzmann : lnZ < boltzmann, kind + "");
        }
    }

    @Test
    void fermionsThatDoNotFitAndNonIntegralDegeneraciesAreRefused() {
        DomainException tooMany = assertThrows(DomainException.class, () -> QuantumCanonical.of(new double[] {0, 1},
                new double[] {1, 2}, 4, QuantumCanonical.Kind.FERMIONS, 0));
        assertEquals("/particles/count", tooMany.field());
        DomainException fraction = assertThrows(DomainException.class, () -> QuantumCanonical.of(new double[] {0},
                new double[] {2.5}, 1, QuantumCanonical.Kind.BOSONS, 0));
        assertEquals("/levels/degeneracies/0", fraction.field());
    }
}
