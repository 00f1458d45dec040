package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

class HarmonicModesProperties {

    private static HarmonicModes modes(long seed, int n) {
        java.util.Random r = new java.util.Random(seed);
        double[] theta = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            theta[i] = 1 + 3000 * r.nextDouble();
            w[i] = 0.1 + 3 * r.nextDouble();
        }
        return HarmonicModes.of(theta, w, 0);
    }

    private static double[] at(HarmonicModes m, double t) {
        double[] out = new double[8];
        m.evaluateAt(t, out);
        return out;
    }

    @Property(tries = 200)
    void helmholtzIsInternalEnergyMinusTemperatureTimesEntropy(@ForAll long seed, @ForAll @IntRange(min = 1, max = 30) int n,
            @ForAll @DoubleRange(min = 0.5, max = 5000) double t) {
        double[] r = at(modes(seed, n), t);
        // F = U - TS: the three bounds plus the rounding of U - TS.
        assertEquals(r[0], r[1] - t * r[2], r[4] + r[5] + t * r[6] + 4 * Math.ulp(Math.abs(r[1]) + t * r[2]));
    }

    @Property(tries = 100)
    void entropyAndHeatCapacityAreTemperatureDerivatives(@ForAll long seed, @ForAll @IntRange(min = 1, max = 30) int n,
            @ForAll @DoubleRange(min = 5, max = 5000) double t) {
        HarmonicModes m = modes(seed, n);
        double h = 1e-3 * t;
        double[] up = at(m, t + h);
        double[] down = at(m, t - h);
        double[] mid = at(m, t);
        // Central differences: truncation ~ (h^2 / 6) |F'''| and rounding ~ u |F| / h; 1e-5 relative covers both.
        double s = -(up[0] - down[0]) / (2 * h);
        double cv = (up[1] - down[1]) / (2 * h);
        assertEquals(mid[2], s, 1e-5 * (mid[2] + Math.abs(mid[0]) / t));
        assertEquals(mid[3], cv, 1e-5 * (mid[3] + Math.abs(mid[1]) / t));
    }

    @Property(tries = 100)
    void splittingAModeInTwoChangesNothingBeyondTheBounds(@ForAll @DoubleRange(min = 1, max = 3000) double theta,
            @ForAll @DoubleRange(min = 0.1, max = 10) double weight, @ForAll @DoubleRange(min = 0, max = 5000) double t) {
        double[] one = at(HarmonicModes.of(new double[] {theta}, new double[] {weight}, 0), t);
        double[] two = at(HarmonicModes.of(new double[] {theta, theta}, new double[] {weight / 2, weight / 2}, 0), t);
        for (int q = 0; q < 4; q++) {
            assertEquals(one[q], two[q], one[q + 4] + two[q + 4]);
        }
    }

    @Property(tries = 100)
    void scalingFrequenciesAndTemperatureTogetherScalesEnergies(@ForAll long seed,
            @ForAll @IntRange(min = 1, max = 10) int n, @ForAll @DoubleRange(min = 1, max = 2000) double t,
            @ForAll @DoubleRange(min = 0.25, max = 4) double lambda) {
        HarmonicModes m = modes(seed, n);
        double[] base = at(m, t);
        double[] scaled = at(m.scaled(lambda), lambda * t);
        // F(lambda theta, lambda T) = lambda F(theta, T); S and C_V unchanged (they depend on theta / T only).
        assertEquals(lambda * base[0], scaled[0], lambda * base[4] + scaled[4] + 4 * Math.ulp(scaled[0]));
        assertEquals(base[2], scaled[2], base[6] + scaled[6] + 8 * Math.ulp(base[2]) + 1e-300);
        assertEquals(base[3], scaled[3], base[7] + scaled[7] + 8 * Math.ulp(base[3]) + 1e-300);
        assertTrue(base[4] >= 0 && base[7] >= 0);
    }
}
