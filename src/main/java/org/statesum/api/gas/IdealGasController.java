package org.statesum.api.gas;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.ThermoResponse;
import org.statesum.api.species.IdealGasJob;
import org.statesum.api.species.IdealGasRequestReader;
import org.statesum.models.gas.IdealGasModel;
import org.statesum.models.gas.IdealGasResult;

/** {@code POST /v1/ideal-gas}: one molecular species as an ideal gas, per mole of molecules. */
public final class IdealGasController implements ComputeEndpoint {

    private final IdealGasRequestReader requests;

    public IdealGasController(ServiceConfig config) {
        this.requests = new IdealGasRequestReader(config);
    }

    @Override
    public Object answer(JsonNode body) {
        IdealGasJob job = requests.read(body);
        IdealGasResult result = IdealGasModel.evaluate(job.species(), job.temperaturesKelvin());
        Map<String, Object> answer = ThermoResponse.of(result.total(), job.outputUnit(), job.system());
        Map<String, Object> contributions = new LinkedHashMap<>();
        result.contributions().forEach((kind, series) -> contributions.put(kind.name().toLowerCase(Locale.ROOT),
                ThermoResponse.seriesMap(series, job.outputUnit())));
        answer.put("contributions", contributions);
        return answer;
    }
}
