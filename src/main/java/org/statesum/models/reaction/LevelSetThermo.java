package org.statesum.models.reaction;

import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.engine.LevelSet;
import org.statesum.engine.Series;
import org.statesum.models.LevelSetModel;
import org.statesum.models.Particles;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;

/**
 * A discrete level set in a reaction, per particle, as a phase without a pV term (a condensed phase or
 * an internal degree of freedom): G = F, H = U, C_p = C_V, activity 1.
 *
 * @param levels the levels
 * @param particles count and statistics; the basis is always per particle here
 */
public record LevelSetThermo(LevelSet levels, Particles particles) implements SpeciesThermo {

    @Override
    public ThermoResult at(double[] temperaturesKelvin) {
        Particles perParticle = new Particles(particles.count(), particles.statistics(), true);
        ThermoResult r = LevelSetModel.evaluate(levels, temperaturesKelvin, perParticle, false);
        Map<Quantity, Series> series = new LinkedHashMap<>(r.series());
        series.put(Quantity.GIBBS_ENERGY, r.series().get(Quantity.HELMHOLTZ_ENERGY));
        series.put(Quantity.ENTHALPY, r.series().get(Quantity.INTERNAL_ENERGY));
        series.put(Quantity.ISOBARIC_HEAT_CAPACITY, r.series().get(Quantity.ISOCHORIC_HEAT_CAPACITY));
        return new ThermoResult(r.temperaturesKelvin(), series, r.precision(), r.warnings(), null);
    }

    @Override
    public String standardState() {
        return "level set per particle, no pV term (activity 1)";
    }
}
