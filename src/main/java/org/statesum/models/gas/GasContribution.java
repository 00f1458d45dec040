package org.statesum.models.gas;

/** The four factors of the molecular partition function, in the order answers list them. */
public enum GasContribution {
    TRANSLATIONAL, ROTATIONAL, VIBRATIONAL, ELECTRONIC
}
