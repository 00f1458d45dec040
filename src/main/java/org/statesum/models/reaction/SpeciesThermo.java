package org.statesum.models.reaction;

import org.statesum.models.ThermoResult;

/**
 * One species as a reaction sees it: at any temperatures, its Gibbs energy, enthalpy, entropy and
 * isobaric heat capacity per entity (SI, with bounds), in its standard state. A new model kind joins
 * reactions by implementing this.
 */
public interface SpeciesThermo {

    /**
     * The species at these temperatures: a result holding at least {@code GIBBS_ENERGY}, {@code ENTHALPY},
     * {@code ENTROPY} and {@code ISOBARIC_HEAT_CAPACITY}.
     */
    ThermoResult at(double[] temperaturesKelvin);

    /** The standard state the activity refers to, e.g. "p = 100000 Pa" or "pure phase (activity 1)". */
    String standardState();
}
