package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.statesum.testing.ExactCanonical;
import org.statesum.testing.ExactMath;

/** The engine against closed forms and published values of textbook systems. */
class PublishedValuesTest {

    private static final double U = 0x1.0p-53;

    private static CanonicalTable evaluate(double[] e, double[] g, double... t) {
        return CanonicalEnsemble.evaluate(LevelSet.ofDegeneracies(e, g), t, false);
    }

    @Test
    void twoLevelHeatCapacityPeaksAtThePublishedTemperatureAndHeight() {
        // Schottky anomaly of two non-degenerate levels a gap D apart: C_V / k = x^2 e^x / (1 + e^x)^2,
        // x = D / kT; its maximum C_V = 0.43923 k at kT / D = 0.41678 (textbook result, e.g. Kittel and
        // Kroemer, Thermal Physics, 2nd ed., 1980, the two-state system). Re-derived here: dC_V/dx = 0
        // reduces to (x - 2) e^x = x + 2, solved with commons-math3's Brent solver.
        BrentSolver solver = new BrentSolver(1e-15, 1e-15);
        double xStar = solver.solve(100, x -> (x - 2) * Math.exp(x) - (x + 2), 1.5, 4.0);
        double tStar = 1 / xStar;
        double closed = xStar * xStar * Math.exp(xStar) / Math.pow(1 + Math.exp(xStar), 2);
        assertEquals(0.41678, tStar, 5e-6);
        assertEquals(0.43923, closed, 5e-6);
        CanonicalTable table = evaluate(new double[] {0, 1}, new double[] {1, 1}, tStar * (1 - 1e-3), tStar,
                tStar * (1 + 1e-3));
        double[] cv = table.heatCapacityOverBoltzmann().values();
        // The closed form in double carries a few ulps (exp, squares, a quotient): 16 u relative.
        assertEquals(closed, cv[1], table.heatCapacityOverBoltzmann().errorBounds()[1] + 16 * U * closed);
        assertEquals(0.43923, cv[1], 5e-6);
        assertTrue(cv[0] < cv[1] && cv[2] < cv[1], "a maximum");
    }

