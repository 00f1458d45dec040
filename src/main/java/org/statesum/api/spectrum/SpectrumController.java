package org.statesum.api.spectrum;

import com.fasterxml.jackson.databind.JsonNode;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.species.SpectrumJob;
import org.statesum.api.species.SpectrumRequestReader;
import org.statesum.models.HeatCapacityMaximum;
import org.statesum.models.LevelSetModel;
import org.statesum.models.ThermoResult;

/** {@code POST /v1/spectrum}: a discrete level set as N particles, to free energies. */
public final class SpectrumController implements ComputeEndpoint {

    private final SpectrumRequestReader requests;

    public SpectrumController(ServiceConfig config) {
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
