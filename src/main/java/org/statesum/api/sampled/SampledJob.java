package org.statesum.api.sampled;

import org.statesum.engine.sampling.ReducedPotentials;
import org.statesum.units.EnergyUnit;

/**
 * A validated {@code POST /v1/sampled} request.
 *
 * @param data the reduced potentials and sample counts
 * @param method {@code exponential-averaging}, {@code bar} or {@code mbar}
 * @param forward for exponential averaging: average over the lower state of each pair
 * @param temperatureKelvin the temperature for answers in energy units, K; NaN when not given
 * @param outputUnit the energy unit of those answers
 */
public record SampledJob(ReducedPotentials data, String method, boolean forward, double temperatureKelvin,
        EnergyUnit outputUnit) {

    boolean hasTemperature() {
        return !Double.isNaN(temperatureKelvin);
    }
}
