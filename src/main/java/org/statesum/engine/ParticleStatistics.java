package org.statesum.engine;

/** How N identical particles are counted when the N-particle partition function is formed. */
public enum ParticleStatistics {
    /** Localised particles (sites of a crystal): Z_N = Z_1^N. */
    DISTINGUISHABLE,
    /** Particles free to exchange places (a dilute gas): Z_N = Z_1^N / N! (Boltzmann counting). */
    INDISTINGUISHABLE,
    /** Identical bosons, counted exactly ({@link QuantumCanonical}). */
    BOSE_EINSTEIN,
    /** Identical fermions, counted exactly ({@link QuantumCanonical}). */
    FERMI_DIRAC;

    /** Whether the counting is exact quantum statistics rather than a product of one-particle sums. */
    public boolean quantum() {
        return this == BOSE_EINSTEIN || this == FERMI_DIRAC;
    }
}
