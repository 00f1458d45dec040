package org.statesum.models;

/** The thermodynamic quantities a model can report, each with its physical dimension. */
public enum Quantity {
    LOG_PARTITION_FUNCTION(Dimension.NONE),
    HELMHOLTZ_ENERGY(Dimension.ENERGY),
    INTERNAL_ENERGY(Dimension.ENERGY),
    ENTROPY(Dimension.ENTROPY),
    ISOCHORIC_HEAT_CAPACITY(Dimension.ENTROPY),
    ENTHALPY(Dimension.ENERGY),
    GIBBS_ENERGY(Dimension.ENERGY),
    ISOBARIC_HEAT_CAPACITY(Dimension.ENTROPY),
    ZERO_POINT_ENERGY(Dimension.ENERGY),
    /** ln K of a reaction, dimensionless. */
    LOG_EQUILIBRIUM_CONSTANT(Dimension.NONE),
    /** mu = F_N - F_{N-1}, per particle whatever the basis (an intensive quantity). */
    CHEMICAL_POTENTIAL(Dimension.ENERGY),
    /** The entropy of mixing the members of an ensemble, -k sum p_i ln(p_i / d_i). */
    MIXING_ENTROPY(Dimension.ENTROPY);

    /** Dimensionless, energy (J per entity inside models) or entropy and heat capacity (J/K per entity). */
    public enum Dimension { NONE, ENERGY, ENTROPY }

    private final Dimension dimension;

    Quantity(Dimension dimension) {
        this.dimension = dimension;
    }

    public Dimension dimension() {
        return dimension;
    }

    /**
     * Whether the quantity scales with the amount of substance: a molar unit then divides the total of
     * N particles by N. The chemical potential is already per particle.
     */
    public boolean extensive() {
        return dimension != Dimension.NONE && this != CHEMICAL_POTENTIAL;
    }
}
