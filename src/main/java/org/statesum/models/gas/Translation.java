package org.statesum.models.gas;

import org.statesum.engine.Series;
import org.statesum.units.PhysicalConstants;

/**
 * Translation of a molecule of mass m in the volume per molecule v of its standard state:
 * q / N = v / Lambda^3 e (Boltzmann counting), with the thermal de Broglie wavelength
 * Lambda = h / sqrt(2 pi m k_B T). Sackur-Tetrode: S / k_B = ln(v / Lambda^3) + 5/2; U = 3/2 k_B T;
 * C_V = 3/2 k_B. (The pV = k_B T term that turns U into H is added by {@link IdealGasModel}.)
 *
 * <p>Accuracy: ln(v / Lambda^3) is formed as ln v - 3 ln Lambda from about ten roundings; the bound is
 * 16 u times the magnitudes involved (u = 2^-53).
 */
public final class Translation {

    private final double massKilogram;
    private final StandardState state;

    private Translation(double massKilogram, StandardState state) {
        this.massKilogram = massKilogram;
        this.state = state;
    }

    /** @param massKilogram the molecular mass, kg, positive */
    public static Translation of(double massKilogram, StandardState state) {
        return new Translation(massKilogram, state);
    }

    /** The part at every temperature (each T > 0). */
    public GasPart evaluate(double[] temperaturesKelvin) {
        int n = temperaturesKelvin.length;
        GasPart part = GasPart.zero(n);
        double u = GasPart.U;
        double h = PhysicalConstants.PLANCK_J_S;
        double k = PhysicalConstants.BOLTZMANN_J_PER_K;
        for (int j = 0; j < n; j++) {
            double t = temperaturesKelvin[j];
            double logLambda = Math.log(h) - 0.5 * Math.log(2 * Math.PI * massKilogram * k * t);
            double logV = state.logVolumePerMolecule(t);
            double s = logV - 3 * logLambda + 2.5;
            part.entropy().values()[j] = s;
            part.entropy().errorBounds()[j] = 16 * u * (Math.abs(logV) + 3 * Math.abs(logLambda) + 2.5);
            part.internalEnergyKelvin().values()[j] = 1.5 * t;
            part.internalEnergyKelvin().errorBounds()[j] = u * 1.5 * t;
            part.heatCapacity().values()[j] = 1.5;
        }
        return part;
    }
}
