package org.statesum.models.gas;

import org.statesum.units.PhysicalConstants;

/**
 * The standard state of the gas: a pressure p (the volume per molecule is k_B T / p) or a
 * concentration c (the volume per molecule is 1 / (c N_A), c in mol/m^3; the solution-phase
 * convention of 1 mol/L = 1000 mol/m^3). Exactly one of the two is positive.
 *
 * @param pressurePascal p, Pa, or 0 when a concentration is given
 * @param concentrationMolPerCubicMetre c, mol/m^3, or 0 when a pressure is given
 */
public record StandardState(double pressurePascal, double concentrationMolPerCubicMetre) {

    /** The conventional standard pressure, 1 bar (IUPAC, since 1982). */
    public static final double STANDARD_PRESSURE_PASCAL = 1e5;

    public static StandardState pressure(double pascal) {
        return new StandardState(pascal, 0);
    }

    public static StandardState concentration(double molPerCubicMetre) {
        return new StandardState(0, molPerCubicMetre);
    }

    /** ln of the volume per molecule in m^3 at temperature T, K. */
    double logVolumePerMolecule(double temperatureKelvin) {
        return pressurePascal > 0
                ? Math.log(PhysicalConstants.BOLTZMANN_J_PER_K * temperatureKelvin / pressurePascal)
                : -Math.log(concentrationMolPerCubicMetre * PhysicalConstants.AVOGADRO_PER_MOL);
    }

    /** For answers: "p = 100000 Pa" or "c = 1000 mol/m^3 (1 mol/L)". */
    public String describe() {
        return pressurePascal > 0 ? "p = " + pressurePascal + " Pa"
                : "c = " + concentrationMolPerCubicMetre / 1000 + " mol/L";
    }
}
