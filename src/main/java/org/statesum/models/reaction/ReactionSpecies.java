package org.statesum.models.reaction;

/**
 * One species of a reaction: a name, its stoichiometric coefficient nu (negative for reactants) and its
 * thermodynamics.
 */
public record ReactionSpecies(String name, double coefficient, SpeciesThermo thermo) {
}
