package org.statesum.engine.sampling;

import java.util.stream.IntStream;
import org.statesum.engine.Cancellation;

/**
 * One pass of the MBAR kernel over the sampled states' rows of u at trial free energies f. For each
 * sample n, with a_kn = f_k + ln N_k - u_kn over the sampled states and m_n = max_k a_kn:
 * <pre>
 *   ln D_n = m_n + ln sum_k exp(a_kn - m_n)        (ln sum_k N_k exp(f_k - u_kn))
 *   p_kn   = exp(a_kn - m_n) / sum_k exp(a_kn - m_n) = N_k W_kn
 * </pre>
 * and it accumulates S_k = sum_n W_kn (= 1 at the solution), the convex objective
 * A(f) = sum_n ln D_n - sum_k N_k f_k and, on request, P_ij = sum_n p_in p_jn (for the Hessian
 * H_ij = N_i S_i delta_ij - P_ij and for the covariance). One exponential per matrix element, as in a
 * plain log-sum-exp pass.
 *
 * <p>The samples are cut into fixed blocks of {@link #BLOCK} that run in parallel on the common
 * fork-join pool; each block's sums are kept apart and added in block order (S_k with Kahan's
 * compensation), so the result does not depend on the number of threads or their timing.
 */
final class MbarPass {

    /** Samples per block: large enough to amortise a task, small enough to split 1e5 samples. */
    static final int BLOCK = 1 << 14;
    /** Below this many matrix elements one thread is faster than forking. */
    private static final long PARALLEL_THRESHOLD = 1L << 17;

    private final double[][] rows;
    private final double[] logCounts;
    private final int samples;

    /**
     * @param rows u_kn of the sampled states (each row length N)
     * @param counts their sample counts N_k, all at least 1
     */
    MbarPass(double[][] rows, int[] counts) {
        this.rows = rows;
        this.samples = rows[0].length;
        this.logCounts = new double[counts.length];
        for (int k = 0; k < counts.length; k++) {
            logCounts[k] = Math.log(counts[k]);
        }
    }

    /** What one pass returns. P is K x K (full, symmetric) or null. */
    record Sums(double[] s, double objective, double[][] p) {
    }

    Sums run(double[] f, double[] counts, boolean withP, double[] logDenominators) {
        int k = rows.length;
        int blocks = (samples + BLOCK - 1) / BLOCK;
        double[][] partial = new double[blocks][];
        IntStream range = IntStream.range(0, blocks);
        if ((long) samples * k >= PARALLEL_THRESHOLD) {
            range = range.parallel();
        }
        Runnable stop = Cancellation.current();
        range.forEach(b -> {
            stop.run(); // a cooperative stop between blocks of samples; see Cancellation
            partial[b] = block(f, b * BLOCK, Math.min(samples, (b + 1) * BLOCK), withP, logDenominators);
        });
        double[] s = new double[k];
        double[] compensation = new double[k];
        double objective = 0;
        double objectiveCompensation = 0;
        double[][] p = withP ? new double[k][k] : null;
        for (double[] part : partial) {
            for (int i = 0; i < k; i++) {
                double y = part[i] - compensation[i];
                double t = s[i] + y;
                compensation[i] = (t - s[i]) - y;
                s[i] = t;
            }
            double y = part[k] - objectiveCompensation;
            double t = objective + y;
            objectiveCompensation = (t - objective) - y;
            objective = t;
            if (withP) {
                int at = k + 1;
                for (int i = 0; i < k; i++) {
                    for (int j = 0; j <= i; j++) {
                        p[i][j] += part[at++];
                    }
                }
            }
        }
        for (int i = 0; i < k; i++) {
            s[i] /= counts[i];
            objective -= counts[i] * f[i];
            if (withP) {
                for (int j = 0; j < i; j++) {
                    p[j][i] = p[i][j];
                }
            }
        }
        return new Sums(s, objective, p);
    }

    /** Sums over samples [from, to): p_k (K), sum ln D (1), lower triangle of P (K(K+1)/2). */
    private double[] block(double[] f, int from, int to, boolean withP, double[] logDenominators) {
        int k = rows.length;
        double[] out = new double[k + 1 + (withP ? k * (k + 1) / 2 : 0)];
        double[] a = new double[k];
        double[] shift = new double[k];
        for (int i = 0; i < k; i++) {
            shift[i] = f[i] + logCounts[i];
        }
        double logSum = 0;
        for (int n = from; n < to; n++) {
            double max = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < k; i++) {
                a[i] = shift[i] - rows[i][n];
                max = Math.max(max, a[i]);
            }
            double sum = 0;
            for (int i = 0; i < k; i++) {
                a[i] = Math.exp(a[i] - max);
                sum += a[i];
            }
            double inverse = 1 / sum;
            double logD = max + Math.log(sum);
            logSum += logD;
            if (logDenominators != null) {
                logDenominators[n] = logD;
            }
            for (int i = 0; i < k; i++) {
                a[i] *= inverse;
                out[i] += a[i];
            }
            if (withP) {
                int at = k + 1;
                for (int i = 0; i < k; i++) {
                    double ai = a[i];
                    for (int j = 0; j <= i; j++) {
                        out[at++] += ai * a[j];
                    }
                }
            }
        }
        out[k] = logSum;
        return out;
    }
}
