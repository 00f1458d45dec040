package org.statesum.api;

import com.fasterxml.jackson.databind.JsonNode;
import org.statesum.models.HeatCapacityMaximum;
import org.statesum.models.LevelSetModel;
import org.statesum.models.ThermoResult;

/** {@code POST /v1/spectrum}: a discrete level set as N particles, to free energies. */
final class SpectrumController implements ComputeEndpoint {

    private final SpectrumRequestReader requests;

    SpectrumController(ServiceConfig config) {
        this.requests = new SpectrumRequestReader(config);
    }

    @Override
    public Object answer(JsonNode body) {
        SpectrumJob job = requests.read(body);
        ThermoResult result = LevelSetModel.evaluate(job.levels(), job.temperaturesKelvin(), job.particles(),
                job.withPopulations());
        // written straight to the generator, the same bytes as ThermoResponse's maps (SpectrumAnswer)
        return new SpectrumAnswer(result, job.outputUnit(), job.particles(),
                HeatCapacityMaximum.locate(job.levels(), job.particles(), result).orElse(null));
    }
}
