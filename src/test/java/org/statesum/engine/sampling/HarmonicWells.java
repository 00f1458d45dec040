package org.statesum.engine.sampling;

import java.util.Random;

/**
 * Independent one-dimensional harmonic wells u_k(x) = (kappa_k / 2)(x - c_k)^2 (reduced units),
 * sampled exactly: x ~ Normal(c_k, 1 / sqrt(kappa_k)). The analytic dimensionless free energy is
 * f_k = -ln integral exp(-u_k) dx = -ln sqrt(2 pi / kappa_k), so f_k - f_0 = (1/2) ln(kappa_k / kappa_0)
 * whatever the centres (Gaussian integral; the validation system of Shirts and Chodera 2008, sec. V.A).
 */
final class HarmonicWells {

    final double[] springs;
    final double[] centres;

    HarmonicWells(double[] springs, double[] centres) {
        this.springs = springs;
        this.centres = centres;
    }

    /** f_k - f_0, analytic. */
    double exactDifference(int k) {
        return 0.5 * Math.log(springs[k] / springs[0]);
    }

    /** Draws counts[k] samples from each well and evaluates every reduced potential on them. */
    ReducedPotentials sample(int[] counts, long seed) {
        Random random = new Random(seed);
        int total = 0;
        for (int c : counts) {
            total += c;
        }
        double[] x = new double[total];
        int at = 0;
        for (int k = 0; k < counts.length; k++) {
            for (int i = 0; i < counts[k]; i++) {
                x[at++] = centres[k] + random.nextGaussian() / Math.sqrt(springs[k]);
            }
        }
        double[][] u = new double[springs.length][total];
        for (int k = 0; k < springs.length; k++) {
            for (int n = 0; n < total; n++) {
                double d = x[n] - centres[k];
                u[k][n] = 0.5 * springs[k] * d * d;
            }
        }
        return ReducedPotentials.of(u, counts);
    }
}
