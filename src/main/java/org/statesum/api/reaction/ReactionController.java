package org.statesum.api.reaction;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.ThermoResponse;
import org.statesum.api.species.SpeciesKinds;
import org.statesum.models.reaction.ReactionModel;
import org.statesum.models.reaction.ReactionResult;

/** {@code POST /v1/reaction}: reaction Gibbs energy, enthalpy, entropy, heat capacity, ln K and sign changes. */
public final class ReactionController implements ComputeEndpoint {

    /** What ln K refers to, stated in every answer. */
    static final String STANDARD_STATE = "K = product of a_i^nu_i; each activity a_i is relative to the standard "
            + "state listed for species i (p_i / p° or c_i / c° for an ideal gas; 1 for a level set)";

    private final ReactionRequestReader requests;

    public ReactionController(ServiceConfig config) {
        this.requests = new ReactionRequestReader(config, SpeciesKinds.standard(config));
    }

    @Override
    public Object answer(JsonNode body) {
        ReactionJob job = requests.read(body);
        ReactionResult result = ReactionModel.evaluate(job.species(), job.temperaturesKelvin(),
                job.rootToleranceKelvin());
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("species", job.echo());
        system.put("equilibriumConstant", STANDARD_STATE);
        system.put("basis", "per reaction event as written (per mole of reaction in molar units)");
        Map<String, Object> answer = ThermoResponse.of(result.result(), job.outputUnit(), system);
        answer.put("signChanges", result.signChanges().stream().map(s -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("temperature", s.temperatureKelvin());
            m.put("solverTolerance", s.solverToleranceKelvin());
            m.put("errorBound", s.errorBoundKelvin());
            m.put("direction", s.rising() ? "negative-to-positive" : "positive-to-negative");
            m.put("evaluations", s.evaluations());
            return m;
        }).toList());
        return answer;
    }
}
