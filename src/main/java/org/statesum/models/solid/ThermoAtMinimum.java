package org.statesum.models.solid;

import org.statesum.engine.EosMinimum;
import org.statesum.engine.PolynomialFit;

/**
 * Fills one temperature of one pressure's columns from the minimum and the S(V), C_V(V) fits, with
 * first-order bounds: a fitted value's bound is 2 sum_i |w_i| (r + delta_i) (weights of the least-squares
 * evaluation, r the fit's largest residual, delta_i the data's bounds) plus its slope times the bound of V.
 * Column pairs (value, bound): G, H, F, S, C_V, C_P, V, B, alpha; working units K, k_B, cubic angstrom.
 */
final class ThermoAtMinimum {

    private static final double U = 0x1.0p-53;

    private ThermoAtMinimum() {
    }

    static void fill(double[][] c, int j, double t, EosMinimum m, PolynomialFit sFit, PolynomialFit cFit,
            Sampler sampler) {
        double v = m.volume();
        double dv = m.volumeBound();
        double s = sFit.value(v);
        double dsdv = sFit.derivative(v);
        double sBound = weighted(sFit.weights(v, false), sFit.maxAbsoluteResidual(), sampler.sb)
                + Math.abs(dsdv) * dv + 4 * U * Math.abs(s);
        double slopeBound = weighted(sFit.weights(v, true), sFit.maxAbsoluteResidual(), sampler.sb)
                + 4 * U * Math.abs(dsdv);
        double cv = cFit.value(v);
        double cvBound = weighted(cFit.weights(v, false), cFit.maxAbsoluteResidual(), sampler.cb)
                + Math.abs(cFit.derivative(v)) * dv + 4 * U * Math.abs(cv);
        double b = m.bulkModulus();
        double bb = m.bulkModulusBound();
        double alpha = dsdv / b;
        double alphaRel = slopeBound / Math.abs(dsdv) + bb / b + 2 * U;
        double extra = t * v * dsdv * dsdv / b;
        double extraRel = dv / v + 2 * slopeBound / Math.abs(dsdv) + bb / b + 4 * U;
        double cp = cv + extra;
        double h = m.gibbsEnergy() + t * s;
        put(c, 0, j, m.gibbsEnergy(), m.gibbsEnergyBound());
        put(c, 2, j, h, m.gibbsEnergyBound() + t * sBound + 2 * U * (Math.abs(h) + t * Math.abs(s)));
        put(c, 4, j, m.energy(), m.energyBound());
        put(c, 6, j, s, sBound);
        put(c, 8, j, cv, cvBound);
        put(c, 10, j, cp, cvBound + (dsdv == 0 ? 0 : Math.abs(extra) * extraRel) + 2 * U * cp);
        put(c, 12, j, v, dv);
        put(c, 14, j, b, bb);
        put(c, 16, j, alpha, dsdv == 0 ? slopeBound / b : Math.abs(alpha) * alphaRel);
    }

    private static double weighted(double[] w, double residual, double[] bounds) {
        double sum = 0;
        for (int i = 0; i < w.length; i++) {
            sum += Math.abs(w[i]) * (residual + bounds[i]);
        }
        // First-order, doubled as every bound here.
        return 2 * sum;
    }

    private static void put(double[][] c, int col, int j, double value, double bound) {
        c[col][j] = value;
        c[col + 1][j] = bound;
    }
}
