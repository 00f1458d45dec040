package org.statesum.engine.sampling;

import java.util.List;
import java.util.Map;

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
            double[] step = newton ? MbarNewton.step(cur, countsD) : null;
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
                    if (next.objective() <= cur.objective() + MbarNewton.slack(cur, f, countsD, n)) {
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
                next[i] = representable ? f[i] - Math.log(cur.s()[i]) : -MbarWeights.logSumExp(rows[i], logD);
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
        double[] finalStep = ks > 1 ? MbarNewton.step(cur, countsD) : new double[ks];
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
                    all[s] = -MbarWeights.logSumExp(data.u()[s], logD);
                    bounds[s] = worstSampled + 2 * u * (n + 2 * Math.abs(all[s]) + 4);
                }
            }
            m = MbarWeights.products(data.u(), all, logD);
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
}
