package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import org.statesum.models.reaction.SpeciesThermo;

/**
 * One model kind a reaction species may use: reads the body of that model's endpoint (with the
 * reaction's temperature grid put in) and returns the species' thermodynamics. Throws
 * {@link org.statesum.api.request.ProblemException} naming bad fields by pointers relative to that body, as the endpoint does.
 */
@FunctionalInterface
public interface SpeciesKind {

    SpeciesThermo read(JsonNode input);
}
