package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;
import org.statesum.testing.ExactDensityOfStates;

/**
 * The exact integral of a piecewise-linear density against an independent 40-digit tanh-sinh quadrature
 * ({@link ExactDensityOfStates}), from 1e-3 K to 1e6 K: every value within its reported bound, and the
 * bound useful up to 1e4 K (at most 1e-9 of the value). A segment far narrower than the others loses
 * digits to the difference of its end points' antiderivatives (a segment 1e-5 K wide: 7e-11 of S at
 * 5 K), and its bound says so (1e-8 of S there). Far above the highest mode (1e6 K here) the
 * differences of antiderivatives at nearby small x make the bound grow like T / theta: 1.5e-8 of U at
 * 1e6 K on a 201-node grid, for a true error of 2e-12.
 */
class LinearDensityOfStatesTest {

    private static final double[] TEMPERATURES = {1e-3, 1e-2, 0.1, 1, 5, 30, 300, 3000, 1e6};

    /** A nu^2 density (Debye-like, cut at 576 K = 12 THz) on {@code nodes} nodes from 0, 3 modes in all. */
    private static double[][] debyeLike(int nodes) {
        double max = 576;
        double[] theta = new double[nodes];
        double[] g = new double[nodes];
        for (int i = 0; i < nodes; i++) {
            theta[i] = max * i / (nodes - 1);
            g[i] = 9 * theta[i] * theta[i] / (max * max * max);
        }
        return new double[][] {theta, g};
    }

    private static void check(double[] theta, double[] g, String what) {
        check(theta, g, what, 1e-9);
    }

    /** Every value within its bound at every temperature; bounds at most {@code useful} of the value to 1e4 K. */
    private static void check(double[] theta, double[] g, String what, double useful) {
        LinearDensityOfStates dos = LinearDensityOfStates.of(theta, g, 0);
        double[] out = new double[8];
        double loosest = 0;
        for (double t : TEMPERATURES) {
            dos.evaluateAt(t, out);
            BigDecimal[] exact = ExactDensityOfStates.thermodynamics(theta, g, t);
            for (int q = 0; q < 4; q++) {
                double error = Math.abs(new BigDecimal(out[q]).subtract(exact[q]).doubleValue());
                String context = what + " T = " + t + " quantity " + q + ": " + out[q] + " vs " + exact[q]
                        + ", error " + error + ", bound " + out[q + 4];
                assertTrue(error <= out[q + 4], "bound exceeded: " + context);
                double scale = Math.abs(exact[q].doubleValue());
                if (scale > 0 && t <= 1e4) {
                    loosest = Math.max(loosest, out[q + 4] / scale);
                    assertTrue(out[q + 4] <= useful * scale + 1e-300, "bound too loose: " + context);
                }
            }
        }
        if (Boolean.getBoolean("statesum.verbose")) {
            System.out.printf("%s: loosest bound %.3g of its value%n", what, loosest);
        }
    }

    @Test
    void aNuSquaredDensityOnFortyNineNodes() {
        double[][] d = debyeLike(49);
        check(d[0], d[1], "49-node nu^2");
    }

    @Test
    void aNuSquaredDensityOnTwoHundredAndOneNodes() {
        double[][] d = debyeLike(201);
        check(d[0], d[1], "201-node nu^2");
    }

    @Test
    void anIrregularDensityThatDoesNotStartAtZero() {
        // adversarial: uneven spacing, a density non-zero at the first node, a spike and an empty stretch
        double[] theta = {3.5, 3.50001, 40, 41, 200, 200.5, 333, 700, 701};
        double[] g = {0.002, 0.01, 0, 0.5, 0.5, 0, 0, 0.0001, 0.0012};
        check(theta, g, "irregular", 2e-8);
    }

    @Test
    void aDensityNonZeroAtZeroFrequency() {
        double[] theta = {0, 1e-4, 2, 80, 300};
        double[] g = {0.01, 0.01, 0.02, 0.001, 0.004};
        check(theta, g, "non-zero at 0");
    }

    @Test
    void theLowTemperatureLimitFollowsThePowerLawOfTheFirstSegment() {
        // g = c theta on [0, theta_1]: S -> c T int x (x n - ln(1 - e^-x)) dx = c T (2 zeta(3) + 2 zeta(3)) ... here
        // checked as S(T) / S(T / 2) -> 4 (S ~ T^2), where a sum over nodes falls off exponentially
        double[][] d = debyeLike(49);
        LinearDensityOfStates dos = LinearDensityOfStates.of(d[0], d[1], 0);
        double[] lo = new double[8];
        double[] hi = new double[8];
        dos.evaluateAt(0.05, lo);
        dos.evaluateAt(0.1, hi);
        assertTrue(Math.abs(hi[2] / lo[2] - 4) < 1e-6, hi[2] / lo[2] + "");
        assertTrue(Math.abs(hi[3] / lo[3] - 4) < 1e-6, hi[3] / lo[3] + "");
    }
}
