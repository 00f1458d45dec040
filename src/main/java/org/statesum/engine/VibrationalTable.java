package org.statesum.engine;

/**
 * Harmonic vibrational thermodynamics on a temperature grid, in reduced units, for whatever amount of
 * crystal the caller chose (one atom, one formula unit): energies as E / k_B (K), entropy and heat
 * capacity in k_B. Every series carries absolute error bounds in its own unit.
 *
 * @param temperaturesKelvin the grid, K
 * @param helmholtzEnergyKelvin F / k_B, K
 * @param internalEnergyKelvin U / k_B, K (includes the zero-point energy)
 * @param entropyOverBoltzmann S / k_B
 * @param heatCapacityOverBoltzmann C_V / k_B
 * @param zeroPointEnergyKelvin E_zp / k_B, K
 * @param zeroPointEnergyBound absolute error bound of {@code zeroPointEnergyKelvin}, K
 */
public record VibrationalTable(
        double[] temperaturesKelvin,
        Series helmholtzEnergyKelvin,
        Series internalEnergyKelvin,
        Series entropyOverBoltzmann,
        Series heatCapacityOverBoltzmann,
        double zeroPointEnergyKelvin,
        double zeroPointEnergyBound) {

    /** This table times a positive amount (atoms per formula unit, say); bounds scale and gain two roundings. */
    public VibrationalTable times(double amount) {
        return new VibrationalTable(temperaturesKelvin, helmholtzEnergyKelvin.scaled(amount),
                internalEnergyKelvin.scaled(amount), entropyOverBoltzmann.scaled(amount),
                heatCapacityOverBoltzmann.scaled(amount), zeroPointEnergyKelvin * amount,
                zeroPointEnergyBound * amount + 2 * Math.ulp(zeroPointEnergyKelvin * amount));
    }
}
