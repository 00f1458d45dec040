package org.statesum.api;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.engine.ParticleStatistics;
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
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("particleCount", job.particles().count());
        system.put("statistics", job.particles().statistics() == ParticleStatistics.INDISTINGUISHABLE
                ? "indistinguishable" : "distinguishable");
        system.put("basis", job.particles().perParticle() ? "per-particle" : "total");
        double particlesPerEntity = job.particles().perParticle() ? 1 : job.particles().count();
        Map<String, Object> answer = ThermoResponse.of(result, job.outputUnit(), system, particlesPerEntity);
        HeatCapacityMaximum.locate(job.levels(), job.particles(), result).ifPresent(max -> answer.put(
                "heatCapacityMaximum", HeatCapacityMaximumAnswer.of(max, job.outputUnit(), particlesPerEntity)));
        return answer;
    }
}
