package org.statesum.api.species;

import org.statesum.models.solid.QuasiHarmonicCrystal;
import org.statesum.units.EnergyUnit;
import org.statesum.units.PressureUnit;
import org.statesum.units.VolumeUnit;

/**
 * A validated {@code POST /v1/quasi-harmonic} request.
 *
 * @param crystal the sampled crystal, SI per formula unit
 * @param temperaturesKelvin the grid, K
 * @param pressuresPascal the pressures, Pa
 * @param pressureUnit the unit the pressures came in (and bulk moduli go out in)
 * @param volumeUnit the unit the volumes came in (and go out in)
 * @param perAtom extensive results per atom rather than per formula unit
 * @param outputUnit energy unit of the answer
 */
public record QuasiHarmonicJob(QuasiHarmonicCrystal crystal, double[] temperaturesKelvin, double[] pressuresPascal,
        PressureUnit pressureUnit, VolumeUnit volumeUnit, boolean perAtom, EnergyUnit outputUnit) {
}
