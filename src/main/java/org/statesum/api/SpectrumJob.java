package org.statesum.api;

import org.statesum.engine.LevelSet;
import org.statesum.models.Particles;
import org.statesum.units.EnergyUnit;

/** A validated {@code POST /v1/spectrum} request, ready for the model. */
record SpectrumJob(LevelSet levels, double[] temperaturesKelvin, Particles particles, EnergyUnit outputUnit,
        boolean withPopulations) {
}
