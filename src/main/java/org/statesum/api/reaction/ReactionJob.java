package org.statesum.api.reaction;

import java.util.List;
import java.util.Map;
import org.statesum.models.reaction.ReactionSpecies;
import org.statesum.units.EnergyUnit;

/** A validated {@code POST /v1/reaction} request. */
public record ReactionJob(List<ReactionSpecies> species, List<Map<String, Object>> echo, double[] temperaturesKelvin,
        EnergyUnit outputUnit, double rootToleranceKelvin) {
}
