package org.statesum.api.species;

import java.util.Map;
import org.statesum.models.gas.IdealGasSpecies;
import org.statesum.units.EnergyUnit;

/** A validated {@code POST /v1/ideal-gas} request: the species, the grid, the output unit, and what to echo. */
public record IdealGasJob(IdealGasSpecies species, double[] temperaturesKelvin, EnergyUnit outputUnit,
        Map<String, Object> system) {
}
