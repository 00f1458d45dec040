package org.statesum.engine.sampling;

import org.statesum.engine.DomainException;

/**
 * The reduced potentials of K thermodynamic states evaluated on N pooled samples, u[k][n] =
 * beta_k U_k(x_n) (dimensionless), with the samples grouped by the state that drew them: the first
 * {@code counts[0]} columns come from state 0, the next {@code counts[1]} from state 1, and so on.
 * A state with a count of 0 was not sampled (MBAR still estimates its free energy).
 *
 * <p>The arrays are not copied: callers hand them over and do not change them afterwards.
 *
 * @param u the K x N matrix; every element finite, |u| at most {@link #MAX_ABS_REDUCED_POTENTIAL}
 * @param counts samples drawn from each state, non-negative, summing to N
 */
public record ReducedPotentials(double[][] u, int[] counts) {

    /**
     * Largest accepted |u|: differences of two reduced potentials and their sums over a million
     * samples stay far inside the binary64 range (1e15 * 2e6 = 2e21).
     */
    public static final double MAX_ABS_REDUCED_POTENTIAL = 1e15;

    /**
     * Checks the shape and the values.
     *
     * @throws DomainException {@code SAMPLES_INVALID} naming the first offending field
     */
    public static ReducedPotentials of(double[][] u, int[] counts) {
        if (u.length < 2) {
            throw new DomainException("SAMPLES_INVALID", "/reducedPotentials", "at least two states are needed");
        }
        if (counts.length != u.length) {
            throw new DomainException("SAMPLES_INVALID", "/sampleCounts", "has " + counts.length
                    + " elements but there are " + u.length + " states");
        }
        long total = 0;
        for (int k = 0; k < counts.length; k++) {
            if (counts[k] < 0) {
                throw new DomainException("SAMPLES_INVALID", "/sampleCounts/" + k, "must not be negative");
            }
            total += counts[k];
        }
        int n = u[0].length;
        if (total != n) {
            throw new DomainException("SAMPLES_INVALID", "/sampleCounts", "the counts sum to " + total
                    + " but each row of reducedPotentials has " + n + " samples");
        }
        for (int k = 0; k < u.length; k++) {
            if (u[k].length != n) {
                throw new DomainException("SAMPLES_INVALID", "/reducedPotentials/" + k, "has " + u[k].length
                        + " samples but row 0 has " + n);
            }
            for (int i = 0; i < n; i++) {
                if (!(Math.abs(u[k][i]) <= MAX_ABS_REDUCED_POTENTIAL)) {
                    throw new DomainException("SAMPLES_INVALID", "/reducedPotentials/" + k + "/" + i,
                            "must be finite and at most " + MAX_ABS_REDUCED_POTENTIAL + " in magnitude");
                }
            }
        }
        return new ReducedPotentials(u, counts);
    }

    /** K, the number of states. */
    public int states() {
        return u.length;
    }

    /** N, the number of pooled samples. */
    public int samples() {
        return u[0].length;
    }

    /** The first column drawn from state k. */
    int offset(int k) {
        int offset = 0;
        for (int j = 0; j < k; j++) {
            offset += counts[j];
        }
        return offset;
    }

    /** Requires at least one sample from state k, for estimators that average over its samples. */
    void requireSampled(int k, String method) {
        if (counts[k] < 1) {
            throw new DomainException("SAMPLES_INVALID", "/sampleCounts/" + k, method
                    + " needs samples from state " + k);
        }
    }
}
