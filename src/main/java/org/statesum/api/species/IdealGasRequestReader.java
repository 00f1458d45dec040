package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.Fields;
import org.statesum.api.request.Measures;
import org.statesum.api.request.TemperatureGridReader;
import org.statesum.engine.DomainException;
import org.statesum.engine.LevelSet;
import org.statesum.models.LevelSetModel;
import org.statesum.models.gas.ElectronicStates;
import org.statesum.models.gas.IdealGasSpecies;
import org.statesum.models.gas.LinearRotor;
import org.statesum.models.gas.Rotation;
import org.statesum.models.gas.StandardState;
import org.statesum.units.EnergyUnit;

/** Validates a {@code POST /v1/ideal-gas} body, collecting every bad field, into an {@link IdealGasJob}. */
public final class IdealGasRequestReader {

    private static final Set<String> TOP = Set.of("mass", "standardState", "rotation", "vibrations", "electronic",
            "electronicEnergy", "temperatures", "outputUnit");
    private static final Set<String> ELECTRONIC = Set.of("multiplicity", "energies", "degeneracies", "energyUnit");
    /** Most electronic multiplicity accepted (2S + 1 for S up to 10). */
    private static final int MAX_MULTIPLICITY = 21;

    private final ServiceConfig config;

    public IdealGasRequestReader(ServiceConfig config) {
        this.config = config;
    }

    public IdealGasJob read(JsonNode root) {
        Fields fields = new Fields();
        if (!fields.object(root, "", TOP)) {
            fields.throwIfAny();
        }
        OptionalDouble mass = Measures.positive(fields.required(root, "mass", ""), "/mass", GasUnits.MASS, fields);
        Optional<StandardState> state = standardState(root.get("standardState"), fields);
        Optional<double[]> temperatures = Optional.ofNullable(fields.required(root, "temperatures", ""))
                .flatMap(t -> TemperatureGridReader.read(t, "/temperatures", config.maxTemperatures(), fields));
        temperatures.filter(t -> Arrays.stream(t).anyMatch(v -> v == 0))
                .ifPresent(t -> fields.add("/temperatures", "an ideal gas needs T > 0 (its entropy diverges at T = 0)"));
        Optional<EnergyUnit> unit = root.has("outputUnit")
                ? fields.oneOf(root.get("outputUnit"), "/outputUnit", EnergyUnit.symbols()).flatMap(EnergyUnit::bySymbol)
                : EnergyUnit.bySymbol("kJ/mol");
        Optional<Rotation> rotation = RotationReader.read(fields.required(root, "rotation", ""), fields);
        Optional<VibrationReader.Result> vibrations = VibrationReader.read(root.get("vibrations"), config.maxLevels(),
                fields);
        Optional<LevelSet> levels = electronicLevels(root.get("electronic"), fields);
        double[] energy = electronicEnergy(root.get("electronicEnergy"), fields);
        if (temperatures.isPresent() && rotation.isPresent() && vibrations.isPresent()) {
            checkBudget(temperatures.get(), rotation.get(), vibrations.get(), fields);
        }
        fields.throwIfAny();
        IdealGasSpecies species = new IdealGasSpecies(mass.getAsDouble(), state.get(), rotation.get(),
                vibrations.get().vibrations(), new ElectronicStates(levels.get(), energy[0], energy[1]));
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("massKilogram", mass.getAsDouble());
        system.put("standardState", state.get().describe());
        system.put("vibrationalModes", vibrations.get().vibrations().modeCount());
        if (!Double.isNaN(vibrations.get().droppedImaginary())) {
            system.put("droppedImaginaryWavenumber", vibrations.get().droppedImaginary());
        }
        return new IdealGasJob(species, temperatures.get(), unit.get(), system);
    }

