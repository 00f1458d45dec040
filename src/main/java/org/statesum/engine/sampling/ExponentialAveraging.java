package org.statesum.engine.sampling;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Exponential averaging (free-energy perturbation, Zwanzig 1954) along the chain of neighbouring
 * states: forward, f_{k+1} - f_k = -ln &lt;exp(-(u_{k+1} - u_k))&gt;_k over the samples of state k;
 * reverse, f_{k+1} - f_k = ln &lt;exp(-(u_k - u_{k+1}))&gt;_{k+1} over the samples of state k+1.
 *
 * <p>The average is a log-sum-exp: -ln mean e^{-w} = ln n - lse(-w). Its asymptotic variance (delta
 * method) is var(e^{-w}) / (n mean(e^{-w})^2) = (mean(e^{-2w}) / mean(e^{-w})^2 - 1) / (n - 1), with the
 * unbiased sample variance, evaluated as exp(lse(-2w) - 2 lse(-w) + ln n) - 1 so that nothing
 * overflows. The estimator is biased and its variance estimate unreliable when the two states
 * overlap poorly; prefer BAR or MBAR.
 *
 * <p>Accuracy: the numerical error bound is a first-order running bound on the log-sum-exp
 * (rounding of each work value, each shifted exponent, the n - 1 additions and the final logarithm),
 * doubled.
 */
public final class ExponentialAveraging {

    private ExponentialAveraging() {
    }

    /**
     * Estimates f_k - f_0 along the chain.
     *
     * @param data the reduced potentials; forward needs at least 2 samples from every state but the
     *        last, reverse from every state but the first
     * @param forward true to average over the lower state of each pair, false over the upper one
     * @throws org.statesum.engine.DomainException {@code SAMPLES_INVALID} when a needed state has fewer
     *         than 2 samples
     */
    public static FreeEnergyEstimate estimate(ReducedPotentials data, boolean forward) {
        int k = data.states();
        double[] steps = new double[k - 1];
        double[] variances = new double[k - 1];
        double[] bounds = new double[k - 1];
        for (int s = 0; s < k - 1; s++) {
            int from = forward ? s : s + 1;
            int to = forward ? s + 1 : s;
            if (data.counts()[from] < 2) {
                throw new org.statesum.engine.DomainException("SAMPLES_INVALID", "/sampleCounts/" + from,
                        "exponential averaging needs at least 2 samples from state " + from);
            }
            double[] one = step(data, from, to);
            steps[s] = forward ? one[0] : -one[0];
            variances[s] = one[1];
            bounds[s] = one[2];
        }
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "log-sum-exp about the largest term");
        precision.put("errorAnalysis", "first-order running error bound, doubled");
        precision.put("uncertainty", "asymptotic (delta method), one standard deviation");
        precision.put("direction", forward ? "forward" : "reverse");
        return new FreeEnergyEstimate("exponential-averaging", PairChain.values(steps),
                PairChain.uncertainties(variances), PairChain.errorBounds(steps, bounds), null, precision, List.of());
    }

    /** {f_to - f_from, its variance, its numerical error bound} from the samples of state {@code from}. */
    static double[] step(ReducedPotentials data, int from, int to) {
        int n = data.counts()[from];
        int offset = data.offset(from);
        double[] minusW = new double[n];
        double[] minusTwoW = new double[n];
        double worstArgument = 0;
        for (int i = 0; i < n; i++) {
            double w = data.u()[to][offset + i] - data.u()[from][offset + i];
            minusW[i] = -w;
            minusTwoW[i] = -2 * w;
            worstArgument = Math.max(worstArgument, Math.abs(w));
        }
        double lse = LogSpace.logSumExp(minusW);
        double logN = Math.log(n);
        double delta = logN - lse;
        double ratio = Math.exp(LogSpace.logSumExp(minusTwoW) - 2 * lse + logN);
        double variance = Math.max(0, ratio - 1) / (n - 1);
        double largest = Double.NEGATIVE_INFINITY;
        for (double x : minusW) {
            largest = Math.max(largest, x);
        }
        double spread = 0;
        for (double x : minusW) {
            spread = Math.max(spread, largest - x);
        }
        // Work value (u|w|), shifted exponent (u(spread)), exp (u), n - 1 additions, ln, the shift back
        // by the largest term, and the subtraction from ln n: each contributes u times its magnitude.
        double u = LogSpace.UNIT_ROUNDOFF;
        double bound = 2 * u * (worstArgument + spread + 2 + (n - 1) + Math.abs(lse - largest)
                + Math.abs(largest) + Math.abs(lse) + logN + Math.abs(delta));
        return new double[] {delta, variance, bound};
    }
}
