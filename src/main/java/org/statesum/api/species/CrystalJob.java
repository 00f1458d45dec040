package org.statesum.api.species;

import org.statesum.models.solid.Crystal;
import org.statesum.units.EnergyUnit;

/**
 * A validated {@code POST /v1/crystal} request.
 *
 * @param crystal the harmonic crystal, per formula unit
 * @param temperaturesKelvin the grid, K
 * @param perAtom whether extensive results are per atom rather than per formula unit
 * @param outputUnit the energy unit of the answer
 */
public record CrystalJob(Crystal crystal, double[] temperaturesKelvin, boolean perAtom, EnergyUnit outputUnit) {
}
