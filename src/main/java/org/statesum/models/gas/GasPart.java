package org.statesum.models.gas;

import org.statesum.engine.Series;

/**
 * One factor of the molecular partition function on a temperature grid, in reduced units per molecule:
 * U / k_B in K, S / k_B and C_V / k_B dimensionless, each with its absolute error bound. The Helmholtz
 * energy follows as F = U - T S (so that interpolated treatments, which give S and U directly, stay
 * consistent with G = H - T S).
 */
public record GasPart(Series internalEnergyKelvin, Series entropy, Series heatCapacity) {

    static final double U = 0x1.0p-53;

    /** A part that contributes nothing (an atom's rotation, a molecule without vibrations). */
    static GasPart zero(int size) {
        return new GasPart(Series.zeros(size), Series.zeros(size), Series.zeros(size));
    }

    /** F / k_B = U / k_B - T S / k_B, K, with its bound. */
    public Series helmholtzEnergyKelvin(double[] temperaturesKelvin) {
        int n = temperaturesKelvin.length;
        double[] v = new double[n];
        double[] b = new double[n];
        for (int j = 0; j < n; j++) {
            double ts = temperaturesKelvin[j] * entropy.values()[j];
            v[j] = internalEnergyKelvin.values()[j] - ts;
            b[j] = internalEnergyKelvin.errorBounds()[j] + temperaturesKelvin[j] * entropy.errorBounds()[j]
                    + 2 * U * (Math.abs(ts) + Math.abs(internalEnergyKelvin.values()[j]));
        }
        return new Series(v, b);
    }
}
