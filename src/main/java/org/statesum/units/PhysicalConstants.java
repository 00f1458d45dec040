package org.statesum.units;

/**
 * Physical constants, CODATA 2018 recommended values (Tiesinga et al., Rev. Mod. Phys. 93, 025010
 * (2021)). Since the 2019 SI redefinition k_B, h, N_A, e and c are exact; the atomic mass constant and
 * the hartree energy are measured and carry the standard uncertainty quoted beside them.
 */
public final class PhysicalConstants {

    /** Boltzmann constant k_B, J/K (exact). */
    public static final double BOLTZMANN_J_PER_K = 1.380649e-23;
    /** Planck constant h, J s (exact). */
    public static final double PLANCK_J_S = 6.62607015e-34;
    /** Avogadro constant N_A, 1/mol (exact). */
    public static final double AVOGADRO_PER_MOL = 6.02214076e23;
    /** Elementary charge e, C (exact); also the joules in one electronvolt. */
    public static final double ELEMENTARY_CHARGE_C = 1.602176634e-19;
    /** Speed of light in vacuum c, m/s (exact). */
    public static final double SPEED_OF_LIGHT_M_PER_S = 299792458.0;
    /** Atomic mass constant m_u, kg; standard uncertainty 5.0e-37 kg. */
    public static final double ATOMIC_MASS_CONSTANT_KG = 1.66053906660e-27;
    /** Hartree energy E_h, J; standard uncertainty 8.5e-30 J. */
    public static final double HARTREE_J = 4.3597447222071e-18;
    /** Molar gas constant R = N_A k_B, J/(mol K) (exact product, rounded once). */
    public static final double GAS_CONSTANT_J_PER_MOL_K = AVOGADRO_PER_MOL * BOLTZMANN_J_PER_K;
    /** Thermochemical calorie, J (exact by definition). */
    public static final double THERMOCHEMICAL_CALORIE_J = 4.184;

    /** The name of this constant set, as reported in every answer's provenance. */
    public static final String SOURCE = "CODATA 2018";

    private PhysicalConstants() {
    }
}
