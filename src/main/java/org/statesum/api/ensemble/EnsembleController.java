package org.statesum.api.ensemble;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.Fields;
import org.statesum.api.request.ThermoResponse;
import org.statesum.api.species.EnsembleReader;
import org.statesum.api.species.SpeciesKinds;
import org.statesum.models.ThermoResult;
import org.statesum.models.reaction.EnsembleThermo;
import org.statesum.units.EnergyUnit;

/** {@code POST /v1/ensemble}: one ensemble of members, each any species model, on a temperature grid. */
public final class EnsembleController implements ComputeEndpoint {

    private static final Set<String> TOP = Set.of("members", "temperatures", "outputUnit");

    private final EnsembleReader ensembles;
    private final ServiceConfig config;

    public EnsembleController(ServiceConfig config) {
        this.ensembles = SpeciesKinds.ensembles(config);
        this.config = config;
    }

    @Override
    public Object answer(JsonNode body) {
        Fields fields = new Fields();
        Optional<EnergyUnit> unit = body != null && body.has("outputUnit")
                ? fields.oneOf(body.get("outputUnit"), "/outputUnit", EnergyUnit.symbols()).flatMap(EnergyUnit::bySymbol)
                : EnergyUnit.bySymbol("kJ/mol");
        EnsembleThermo ensemble = ensembles.read(body, TOP, fields);
        fields.throwIfAny();
        double[] grid = org.statesum.api.request.TemperatureGridReader.read(body.get("temperatures"), "/temperatures",
                config.maxTemperatures(), new Fields()).orElseThrow();
        ThermoResult result = ensemble.at(grid);
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("members", ensemble.names());
        system.put("degeneracies", ensemble.degeneracies());
        system.put("standardState", ensemble.standardState());
        return ThermoResponse.of(result, unit.get(), system);
    }
}
