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
                Map<String, Object> series = ThermoResponse.series(e.getKey(), e.getValue(), unit);
                // the estimate in the series' own unit: the conversion of its values, applied to it
                double factor = ThermoResponse.converted(e.getKey(), new Series(new double[] {1}, new double[] {0}), unit)
                        .values()[0];
                series.put(FIT_ESTIMATES, scaled(s.thermoFitEstimates().get(e.getKey()), factor));
                state.put(ThermoResponse.wireName(e.getKey()), series);
            }
            double perVolumeUnit = 1 / job.volumeUnit().cubicMetresPerUnit();
            state.put("volume", withEstimates(ThermoResponse.wire(job.volumeUnit().symbol(),
                    s.volumeCubicMetre().scaled(perVolumeUnit)), scaled(s.volumeFitEstimate(), perVolumeUnit)));
            state.put("bulkModulus", withEstimates(ThermoResponse.wire(job.pressureUnit().symbol(),
                    s.bulkModulusPascal().scaled(1 / pressureScale)), scaled(s.bulkModulusFitEstimate(), 1 / pressureScale)));
            state.put("thermalExpansion", withEstimates(ThermoResponse.wire("1/K", s.thermalExpansionPerKelvin()),
                    s.thermalExpansionFitEstimate()));
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

    /** A series' fit-error estimates (an estimate, not a bound: see the contract). */
    private static final String FIT_ESTIMATES = "fitErrorEstimates";

    private static Map<String, Object> withEstimates(Map<String, Object> series, double[] estimates) {
        series.put(FIT_ESTIMATES, estimates);
        return series;
    }

    private static double[] scaled(double[] a, double f) {
        double[] o = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            o[i] = a[i] * f;
        }
        return o;
    }
}
