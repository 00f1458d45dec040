package org.statesum.engine.sampling;

import java.util.ArrayList;
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
 * <p>Overlap: the Kish effective sample size of the weights e^{-w}, (sum e^{-w})^2 / sum e^{-2w} =
 * exp(2 lse(-w) - lse(-2w)), says how many samples carry the average; below
 * {@link #FEW_EFFECTIVE_SAMPLES} the pair is named in a {@code STATES_DO_NOT_OVERLAP} warning (the
 * estimate and its uncertainty then rest on a handful of samples and are typically biased). A pair
 * whose variance is not a finite double (the samples' weights span more than the double range) has no
 * usable estimate: {@code SAMPLES_DO_NOT_OVERLAP}, a 422 naming the reduced potentials.
 *
 * <p>Accuracy: the numerical error bound is a first-order running bound on the log-sum-exp
 * (rounding of each work value, each shifted exponent, the n - 1 additions and the final logarithm),
 * doubled.
 */
public final class ExponentialAveraging {

    /**
     * Effective samples below which a pair is reported as not overlapping: an average carried by fewer
     * than ten samples (common practice; the Kish effective size, L. Kish, Survey Sampling, 1965).
     */
    public static final double FEW_EFFECTIVE_SAMPLES = 10;

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
        List<FreeEnergyEstimate.PairOverlap> pairs = new ArrayList<>();
        List<FreeEnergyEstimate.SampleWarning> warnings = new ArrayList<>();
        for (int s = 0; s < k - 1; s++) {
            int from = forward ? s : s + 1;
            int to = forward ? s + 1 : s;
            if (data.counts()[from] < 2) {
                throw new org.statesum.engine.DomainException("SAMPLES_INVALID", "/sampleCounts/" + from,
                        "exponential averaging needs at least 2 samples from state " + from);
            }
            double[] one = step(data, from, to);
            if (!(Double.isFinite(one[1]) && Double.isFinite(one[2]))) {
                throw new org.statesum.engine.DomainException("SAMPLES_DO_NOT_OVERLAP", "/reducedPotentials",
                        "the samples of state " + from + " carry no usable weight for state " + to + ": the "
                                + "exponential weights span beyond the range of a double, so the estimate has no "
                                + "finite uncertainty; add intermediate states");
            }
            steps[s] = forward ? one[0] : -one[0];
            variances[s] = one[1];
            bounds[s] = one[2];
            pairs.add(new FreeEnergyEstimate.PairOverlap(s, data.counts()[from], one[3], Double.NaN));
            if (!(one[3] >= FEW_EFFECTIVE_SAMPLES)) {
                warnings.add(new FreeEnergyEstimate.SampleWarning("STATES_DO_NOT_OVERLAP", "states " + s + " and "
                        + (s + 1) + ": the average over state " + from + " rests on " + String.format("%.3g", one[3])
                        + " effective samples of " + data.counts()[from] + " (fewer than " + (int) FEW_EFFECTIVE_SAMPLES
                        + "): the estimate is likely biased and its uncertainty too small; use BAR or MBAR, or add "
                        + "intermediate states", new int[] {s, s + 1}));
            }
        }
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "log-sum-exp about the largest term");
        precision.put("errorAnalysis", "first-order running error bound, doubled");
        precision.put("uncertainty", "asymptotic (delta method), one standard deviation");
        precision.put("direction", forward ? "forward" : "reverse");
        return new FreeEnergyEstimate("exponential-averaging", PairChain.values(steps),
                PairChain.uncertainties(variances), PairChain.errorBounds(steps, bounds), null, pairs, precision,
                warnings);
    }

    /**
     * {f_to - f_from, its variance, its numerical error bound, the effective sample size} from the
     * samples of state {@code from}.
     */
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
        double lse2 = LogSpace.logSumExp(minusTwoW);
        double ratio = Math.exp(lse2 - 2 * lse + logN);
        double effective = Math.exp(2 * lse - lse2);
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
        return new double[] {delta, variance, bound, effective};
    }
}
