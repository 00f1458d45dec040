package org.statesum.models.gas;

/**
 * One molecular species as an ideal gas: mass and standard state (translation), rotation,
 * vibrations and electronic levels.
 *
 * @param massKilogram molecular mass, kg
 * @param state the standard state
 * @param rotation the rotor
 * @param vibrations the modes (possibly none)
 * @param electronic the electronic levels and absolute energy
 */
public record IdealGasSpecies(double massKilogram, StandardState state, Rotation rotation, Vibrations vibrations,
        ElectronicStates electronic) {
}
