package org.statesum.api;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;
import org.statesum.units.EnergyUnit;
import org.statesum.units.PhysicalConstants;

/**
 * Maps a model's {@link ThermoResult} (SI) to the shared answer shape: one columnar series per
 * quantity with its unit and error bounds, then {@code precision}, {@code warnings} and
 * {@code provenance}. Energies go to the output unit, entropies and heat capacities to its entropy unit.
 */
final class ThermoResponse {

    private ThermoResponse() {
    }

    static Map<String, Object> of(ThermoResult result, EnergyUnit unit, Map<String, Object> system) {
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("temperature", Map.of("unit", "K", "values", result.temperaturesKelvin()));
        for (Map.Entry<Quantity, Series> entry : result.series().entrySet()) {
            body.put(wireName(entry.getKey()), series(entry.getKey(), entry.getValue(), unit));
        }
        if (result.populations() != null) {
            Map<String, Object> populations = new LinkedHashMap<>();
            populations.put("unit", "1");
            populations.put("values", result.populations().values());
            populations.put("errorBounds", result.populations().errorBounds());
            body.put("populations", populations);
        }
        if (system != null) {
            body.put("system", system);
        }
        body.put("precision", result.precision());
        body.put("warnings", warnings(result.warnings()));
        body.put("provenance", provenance());
        return body;
    }

    /** Every series of a map, by wire name, in the output unit (as in the main answer). */
    static Map<String, Object> seriesMap(Map<Quantity, Series> series, EnergyUnit unit) {
        Map<String, Object> out = new LinkedHashMap<>();
        series.forEach((quantity, si) -> out.put(wireName(quantity), series(quantity, si, unit)));
        return out;
    }

    static Map<String, Object> provenance() {
        Map<String, Object> provenance = new LinkedHashMap<>();
        provenance.put("service", "statesum");
        provenance.put("version", Version.current());
        provenance.put("constants", PhysicalConstants.SOURCE);
        return provenance;
    }

    static String wireName(Quantity quantity) {
        return switch (quantity) {
            case LOG_PARTITION_FUNCTION -> "logPartitionFunction";
            case HELMHOLTZ_ENERGY -> "helmholtzEnergy";
            case INTERNAL_ENERGY -> "internalEnergy";
            case ENTROPY -> "entropy";
            case ISOCHORIC_HEAT_CAPACITY -> "isochoricHeatCapacity";
            case ENTHALPY -> "enthalpy";
            case GIBBS_ENERGY -> "gibbsEnergy";
            case ISOBARIC_HEAT_CAPACITY -> "isobaricHeatCapacity";
            case ZERO_POINT_ENERGY -> "zeroPointEnergy";
            case LOG_EQUILIBRIUM_CONSTANT -> "logEquilibriumConstant";
        };
    }

    static Map<String, Object> series(Quantity quantity, Series si, EnergyUnit unit) {
        Map<String, Object> out = new LinkedHashMap<>();
        Series converted;
        switch (quantity.dimension()) {
            case ENERGY -> {
                out.put("unit", unit.symbol());
                converted = si.scaled(1.0 / unit.joulesPerUnit());
            }
            case ENTROPY -> {
                out.put("unit", unit.entropySymbol());
                converted = si.scaled(unit.entropyFromJoulesPerKelvin(1.0));
            }
            default -> {
                out.put("unit", "1");
                converted = si;
            }
        }
        out.put("values", converted.values());
        out.put("errorBounds", converted.errorBounds());
        return out;
    }

    private static List<Map<String, Object>> warnings(List<Warning> warnings) {
        return warnings.stream().map(w -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("code", w.code());
            m.put("message", w.message());
            m.put("temperatures", w.temperatures());
            return m;
        }).toList();
    }
}
