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
        for (int j = 0; j < temperaturesKelvin.length; j++) {
            double t = temperaturesKelvin[j];
            if (!(t == 0 || (t >= MIN_POSITIVE_TEMPERATURE_KELVIN && t <= MAX_TEMPERATURE_KELVIN))) {
                throw new DomainException("TEMPERATURE_OUT_OF_RANGE", "/temperatures/values/" + j,
                        "a temperature must be 0 or between " + MIN_POSITIVE_TEMPERATURE_KELVIN + " and "
                                + MAX_TEMPERATURE_KELVIN + " K");
            }
        }
        PreparedLevels prepared = new PreparedLevels(levels);
        int count = temperaturesKelvin.length;
        CanonicalColumns out = new CanonicalColumns(count, prepared.size, withPopulations);
        long pairs = (long) count * prepared.size;
        int workers = pairs < PARALLEL_THRESHOLD_PAIRS ? 1
                : Math.min(count, Runtime.getRuntime().availableProcessors());
        Runnable stop = Cancellation.current();
        if (workers <= 1) {
            evaluateRange(prepared, temperaturesKelvin, 0, count, out, stop);
        } else {
            IntStream.range(0, workers).parallel().forEach(w -> evaluateRange(prepared, temperaturesKelvin,
                    (int) ((long) count * w / workers), (int) ((long) count * (w + 1) / workers), out, stop));
        }
        return out.toTable(temperaturesKelvin);
    }

    private static void evaluateRange(PreparedLevels prepared, double[] temperatures, int from, int to,
            CanonicalColumns out, Runnable stop) {
        CanonicalKernel kernel = new CanonicalKernel(prepared);
        for (int j = from; j < to; j++) {
            stop.run(); // a cooperative stop between temperatures (time limit, client gone); see Cancellation
            kernel.evaluate(temperatures[j], j, out);
        }
    }
}
