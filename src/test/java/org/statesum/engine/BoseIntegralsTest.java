package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.statesum.testing.ExactMath;

/**
 * The six antiderivatives against their definitions in the polylogarithms, each Li_n(e^{-x}) summed
 * as sum e^{-kx} / k^n at 60 digits (independent of the expansion about 0), and within their bounds.
 */
class BoseIntegralsTest {

    private static final MathContext MC = new MathContext(60);
    private static final BigDecimal ZETA2 = ExactMath.PI.multiply(ExactMath.PI, MC).divide(BigDecimal.valueOf(6), MC);
    /** zeta(3) to 40 digits (OEIS A002117). */
    private static final BigDecimal ZETA3 = new BigDecimal("1.202056903159594285399738161511449990765");

    private static BigDecimal li(int n, BigDecimal z) {
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal zk = BigDecimal.ONE;
        for (int k = 1; k < 20_000; k++) {
            zk = zk.multiply(z, MC);
            BigDecimal term = zk.divide(BigDecimal.valueOf(k).pow(n), MC);
            sum = sum.add(term, MC);
            if (term.compareTo(BigDecimal.ONE.movePointLeft(45)) < 0) {
                break;
            }
        }
        return sum;
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.25, 0.4, 0.7, 1.0, 1.3, 1.4999, 1.5, 2, 5, 20, 100})
    void eachAntiderivativeMatchesItsPolylogarithmFormWithinItsBound(double x) {
        BigDecimal bx = new BigDecimal(x);
        BigDecimal z = ExactMath.exp(bx.negate());
        BigDecimal l1 = li(1, z);
        BigDecimal l2 = li(2, z);
        BigDecimal l3 = li(3, z);
        BigDecimal n = z.divide(BigDecimal.ONE.subtract(z, MC), MC);
        BigDecimal x2 = bx.multiply(bx, MC);
        BigDecimal u0 = bx.multiply(l1, MC).add(l2, MC).negate();
        BigDecimal u1 = x2.multiply(l1, MC).add(BigDecimal.valueOf(2).multiply(bx, MC).multiply(l2, MC), MC)
                .add(BigDecimal.valueOf(2).multiply(l3, MC), MC).negate();
        BigDecimal[] exact = {l2, bx.multiply(l2, MC).add(l3, MC), u0, u1,
            x2.multiply(n, MC).negate().add(u0.multiply(BigDecimal.valueOf(2), MC), MC),
            x2.multiply(bx, MC).multiply(n, MC).negate().add(u1.multiply(BigDecimal.valueOf(3), MC), MC)};
        BigDecimal[] atZero = {ZETA2, ZETA3, ZETA2.negate(), ZETA3.multiply(BigDecimal.valueOf(-2)),
            ZETA2.multiply(BigDecimal.valueOf(-2)), ZETA3.multiply(BigDecimal.valueOf(-6))};
        BoseIntegrals.Value v = BoseIntegrals.at(x);
        for (int i = 0; i < 6; i++) {
            BigDecimal want = v.nearZero() ? exact[i].subtract(atZero[i], MC) : exact[i];
            double error = Math.abs(new BigDecimal(v.values()[i]).subtract(want, MC).doubleValue());
            assertTrue(error <= v.bounds()[i], "x = " + x + " antiderivative " + i + ": " + v.values()[i] + " vs "
                    + want + ", error " + error + ", bound " + v.bounds()[i]);
            assertTrue(v.bounds()[i] <= 1e-13 * Math.max(1, Math.abs(want.doubleValue())), "loose: " + x + " " + i
                    + " bound " + v.bounds()[i]);
        }
    }
}
