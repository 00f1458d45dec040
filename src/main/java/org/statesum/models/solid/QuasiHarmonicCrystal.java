package org.statesum.models.solid;

import org.statesum.engine.EquationOfState;

/**
 * A crystal sampled at several volumes for the quasi-harmonic approximation, in SI per formula unit.
 *
 * @param volumesCubicMetre V_i, m^3 per formula unit, at least 5, distinct
 * @param staticEnergiesJoule E_0(V_i), J per formula unit
 * @param staticEnergyRelativeError relative error of each E_0 from unit conversion
 * @param vibrations the vibrations at each V_i
 * @param atomsPerFormulaUnit at least 1
 * @param equationOfState the form fitted to F(V) at each temperature
 * @param screen modes left out, summed over the volumes
 */
public record QuasiHarmonicCrystal(double[] volumesCubicMetre, double[] staticEnergiesJoule,
        double staticEnergyRelativeError, Vibrations[] vibrations, int atomsPerFormulaUnit,
        EquationOfState equationOfState, ModeScreen screen) {

    /**
     * Vibrations at every volume from one reference set by a constant Grueneisen parameter gamma:
     * nu(V) = nu(V_ref) (V / V_ref)^{-gamma} (E. Grueneisen, Ann. Phys. 344 (1912) 257).
     */
    public static Vibrations[] grueneisenScaled(Vibrations reference, double referenceVolume, double gamma,
            double[] volumes) {
        Vibrations[] out = new Vibrations[volumes.length];
        for (int i = 0; i < volumes.length; i++) {
            out[i] = reference.scaled(Math.pow(volumes[i] / referenceVolume, -gamma));
        }
        return out;
    }
}
