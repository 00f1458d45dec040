package org.statesum.engine;

/**
 * Canonical-ensemble quantities of one level set on a temperature grid, in reduced units: energies as
 * E / k_B (kelvin), entropy and heat capacity in units of k_B, ln Z dimensionless.
 *
 * @param temperaturesKelvin the grid T_j, K
 * @param logPartitionFunction ln Z; NaN at T = 0 when the lowest level is not at zero energy
 * @param helmholtzEnergyKelvin F / k_B = -T ln Z, K
 * @param internalEnergyKelvin U / k_B = sum p_i E_i, K
 * @param entropyOverBoltzmann S / k_B = ln Z + U / (k_B T)
 * @param heatCapacityOverBoltzmann C_V / k_B = sum p_i (E_i - U)^2 / (k_B T)^2
 * @param logRelativePartitionFunction ln Z' = ln sum g_i exp(-(E_i - E_0)/k_B T), the number of
 *        thermally reachable states on a log scale (shift-invariant)
 * @param topLevelPopulation population of the highest level, for truncation checks
 * @param populations p_i per temperature (rows) and level (columns), or null when not asked for
 * @param populationBounds error bounds of {@code populations}, or null
 */
public record CanonicalTable(
        double[] temperaturesKelvin,
        Series logPartitionFunction,
        Series helmholtzEnergyKelvin,
        Series internalEnergyKelvin,
        Series entropyOverBoltzmann,
        Series heatCapacityOverBoltzmann,
        double[] logRelativePartitionFunction,
        double[] topLevelPopulation,
        double[][] populations,
        double[][] populationBounds) {
}
