package org.statesum.models.reaction;

import org.statesum.engine.LevelSet;
import org.statesum.models.LevelSetModel;
import org.statesum.models.Particles;
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
        return WithoutPv.of(LevelSetModel.evaluate(levels, temperaturesKelvin, perParticle, false));
    }

    @Override
    public String standardState() {
        return "level set per particle, no pV term (activity 1)";
    }
}
