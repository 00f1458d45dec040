package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/**
 * Identities of canonical thermodynamics on random level sets, each checked within the engine's own
 * bounds (plus, for derivatives, the finite-difference truncation estimated by comparing steps h and 2h).
 */
class ThermodynamicIdentityProperties {

    private static final double U = 0x1.0p-53;

    /** Energies k / 1024 K with integer k < 2^30 (exactly representable, and exact under integer shifts). */
    record Levels(double[] energies, double[] degeneracies) {

        LevelSet set() {
            return LevelSet.ofDegeneracies(energies, degeneracies);
        }

        double spread() {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (double e : energies) {
                lo = Math.min(lo, e);
                hi = Math.max(hi, e);
            }
            return Math.max(hi - lo, 1.0 / 1024);
        }
    }

    @Provide
    Arbitrary<Levels> levels() {
        Arbitrary<Integer> size = Arbitraries.integers().between(1, 12);
        return size.flatMap(n -> Combinators.combine(
                Arbitraries.integers().between(0, 1 << 30).array(int[].class).ofSize(n),
                Arbitraries.integers().between(1, 500).map(g -> 2.0 * g).array(double[].class).ofSize(n))
                .as((k, g) -> {
                    double[] e = new double[n];
                    for (int i = 0; i < n; i++) {
                        e[i] = k[i] / 1024.0;
                    }
                    return new Levels(e, g);
                }));
    }

    private static CanonicalTable at(Levels l, double... t) {
        return CanonicalEnsemble.evaluate(l.set(), t, false);
    }

    @Property(tries = 300)
    void helmholtzIsInternalEnergyMinusTS(@ForAll("levels") Levels l, @ForAll @DoubleRange(min = -3, max = 3) double lg) {
        double t = l.spread() * Math.pow(10, lg);
        CanonicalTable c = at(l, t);
        double f = c.helmholtzEnergyKelvin().values()[0];
        double u = c.internalEnergyKelvin().values()[0];
        double s = c.entropyOverBoltzmann().values()[0];
        // Bounds of F, U and T S, and the roundings of T * S and U - T S.
        double tol = c.helmholtzEnergyKelvin().errorBounds()[0] + c.internalEnergyKelvin().errorBounds()[0]
                + t * c.entropyOverBoltzmann().errorBounds()[0] + 2 * U * (Math.abs(u) + Math.abs(t * s));
        assertEquals(f, u - t * s, tol);
    }

    @Property(tries = 200)
    void entropyIsMinusDfDtAndHeatCapacityIsDuDt(@ForAll("levels") Levels l,
            @ForAll @DoubleRange(min = -1, max = 1.5) double lg) {
        double t = l.spread() * Math.pow(10, lg);
        double h = 1e-3 * t;
        CanonicalTable c = at(l, t - 2 * h, t - h, t, t + h, t + 2 * h);
        checkDerivative(c.helmholtzEnergyKelvin(), -1, c.entropyOverBoltzmann(), h);
        checkDerivative(c.internalEnergyKelvin(), 1, c.heatCapacityOverBoltzmann(), h);
    }

    /**
     * sign * (G(T + h) - G(T - h)) / 2h against D(T). Central differences err by c h^2 + O(h^4), so the
     * steps h and 2h differ by about 3 c h^2: the truncation is estimated as |D_h - D_2h| / 3, doubled
     * for safety; the rounding part is (bound(T + h) + bound(T - h)) / 2h plus the rounding of the grid
     * points T +- h themselves (u T times the derivative).
     */
    private static void checkDerivative(Series g, double sign, Series d, double h) {
        double[] v = g.values();
        double[] b = g.errorBounds();
        double dh = sign * (v[3] - v[1]) / (2 * h);
        double d2h = sign * (v[4] - v[0]) / (4 * h);
        double truncation = 2 * Math.abs(dh - d2h) / 3;
        double rounding = (b[3] + b[1]) / (2 * h) + (b[4] + b[0]) / (4 * h) + 4 * U * Math.abs(dh) * (1 + 2 / 1e-3);
        double tol = truncation + rounding + d.errorBounds()[2] + 1e-12 * Math.abs(dh);
        assertEquals(d.values()[2], dh, tol);
    }

