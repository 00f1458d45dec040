package org.statesum.api.solid;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.ThermoResponse;
import org.statesum.api.species.CrystalJob;
import org.statesum.api.species.CrystalRequestReader;
import org.statesum.models.solid.Crystal;
import org.statesum.models.solid.CrystalModel;

/** {@code POST /v1/crystal}: a harmonic crystal to free energies per formula unit or per atom. */
public final class CrystalController implements ComputeEndpoint {

    private final CrystalRequestReader requests;

    public CrystalController(ServiceConfig config) {
        this.requests = new CrystalRequestReader(config);
    }

    @Override
    public Object answer(JsonNode body) {
        CrystalJob job = requests.read(body);
        Crystal crystal = job.crystal();
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("model", crystal.model());
        system.put("atomsPerFormulaUnit", crystal.atomsPerFormulaUnit());
        system.put("basis", job.perAtom() ? "atom" : "formula-unit");
        Map<String, Object> leftOut = new LinkedHashMap<>();
        leftOut.put("nearZeroModes", crystal.screen().nearZeroModes());
        leftOut.put("smallImaginaryModes", crystal.screen().smallImaginaryModes());
        leftOut.put("toleranceKelvin", crystal.screen().toleranceKelvin());
        system.put("modesLeftOut", leftOut);
        if (crystal.normalisation() != null) {
            Map<String, Object> norm = new LinkedHashMap<>();
            norm.put("integral", crystal.normalisation().integral());
            norm.put("expected", crystal.normalisation().expected());
            norm.put("factor", crystal.normalisation().factor());
            norm.put("applied", crystal.normalisation().applied());
            system.put("normalisation", norm);
        }
        return ThermoResponse.of(CrystalModel.evaluate(crystal, job.temperaturesKelvin(), job.perAtom()),
                job.outputUnit(), system);
    }
}
