package org.statesum.models.reaction;

import java.util.List;
import org.statesum.models.ThermoResult;

/** The reaction quantities on the grid (SI per reaction event as written) and the sign changes of Delta_r G. */
public record ReactionResult(ThermoResult result, List<SignChange> signChanges) {
}
