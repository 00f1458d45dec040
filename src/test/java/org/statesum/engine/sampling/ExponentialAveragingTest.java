package org.statesum.engine.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import org.junit.jupiter.api.Test;
import org.statesum.testing.ExactMath;

class ExponentialAveragingTest {

    /** 50 significant digits: the reference is exact to far below binary64. */
    private static final MathContext MC = new MathContext(50, RoundingMode.HALF_EVEN);

    @Test
    void matchesADirectFiftyDigitEvaluation() {
        // Work values spanning 1500 k_B T, so that e^{-w} alone would overflow and underflow binary64;
        // the samples of state 0 are columns 0-5, state 1 columns 6-8.
        double[] u0 = {0, 0, 0, 0, 0, 0, 0, 0, 0};
        double[] u1 = {-750.25, -749.5, 0.125, 3.75, 745.0, -748.0, 1, 2, 3};
        ReducedPotentials data = ReducedPotentials.of(new double[][] {u0, u1}, new int[] {6, 3});
        FreeEnergyEstimate forward = ExponentialAveraging.estimate(data, true);
        double expected = reference(u1, u0, 0, 6);
        double error = Math.abs(forward.values()[1] - expected);
        // The reported bound must hold and must not be loose by orders of magnitude.
        assertTrue(error <= forward.errorBounds()[1], error + " > " + forward.errorBounds()[1]);
        assertTrue(forward.errorBounds()[1] < 1e4 * Math.max(error, Math.ulp(expected)));
        assertEquals(expected, forward.values()[1], 4 * Math.ulp(expected));
        FreeEnergyEstimate reverse = ExponentialAveraging.estimate(data, false);
        // Reverse: f_1 - f_0 = +ln <exp(-(u_0 - u_1))>_1 = -(f_0 - f_1 by forward averaging from state 1).
        double expectedReverse = -reference(u0, u1, 6, 9);
        assertEquals(expectedReverse, reverse.values()[1], 4 * Math.ulp(expectedReverse));
    }

    /** -ln (1/n) sum exp(-(u_to - u_from)) over columns [from, to), in 50-digit arithmetic. */
    private static double reference(double[] uTo, double[] uFrom, int from, int to) {
        BigDecimal sum = BigDecimal.ZERO;
        for (int i = from; i < to; i++) {
            BigDecimal w = new BigDecimal(uTo[i]).subtract(new BigDecimal(uFrom[i]), MC);
            sum = sum.add(ExactMath.exp(w.negate()), MC);
        }
        BigDecimal mean = sum.divide(BigDecimal.valueOf(to - from), MC);
        return ExactMath.log(mean).negate().doubleValue();
    }
}
