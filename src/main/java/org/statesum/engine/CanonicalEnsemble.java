package org.statesum.engine;

import java.util.stream.IntStream;

/**
 * Canonical-ensemble thermodynamics of a discrete level set: ln Z, F, U, S and C_V on a temperature
 * grid, each with an absolute bound on its numerical error. See {@link CanonicalKernel} for the
 * algorithm and the error analysis.
 *
 * <p>Temperatures must be 0 (the T -> 0 limit) or in [{@link #MIN_POSITIVE_TEMPERATURE_KELVIN},
 * {@link #MAX_TEMPERATURE_KELVIN}]. Large jobs are split over the available cores by temperature;
 * every temperature is evaluated by the same sequential code, so the answer does not depend on the
 * split (bit-identical repeats). Thread-safe: holds no state.
 */
public final class CanonicalEnsemble {

    /** Smallest non-zero temperature, K: with |E / k_B| <= 1e60 K keeps (E / k_B T)^2 below 1e260. */
    public static final double MIN_POSITIVE_TEMPERATURE_KELVIN = 1e-12;
    /** Largest temperature, K (far above any chemistry; keeps beta E_0 meaningful). */
    public static final double MAX_TEMPERATURE_KELVIN = 1e12;
    /** Below this many (level, temperature) pairs one core is faster than forking. */
    private static final long PARALLEL_THRESHOLD_PAIRS = 200_000;

    private CanonicalEnsemble() {
    }

    /**
     * Evaluates the level set at every temperature.
     *
     * @param levels the levels (energies as E / k_B)
     * @param temperaturesKelvin the grid, K; each 0 or within the limits above
     * @param withPopulations whether to return the population of every level at every temperature
     * @throws DomainException TEMPERATURE_OUT_OF_RANGE naming the first bad temperature
     */
    public static CanonicalTable evaluate(LevelSet levels, double[] temperaturesKelvin, boolean withPopulations) {
        checkTemperatures(temperaturesKelvin);
        return prepare(levels).evaluate(temperaturesKelvin, withPopulations);
    }

    /** The level set prepared once for evaluation at many temperatures, one call after another. */
    public static Prepared prepare(LevelSet levels) {
        return new Prepared(new PreparedLevels(levels));
    }

    private static void checkTemperatures(double[] temperaturesKelvin) {
        for (int j = 0; j < temperaturesKelvin.length; j++) {
            double t = temperaturesKelvin[j];
            if (!(t == 0 || (t >= MIN_POSITIVE_TEMPERATURE_KELVIN && t <= MAX_TEMPERATURE_KELVIN))) {
                throw new DomainException("TEMPERATURE_OUT_OF_RANGE", "/temperatures/values/" + j,
                        "a temperature must be 0 or between " + MIN_POSITIVE_TEMPERATURE_KELVIN + " and "
                                + MAX_TEMPERATURE_KELVIN + " K");
            }
        }
    }

    /**
     * A level set prepared for repeated evaluation, e.g. by a search over temperature: the per-level
     * work (shifts, logarithms, input-error terms) and the kernel's scratch arrays are made once
     * instead of at every call. The answers are bit-identical to {@link CanonicalEnsemble#evaluate}.
     * Not thread-safe: one call at a time (a call may still use several cores).
     */
    public static final class Prepared {

        private final PreparedLevels levels;
        /** The kernel of single-core calls, kept between them (its scratch is overwritten per temperature). */
        private CanonicalKernel sequential;

        private Prepared(PreparedLevels levels) {
            this.levels = levels;
        }

        /** As {@link CanonicalEnsemble#evaluate}, for the prepared level set. */
        public CanonicalTable evaluate(double[] temperaturesKelvin, boolean withPopulations) {
            checkTemperatures(temperaturesKelvin);
            int count = temperaturesKelvin.length;
            CanonicalColumns out = new CanonicalColumns(count, levels.size, withPopulations);
            long pairs = (long) count * levels.size;
            int workers = pairs < PARALLEL_THRESHOLD_PAIRS ? 1
                    : Math.min(count, Runtime.getRuntime().availableProcessors());
            Runnable stop = Cancellation.current();
            if (workers <= 1) {
                if (sequential == null) {
                    sequential = new CanonicalKernel(levels);
                }
                evaluateRange(sequential, temperaturesKelvin, 0, count, out, stop);
            } else {
                IntStream.range(0, workers).parallel().forEach(w -> evaluateRange(new CanonicalKernel(levels),
                        temperaturesKelvin, (int) ((long) count * w / workers),
                        (int) ((long) count * (w + 1) / workers), out, stop));
            }
            return out.toTable(temperaturesKelvin);
        }
    }

    private static void evaluateRange(CanonicalKernel kernel, double[] temperatures, int from, int to,
            CanonicalColumns out, Runnable stop) {
        for (int j = from; j < to; j++) {
            stop.run(); // a cooperative stop between temperatures (time limit, client gone); see Cancellation
            kernel.evaluate(temperatures[j], j, out);
        }
    }
}
