package org.statesum.api;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.http.Context;
import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.engine.ParticleStatistics;
import org.statesum.models.LevelSetModel;
import org.statesum.models.ThermoResult;

/** {@code POST /v1/spectrum}: a discrete level set as N particles, to free energies. */
final class SpectrumController {

    private final BodyReader bodies;
    private final SpectrumRequestReader requests;
    private final ObjectMapper mapper;

    SpectrumController(BodyReader bodies, ServiceConfig config, ObjectMapper mapper) {
        this.bodies = bodies;
        this.requests = new SpectrumRequestReader(config);
        this.mapper = mapper;
    }

    void post(Context ctx) throws IOException {
        SpectrumJob job = requests.read(bodies.read(ctx));
        ThermoResult result = LevelSetModel.evaluate(job.levels(), job.temperaturesKelvin(), job.particles(),
                job.withPopulations());
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("particleCount", job.particles().count());
        system.put("statistics", job.particles().statistics() == ParticleStatistics.INDISTINGUISHABLE
                ? "indistinguishable" : "distinguishable");
        system.put("basis", job.particles().perParticle() ? "per-particle" : "total");
        Responses.json(ctx, mapper, ThermoResponse.of(result, job.outputUnit(), system));
    }
}
