package org.statesum.models;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.statesum.engine.LevelSet;
import org.statesum.engine.ParticleStatistics;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;

/** Warnings of the level-set model, and its T = 0 column, with the thresholds computed in the test. */
class LevelSetModelTest {

    private static final double K = 1.380649e-23; // J/K, CODATA 2018 exact
    private static final double U = 0x1.0p-53;

    private static Optional<Warning> warning(ThermoResult r, String code) {
        return r.warnings().stream().filter(w -> w.code().equals(code)).findFirst();
    }

    private static Series series(ThermoResult r, Quantity q) {
        return r.series().get(q);
    }

    @Test
    void truncationIsFlaggedExactlyWhereTheTopLevelHoldsMoreThanOnePerMille() {
        // Two levels 1 K apart: p_top = 1 / (1 + e^(1/T)) = 1e-3 at T = 1 / ln 999 = 0.1447828 K.
        double edge = 1 / Math.log(999);
        double[] t = {0, 0.05, edge * (1 - 1e-6), edge * (1 + 1e-6), 300};
        ThermoResult r = LevelSetModel.evaluate(LevelSet.ofDegeneracies(new double[] {0, 1}, new double[] {1, 1}), t,
                Particles.single(), false);
        Warning w = warning(r, "LEVEL_SET_TRUNCATED").orElseThrow();
        assertArrayEquals(new double[] {t[3], t[4]}, w.temperatures());
    }

    @Test
    void wellConvergedLadderIsNotFlagged() {
        double[] e = new double[200];
        double[] g = new double[200];
        for (int i = 0; i < e.length; i++) {
            e[i] = i;
            g[i] = 1;
        }
        // At 10 K the top level (199 K) holds e^-19.9 (1 - e^-0.1) ~ 2e-10 of the population.
        ThermoResult r = LevelSetModel.evaluate(LevelSet.ofDegeneracies(e, g), new double[] {0, 1, 10}, Particles.single(),
                false);
        assertTrue(warning(r, "LEVEL_SET_TRUNCATED").isEmpty());
    }

    @Test
    void boltzmannCountingWarnsWhenParticlesOutnumberAHundredthOfTheReachableStates() {
        // One level with ln g = 30: Z' = e^30 ~ 1.07e13 at every T. NOT_DILUTE when N > 0.01 Z', i.e. N > 1.07e11.
        LevelSet set = LevelSet.ofLogDegeneracies(new double[] {0}, new double[] {30});
        double[] t = {0, 300};
        ThermoResult dilute = LevelSetModel.evaluate(set, t,
                new Particles(1e11, ParticleStatistics.INDISTINGUISHABLE, true), false);
        assertTrue(warning(dilute, "NOT_DILUTE").isEmpty());
        ThermoResult crowded = LevelSetModel.evaluate(set, t,
                new Particles(2e11, ParticleStatistics.INDISTINGUISHABLE, true), false);
        assertArrayEquals(t, warning(crowded, "NOT_DILUTE").orElseThrow().temperatures());
        ThermoResult localised = LevelSetModel.evaluate(set, t,
                new Particles(2e11, ParticleStatistics.DISTINGUISHABLE, true), false);
        assertTrue(warning(localised, "NOT_DILUTE").isEmpty(), "distinguishable particles never warn");
    }

