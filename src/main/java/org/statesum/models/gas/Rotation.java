package org.statesum.models.gas;

import java.util.Map;

/** The rotational factor of the molecular partition function: an atom, a linear or a non-linear rotor. */
public sealed interface Rotation permits Atom, LinearRotor, NonlinearRotor {

    /** The part at every temperature (each T > 0). */
    GasPart evaluate(double[] temperaturesKelvin);

    /** Adds how the part was computed to an answer's precision block. */
    void describe(Map<String, Object> precision, double[] temperaturesKelvin);
}
