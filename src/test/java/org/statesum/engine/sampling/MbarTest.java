package org.statesum.engine.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class MbarTest {

    private final HarmonicWells wells = new HarmonicWells(new double[] {1, 2, 4, 3}, new double[] {0, 0.5, 1, 1.5});

    @Test
    void harmonicWellsGiveTheAnalyticDifferences() {
        FreeEnergyEstimate mbar = Mbar.estimate(wells.sample(new int[] {4000, 4000, 4000, 4000}, 11));
        for (int k = 1; k < 4; k++) {
            // Within 4 reported standard deviations of the analytic value (HarmonicWells): a failure of
            // the estimate, not of chance, below a 1e-4 probability.
            double sd = mbar.uncertainties()[k];
            assertEquals(wells.exactDifference(k), mbar.values()[k], 4 * sd, "state " + k);
            assertTrue(sd > 0 && sd < 0.05, "sd " + sd);
        }
        assertTrue((double) mbar.precision().get("relativeGradient") < 1e-10);
        assertTrue(mbar.warnings().isEmpty());
    }

    @Test
    void anUnsampledStateIsEstimatedFromThePool() {
        FreeEnergyEstimate mbar = Mbar.estimate(wells.sample(new int[] {4000, 4000, 0, 4000}, 12));
        // State 2 (kappa 4, centre 1) sits between sampled wells; 4 sd as above.
        assertEquals(wells.exactDifference(2), mbar.values()[2], 4 * mbar.uncertainties()[2]);
        // An unsampled state takes no samples: its column of the overlap matrix is zero.
        assertEquals(0, mbar.overlap().matrix()[0][2], 0);
    }

    @Test
    void twoStateMbarIsBar() {
        HarmonicWells two = new HarmonicWells(new double[] {1, 2.5}, new double[] {0, 0.7});
        ReducedPotentials data = two.sample(new int[] {300, 500}, 13);
        FreeEnergyEstimate mbar = Mbar.estimate(data);
        FreeEnergyEstimate bar = BennettAcceptanceRatio.estimate(data);
        // Both solve the same equation (Shirts and Chodera 2008, sec. III); 1e-8 is the required
        // agreement, far above both solvers' tolerances (1e-10 relative gradient, 1e-13 on df).
        assertEquals(bar.values()[1], mbar.values()[1], 1e-8);
        // The asymptotic variances coincide as well (Shirts et al. 2003 vs. the MBAR covariance).
        assertEquals(bar.uncertainties()[1], mbar.uncertainties()[1], 1e-8);
        // Each reports a bound on its numerical error; together they must cover the disagreement.
        assertTrue(Math.abs(bar.values()[1] - mbar.values()[1]) <= bar.errorBounds()[1] + mbar.errorBounds()[1]);
    }

    @Test
    void statesWhosePotentialsDifferByThousandsOfKtConverge() {
        // Offsets of thousands of k_B T between states (absolute energies at different temperatures):
        // the first weights underflow, and the update must be taken in logarithms.
        ReducedPotentials data = wells.sample(new int[] {500, 500, 500, 500}, 15);
        double[] shifts = {0, 5000, -3000, 800};
        double[][] shifted = new double[4][];
        for (int k = 0; k < 4; k++) {
            shifted[k] = data.u()[k].clone();
            for (int n = 0; n < shifted[k].length; n++) {
                shifted[k][n] += shifts[k];
            }
        }
        FreeEnergyEstimate before = Mbar.estimate(data);
        FreeEnergyEstimate after = Mbar.estimate(ReducedPotentials.of(shifted, data.counts()));
        assertTrue((double) after.precision().get("relativeGradient") < 1e-10);
        for (int k = 1; k < 4; k++) {
            // Adding a shift of up to 5000 rounds each u by up to ulp(5000) / 2 = 4.5e-13.
            double tolerance = before.errorBounds()[k] + after.errorBounds()[k] + 2e-12;
            assertEquals(before.values()[k] + shifts[k], after.values()[k], tolerance, "state " + k);
        }
    }

    @Test
    void shiftingAStatesPotentialShiftsItsFreeEnergyByTheSameAmount() {
        // u_k -> u_k + c_k multiplies Z_k by e^{-c_k}, so f_k -> f_k + c_k (identity of the estimator:
        // W_kn is unchanged once f_k absorbs c_k). Checked to the solver's error bounds.
        ReducedPotentials data = wells.sample(new int[] {500, 500, 0, 500}, 14);
        double[] shifts = {3.5, -20, 7.25, 0.125};
        double[][] shifted = new double[4][];
        for (int k = 0; k < 4; k++) {
            shifted[k] = data.u()[k].clone();
            for (int n = 0; n < shifted[k].length; n++) {
                shifted[k][n] += shifts[k];
            }
        }
        FreeEnergyEstimate before = Mbar.estimate(data);
        FreeEnergyEstimate after = Mbar.estimate(ReducedPotentials.of(shifted, data.counts()));
        for (int k = 1; k < 4; k++) {
            // Adding the shift rounds each u once (u |u| relative), hence the extra 1e-12.
            double tolerance = before.errorBounds()[k] + after.errorBounds()[k] + 1e-12;
            assertEquals(before.values()[k] + shifts[k] - shifts[0], after.values()[k], tolerance, "state " + k);
            assertEquals(before.uncertainties()[k], after.uncertainties()[k], 1e-9);
        }
    }

    @Test
    void ninetyFivePercentIntervalsCoverTheTruthNinetyFivePercentOfTheTime() {
        // The validation design of Shirts and Chodera 2008, sec. V.A: repeat the experiment with new
        // samples and count how often f +/- 1.96 sd holds the analytic value.
        HarmonicWells three = new HarmonicWells(new double[] {1, 1.8, 3}, new double[] {0, 0.4, 0.9});
        int replicates = 200;
        int mbarHits = 0;
        int barHits = 0;
        int intervals = 0;
        for (int r = 0; r < replicates; r++) {
            ReducedPotentials data = three.sample(new int[] {100, 100, 100}, 1000 + r);
            FreeEnergyEstimate mbar = Mbar.estimate(data);
            FreeEnergyEstimate bar = BennettAcceptanceRatio.estimate(data);
            for (int k = 1; k < 3; k++) {
                double truth = three.exactDifference(k);
                mbarHits += Math.abs(mbar.values()[k] - truth) <= 1.96 * mbar.uncertainties()[k] ? 1 : 0;
                barHits += Math.abs(bar.values()[k] - truth) <= 1.96 * bar.uncertainties()[k] ? 1 : 0;
                intervals++;
            }
        }
        double mbarCoverage = (double) mbarHits / intervals;
        double barCoverage = (double) barHits / intervals;
        assertEquals(0.95, mbarCoverage, 0.03, "MBAR coverage");
        assertEquals(0.95, barCoverage, 0.03, "BAR coverage");
    }
}