    @Test
    void lnZAtZeroKelvinIsUndefinedOnlyWhenTheGroundLevelIsNotAtZero() {
        // Ground level 50 K above zero with g_0 = 2 + 4 = 6 (two levels at the same lowest energy).
        double[] e = {50, 50, 80};
        double[] g = {2, 4, 3};
        double[] t = {0, 10};
        ThermoResult r = LevelSetModel.evaluate(LevelSet.ofDegeneracies(e, g), t, Particles.single(), true);
        assertArrayEquals(new double[] {0}, warning(r, "LOG_PARTITION_FUNCTION_UNDEFINED").orElseThrow().temperatures());
        assertTrue(Double.isNaN(series(r, Quantity.LOG_PARTITION_FUNCTION).values()[0]));
        assertTrue(Double.isFinite(series(r, Quantity.LOG_PARTITION_FUNCTION).values()[1]));
        // The T -> 0 limits: F = U = E_0, S = k ln g_0, C_V = 0, populations g_i / g_0 on the ground levels.
        assertEquals(50 * K, series(r, Quantity.HELMHOLTZ_ENERGY).values()[0], 2 * U * 50 * K);
        assertEquals(50 * K, series(r, Quantity.INTERNAL_ENERGY).values()[0], 2 * U * 50 * K);
        assertEquals(K * Math.log(6), series(r, Quantity.ENTROPY).values()[0],
                series(r, Quantity.ENTROPY).errorBounds()[0] + 2 * U * K * Math.log(6));
        assertEquals(0.0, series(r, Quantity.ISOCHORIC_HEAT_CAPACITY).values()[0]);
        assertEquals(0.0, series(r, Quantity.ISOCHORIC_HEAT_CAPACITY).errorBounds()[0]);
        double[] p0 = r.populations().values()[0];
        assertEquals(1.0 / 3, p0[0], r.populations().errorBounds()[0][0] + U);
        assertEquals(2.0 / 3, p0[1], r.populations().errorBounds()[0][1] + U);
        assertEquals(0.0, p0[2]);
        for (Series s : r.series().values()) {
            for (int j = 0; j < t.length; j++) {
                boolean undefined = Double.isNaN(s.values()[j]);
                assertEquals(undefined, Double.isNaN(s.errorBounds()[j]), "a NaN value has a NaN bound, else finite");
                assertTrue(undefined || Double.isFinite(s.errorBounds()[j]));
            }
        }

        ThermoResult atZero = LevelSetModel.evaluate(LevelSet.ofDegeneracies(new double[] {0, 80}, new double[] {6, 3}), t,
                Particles.single(), false);
        assertTrue(warning(atZero, "LOG_PARTITION_FUNCTION_UNDEFINED").isEmpty());
        assertEquals(Math.log(6), series(atZero, Quantity.LOG_PARTITION_FUNCTION).values()[0],
                series(atZero, Quantity.LOG_PARTITION_FUNCTION).errorBounds()[0] + 2 * U * Math.log(6));
    }

    @Test
    void zeroKelvinColumnOfManyParticlesKeepsItsLimits() {
        // N = 10 indistinguishable particles on a ground level with g_0 = 1e6 at E_0 = 0: at T = 0,
        // S_N = k (N ln g_0 - ln N!) (Boltzmann counting, flagged as not dilute since N > 0.01 g_0 is false
        // here: 10 < 1e4, so no warning), F_N = U_N = 0, C_V = 0, ln Z_N = N ln g_0 - ln N!.
        ThermoResult r = LevelSetModel.evaluate(LevelSet.ofDegeneracies(new double[] {0, 5}, new double[] {1e6, 1}),
                new double[] {0}, new Particles(10, ParticleStatistics.INDISTINGUISHABLE, false), false);
        double lnFact = Math.log(3628800); // ln 10!
        double expected = 10 * Math.log(1e6) - lnFact;
        assertEquals(expected, series(r, Quantity.LOG_PARTITION_FUNCTION).values()[0],
                series(r, Quantity.LOG_PARTITION_FUNCTION).errorBounds()[0] + 4 * U * expected);
        assertEquals(K * expected, series(r, Quantity.ENTROPY).values()[0],
                series(r, Quantity.ENTROPY).errorBounds()[0] + 4 * U * K * expected);
        assertEquals(0.0, series(r, Quantity.HELMHOLTZ_ENERGY).values()[0], 0.0);
        assertEquals(0.0, series(r, Quantity.ISOCHORIC_HEAT_CAPACITY).values()[0]);
        assertTrue(warning(r, "NOT_DILUTE").isEmpty());
        assertEquals(List.of(), r.warnings().stream().filter(w -> w.code().equals("LOG_PARTITION_FUNCTION_UNDEFINED"))
                .toList());
    }
}
