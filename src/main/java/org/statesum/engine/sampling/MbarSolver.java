package org.statesum.engine.sampling;

import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.statesum.engine.Cancellation;

/**
 * Solves the MBAR equations (see {@link Mbar}) and gathers M = W^T W for the covariance. The
 * sampled states' free energies are relative to the first sampled state while solving.
 */
final class MbarSolver {

    /** Convergence: max_i |S_i - 1| (the gradient over N_i) below this. */
    static final double TOLERANCE = 1e-10;
    /**
     * Relative gradient below which Newton takes over from self-consistent iteration: close enough
     * that full Newton steps are usually accepted, reached in a few cheap iterations when states
     * overlap.
     */
    static final double NEWTON_SWITCH = 1e-1;
    /** Self-consistent iterations before Newton takes over regardless. */
    static final int MAX_SELF_CONSISTENT = 8;
    /** Passes over the data before giving up (a warning then says so). */
    static final int MAX_PASSES = 200;
    /** Step halvings before a Newton step is abandoned for a self-consistent one. */
    static final int MAX_HALVINGS = 30;
    /** Objective increase tolerated as rounding, relative to the magnitude of its terms. */
    static final double OBJECTIVE_SLACK = 1e-12;

    private MbarSolver() {
    }

    /**
     * @param freeEnergies f_k for all K states, f of the first sampled state 0
     * @param errorBounds numerical error bound of each f_k
     * @param weightProducts M_ij = sum_n W_in W_jn, K x K
     */
    record Solution(double[] freeEnergies, double[] errorBounds, double[][] weightProducts, boolean converged,
            Map<String, Object> precision) {
    }

    static Solution solve(ReducedPotentials data, List<Integer> sampled) {
        int ks = sampled.size();
        int kAll = data.states();
        int n = data.samples();
        double[][] rows = new double[ks][];
        int[] counts = new int[ks];
        double[] countsD = new double[ks];
        for (int i = 0; i < ks; i++) {
            rows[i] = data.u()[sampled.get(i)];
            counts[i] = data.counts()[sampled.get(i)];
            countsD[i] = counts[i];
        }
        boolean unsampled = ks < kAll;
        // ln D_n of the latest pass: for unsampled states, and for the log-space update below.
        double[] logD = new double[n];
        MbarPass pass = new MbarPass(rows, counts);
        double[] f = new double[ks];
        MbarPass.Sums cur = pass.run(f, countsD, false, logD);
        int passes = 1;
        int sci = 0;
        int newtonIterations = 0;
        int halvings = 0;
        boolean newton = false;
        boolean curIsLast = true;
        double residual = residual(cur.s());
        while (residual > TOLERANCE && passes < MAX_PASSES) {
            double[] step = newton ? newtonStep(cur, countsD) : null;
            if (step != null) {
                newtonIterations++;
                double t = 1;
                boolean accepted = false;
                for (int h = 0; h <= MAX_HALVINGS && passes < MAX_PASSES; h++) {
                    double[] trial = new double[ks];
                    for (int i = 0; i < ks; i++) {
                        trial[i] = f[i] + t * step[i];
                    }
                    MbarPass.Sums next = pass.run(trial, countsD, true, logD);
                    passes++;
                    if (next.objective() <= cur.objective() + slack(cur, f, countsD, n)) {
                        f = trial;
                        cur = next;
                        accepted = true;
                        curIsLast = true;
                        break;
                    }
                    curIsLast = false;
                    t *= 0.5;
                    halvings++;
                }
                if (accepted) {
                    residual = residual(cur.s());
                    continue;
                }
            }
            // Self-consistent step: f_i <- f_i - ln S_i, then hold the first sampled state at 0. When
            // some S_i has underflowed or overflowed (f far from consistent, e.g. states whose
            // potentials differ by thousands of k_B T), the same update is taken in logarithms:
            // f_i <- -ln sum_n exp(-u_in - ln D_n).
            double[] next = new double[ks];
            boolean representable = true;
            for (int i = 0; i < ks; i++) {
                double si = cur.s()[i];
                representable &= si >= Double.MIN_NORMAL && si <= Double.MAX_VALUE;
            }
            if (!representable && !curIsLast) {
                cur = pass.run(f, countsD, newton, logD);
                passes++;
            }
            for (int i = 0; i < ks; i++) {
                next[i] = representable ? f[i] - Math.log(cur.s()[i]) : -logSumExp(rows[i], logD);
            }
            for (int i = ks - 1; i >= 0; i--) {
                next[i] -= next[0];
            }
            if (!newton) {
                sci++;
                newton = residual < NEWTON_SWITCH || sci >= MAX_SELF_CONSISTENT;
            }
            f = next;
            cur = pass.run(f, countsD, newton, logD);
            passes++;
            curIsLast = true;
            residual = residual(cur.s());
        }
        if (cur.p() == null || !curIsLast) {
            cur = pass.run(f, countsD, true, logD);
            passes++;
            residual = residual(cur.s());
        }
        double[] finalStep = ks > 1 ? newtonStep(cur, countsD) : new double[ks];
        double u = LogSpace.UNIT_ROUNDOFF;
        double[] all = new double[kAll];
        double[] bounds = new double[kAll];
        double worstSampled = 0;
        for (int i = 0; i < ks; i++) {
            all[sampled.get(i)] = f[i];
            double correction = finalStep == null ? Math.abs(Math.log(cur.s()[i])) : Math.abs(finalStep[i]);
            bounds[sampled.get(i)] = 2 * correction + 4 * u * (Math.abs(f[i]) + 1);
            worstSampled = Math.max(worstSampled, bounds[sampled.get(i)]);
        }
        double[][] m;
        if (unsampled) {
            for (int s = 0; s < kAll; s++) {
                if (data.counts()[s] == 0) {
                    all[s] = -logSumExp(data.u()[s], logD);
                    bounds[s] = worstSampled + 2 * u * (n + 2 * Math.abs(all[s]) + 4);
                }
            }
            m = weightProducts(data.u(), all, logD);
        } else {
            m = new double[kAll][kAll];
            for (int i = 0; i < ks; i++) {
                for (int j = 0; j < ks; j++) {
                    m[i][j] = cur.p()[i][j] / (countsD[i] * countsD[j]);
                }
            }
        }
        boolean parallel = (long) n * ks >= (1L << 17);
        return new Solution(all, bounds, m, residual <= TOLERANCE,
                Mbar.describe(sci, newtonIterations, halvings, passes, residual, parallel));
    }

