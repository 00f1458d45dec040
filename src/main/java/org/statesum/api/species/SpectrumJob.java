package org.statesum.api.species;

import org.statesum.engine.LevelSet;
import org.statesum.models.Particles;
import org.statesum.units.EnergyUnit;

/** A validated {@code POST /v1/spectrum} request, ready for the model. */
public record SpectrumJob(LevelSet levels, double[] temperaturesKelvin, Particles particles, EnergyUnit outputUnit,
        boolean withPopulations) {
}
