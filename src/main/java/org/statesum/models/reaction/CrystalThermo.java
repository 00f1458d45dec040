package org.statesum.models.reaction;

import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.engine.Series;
import org.statesum.models.Quantity;
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
        ThermoResult r = CrystalModel.evaluate(crystal, temperaturesKelvin, false);
        Map<Quantity, Series> series = new LinkedHashMap<>(r.series());
        series.put(Quantity.GIBBS_ENERGY, CrystalModel.gibbsEnergy(crystal, temperaturesKelvin));
        series.put(Quantity.ENTHALPY, r.series().get(Quantity.INTERNAL_ENERGY));
        series.put(Quantity.ISOBARIC_HEAT_CAPACITY, r.series().get(Quantity.ISOCHORIC_HEAT_CAPACITY));
        return new ThermoResult(r.temperaturesKelvin(), series, r.precision(), r.warnings(), null);
    }

    @Override
    public String standardState() {
        return "pure harmonic solid per formula unit at P = 0, fixed volume (activity 1)";
    }
}