    static double residual(double[] s) {
        double r = 0;
        for (double v : s) {
            r = Math.max(r, Math.abs(v - 1));
        }
        return Double.isNaN(r) ? Double.POSITIVE_INFINITY : r;
    }

    private static double slack(MbarPass.Sums cur, double[] f, double[] counts, int n) {
        double scale = Math.abs(cur.objective()) + n;
        for (int i = 0; i < f.length; i++) {
            scale += counts[i] * Math.abs(f[i]);
        }
        return OBJECTIVE_SLACK * scale;
    }

    /** The Newton step with the first state fixed, or null when the Hessian is not positive definite. */
    static double[] newtonStep(MbarPass.Sums cur, double[] counts) {
        int ks = counts.length;
        if (ks == 1) {
            return new double[1];
        }
        int r = ks - 1;
        double[][] h = new double[r][r];
        double[] g = new double[r];
        for (int i = 0; i < r; i++) {
            g[i] = -counts[i + 1] * (cur.s()[i + 1] - 1);
            for (int j = 0; j < r; j++) {
                h[i][j] = (i == j ? counts[i + 1] * cur.s()[i + 1] : 0) - cur.p()[i + 1][j + 1];
            }
        }
        try {
            double[] d = new CholeskyDecomposition(new Array2DRowRealMatrix(h, false), 1e-10, 1e-14)
                    .getSolver().solve(new ArrayRealVector(g, false)).toArray();
            double[] step = new double[ks];
            System.arraycopy(d, 0, step, 1, r);
            for (double v : step) {
                if (!Double.isFinite(v)) {
                    return null;
                }
            }
            return step;
        } catch (MathIllegalArgumentException e) {
            return null;
        }
    }

    /** -f_k = ln sum_n exp(-u_kn - ln D_n), in blocks added in order. */
    private static double logSumExp(double[] row, double[] logD) {
        int n = row.length;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            max = Math.max(max, -row[i] - logD[i]);
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += Math.exp(-row[i] - logD[i] - max);
        }
        return max + Math.log(sum);
    }

    /** M_ij = sum_n W_in W_jn over all states, W_kn = exp(f_k - u_kn - ln D_n), blocks in parallel. */
    private static double[][] weightProducts(double[][] u, double[] f, double[] logD) {
        int k = u.length;
        int n = logD.length;
        int blocks = (n + MbarPass.BLOCK - 1) / MbarPass.BLOCK;
        double[][][] partial = new double[blocks][][];
        Runnable stop = Cancellation.current();
        IntStream.range(0, blocks).parallel().forEach(b -> {
            stop.run(); // a cooperative stop between blocks of samples; see Cancellation
            double[][] m = new double[k][k];
            double[] w = new double[k];
            for (int s = b * MbarPass.BLOCK; s < Math.min(n, (b + 1) * MbarPass.BLOCK); s++) {
                for (int i = 0; i < k; i++) {
                    w[i] = Math.exp(f[i] - u[i][s] - logD[s]);
                }
                for (int i = 0; i < k; i++) {
                    for (int j = 0; j <= i; j++) {
                        m[i][j] += w[i] * w[j];
                    }
                }
            }
            partial[b] = m;
        });
        double[][] m = new double[k][k];
        for (double[][] part : partial) {
            for (int i = 0; i < k; i++) {
                for (int j = 0; j <= i; j++) {
                    m[i][j] += part[i][j];
                }
            }
        }
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < i; j++) {
                m[j][i] = m[i][j];
            }
        }
        return m;
    }
}
