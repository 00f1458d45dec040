package org.statesum.engine.sampling;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.statesum.engine.DomainException;

/**
 * Bennett's acceptance ratio (Bennett 1976) along the chain of neighbouring states. For a pair A, B
 * with n_A and n_B samples, work values w_F = u_B - u_A on the samples of A and w_R = u_A - u_B on
 * those of B, and M = ln(n_A / n_B), the estimate df = f_B - f_A solves
 * <pre>
 *   sum_A 1 / (1 + exp(M + w_F - df)) = sum_B 1 / (1 + exp(-M + w_R + df)),
 * </pre>
 * taken in logarithms, phi(df) = lse_A(-softplus(M + w_F - df)) - lse_B(-softplus(-M + w_R + df)) = 0.
 * phi increases strictly from -infinity to +infinity, so the root is unique; it is bracketed by
 * doubling steps and found by Brent's method (commons-math3) to {@link #ROOT_ABSOLUTE_ACCURACY}.
 *
 * <p>Variance (Shirts, Bair, Hooker and Pande 2003, eq. 10, with N = n_A + n_B):
 * var(df) = (1/N) [ &lt;1 / (2 + 2 cosh(M + w - df))&gt;^-1 - (N/n_A + N/n_B) ], the average running over
 * all N samples with w = u_B - u_A. It equals the two-state MBAR asymptotic variance.
 *
 * <p>Overlap: the pair's two-state overlap matrix (as MBAR's), O_AB = (1 / n_A) sum_n 1 / (2 + 2 cosh(M
 * + w_n - df)) over the samples of both states and O_BA = O_AB n_A / n_B; the smaller is reported, and
 * below {@link Mbar#POOR_OVERLAP} the pair is named in a {@code STATES_DO_NOT_OVERLAP} warning. When the
 * sum underflows to 0 (the states share no samples at all) the variance and the slope of Bennett's
 * equation are not finite: {@code SAMPLES_DO_NOT_OVERLAP}, a 422 naming the reduced potentials, rather
 * than an answer without an uncertainty.
 *
 * <p>Accuracy: the error bound is the root tolerance plus the first-order rounding error of phi
 * divided by its slope at the root, doubled.
 */
public final class BennettAcceptanceRatio {

    /** Absolute tolerance on df of the root finder: far below any statistical uncertainty. */
    static final double ROOT_ABSOLUTE_ACCURACY = 1e-13;
    /** Relative tolerance on df of the root finder: a few units of roundoff. */
    static final double ROOT_RELATIVE_ACCURACY = 4e-16;
    private static final int MAX_EVALUATIONS = 500;

    private BennettAcceptanceRatio() {
    }

