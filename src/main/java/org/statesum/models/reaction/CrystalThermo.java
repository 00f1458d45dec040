package org.statesum.models.reaction;

import org.statesum.models.ThermoResult;
import org.statesum.models.solid.Crystal;
import org.statesum.models.solid.CrystalModel;

/**
 * A harmonic crystal in a reaction, per formula unit, as a pure solid at zero pressure with a fixed
 * volume: G = F, H = U, C_p = C_V (no thermal expansion), activity 1.
 *
 * @param crystal the crystal
 */
public record CrystalThermo(Crystal crystal) implements SpeciesThermo {

    @Override
    public ThermoResult at(double[] temperaturesKelvin) {
        // per formula unit, where F is also CrystalModel.gibbsEnergy: one evaluation gives both
        return WithoutPv.of(CrystalModel.evaluate(crystal, temperaturesKelvin, false));
    }

    @Override
    public String standardState() {
        return "pure harmonic solid per formula unit at P = 0, fixed volume (activity 1)";
    }
}
