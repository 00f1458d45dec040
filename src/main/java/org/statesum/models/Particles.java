package org.statesum.models;

import org.statesum.engine.ParticleStatistics;

/**
 * How many identical non-interacting particles the level set describes, how they are counted, and
 * whether extensive results are given per particle or for the whole N-particle system.
 */
public record Particles(double count, ParticleStatistics statistics, boolean perParticle) {

    /** One particle: the level set's own partition function. */
    public static Particles single() {
        return new Particles(1, ParticleStatistics.DISTINGUISHABLE, false);
    }
}
