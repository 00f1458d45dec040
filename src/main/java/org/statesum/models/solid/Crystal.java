package org.statesum.models.solid;

/**
 * A harmonic crystal, per formula unit: its vibrations, the number of atoms in a formula unit, what was
 * left out of its phonons, and how a density of states was normalised (null otherwise).
 *
 * @param model the model's name as the client gave it ("einstein", "debye", "phonons", "density-of-states")
 * @param vibrations the vibrations of one formula unit
 * @param atomsPerFormulaUnit at least 1
 * @param screen modes left out
 * @param normalisation the density-of-states normalisation, or null
 */
public record Crystal(String model, Vibrations vibrations, int atomsPerFormulaUnit, ModeScreen screen,
        Normalisation normalisation) {

    /**
     * @param integral int g(nu) d nu over the given grid (trapezoidal), modes per formula unit
     * @param expected 3 x atoms per formula unit
     * @param factor the factor applied to the density (1 when only checked)
     * @param applied whether the density was rescaled
     */
    public record Normalisation(double integral, double expected, double factor, boolean applied) {
    }
}