    private static Optional<StandardState> standardState(JsonNode node, Fields fields) {
        String p = "/standardState";
        if (node == null) {
            return Optional.of(StandardState.pressure(StandardState.STANDARD_PRESSURE_PASCAL));
        }
        if (!fields.object(node, p, Set.of("pressure", "concentration"))) {
            return Optional.empty();
        }
        if (node.has("pressure") == node.has("concentration")) {
            fields.add(p, "give exactly one of 'pressure' and 'concentration'");
            return Optional.empty();
        }
        OptionalDouble value = node.has("pressure")
                ? Measures.positive(node.get("pressure"), p + "/pressure", GasUnits.PRESSURE, fields)
                : Measures.positive(node.get("concentration"), p + "/concentration", GasUnits.CONCENTRATION, fields);
        if (value.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(node.has("pressure") ? StandardState.pressure(value.getAsDouble())
                : StandardState.concentration(value.getAsDouble()));
    }

    private Optional<LevelSet> electronicLevels(JsonNode node, Fields fields) {
        String p = "/electronic";
        if (node == null) {
            return Optional.of(LevelSet.ofDegeneracies(new double[] {0}, new double[] {1}));
        }
        if (!fields.object(node, p, ELECTRONIC)) {
            return Optional.empty();
        }
        if (node.has("multiplicity")) {
            if (node.has("energies") || node.has("degeneracies") || node.has("energyUnit")) {
                fields.add(p, "give 'multiplicity' alone, or 'energies', 'degeneracies' and 'energyUnit'");
            }
            OptionalDouble m = Measures.inRange(node, "multiplicity", p + "/multiplicity", 1, MAX_MULTIPLICITY, 1,
                    fields);
            if (m.isPresent() && Math.rint(m.getAsDouble()) != m.getAsDouble()) {
                fields.add(p + "/multiplicity", "must be an integer");
            }
            return m.isPresent() ? Optional.of(LevelSet.ofDegeneracies(new double[] {0},
                    new double[] {m.getAsDouble()})) : Optional.empty();
        }
        Optional<EnergyUnit> unit = fields.oneOf(fields.required(node, "energyUnit", p), p + "/energyUnit",
                EnergyUnit.symbols()).flatMap(EnergyUnit::bySymbol);
        Optional<double[]> energies = fields.numbers(fields.required(node, "energies", p), p + "/energies",
                config.maxLevels());
        Optional<double[]> degeneracies = fields.numbers(fields.required(node, "degeneracies", p),
                p + "/degeneracies", config.maxLevels());
        if (unit.isEmpty() || energies.isEmpty() || degeneracies.isEmpty()) {
            return Optional.empty();
        }
        double[] e = energies.get();
        double[] g = degeneracies.get();
        if (e.length != g.length) {
            fields.add(p + "/degeneracies", "has " + g.length + " elements but energies has " + e.length);
            return Optional.empty();
        }
        double[] kelvin = new double[e.length];
        boolean good = true;
        for (int i = 0; i < e.length; i++) {
            kelvin[i] = LevelSetModel.toKelvin(new double[] {unit.get().toJoules(e[i])})[0];
            if (!(Math.abs(kelvin[i]) <= LevelSet.MAX_ABS_ENERGY_KELVIN)) {
                fields.add(p + "/energies/" + i, "energy / k_B exceeds " + LevelSet.MAX_ABS_ENERGY_KELVIN + " K");
                good = false;
            }
            if (!(g[i] > 0)) {
                fields.add(p + "/degeneracies/" + i, "a degeneracy must be positive");
                good = false;
            }
        }
        return good ? Optional.of(LevelSet.ofDegeneracies(kelvin, g)
                .withEnergyRelativeError(2 * EnergyUnit.conversionRelativeError())) : Optional.empty();
    }

    /** E_el in J per molecule and its conversion bound; zeros when absent. */
    private static double[] electronicEnergy(JsonNode node, Fields fields) {
        String p = "/electronicEnergy";
        if (node == null || !fields.object(node, p, Set.of("value", "unit"))) {
            return new double[2];
        }
        OptionalDouble value = fields.number(fields.required(node, "value", p), p + "/value");
        Optional<EnergyUnit> unit = fields.oneOf(fields.required(node, "unit", p), p + "/unit", EnergyUnit.symbols())
                .flatMap(EnergyUnit::bySymbol);
        if (value.isEmpty() || unit.isEmpty()) {
            return new double[2];
        }
        double joule = unit.get().toJoules(value.getAsDouble());
        return new double[] {joule, EnergyUnit.conversionRelativeError() * Math.abs(joule)};
    }

    private void checkBudget(double[] temperatures, Rotation rotation, VibrationReader.Result vibrations,
            Fields fields) {
        long work = (long) temperatures.length * (vibrations.vibrations().modeCount() + 1);
        if (rotation instanceof LinearRotor rotor) {
            try {
                work += rotor.levelCount(temperatures);
            } catch (DomainException e) {
                fields.add("/rotation/treatment", e.getMessage());
                return;
            }
        }
        if (work > config.computeBudget()) {
            fields.add("", "this job needs about " + work + " term evaluations, over the compute budget of "
                    + config.computeBudget() + " (STATESUM_COMPUTE_BUDGET)");
        }
    }
}
