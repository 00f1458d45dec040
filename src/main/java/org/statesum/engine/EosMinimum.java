package org.statesum.engine;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The minimum over V of E_fit(V) + P V for a fitted {@link EosFit}: the volume V* where the fitted
 * pressure equals P (Brent's method, R. P. Brent, Algorithms for Minimization without Derivatives, 1973,
 * ch. 4), the bulk modulus B(V*), the energy E_fit(V*) and G = E_fit(V*) + P V*.
 *
 * <p>Bounds and estimates: with g = d(answer)/d(parameters) (central differences, re-solving for V*) and
 * the fit's sensitivity A, moving the data by d_i changes the answer by g A d to first order. The error
 * bound is the numerical part, 2 sum_i |(g A)_i| delta_i with delta_i the error bound of E_i (the data's
 * rounding and mode sums; first order, doubled, with delta_i at the level of rounding), plus the
 * optimiser's stopping tolerance carried through g (a hundredfold), the root tolerance and the rounding
 * of the answer. The fit-error estimate is the part that no computation can
 * bound, how far the chosen form's best fit may sit from the data: 2 sum_i |(g A)_i| r, r the largest
 * fit residual (B's doubled once more, where a misfit of the form shows most). It is an estimate, not a
 * bound, and not a statistical confidence interval.
 *
 * @param volume V*, caller's volume unit; NaN when no volume in (V0/5, 5 V0) has that pressure
 * @param volumeBound its bound
 * @param bulkModulus B(V*), energy / volume
 * @param bulkModulusBound its bound
 * @param energy E_fit(V*)
 * @param energyBound its bound
 * @param gibbsEnergy E_fit(V*) + P V*
 * @param gibbsEnergyBound its bound
 * @param fitEstimates the fit-error estimates of volume, bulk modulus, energy and Gibbs energy, in that order
 */
public record EosMinimum(double volume, double volumeBound, double bulkModulus, double bulkModulusBound,
        double energy, double energyBound, double gibbsEnergy, double gibbsEnergyBound, double[] fitEstimates) {

    private static final double U = 0x1.0p-53;
    /** How far from V0 a pressure root is searched for: beyond, no fitted form is meaningful. */
    private static final double SEARCH_FACTOR = 5;

    /** Whether a minimum was found. */
    public boolean found() {
        return !Double.isNaN(volume);
    }

    /**
     * @param fit the fitted equation of state
     * @param pressure P in the caller's energy / volume unit
     * @param dataBounds error bound of each fitted E_i, caller's energy unit
     */
    public static EosMinimum of(EosFit fit, double pressure, double[] dataBounds) {
        double es = fit.energyScale();
        double vs = fit.volumeScale();
        double pn = pressure * vs / es;
        double[] p = fit.normalisedParameters();
        double[] base = answers(fit.equationOfState(), p, pn);
        if (Double.isNaN(base[0])) {
            return new EosMinimum(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, new double[] {Double.NaN, Double.NaN, Double.NaN, Double.NaN});
        }
        double[][] a = fit.sensitivity();
        int n = a[0].length;
        double[][] gradient = EosFit.centralDifferences(q -> answers(fit.equationOfState(), q, pn), p);
        // First order, doubled as every bound here: on a synthetic crystal whose exact answer is known
        // (QuasiHarmonicModelTest) the true error of the form reaches 1.3 times the undoubled estimate.
        double residual = 2 * fit.maxAbsoluteResidual() / es;
        double[] bound = new double[4];
        double[] estimate = new double[4];
        for (int i = 0; i < n; i++) {
            for (int q = 0; q < 4; q++) {
                double g = 0;
                for (int k = 0; k < 4; k++) {
                    g += gradient[q][k] * a[k][i];
                }
                bound[q] += Math.abs(g) * 2 * dataBounds[i] / es;
                estimate[q] += Math.abs(g) * residual;
            }
        }
        // The optimiser stops when a step changes the parameters by under STEP_TOLERANCE relative: the point
        // it returns may sit that far from the least-squares minimum, and a hundred times that is counted
        // (seen: one ulp of data moves G by 1.4e-13 relative; this term is about 1e-10 of it). The central
        // differences of g carry ~1e-8 relative: 1.01 covers their effect on the first-order terms.
        for (int q = 0; q < 4; q++) {
            double minimisation = 0;
            for (int k = 0; k < 4; k++) {
                minimisation += Math.abs(gradient[q][k]) * 100 * EosFit.STEP_TOLERANCE * Math.max(Math.abs(p[k]), 1e-3);
            }
            bound[q] = 1.01 * bound[q] + minimisation;
        }
        double volume = base[0] * vs;
        double bulk = base[1] * es / vs;
        double energy = fit.energyShift() + base[2] * es;
        double gibbs = fit.energyShift() + base[3] * es;
        // Root tolerance (8 u relative) and rounding of the forms and of the unit changes (16 u each).
        // B is a second derivative of the fitted form, where a misfit of the form shows most: its estimate is
        // doubled once more (the synthetic test sees the true error reach 2.1 times the single-doubled one).
        return new EosMinimum(volume, bound[0] * vs + 8 * U * volume,
                bulk, bound[1] * es / vs + 16 * U * Math.abs(bulk),
                energy, bound[2] * es + 16 * U * (Math.abs(energy) + Math.abs(fit.energyShift())),
                gibbs, bound[3] * es + 16 * U * (Math.abs(gibbs) + Math.abs(fit.energyShift())),
                new double[] {estimate[0] * vs, 2 * estimate[1] * es / vs, estimate[2] * es, estimate[3] * es});
    }

    /** V*, B(V*), E(V*), E(V*) + P V* in normalised units; NaN when no root is bracketed. */
    private static double[] answers(EquationOfState eos, double[] p, double pn) {
        double v0 = p[1];
        double v;
        if (pn == 0) {
            v = v0;
        } else {
            // Walk away from V0 in steps of 2 % until the pressure crosses P: the first crossing is the
            // mechanically stable branch (B > 0), not a root beyond a spinodal.
            double step = pn > 0 ? 1 / 1.02 : 1.02;
            double lo = v0;
            double hi = v0;
            boolean bracketed = false;
            for (int i = 0; i < 200 && !bracketed; i++) {
                double next = (pn > 0 ? lo : hi) * step;
                if (next < v0 / SEARCH_FACTOR || next > v0 * SEARCH_FACTOR) {
                    break;
                }
                if (pn > 0) {
                    hi = lo;
                    lo = next;
                    bracketed = eos.pressure(lo, p) - pn >= 0;
                } else {
                    lo = hi;
                    hi = next;
                    bracketed = eos.pressure(hi, p) - pn <= 0;
                }
            }
            if (!bracketed) {
                return new double[] {Double.NaN, Double.NaN, Double.NaN, Double.NaN};
            }
            try {
                v = new BrentSolver(1e-15, 4 * U * v0).solve(500, x -> eos.pressure(x, p) - pn, lo, hi);
            } catch (RuntimeException noRoot) {
                return new double[] {Double.NaN, Double.NaN, Double.NaN, Double.NaN};
            }
        }
        double e = eos.energy(v, p);
        return new double[] {v, eos.bulkModulus(v, p), e, e + pn * v};
    }
}
