package org.statesum.api.spectrum;

import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.models.HeatCapacityMaximum;
import org.statesum.units.EnergyUnit;

/** Maps a {@link HeatCapacityMaximum} to the optional {@code heatCapacityMaximum} member of a spectrum answer. */
public final class HeatCapacityMaximumAnswer {

    private HeatCapacityMaximumAnswer() {
    }

    static Map<String, Object> of(HeatCapacityMaximum max, EnergyUnit unit) {
        return of(max, unit, 1);
    }

    /**
     * As {@link #of(HeatCapacityMaximum, EnergyUnit)} for an answer whose entity holds
     * {@code particlesPerEntity} particles: a molar unit is per mole of particles (as in
     * {@link org.statesum.api.request.ThermoResponse}), so the heat capacity is divided by N there.
     */
    static Map<String, Object> of(HeatCapacityMaximum max, EnergyUnit unit, double particlesPerEntity) {
        double perEntity = unit.molar() ? 1.0 / particlesPerEntity : 1.0;
        Map<String, Object> temperature = new LinkedHashMap<>();
        temperature.put("unit", "K");
        temperature.put("value", max.temperatureKelvin());
        temperature.put("tolerance", max.temperatureToleranceKelvin());
        Map<String, Object> value = new LinkedHashMap<>();
        value.put("unit", unit.entropySymbol());
        double c = unit.entropyFromJoulesPerKelvin(max.heatCapacityJoulePerKelvin()) * perEntity;
        value.put("value", c);
        // The conversion's roundings, and two more (1/N and the product) when divided by N.
        value.put("errorBound", unit.entropyFromJoulesPerKelvin(max.heatCapacityErrorBoundJoulePerKelvin()) * perEntity
                + (EnergyUnit.conversionRelativeError() + (perEntity == 1.0 ? 0 : 2 * Math.ulp(1.0))) * Math.abs(c));
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("temperature", temperature);
        out.put("isochoricHeatCapacity", value);
        out.put("optimizer", "Brent's method on the bracketing grid interval (commons-math3)");
        out.put("evaluations", max.evaluations());
        return out;
    }
}
