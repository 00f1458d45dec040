package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.statesum.testing.HighPrecision;

class LinearRotorSumTest {

    /**
     * Against a 40-digit term-by-term sum over far more levels than the engine keeps (J <= 2 N + 20):
     * the true error never exceeds the bound, and the bound is within 1e-12 relative (honest but not
     * loose by orders of magnitude: rounding of ~N terms at u = 1.1e-16 each).
     */
    @ParameterizedTest
    @CsvSource({
        // theta (K), even weight, odd weight, T (K)
        "87.55, 0.25, 0.75, 20",     // H2-like, equilibrium, deep quantum regime
        "87.55, 0.25, 0.75, 300",
        "87.55, 0.25, 0,    150",    // para only
        "87.55, 0,    0.75, 150",    // ortho only: lowest level J = 1
        "2.875, 0.5,  0.5,  298.15", // N2-like, symmetric average
        "0.5,   1,    1,    1000",   // heavy heteronuclear, hot: about 300 levels
    })
    void matchesAHighPrecisionSumWithinItsBound(double theta, double even, double odd, double t) {
        LinearRotorSum.Result r = LinearRotorSum.evaluate(theta, even, odd, new double[] {t});
        int top = 2 * r.highestLevel() + 20;
        double[] e = new double[top + 1];
        double[] g = new double[top + 1];
        int n = 0;
        for (int j = 0; j <= top; j++) {
            double w = j % 2 == 0 ? even : odd;
            if (w > 0) {
                e[n] = theta * j * (j + 1.0);
                g[n] = (2 * j + 1) * w;
                n++;
            }
        }
        double[] ref = HighPrecision.moments(java.util.Arrays.copyOf(e, n), java.util.Arrays.copyOf(g, n), t);
        CanonicalTable table = r.table();
        double uErr = Math.abs(table.internalEnergyKelvin().values()[0] - ref[1]);
        double cvErr = Math.abs(table.heatCapacityOverBoltzmann().values()[0] - ref[2]);
        double lnErr = Math.abs(table.logRelativePartitionFunction()[0] - ref[0]);
        assertTrue(uErr <= table.internalEnergyKelvin().errorBounds()[0], "U error " + uErr);
        assertTrue(cvErr <= table.heatCapacityOverBoltzmann().errorBounds()[0], "Cv error " + cvErr);
        assertTrue(lnErr <= 1e-14 * Math.max(1, Math.abs(ref[0])), "ln Z' error " + lnErr);
        assertTrue(table.internalEnergyKelvin().errorBounds()[0] <= 1e-12 * Math.abs(ref[1]) + 1e-300);
        assertTrue(table.heatCapacityOverBoltzmann().errorBounds()[0] <= 1e-12 * Math.max(1, ref[2]));
        assertTrue(r.largestTailBound() <= LinearRotorSum.TAIL_TARGET);
    }

    @ParameterizedTest
    @ValueSource(doubles = {2.875, 0.01})
    void approachesTheClassicalLimitWithTheKnownCorrection(double theta) {
        // High-T expansion of the heteronuclear rotor (common practice, e.g. McQuarrie, Statistical
        // Mechanics, 1976, eq. 6-40): ln q = ln(T / theta) + theta / (3T) + (theta / T)^2 / 90 + O((theta / T)^3).
        double t = 1000 * theta;
        LinearRotorSum.Result r = LinearRotorSum.evaluate(theta, 1, 1, new double[] {t});
        double x = theta / t;
        double expected = Math.log(t / theta) + x / 3 + x * x / 90;
        // The neglected O(x^3) term is 8 x^3 / 2835 ~ 3e-12 at x = 1e-3.
        assertEquals(expected, r.table().logPartitionFunction().values()[0], 1e-11);
    }

    @ParameterizedTest
    @CsvSource({"1e-6, 1e6", "1e-3, 1e9"})
    void refusesSumsBeyondItsLevelLimit(double theta, double t) {
        assertThrows(DomainException.class, () -> LinearRotorSum.evaluate(theta, 1, 1, new double[] {t}));
    }
}
