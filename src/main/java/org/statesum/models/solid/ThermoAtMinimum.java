package org.statesum.models.solid;

import org.statesum.engine.EosMinimum;
import org.statesum.engine.PolynomialFit;

/**
 * Fills one temperature of one pressure's columns from the minimum and the S(V), C_V(V) fits, keeping the
 * error bound (the numerical part: the data's own bounds through the least-squares weights, 2 sum_i
 * |w_i| delta_i, plus the slope times the bound of V, plus rounding) apart from the fit-error estimate
 * (2 sum_i |w_i| r with r the fit's largest residual, plus the slope times the estimate of V). Columns
 * 0..17 are (value, bound) pairs of G, H, F, S, C_V, C_P, V, B, alpha; columns 18..26 their estimates.
 * Working units K, k_B, cubic angstrom.
 */
final class ThermoAtMinimum {

    /** The column of the first fit-error estimate (that of G); the others follow in the same order. */
    static final int ESTIMATES = 18;
    static final int COLUMNS = 27;
    private static final double U = 0x1.0p-53;

    private ThermoAtMinimum() {
    }

    static void fill(double[][] c, int j, double t, EosMinimum m, PolynomialFit sFit, PolynomialFit cFit,
            Sampler sampler) {
        double v = m.volume();
        double dv = m.volumeBound();
        double[] est = m.fitEstimates(); // V, B, E, G
        double ev = est[0];
        double s = sFit.value(v);
        double dsdv = sFit.derivative(v);
        double[] ws = sFit.weights(v, false);
        double[] wd = sFit.weights(v, true);
        double[] wc = cFit.weights(v, false);
        double sBound = weighted(ws, sampler.sb) + Math.abs(dsdv) * dv + 4 * U * Math.abs(s);
        double sEst = weighted(ws, sFit.maxAbsoluteResidual()) + Math.abs(dsdv) * ev;
        double slopeBound = weighted(wd, sampler.sb) + 4 * U * Math.abs(dsdv);
        double slopeEst = weighted(wd, sFit.maxAbsoluteResidual());
        double cv = cFit.value(v);
        double cvBound = weighted(wc, sampler.cb) + Math.abs(cFit.derivative(v)) * dv + 4 * U * Math.abs(cv);
        double cvEst = weighted(wc, cFit.maxAbsoluteResidual()) + Math.abs(cFit.derivative(v)) * ev;
        double b = m.bulkModulus();
        double bb = m.bulkModulusBound();
        double be = est[1];
        double alpha = dsdv / b;
        double alphaRel = slopeBound / Math.abs(dsdv) + bb / b + 2 * U;
        double alphaEstRel = slopeEst / Math.abs(dsdv) + be / b;
        double extra = t * v * dsdv * dsdv / b;
        double extraRel = dv / v + 2 * slopeBound / Math.abs(dsdv) + bb / b + 4 * U;
        double extraEstRel = ev / v + 2 * slopeEst / Math.abs(dsdv) + be / b;
        double cp = cv + extra;
        double h = m.gibbsEnergy() + t * s;
        put(c, 0, j, m.gibbsEnergy(), m.gibbsEnergyBound(), est[3]);
        put(c, 2, j, h, m.gibbsEnergyBound() + t * sBound + 2 * U * (Math.abs(h) + t * Math.abs(s)), est[3] + t * sEst);
        put(c, 4, j, m.energy(), m.energyBound(), est[2]);
        put(c, 6, j, s, sBound, sEst);
        put(c, 8, j, cv, cvBound, cvEst);
        put(c, 10, j, cp, cvBound + (dsdv == 0 ? 0 : Math.abs(extra) * extraRel) + 2 * U * cp,
                cvEst + (dsdv == 0 ? 0 : Math.abs(extra) * extraEstRel));
        put(c, 12, j, v, dv, ev);
        put(c, 14, j, b, bb, be);
        put(c, 16, j, alpha, dsdv == 0 ? slopeBound / b : Math.abs(alpha) * alphaRel,
                dsdv == 0 ? slopeEst / b : Math.abs(alpha) * alphaEstRel);
    }

    /** 2 sum_i |w_i| d_i: the first-order effect of moving each datum by d_i, doubled as every bound here. */
    private static double weighted(double[] w, double[] d) {
        double sum = 0;
        for (int i = 0; i < w.length; i++) {
            sum += Math.abs(w[i]) * d[i];
        }
        return 2 * sum;
    }

    /** As above with every datum moved by the same r. */
    private static double weighted(double[] w, double r) {
        double sum = 0;
        for (double x : w) {
            sum += Math.abs(x);
        }
        return 2 * sum * r;
    }

    private static void put(double[][] c, int col, int j, double value, double bound, double estimate) {
        c[col][j] = value;
        c[col + 1][j] = bound;
        c[ESTIMATES + col / 2][j] = estimate;
    }
}
