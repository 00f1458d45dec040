package org.statesum.testing;

import java.util.Arrays;
import org.statesum.engine.CanonicalEnsemble;
import org.statesum.engine.LevelSet;
import java.util.SplittableRandom;

/**
 * Seeded random level sets for the error-bound tests, built to reach the hard corners: energy ranges
 * from 1e-3 to 1e60 K, offsets far from zero, near-degenerate clusters, degeneracies up to 1e300,
 * log-degeneracies up to 1e6 that compete with equally large Boltzmann exponents, and temperatures
 * from 1e-12 K to 1e12 K, far below and far above the level spacing.
 */
public final class RandomLevelSets {

    /** One generated case: the inputs and the temperature grid (K). */
    public record Case(double[] energiesKelvin, double[] weights, boolean logarithmic, double[] temperatures) {

        public LevelSet levelSet() {
            return logarithmic ? LevelSet.ofLogDegeneracies(energiesKelvin, weights)
                    : LevelSet.ofDegeneracies(energiesKelvin, weights);
        }

        @Override
        public String toString() {
            String e = Arrays.toString(energiesKelvin);
            String w = Arrays.toString(weights);
            return "E=" + e.substring(0, Math.min(200, e.length())) + (logarithmic ? " lng=" : " g=")
                    + w.substring(0, Math.min(200, w.length())) + " T=" + Arrays.toString(temperatures);
        }
    }

    private RandomLevelSets() {
    }

    private static double logUniform(SplittableRandom r, double lowExp, double highExp) {
        return Math.pow(10, r.nextDouble(lowExp, highExp));
    }

    public static Case next(SplittableRandom r) {
        int n = 1 + r.nextInt(r.nextInt(4) == 0 ? 60 : 8);
        double[] e = new double[n];
        double width = logUniform(r, -3, 8);
        double offset = r.nextInt(3) == 0 ? (r.nextBoolean() ? 1 : -1) * logUniform(r, 0, 12) : 0;
        int energyMode = r.nextInt(5);
        for (int i = 0; i < n; i++) {
            e[i] = switch (energyMode) {
                case 0 -> offset + width * r.nextDouble();
                case 1 -> offset + width * i;
                case 2 -> offset + width * (r.nextInt(3) + 1e-9 * r.nextDouble());
                case 3 -> r.nextInt(3) == 0 ? logUniform(r, 20, 60) : width * r.nextDouble();
                default -> offset + width * i * i;
            };
        }
        boolean logarithmic = r.nextBoolean();
        double[] w = new double[n];
        int weightMode = r.nextInt(logarithmic ? 4 : 3);
        double spread = e.length > 1 ? Arrays.stream(e).max().getAsDouble() - Arrays.stream(e).min().getAsDouble() : 1;
        double emin = Arrays.stream(e).min().getAsDouble();
        double denseScale = logUniform(r, 0, 6);
        for (int i = 0; i < n; i++) {
            if (!logarithmic) {
                w[i] = switch (weightMode) {
                    case 0 -> 1;
                    case 1 -> 1 + r.nextInt(50);
                    default -> logUniform(r, 0, 300);
                };
            } else {
                w[i] = switch (weightMode) {
                    case 0 -> r.nextDouble(-20, 20);
                    case 1 -> r.nextDouble(0, 1e3);
                    // A density of states: ln g growing with energy to ~1e6, so that at the
                    // temperatures below ln g and E / T are both large and nearly cancel.
                    case 2 -> denseScale * Math.sqrt(spread == 0 ? 0 : (e[i] - emin) / spread);
                    default -> r.nextDouble(0, 1e6);
                };
            }
        }
        int count = 1 + r.nextInt(4);
        double[] t = new double[count];
        for (int j = 0; j < count; j++) {
            double temp = switch (r.nextInt(4)) {
                case 0 -> logUniform(r, -12, 12);
                case 1 -> width * logUniform(r, -4, 3);
                case 2 -> logarithmic && weightMode == 2 ? spread / denseScale * logUniform(r, -0.5, 0.5)
                        : width * logUniform(r, -1, 1);
                default -> width * logUniform(r, -2, 0.5);
            };
            t[j] = Math.min(CanonicalEnsemble.MAX_TEMPERATURE_KELVIN,
                    Math.max(CanonicalEnsemble.MIN_POSITIVE_TEMPERATURE_KELVIN, temp));
        }
        return new Case(e, w, logarithmic, t);
    }
}
