package org.statesum.engine.sampling;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.DomainException;

/**
 * The multistate Bennett acceptance ratio (Shirts and Chodera 2008). The free energies solve
 * <pre>
 *   f_i = -ln sum_n exp(-u_in) / sum_k N_k exp(f_k - u_kn),   i = 0..K-1,
 * </pre>
 * which for the sampled states is the stationary point of the convex function
 * A(f) = sum_n ln sum_k N_k exp(f_k - u_kn) - sum_k N_k f_k, with gradient N_i (S_i - 1), S_i =
 * sum_n W_in, and Hessian N_i S_i delta_ij - sum_n N_i W_in N_j W_jn.
 *
 * <p>Solver ({@link MbarSolver}): self-consistent iteration f_i &lt;- f_i - ln S_i from f = 0 until the
 * relative gradient max |S_i - 1| is below {@link MbarSolver#NEWTON_SWITCH}, then Newton's method on
 * A with the first sampled state held fixed, with backtracking on A; converged when the relative
 * gradient is below {@link MbarSolver#TOLERANCE}. Unsampled states follow from the converged
 * denominators by one log-sum-exp each. All sums over samples are taken in logarithms about their
 * largest term.
 *
 * <p>Uncertainties: {@link MbarCovariance}. Diagnostics: the overlap matrix, its second-largest
 * eigenvalue and Kish's effective sample sizes; a warning names the states whose overlap with every
 * other state is below {@link #POOR_OVERLAP}.
 *
 * <p>Accuracy: the error bound of f_k is twice the Newton correction that the final iterate would
 * still receive (Newton converges quadratically, so the remaining error is at most about that step)
 * plus the rounding of the final log-sum-exp, first order.
 */
public final class Mbar {

    /**
     * Overlap below which a state is reported as not overlapping: 0.03 is the rule of thumb used in
     * practice for neighbouring states (common practice).
     */
    public static final double POOR_OVERLAP = 0.03;

    private Mbar() {
    }

    /**
     * Estimates f_k - f_0 for every state.
     *
     * @param data the reduced potentials; at least one state must have samples
     * @throws DomainException {@code SAMPLES_INVALID} when no state has samples
     */
    public static FreeEnergyEstimate estimate(ReducedPotentials data) {
        int k = data.states();
        List<Integer> sampled = new ArrayList<>();
        for (int s = 0; s < k; s++) {
            if (data.counts()[s] > 0) {
                sampled.add(s);
            }
        }
        if (sampled.isEmpty() || data.samples() == 0) {
            throw new DomainException("SAMPLES_INVALID", "/sampleCounts", "MBAR needs samples from at least one state");
        }
        MbarSolver.Solution solution = MbarSolver.solve(data, sampled);
        double[] counts = new double[k];
        for (int s = 0; s < k; s++) {
            counts[s] = data.counts()[s];
        }
        double[][] m = solution.weightProducts();
        double[] f = solution.freeEnergies();
        double[] values = new double[k];
        double[] bounds = new double[k];
        for (int s = 0; s < k; s++) {
            values[s] = f[s] - f[0];
            bounds[s] = s == 0 ? 0 : solution.errorBounds()[s] + solution.errorBounds()[0]
                    + LogSpace.UNIT_ROUNDOFF * Math.abs(values[s]);
        }
        double[][] overlap = MbarCovariance.overlap(m, counts);
        double[] ess = new double[k];
        for (int s = 0; s < k; s++) {
            ess[s] = m[s][s] > 0 ? 1 / m[s][s] : 0;
        }
        double second = MbarCovariance.secondLargestEigenvalue(m, counts);
        List<FreeEnergyEstimate.SampleWarning> warnings = new ArrayList<>();
        poorOverlap(overlap).ifPresent(warnings::add);
        if (!solution.converged()) {
            warnings.add(new FreeEnergyEstimate.SampleWarning("NOT_CONVERGED", "the MBAR equations did not converge to "
                    + "a relative gradient of " + MbarSolver.TOLERANCE + " within " + MbarSolver.MAX_PASSES
                    + " passes; see precision.relativeGradient", new int[0]));
        }
        return new FreeEnergyEstimate("mbar", values, MbarCovariance.differenceUncertainties(m, counts), bounds,
                new FreeEnergyEstimate.Overlap(overlap, second, ess), List.of(), solution.precision(), warnings);
    }

    private static java.util.Optional<FreeEnergyEstimate.SampleWarning> poorOverlap(double[][] o) {
        int k = o.length;
        List<Integer> poor = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            double best = 0;
            for (int j = 0; j < k; j++) {
                if (j != i) {
                    best = Math.max(best, Math.max(o[i][j], o[j][i]));
                }
            }
            if (!(best >= POOR_OVERLAP)) {
                poor.add(i);
            }
        }
        if (poor.isEmpty()) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new FreeEnergyEstimate.SampleWarning("STATES_DO_NOT_OVERLAP",
                "states " + poor + " overlap less than " + POOR_OVERLAP + " with every other state: their free "
                        + "energies and uncertainties are unreliable; add intermediate states or more samples",
                poor.stream().mapToInt(Integer::intValue).toArray()));
    }

    static Map<String, Object> describe(int sci, int newton, int halvings, int passes, double residual,
            boolean parallel) {
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "log-sum-exp about the largest term; block sums added in order with Kahan "
                + "compensation");
        precision.put("solver", "self-consistent iteration, then Newton's method with backtracking on the "
                + "convex MBAR objective");
        precision.put("selfConsistentIterations", sci);
        precision.put("newtonIterations", newton);
        precision.put("lineSearchHalvings", halvings);
        precision.put("passes", passes);
        precision.put("relativeGradient", residual);
        precision.put("convergenceTolerance", MbarSolver.TOLERANCE);
        precision.put("errorAnalysis", "twice the remaining Newton correction plus first-order rounding");
        precision.put("uncertainty", "asymptotic covariance (Shirts and Chodera 2008), one standard deviation");
        precision.put("parallel", parallel);
        return precision;
    }
}
