package org.statesum.testing;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * An independent 40-digit evaluation of the harmonic thermodynamics of a piecewise-linear density of
 * states, for checking {@code LinearDensityOfStates}: the integrals over each segment by tanh-sinh
 * quadrature (H. Takahasi and M. Mori, Publ. RIMS Kyoto Univ. 9 (1974) 721), in BigDecimal, on pieces
 * at most two units of x = theta / T wide (the integrands' poles lie at x = 2 pi i k), the x range cut
 * where e^{-x} has fallen 1e-51 below its value at the first node. Nodes are kept as distances from the nearer end, so that the log
 * singularity of ln(1 - e^{-x}) at x = 0 is resolved.
 */
public final class ExactDensityOfStates {

    private static final MathContext MC = new MathContext(60, RoundingMode.HALF_EVEN);
    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    /** Step and half-width in t of the tanh-sinh rule: nodes to |t| = 4.4, where weights are below 1e-60. */
    private static final int STEPS_PER_UNIT = 12;
    private static final double T_MAX = 4.4;
    private static final double X_CUT = 118;
    private static final double[] NODE_U;
    private static final BigDecimal[] NEAR;
    private static final BigDecimal[] WEIGHT;

    static {
        int half = (int) Math.ceil(T_MAX * STEPS_PER_UNIT);
        NODE_U = new double[2 * half + 1];
        NEAR = new BigDecimal[2 * half + 1];
        WEIGHT = new BigDecimal[2 * half + 1];
        BigDecimal halfPi = ExactMath.PI.divide(TWO, MC);
        BigDecimal h = BigDecimal.ONE.divide(BigDecimal.valueOf(STEPS_PER_UNIT), MC);
        for (int k = -half; k <= half; k++) {
            BigDecimal t = h.multiply(BigDecimal.valueOf(k), MC);
            BigDecimal et = ExactMath.exp(t);
            BigDecimal sinh = et.subtract(BigDecimal.ONE.divide(et, MC), MC).divide(TWO, MC);
            BigDecimal cosh = et.add(BigDecimal.ONE.divide(et, MC), MC).divide(TWO, MC);
            BigDecimal y = halfPi.multiply(sinh, MC);
            // distance of the node from its nearer end of [-1, 1]: 1 - tanh|y| = 2 / (1 + e^{2|y|})
            BigDecimal e2y = ExactMath.exp(y.abs().multiply(TWO, MC));
            BigDecimal near = TWO.divide(BigDecimal.ONE.add(e2y, MC), MC);
            BigDecimal coshY = ExactMath.exp(y.abs()).add(ExactMath.exp(y.abs().negate()), MC).divide(TWO, MC);
            int i = k + half;
            NODE_U[i] = Math.signum(k);
            NEAR[i] = near;
            WEIGHT[i] = halfPi.multiply(cosh, MC).divide(coshY.multiply(coshY, MC), MC).multiply(h, MC);
        }
    }

    private ExactDensityOfStates() {
    }

    /** F/k, U/k, S/k and C_V/k (K, K, 1, 1) of the density g (per K at the nodes theta, K) at T (K, &gt; 0). */
    public static BigDecimal[] thermodynamics(double[] theta, double[] g, double temperature) {
        BigDecimal t = new BigDecimal(temperature);
        BigDecimal zeroPoint = BigDecimal.ZERO;
        BigDecimal[] sums = {BigDecimal.ZERO, BigDecimal.ZERO, BigDecimal.ZERO};
        for (int i = 0; i + 1 < theta.length; i++) {
            BigDecimal a = new BigDecimal(theta[i]);
            BigDecimal b = new BigDecimal(theta[i + 1]);
            BigDecimal ga = new BigDecimal(g[i]);
            BigDecimal gb = new BigDecimal(g[i + 1]);
            BigDecimal width = b.subtract(a, MC);
            // int g theta / 2 = width / 12 (g_a (2a + b) + g_b (a + 2b))
            zeroPoint = zeroPoint.add(width.divide(BigDecimal.valueOf(12), MC).multiply(
                    ga.multiply(a.multiply(TWO).add(b), MC).add(gb.multiply(a.add(b.multiply(TWO)), MC), MC), MC), MC);
            BigDecimal xa = a.divide(t, MC);
            BigDecimal xb = b.divide(t, MC);
            if (xa.doubleValue() > theta[0] / temperature + X_CUT) {
                continue; // e^{-x} below 1e-51 on the whole segment: thermally nothing
            }
            double end = Math.min(xb.doubleValue(), xa.doubleValue() + X_CUT);
            BigDecimal xEnd = end == xb.doubleValue() ? xb : new BigDecimal(end);
            BigDecimal slope = gb.subtract(ga, MC).divide(width, MC); // per K of theta
            // pieces at most 2 wide; near x = 0 (the log singularity of ln(1 - e^{-x})) each piece at most
            // 3 times as long as its distance from 0, so that no singularity sits close to a piece's end
            BigDecimal lo = xa;
            while (lo.compareTo(xEnd) < 0) {
                double l = lo.doubleValue();
                double next = l == 0 ? 1 : Math.min(l + 2, l < 1 ? 4 * l : l + 2);
                BigDecimal hi = next >= xEnd.doubleValue() ? xEnd : new BigDecimal(next);
                BigDecimal[] piece = piece(lo, hi, xa, ga, slope, t);
                for (int q = 0; q < 3; q++) {
                    sums[q] = sums[q].add(piece[q], MC);
                }
                lo = hi;
            }
        }
        // sums: int g ln(1 - e^-x) d theta, int g x n d theta, int g x^2 e^x n^2 d theta
        BigDecimal f = zeroPoint.add(t.multiply(sums[0], MC), MC);
        BigDecimal u = zeroPoint.add(t.multiply(sums[1], MC), MC);
        BigDecimal s = sums[1].subtract(sums[0], MC);
        return new BigDecimal[] {f, u, s, sums[2]};
    }

    /** The three integrals over x in [lo, hi] of g(T x) phi(x) T dx, g = g_a + slope (T x - T x_a). */
    private static BigDecimal[] piece(BigDecimal lo, BigDecimal hi, BigDecimal xa, BigDecimal ga, BigDecimal slope,
            BigDecimal t) {
        BigDecimal halfWidth = hi.subtract(lo, MC).divide(TWO, MC);
        BigDecimal[] out = {BigDecimal.ZERO, BigDecimal.ZERO, BigDecimal.ZERO};
        for (int i = 0; i < NEAR.length; i++) {
            BigDecimal offset = halfWidth.multiply(NEAR[i], MC);
            BigDecimal x = NODE_U[i] < 0 ? lo.add(offset, MC) : hi.subtract(offset, MC);
            if (NODE_U[i] == 0) {
                x = lo.add(halfWidth, MC);
            }
            if (x.signum() <= 0) {
                continue;
            }
            BigDecimal e = ExactMath.exp(x.negate());
            BigDecimal oneMinus = oneMinusExp(x);
            BigDecimal n = e.divide(oneMinus, MC);
            BigDecimal g = ga.add(slope.multiply(t.multiply(x.subtract(xa, MC), MC), MC), MC);
            BigDecimal w = WEIGHT[i].multiply(halfWidth, MC).multiply(t, MC).multiply(g, MC);
            out[0] = out[0].add(w.multiply(logOneMinus(e, oneMinus), MC), MC);
            out[1] = out[1].add(w.multiply(x.multiply(n, MC), MC), MC);
            // x^2 e^x n^2 = x^2 n (1 + n)
            out[2] = out[2].add(w.multiply(x.multiply(x, MC).multiply(n, MC).multiply(BigDecimal.ONE.add(n), MC), MC), MC);
        }
        return out;
    }

    /** ln(1 - e) keeping the relative precision of a tiny e: -sum e^k / k below e = 1/2. */
    private static BigDecimal logOneMinus(BigDecimal e, BigDecimal oneMinus) {
        if (e.compareTo(new BigDecimal("0.5")) >= 0) {
            return ExactMath.log(oneMinus);
        }
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal ek = e;
        for (int k = 1; ek.compareTo(e.movePointLeft(62)) > 0; k++) {
            sum = sum.subtract(ek.divide(BigDecimal.valueOf(k), MC), MC);
            ek = ek.multiply(e, MC);
        }
        return sum;
    }

    /** 1 - e^{-x} without cancellation: its Taylor series below x = 1/2. */
    private static BigDecimal oneMinusExp(BigDecimal x) {
        if (x.compareTo(new BigDecimal("0.5")) >= 0) {
            return BigDecimal.ONE.subtract(ExactMath.exp(x.negate()), MC);
        }
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal term = x;
        for (int k = 1; term.abs().compareTo(x.abs().movePointLeft(62)) > 0; k++) {
            sum = sum.add(term, MC);
            term = term.multiply(x, MC).divide(BigDecimal.valueOf(-(k + 1)), MC);
        }
        return sum;
    }
}
