package org.statesum.api.reaction;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.Fields;
import org.statesum.api.request.Measures;
import org.statesum.api.request.TemperatureGridReader;
import org.statesum.api.species.SpeciesEntryReader;
import org.statesum.api.species.SpeciesKinds;
import org.statesum.models.reaction.ReactionSpecies;
import org.statesum.units.EnergyUnit;

/**
 * Validates a {@code POST /v1/reaction} body. The temperature grid and the output unit are set once, at
 * the reaction level; each species' {@code input} is the body of its model's endpoint without them
 * (the reader puts the reaction's grid in). Errors inside a species are named under
 * {@code /species/i/input}; errors of the grid under {@code /temperatures}; all are collected at once.
 */
public final class ReactionRequestReader {

    private static final Set<String> TOP = Set.of("species", "temperatures", "outputUnit", "rootTolerance");
    private static final Set<String> SPECIES = Set.of("name", "coefficient", "model", "input");
    /** Most species in one reaction. */
    static final int MAX_SPECIES = 64;
    /** Default absolute tolerance of the root solver, K. */
    static final double DEFAULT_ROOT_TOLERANCE = 1e-6;


    private final ServiceConfig config;
    private final SpeciesEntryReader entries;

    ReactionRequestReader(ServiceConfig config, SpeciesKinds kinds) {
        this.config = config;
        this.entries = new SpeciesEntryReader(kinds);
    }

    ReactionJob read(JsonNode root) {
        Fields fields = new Fields();
        if (!fields.object(root, "", TOP)) {
            fields.throwIfAny();
        }
        JsonNode grid = fields.required(root, "temperatures", "");
        Optional<double[]> temperatures = Optional.ofNullable(grid)
                .flatMap(t -> TemperatureGridReader.read(t, "/temperatures", config.maxTemperatures(), fields));
        Optional<EnergyUnit> unit = root.has("outputUnit")
                ? fields.oneOf(root.get("outputUnit"), "/outputUnit", EnergyUnit.symbols()).flatMap(EnergyUnit::bySymbol)
                : EnergyUnit.bySymbol("kJ/mol");
        OptionalDouble tolerance = Measures.inRange(root, "rootTolerance", "/rootTolerance", 1e-12, 1,
                DEFAULT_ROOT_TOLERANCE, fields);
        JsonNode list = fields.required(root, "species", "");
        List<ReactionSpecies> species = new ArrayList<>();
        List<Map<String, Object>> echo = new ArrayList<>();
        if (list != null && (!list.isArray() || list.isEmpty() || list.size() > MAX_SPECIES)) {
            fields.add("/species", "must be an array of 1 to " + MAX_SPECIES + " species");
        } else if (list != null) {
            Set<String> names = new HashSet<>();
            for (int i = 0; i < list.size(); i++) {
                readSpecies(list.get(i), "/species/" + i, grid, temperatures.isPresent(), names, fields)
                        .ifPresent(s -> {
                            species.add(s);
                            echo.add(echo(s));
                        });
            }
        }
        fields.throwIfAny();
        return new ReactionJob(species, echo, temperatures.get(), unit.get(), tolerance.getAsDouble());
    }

    private Optional<ReactionSpecies> readSpecies(JsonNode node, String p, JsonNode grid, boolean gridGood,
            Set<String> names, Fields fields) {
        Optional<SpeciesEntryReader.Entry> entry = entries.read(node, p, SPECIES, grid, gridGood, names, fields);
        if (node == null || !node.isObject()) {
            return Optional.empty();
        }
        OptionalDouble nu = fields.number(fields.required(node, "coefficient", p), p + "/coefficient");
        if (nu.isPresent() && nu.getAsDouble() == 0) {
            fields.add(p + "/coefficient", "must not be zero (negative for reactants, positive for products)");
        }
        return entry.isEmpty() || nu.isEmpty() || nu.getAsDouble() == 0 ? Optional.empty()
                : Optional.of(new ReactionSpecies(entry.get().name(), nu.getAsDouble(), entry.get().thermo()));
    }

    private static Map<String, Object> echo(ReactionSpecies s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", s.name());
        m.put("coefficient", s.coefficient());
        m.put("standardState", s.thermo().standardState());
        return m;
    }
}