    @Property(tries = 300)
    void shiftingEveryEnergyShiftsFOnlyAndLeavesSAndCvAlone(@ForAll("levels") Levels l,
            @ForAll @IntRange(min = -1_000_000_000, max = 1_000_000_000) int shift,
            @ForAll @DoubleRange(min = -2, max = 2) double lg) {
        double t = l.spread() * Math.pow(10, lg);
        double[] moved = l.energies().clone();
        for (int i = 0; i < moved.length; i++) {
            moved[i] += shift; // exact: k / 1024 + an integer, all below 2^31
        }
        CanonicalTable a = at(l, t);
        CanonicalTable b = at(new Levels(moved, l.degeneracies()), t);
        assertWithin(a.entropyOverBoltzmann(), b.entropyOverBoltzmann(), 0, 0);
        assertWithin(a.heatCapacityOverBoltzmann(), b.heatCapacityOverBoltzmann(), 0, 0);
        double fa = a.helmholtzEnergyKelvin().values()[0];
        double fb = b.helmholtzEnergyKelvin().values()[0];
        assertEquals(fa + shift, fb, a.helmholtzEnergyKelvin().errorBounds()[0] + b.helmholtzEnergyKelvin().errorBounds()[0]
                + U * Math.abs(fa + shift));
        assertWithin(a.internalEnergyKelvin(), b.internalEnergyKelvin(), shift, U * Math.abs(fa + shift));
    }

    @Property(tries = 300)
    void splittingALevelIntoTwoHalvesChangesNothing(@ForAll("levels") Levels l, @ForAll @IntRange(min = 0, max = 11) int pick,
            @ForAll @DoubleRange(min = -2, max = 2) double lg) {
        int n = l.energies().length;
        int k = pick % n;
        double[] e = new double[n + 1];
        double[] g = new double[n + 1];
        System.arraycopy(l.energies(), 0, e, 0, n);
        System.arraycopy(l.degeneracies(), 0, g, 0, n);
        e[n] = e[k];
        g[k] /= 2; // even integers: exact halves
        g[n] = g[k];
        double t = l.spread() * Math.pow(10, lg);
        CanonicalTable a = at(l, t);
        CanonicalTable b = at(new Levels(e, g), t);
        assertAllWithin(a, b);
    }

