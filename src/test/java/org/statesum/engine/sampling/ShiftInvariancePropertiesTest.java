package org.statesum.engine.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.LongRange;

/**
 * Identity of every estimator: adding a constant c_k to the reduced potential of state k multiplies
 * Z_k by e^{-c_k}, so f_k - f_0 moves by exactly c_k - c_0, and the uncertainties do not move.
 */
class ShiftInvariancePropertiesTest {

    private static final HarmonicWells WELLS =
            new HarmonicWells(new double[] {1, 1.6, 2.5}, new double[] {0, 0.4, 0.8});

    @Property(tries = 40)
    void everyEstimatorMovesWithTheShift(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
            @ForAll @DoubleRange(min = -50, max = 50) double c1,
            @ForAll @DoubleRange(min = -50, max = 50) double c2) {
        ReducedPotentials data = WELLS.sample(new int[] {60, 60, 60}, seed);
        double[] shifts = {0, c1, c2};
        double[][] moved = new double[3][];
        for (int k = 0; k < 3; k++) {
            moved[k] = data.u()[k].clone();
            for (int n = 0; n < moved[k].length; n++) {
                moved[k][n] += shifts[k];
            }
        }
        ReducedPotentials shifted = ReducedPotentials.of(moved, data.counts());
        check(Mbar.estimate(data), Mbar.estimate(shifted), shifts);
        check(BennettAcceptanceRatio.estimate(data), BennettAcceptanceRatio.estimate(shifted), shifts);
        check(ExponentialAveraging.estimate(data, true), ExponentialAveraging.estimate(shifted, true), shifts);
        check(ExponentialAveraging.estimate(data, false), ExponentialAveraging.estimate(shifted, false), shifts);
    }

    private static void check(FreeEnergyEstimate before, FreeEnergyEstimate after, double[] shifts) {
        for (int k = 1; k < 3; k++) {
            // Both error bounds, plus the rounding of each u + c (ulp(50) / 2 = 3.6e-15 per element,
            // propagated through weighted averages): 1e-13 covers it with room.
            double tolerance = before.errorBounds()[k] + after.errorBounds()[k] + 1e-13;
            assertEquals(before.values()[k] + shifts[k], after.values()[k], tolerance, before.method() + " f_" + k);
            // The uncertainties depend on the shifted work values only through rounding.
            assertEquals(before.uncertainties()[k], after.uncertainties()[k],
                    1e-9 + 1e-9 * before.uncertainties()[k]);
        }
    }
}
