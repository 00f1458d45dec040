package org.statesum.api.request;

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
public final class ThermoResponse {

    private ThermoResponse() {
    }

    public static Map<String, Object> of(ThermoResult result, EnergyUnit unit, Map<String, Object> system) {
        return of(result, unit, system, 1);
    }

    /**
     * As {@link #of(ThermoResult, EnergyUnit, Map)}, for a result whose entity holds
     * {@code particlesPerEntity} particles (N for the total of an N-particle system): a molar unit is
     * per mole of particles, so its values are the result divided by N / N_A.
     */
    public static Map<String, Object> of(ThermoResult result, EnergyUnit unit, Map<String, Object> system,
            double particlesPerEntity) {
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("temperature", measure("K", "values", result.temperaturesKelvin()));
        double perParticle = unit.molar() ? 1.0 / particlesPerEntity : 1.0;
        for (Map.Entry<Quantity, Series> entry : result.series().entrySet()) {
            Series converted = converted(entry.getKey(), entry.getValue(), unit);
            if (perParticle != 1.0 && entry.getKey().extensive()) {
                // One more factor (1/N, rounded) and product: Series.scaled adds their two roundings.
                converted = converted.scaled(perParticle);
            }
            body.put(wireName(entry.getKey()), wire(symbol(entry.getKey(), unit), converted));
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
    /**
     * {@code {"unit": unit, name: value}} in that order, like every series. Answers are built from ordered
     * maps only: Map.of's order changes from one JVM to the next, and the same request must give the same
     * bytes.
     */
    public static Map<String, Object> measure(String unit, String name, Object value) {
        Map<String, Object> measure = new LinkedHashMap<>();
        measure.put("unit", unit);
        measure.put(name, value);
        return measure;
    }

    public static Map<String, Object> seriesMap(Map<Quantity, Series> series, EnergyUnit unit) {
        Map<String, Object> out = new LinkedHashMap<>();
        series.forEach((quantity, si) -> out.put(wireName(quantity),
                wire(symbol(quantity, unit), converted(quantity, si, unit))));
        return out;
    }

    public static Map<String, Object> provenance() {
        Map<String, Object> provenance = new LinkedHashMap<>();
        provenance.put("service", "statesum");
        provenance.put("version", Version.current());
        provenance.put("constants", PhysicalConstants.SOURCE);
        return provenance;
    }

    public static String wireName(Quantity quantity) {
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
            case CHEMICAL_POTENTIAL -> "chemicalPotential";
            case MIXING_ENTROPY -> "mixingEntropy";
        };
    }

    /** One series in the output unit, in wire form ({@code unit}, {@code values}, {@code errorBounds}). */
    public static Map<String, Object> series(Quantity quantity, Series si, EnergyUnit unit) {
        return wire(symbol(quantity, unit), converted(quantity, si, unit));
    }

    /** A series in SI converted to the output unit (energies) or its entropy unit (entropies, heat capacities). */
    public static Series converted(Quantity quantity, Series si, EnergyUnit unit) {
        return switch (quantity.dimension()) {
            case ENERGY -> si.scaled(1.0 / unit.joulesPerUnit());
            case ENTROPY -> si.scaled(unit.entropyFromJoulesPerKelvin(1.0));
            default -> si;
        };
    }

    /** The wire unit symbol of a quantity's series in the output unit. */
    public static String symbol(Quantity quantity, EnergyUnit unit) {
        return switch (quantity.dimension()) {
            case ENERGY -> unit.symbol();
            case ENTROPY -> unit.entropySymbol();
            default -> "1";
        };
    }

    /** A series already in its unit, in wire form. */
    public static Map<String, Object> wire(String symbol, Series series) {
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("unit", symbol);
        out.put("values", series.values());
        out.put("errorBounds", series.errorBounds());
        return out;
    }

    /** Warnings in wire form. */
    public static List<Map<String, Object>> warnings(List<Warning> warnings) {
        return warnings.stream().map(w -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("code", w.code());
            m.put("message", w.message());
            m.put("temperatures", w.temperatures());
            return m;
        }).toList();
    }
}