    @Test
    void harmonicLadderMatchesTheTruncatedClosedForm() {
        // E_n = n theta, n < N: Z_N = (1 - e^(-N x)) / (1 - e^(-x)), x = theta / T; for N -> infinity the
        // oscillator ln Z = -ln(1 - e^-x), U / k = theta / (e^x - 1), C_V / k = x^2 e^x / (e^x - 1)^2 (standard
        // result, e.g. McQuarrie, Statistical Mechanics, 1976, the vibrational partition function).
        int n = 4000;
        double[] e = new double[n];
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = i;
            g[i] = 1;
        }
        double[] temperatures = {0.05, 0.3, 1, 7, 40};
        CanonicalTable table = evaluate(e, g, temperatures);
        for (int j = 0; j < temperatures.length; j++) {
            double x = 1 / temperatures[j];
            double em1 = Math.expm1(x);
            // Truncation: ln Z_inf - ln Z_N = -log1p(-e^{-N x}) <= 2 e^{-N x}: below 1e-40 here (N x >= 100).
            double truncation = 2 * Math.exp(-n * x);
            double lnZ = -Math.log1p(-Math.exp(-x));
            double uK = 1 / em1;
            double cv = x * x * (em1 + 1) / (em1 * em1);
            // The closed forms in double: a few roundings each, 8 u relative plus the truncation
            // (and U and C_V pick up the truncated tail N x e^{-N x}, N^2 x^2 e^{-N x}, far below).
            assertEquals(lnZ, table.logPartitionFunction().values()[j],
                    table.logPartitionFunction().errorBounds()[j] + 8 * U * lnZ + truncation);
            assertEquals(uK, table.internalEnergyKelvin().values()[j],
                    table.internalEnergyKelvin().errorBounds()[j] + 8 * U * uK + 1e-30);
            assertEquals(cv, table.heatCapacityOverBoltzmann().values()[j],
                    table.heatCapacityOverBoltzmann().errorBounds()[j] + 16 * U * cv + 1e-30);
        }
    }

    @Test
    void rigidRotorLadderApproachesMulhollandsSeries() {
        // Linear rigid rotor, E_J = J (J + 1) theta, g_J = 2J + 1. Mulholland (Proc. Camb. Phil. Soc. 24
        // (1928) 280), Euler-Maclaurin: Z = (T / theta)(1 + h/3 + h^2/15 + 4 h^3/315 + O(h^4)), h = theta / T.
        // Hence ln Z = -ln h + h/3 + h^2/90 + 8 h^3/2835 and C_V / k = 1 + h^2/45 + 16 h^3/945 (derived
        // here by expanding the logarithm and differentiating twice in T).
        int jMax = 3000;
        double[] e = new double[jMax + 1];
        double[] g = new double[jMax + 1];
        for (int j = 0; j <= jMax; j++) {
            e[j] = (double) j * (j + 1);
            g[j] = 2 * j + 1;
        }
        double[] temperatures = {50, 100, 300, 1000};
        CanonicalTable table = evaluate(e, g, temperatures);
        for (int k = 0; k < temperatures.length; k++) {
            double h = 1 / temperatures[k];
            double lnZ = -Math.log(h) + h / 3 + h * h / 90 + 8 * h * h * h / 2835;
            double cv = 1 + h * h / 45 + 16 * h * h * h / 945;
            // Tolerance: the first omitted term, O(h^4) with a coefficient below 1 in ln Z (the next
            // Euler-Maclaurin term of Z is of order h^4 / 315, recalled from memory) and below 20 in C_V
            // (two derivatives of h^4 multiply its coefficient by at most 4 * 5). The ladder stops at
            // J = 3000, where J (J + 1) h >= 9000: its tail is below e^-9000.
            assertEquals(lnZ, table.logPartitionFunction().values()[k], Math.pow(h, 4));
            assertEquals(cv, table.heatCapacityOverBoltzmann().values()[k], 20 * Math.pow(h, 4));
        }
    }

    @Test
    void degenerateGroundStateGivesEntropyKLnG0WithoutNaN() {
        // Two levels at the lowest energy (g = 2 and 1) make g_0 = 3: S -> k ln 3, C_V -> 0 (third law with
        // a degenerate ground state; common practice).
        double[] e = {0, 0, 1, 2};
        double[] g = {2, 1, 3, 5};
        CanonicalTable table = evaluate(e, g, 0, 1e-12, 1e-3, 0.01);
        double ln3 = Math.log(3);
        for (int j = 0; j < 4; j++) {
            double s = table.entropyOverBoltzmann().values()[j];
            double cv = table.heatCapacityOverBoltzmann().values()[j];
            assertTrue(Double.isFinite(s) && Double.isFinite(cv), "no NaN at column " + j);
            if (j <= 2) {
                // exp(-1000) and below vanish: the limit exactly, within the bound and one rounding of ln 3.
                assertEquals(ln3, s, table.entropyOverBoltzmann().errorBounds()[j] + 2 * U * ln3);
                assertEquals(0, cv, 1e-300);
                assertEquals(0, table.internalEnergyKelvin().values()[j], 0);
                assertEquals(ln3, table.logPartitionFunction().values()[j],
                        table.logPartitionFunction().errorBounds()[j] + 2 * U * ln3);
            }
        }
        // At 0.01 K the excited level adds 3 e^-100 / 3 to Z: S - ln 3 = e^-100 (1 + 100) ~ 4e-42 to first
        // order, far below an ulp of ln 3.
        assertEquals(ln3, table.entropyOverBoltzmann().values()[3],
                table.entropyOverBoltzmann().errorBounds()[3] + 2 * U * ln3 + 1e-41);
    }

    @Test
    void lnOfOnePlusTinyKeepsItsDigits() {
        // ln(1 + 1e-20) = 1e-20 - 5e-41: a naive ln(1 + r) returns 0.
        CanonicalTable table = CanonicalEnsemble.evaluate(
                LevelSet.ofLogDegeneracies(new double[] {0, 0}, new double[] {0, Math.log(1e-20)}), new double[] {300},
                false);
        BigDecimal exact = ExactCanonical.ofLogDegeneracies(new double[] {0, 0}, new double[] {0, Math.log(1e-20)})
                .at(300).lnZ();
        double value = table.logPartitionFunction().values()[0];
        double err = new BigDecimal(value).subtract(exact).abs().doubleValue();
        assertTrue(err <= table.logPartitionFunction().errorBounds()[0], "bound holds");
        assertTrue(err <= 4 * U * value, "value to a few ulps: " + value);
        // The bound: the exponent ln(1e-20) = -46.05 carries about 46 u, so about 100 u of the value.
        assertTrue(table.logPartitionFunction().errorBounds()[0] <= 200 * U * value, "bound near the value's ulps");
    }

    @Test
    void indistinguishableParticlesMatchTheHighPrecisionFreeEnergy() {
        // F_N = -kT (N ln Z_1 - ln N!) for N = 1, 2, 10 and (the double nearest) 1e23, against the 50-digit
        // reference with ln N! from the exact integer (N <= 2000) or the Stirling series.
        double[] e = {0, 120.5, 300.25, 310};
        double[] g = {1, 3, 5, 2};
        double t = 298.15;
        CanonicalTable one = evaluate(e, g, t);
        ExactCanonical.Point p = ExactCanonical.ofDegeneracies(e, g).at(t);
        MathContext mc = ExactMath.MC;
        for (double n : new double[] {1, 2, 10, 1e23}) {
            CanonicalTable many = CompositeSystem.of(one, n, ParticleStatistics.INDISTINGUISHABLE, false);
            BigDecimal lnZn = p.lnZ().multiply(new BigDecimal(n), mc).subtract(ExactMath.logFactorial(n), mc);
            BigDecimal fN = lnZn.multiply(new BigDecimal(-t), mc);
            double value = many.helmholtzEnergyKelvin().values()[0];
            double err = new BigDecimal(value).subtract(fN).abs().doubleValue();
            assertTrue(err <= many.helmholtzEnergyKelvin().errorBounds()[0], "N = " + n + " err " + err);
            assertTrue(err <= 1e-12 * Math.abs(fN.doubleValue()) + 1e-13 * n * t, "N = " + n + " err " + err);
        }
    }
}
