package org.statesum.models.reaction;

import org.statesum.models.ThermoResult;
import org.statesum.models.gas.IdealGasModel;
import org.statesum.models.gas.IdealGasSpecies;

/** An ideal-gas species in a reaction: its activity is p / p° (or c / c°) of its standard state. */
public record IdealGasThermo(IdealGasSpecies species) implements SpeciesThermo {

    @Override
    public ThermoResult at(double[] temperaturesKelvin) {
        return IdealGasModel.evaluate(species, temperaturesKelvin).total();
    }

    @Override
    public String standardState() {
        return "ideal gas, " + species.state().describe();
    }
}