    /**
     * Estimates f_k - f_0 along the chain.
     *
     * @param data the reduced potentials; every state needs at least 2 samples
     * @throws DomainException {@code SAMPLES_INVALID} when a state has fewer than 2 samples
     */
    public static FreeEnergyEstimate estimate(ReducedPotentials data) {
        int k = data.states();
        for (int s = 0; s < k; s++) {
            if (data.counts()[s] < 2) {
                throw new DomainException("SAMPLES_INVALID", "/sampleCounts/" + s,
                        "BAR needs at least 2 samples from every state; state " + s + " has " + data.counts()[s]);
            }
        }
        double[] steps = new double[k - 1];
        double[] variances = new double[k - 1];
        double[] bounds = new double[k - 1];
        int evaluations = 0;
        List<FreeEnergyEstimate.PairOverlap> pairs = new ArrayList<>();
        List<FreeEnergyEstimate.SampleWarning> warnings = new ArrayList<>();
        for (int s = 0; s < k - 1; s++) {
            Pair pair = Pair.of(data, s, s + 1);
            double[] one = pair.solve();
            if (!(Double.isFinite(one[1]) && Double.isFinite(one[2]) && one[4] > 0)) {
                throw new DomainException("SAMPLES_DO_NOT_OVERLAP", "/reducedPotentials", "the samples of states " + s
                        + " and " + (s + 1) + " do not overlap at all (their overlap underflows to 0), so Bennett's "
                        + "equation fixes no finite estimate or uncertainty; add intermediate states");
            }
            steps[s] = one[0];
            variances[s] = one[1];
            bounds[s] = one[2];
            evaluations += (int) one[3];
            pairs.add(new FreeEnergyEstimate.PairOverlap(s, data.counts()[s] + data.counts()[s + 1], Double.NaN, one[4]));
            if (!(one[4] >= Mbar.POOR_OVERLAP)) {
                warnings.add(new FreeEnergyEstimate.SampleWarning("STATES_DO_NOT_OVERLAP", "states " + s + " and "
                        + (s + 1) + " overlap " + String.format("%.3g", one[4]) + ", less than " + Mbar.POOR_OVERLAP
                        + ": the estimate and its uncertainty are unreliable; add intermediate states or samples",
                        new int[] {s, s + 1}));
            }
        }
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "log-sum-exp about the largest term");
        precision.put("solver", "Brent root finding on Bennett's equation in logarithms (commons-math3)");
        precision.put("rootAbsoluteAccuracy", ROOT_ABSOLUTE_ACCURACY);
        precision.put("functionEvaluations", evaluations);
        precision.put("errorAnalysis",
                "root tolerance plus first-order rounding of the equation over its slope, doubled");
        precision.put("uncertainty", "asymptotic (Shirts et al. 2003), one standard deviation");
        return new FreeEnergyEstimate("bar", PairChain.values(steps), PairChain.uncertainties(variances),
                PairChain.errorBounds(steps, bounds), null, pairs, precision, warnings);
    }

    /** The work values of one pair. */
    private record Pair(double[] forward, double[] reverse, double logRatio) {

        static Pair of(ReducedPotentials data, int a, int b) {
            double[][] u = data.u();
            int offsetA = data.offset(a);
            int offsetB = data.offset(b);
            int nA = data.counts()[a];
            int nB = data.counts()[b];
            double[] forward = new double[nA];
            for (int i = 0; i < nA; i++) {
                forward[i] = u[b][offsetA + i] - u[a][offsetA + i];
            }
            double[] reverse = new double[nB];
            for (int i = 0; i < nB; i++) {
                reverse[i] = u[a][offsetB + i] - u[b][offsetB + i];
            }
            return new Pair(forward, reverse, Math.log((double) nA / nB));
        }

        double phi(double df) {
            double[] x = new double[forward.length];
            for (int i = 0; i < x.length; i++) {
                x[i] = -LogSpace.softplus(logRatio + forward[i] - df);
            }
            double[] y = new double[reverse.length];
            for (int i = 0; i < y.length; i++) {
                y[i] = -LogSpace.softplus(-logRatio + reverse[i] + df);
            }
            return LogSpace.logSumExp(x) - LogSpace.logSumExp(y);
        }

        /** {df, variance, error bound, evaluations, overlap}. */
        double[] solve() {
            double guess = 0.5 * (mean(forward) - mean(reverse));
            double lo = guess - 1;
            double hi = guess + 1;
            double width = 1;
            while (phi(lo) > 0) {
                width *= 2;
                lo = guess - width;
            }
            width = 1;
            while (phi(hi) < 0) {
                width *= 2;
                hi = guess + width;
            }
            BrentSolver brent = new BrentSolver(ROOT_RELATIVE_ACCURACY, ROOT_ABSOLUTE_ACCURACY);
            double df = brent.solve(MAX_EVALUATIONS, this::phi, lo, hi, guess);
            int evaluations = brent.getEvaluations();
            return new double[] {df, variance(df), bound(df), evaluations, overlap(df)};
        }

        private double variance(double df) {
            double total = forward.length + reverse.length;
            double sum = 0;
            for (double w : forward) {
                sum += LogSpace.logisticDensity(logRatio + w - df);
            }
            for (double w : reverse) {
                sum += LogSpace.logisticDensity(logRatio - w - df);
            }
            double mean = sum / total;
            double v = (1 / mean - (total / forward.length + total / reverse.length)) / total;
            return Math.max(0, v);
        }

        /** min(O_AB, O_BA) of the two-state overlap matrix at the root. */
        private double overlap(double df) {
            double sum = 0;
            for (double w : forward) {
                sum += LogSpace.logisticDensity(logRatio + w - df);
            }
            for (double w : reverse) {
                sum += LogSpace.logisticDensity(logRatio - w - df);
            }
            return sum / Math.max(forward.length, reverse.length);
        }

        private double bound(double df) {
            // phi'(df) = (weighted mean of 1 - s over A) + (weighted mean of 1 - s over B), each in (0, 1).
            double h = Math.max(1e-6, 1e-6 * Math.abs(df));
            double slope = (phi(df + h) - phi(df - h)) / (2 * h);
            double worst = 0;
            for (double w : forward) {
                worst = Math.max(worst, Math.abs(w));
            }
            for (double w : reverse) {
                worst = Math.max(worst, Math.abs(w));
            }
            double u = LogSpace.UNIT_ROUNDOFF;
            int n = forward.length + reverse.length;
            double phiRounding = 2 * u * (worst + Math.abs(logRatio) + Math.abs(df) + n + 8);
            double tolerance = ROOT_ABSOLUTE_ACCURACY + 2 * ROOT_RELATIVE_ACCURACY * Math.abs(df);
            return 2 * (tolerance + phiRounding / Math.max(slope, Double.MIN_NORMAL));
        }

        private static double mean(double[] x) {
            double s = 0;
            for (double v : x) {
                s += v;
            }
            return s / x.length;
        }
    }
}
