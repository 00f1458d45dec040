package org.statesum.api.solid;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.ThermoResponse;
import org.statesum.api.species.QuasiHarmonicJob;
import org.statesum.api.species.QuasiHarmonicRequestReader;
import org.statesum.engine.Series;
import org.statesum.models.Quantity;
import org.statesum.models.solid.PressureState;
import org.statesum.models.solid.QuasiHarmonicModel;
import org.statesum.models.solid.QuasiHarmonicResult;
import org.statesum.units.EnergyUnit;

/**
 * {@code POST /v1/quasi-harmonic}: volume-dependent static energies and phonons to G(T, P), V(T), B(T),
 * alpha(T) and C_P(T), one block of series per pressure.
 */
public final class QuasiHarmonicController implements ComputeEndpoint {

    private final QuasiHarmonicRequestReader requests;

    public QuasiHarmonicController(ServiceConfig config) {
        this.requests = new QuasiHarmonicRequestReader(config);
    }

    @Override
    public Object answer(JsonNode body) {
        QuasiHarmonicJob job = requests.read(body);
        QuasiHarmonicResult result = QuasiHarmonicModel.evaluate(job.crystal(), job.temperaturesKelvin(),
                job.pressuresPascal(), job.perAtom());
        EnergyUnit unit = job.outputUnit();
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("temperature", ThermoResponse.measure("K", "values", result.temperaturesKelvin()));
        List<Map<String, Object>> states = new ArrayList<>();
        double pressureScale = job.pressureUnit().pascalsPerUnit();
        for (PressureState s : result.states()) {
            Map<String, Object> state = new LinkedHashMap<>();
            state.put("pressure", ThermoResponse.measure(job.pressureUnit().symbol(), "value",
                    s.pressurePascal() / pressureScale));
            for (Map.Entry<Quantity, Series> e : s.thermo().entrySet()) {
                state.put(ThermoResponse.wireName(e.getKey()), ThermoResponse.series(e.getKey(), e.getValue(), unit));
            }
            state.put("volume", ThermoResponse.wire(job.volumeUnit().symbol(),
                    s.volumeCubicMetre().scaled(1 / job.volumeUnit().cubicMetresPerUnit())));
            state.put("bulkModulus", ThermoResponse.wire(job.pressureUnit().symbol(), s.bulkModulusPascal().scaled(1 / pressureScale)));
            state.put("thermalExpansion", ThermoResponse.wire("1/K", s.thermalExpansionPerKelvin()));
            states.add(state);
        }
        out.put("states", states);
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("atomsPerFormulaUnit", job.crystal().atomsPerFormulaUnit());
        system.put("basis", job.perAtom() ? "atom" : "formula-unit");
        system.put("equationOfState", QuasiHarmonicRequestReader.FORMS.get(job.crystal().equationOfState().ordinal()));
        system.put("volumes", job.crystal().volumesCubicMetre().length);
        out.put("system", system);
        Map<String, Object> precision = new LinkedHashMap<>(result.precision());
        Map<String, Object> residuals = new LinkedHashMap<>();
        residuals.put("unit", unit.symbol());
        residuals.put("maxAbsolute", scaled(result.maxResidualJoule(), 1 / unit.joulesPerUnit()));
        residuals.put("rootMeanSquare", scaled(result.rmsResidualJoule(), 1 / unit.joulesPerUnit()));
        precision.put("fitResiduals", residuals);
        out.put("precision", precision);
        out.put("warnings", ThermoResponse.warnings(result.warnings()));
        out.put("provenance", ThermoResponse.provenance());
        return out;
    }

    private static double[] scaled(double[] a, double f) {
        double[] o = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            o[i] = a[i] * f;
        }
        return o;
    }
}