    @Property(tries = 300)
    void theOrderOfTheLevelsDoesNotMatter(@ForAll("levels") Levels l, @ForAll long seed,
            @ForAll @DoubleRange(min = -2, max = 2) double lg) {
        int n = l.energies().length;
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            order.add(i);
        }
        Collections.shuffle(order, new Random(seed));
        double[] e = new double[n];
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = l.energies()[order.get(i)];
            g[i] = l.degeneracies()[order.get(i)];
        }
        double t = l.spread() * Math.pow(10, lg);
        assertAllWithin(at(l, t), at(new Levels(e, g), t));
    }

    @Property(tries = 3)
    void repeatsAreBitIdenticalAlsoAcrossTheParallelPath(@ForAll long seed) {
        // 2500 levels x 120 temperatures = 300 000 pairs: above the 200 000 at which the work is split.
        Random random = new Random(seed);
        int n = 2500;
        double[] e = new double[n];
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = random.nextDouble() * 5000;
            g[i] = 1 + random.nextInt(9);
        }
        double[] t = new double[120];
        for (int j = 0; j < t.length; j++) {
            t[j] = 10 + 20 * j + random.nextDouble();
        }
        LevelSet set = LevelSet.ofDegeneracies(e, g);
        CanonicalTable first = CanonicalEnsemble.evaluate(set, t, true);
        CanonicalTable second = CanonicalEnsemble.evaluate(set, t, true);
        assertArrayEquals(first.helmholtzEnergyKelvin().values(), second.helmholtzEnergyKelvin().values());
        assertArrayEquals(first.heatCapacityOverBoltzmann().errorBounds(), second.heatCapacityOverBoltzmann().errorBounds());
        assertTrue(java.util.Arrays.deepEquals(first.populations(), second.populations()));
        for (int j : new int[] {0, 37, 119}) {
            // One temperature alone runs on one core: the same bits as inside the split grid.
            CanonicalTable alone = CanonicalEnsemble.evaluate(set, new double[] {t[j]}, false);
            assertEquals(Double.doubleToRawLongBits(first.logPartitionFunction().values()[j]),
                    Double.doubleToRawLongBits(alone.logPartitionFunction().values()[0]));
            assertEquals(Double.doubleToRawLongBits(first.entropyOverBoltzmann().values()[j]),
                    Double.doubleToRawLongBits(alone.entropyOverBoltzmann().values()[0]));
            assertEquals(Double.doubleToRawLongBits(first.internalEnergyKelvin().errorBounds()[j]),
                    Double.doubleToRawLongBits(alone.internalEnergyKelvin().errorBounds()[0]));
        }
    }

    private static void assertAllWithin(CanonicalTable a, CanonicalTable b) {
        assertWithin(a.logPartitionFunction(), b.logPartitionFunction(), 0, 0);
        assertWithin(a.helmholtzEnergyKelvin(), b.helmholtzEnergyKelvin(), 0, 0);
        assertWithin(a.internalEnergyKelvin(), b.internalEnergyKelvin(), 0, 0);
        assertWithin(a.entropyOverBoltzmann(), b.entropyOverBoltzmann(), 0, 0);
        assertWithin(a.heatCapacityOverBoltzmann(), b.heatCapacityOverBoltzmann(), 0, 0);
    }

    /** b = a + offset within the sum of both bounds (each bounds the distance to the same exact value). */
    private static void assertWithin(Series a, Series b, double offset, double extra) {
        for (int j = 0; j < a.size(); j++) {
            assertEquals(a.values()[j] + offset, b.values()[j], a.errorBounds()[j] + b.errorBounds()[j] + extra);
        }
    }

    /** A prepared level set reused across calls (its kernel scratch overwritten) answers bit for bit as fresh ones. */
    @Property(tries = 100)
    void aPreparedLevelSetAnswersAsAFreshEvaluationCallAfterCall(@ForAll("levels") Levels levels,
            @ForAll @DoubleRange(min = 0.01, max = 1e4) double t1, @ForAll @DoubleRange(min = 0.01, max = 1e4) double t2) {
        CanonicalEnsemble.Prepared prepared = CanonicalEnsemble.prepare(levels.set());
        for (double[] grid : new double[][] {{t1}, {t2, t1}, {0, t2}, {t1}}) {
            CanonicalTable reused = prepared.evaluate(grid, true);
            CanonicalTable fresh = CanonicalEnsemble.evaluate(levels.set(), grid, true);
            for (Series[] pair : new Series[][] {
                {reused.logPartitionFunction(), fresh.logPartitionFunction()},
                {reused.helmholtzEnergyKelvin(), fresh.helmholtzEnergyKelvin()},
                {reused.internalEnergyKelvin(), fresh.internalEnergyKelvin()},
                {reused.entropyOverBoltzmann(), fresh.entropyOverBoltzmann()},
                {reused.heatCapacityOverBoltzmann(), fresh.heatCapacityOverBoltzmann()}}) {
                assertArrayEquals(pair[1].values(), pair[0].values());
                assertArrayEquals(pair[1].errorBounds(), pair[0].errorBounds());
            }
        }
    }
}
