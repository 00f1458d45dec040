package org.statesum.api;

import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.models.HeatCapacityMaximum;
import org.statesum.units.EnergyUnit;

/** Maps a {@link HeatCapacityMaximum} to the optional {@code heatCapacityMaximum} member of a spectrum answer. */
final class HeatCapacityMaximumAnswer {

    private HeatCapacityMaximumAnswer() {
    }

    static Map<String, Object> of(HeatCapacityMaximum max, EnergyUnit unit) {
        Map<String, Object> temperature = new LinkedHashMap<>();
        temperature.put("unit", "K");
        temperature.put("value", max.temperatureKelvin());
        temperature.put("tolerance", max.temperatureToleranceKelvin());
        Map<String, Object> value = new LinkedHashMap<>();
        value.put("unit", unit.entropySymbol());
        value.put("value", unit.entropyFromJoulesPerKelvin(max.heatCapacityJoulePerKelvin()));
        value.put("errorBound", unit.entropyFromJoulesPerKelvin(max.heatCapacityErrorBoundJoulePerKelvin())
                + EnergyUnit.conversionRelativeError() * Math.abs(unit.entropyFromJoulesPerKelvin(
                        max.heatCapacityJoulePerKelvin())));
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("temperature", temperature);
        out.put("isochoricHeatCapacity", value);
        out.put("optimizer", "Brent's method on the bracketing grid interval (commons-math3)");
        out.put("evaluations", max.evaluations());
        return out;
    }
}
