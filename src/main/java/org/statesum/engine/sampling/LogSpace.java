package org.statesum.engine.sampling;

/**
 * Sums of exponentials kept in logarithms, so that no intermediate overflows or underflows.
 *
 * <p>{@code logSumExp(x) = m + ln sum_i exp(x_i - m)} with m = max x_i: every term is at most 1 and
 * the largest is exactly 1, so the sum lies in [1, n] (Blanchard, Higham and Higham 2021).
 */
final class LogSpace {

    /** Unit roundoff of binary64, 2^-53. */
    static final double UNIT_ROUNDOFF = 0x1p-53;

    private LogSpace() {
    }

    /** ln sum_i exp(x_i) over {@code x[from..to)}; -infinity for an empty range. */
    static double logSumExp(double[] x, int from, int to) {
        double max = Double.NEGATIVE_INFINITY;
        for (int i = from; i < to; i++) {
            max = Math.max(max, x[i]);
        }
        if (max == Double.NEGATIVE_INFINITY) {
            return max;
        }
        double sum = 0;
        for (int i = from; i < to; i++) {
            sum += Math.exp(x[i] - max);
        }
        return max + Math.log(sum);
    }

    /** ln sum_i exp(x_i) over the whole array. */
    static double logSumExp(double[] x) {
        return logSumExp(x, 0, x.length);
    }

    /**
     * ln(1 + e^y), without overflow for large y and without loss for very negative y:
     * max(y, 0) + log1p(exp(-|y|)).
     */
    static double softplus(double y) {
        return Math.max(y, 0) + Math.log1p(Math.exp(-Math.abs(y)));
    }

    /**
     * The logistic density s(y)(1 - s(y)) = 1 / (2 + 2 cosh y), with s(y) = 1 / (1 + e^-y), written as
     * e^-|y| / (1 + e^-|y|)^2 so that it neither overflows nor cancels.
     */
    static double logisticDensity(double y) {
        double e = Math.exp(-Math.abs(y));
        return e / ((1 + e) * (1 + e));
    }
}
