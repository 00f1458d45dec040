package org.statesum.api.reaction;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
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
import org.statesum.api.request.ProblemException;
import org.statesum.api.request.TemperatureGridReader;
import org.statesum.api.species.SpeciesKind;
import org.statesum.api.species.SpeciesKinds;
import org.statesum.engine.DomainException;
import org.statesum.models.reaction.ReactionSpecies;
import org.statesum.models.reaction.SpeciesThermo;
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

    private static final JsonNode STAND_IN_GRID = JsonNodeFactory.instance
            .objectNode().set("values", JsonNodeFactory.instance.arrayNode()
                    .add(298.15));

    private final ServiceConfig config;
    private final SpeciesKinds kinds;

    ReactionRequestReader(ServiceConfig config, SpeciesKinds kinds) {
        this.config = config;
        this.kinds = kinds;
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
        if (!fields.object(node, p, SPECIES)) {
            return Optional.empty();
        }
        JsonNode nameNode = fields.required(node, "name", p);
        String name = null;
        if (nameNode != null && (!nameNode.isTextual() || nameNode.textValue().isBlank())) {
            fields.add(p + "/name", "must be a non-empty string");
        } else if (nameNode != null && !names.add(nameNode.textValue())) {
            fields.add(p + "/name", "another species already has this name");
        } else if (nameNode != null) {
            name = nameNode.textValue();
        }
        OptionalDouble nu = fields.number(fields.required(node, "coefficient", p), p + "/coefficient");
        if (nu.isPresent() && nu.getAsDouble() == 0) {
            fields.add(p + "/coefficient", "must not be zero (negative for reactants, positive for products)");
        }
        Optional<SpeciesKind> kind = fields.oneOf(fields.required(node, "model", p), p + "/model", kinds.names())
                .flatMap(kinds::find);
        JsonNode input = fields.required(node, "input", p);
        if (input != null && !input.isObject()) {
            fields.add(p + "/input", "must be an object: the body of the model's endpoint, without temperatures");
            return Optional.empty();
        }
        if (input != null) {
            for (String shared : List.of("temperatures", "outputUnit")) {
                if (input.has(shared)) {
                    fields.add(p + "/input/" + shared, "is set once for the whole reaction, at /" + shared);
                }
            }
        }
        if (kind.isEmpty() || input == null) {
            return Optional.empty();
        }
        ObjectNode withGrid = ((ObjectNode) input).deepCopy();
        // A species' own grid or output unit was reported above; the rest of its input is still checked.
        withGrid.remove("outputUnit");
        // With a bad grid (already reported) the species is still checked, on a stand-in grid.
        withGrid.set("temperatures", gridGood ? grid : STAND_IN_GRID);
        try {
            SpeciesThermo thermo = kind.get().read(withGrid);
            return name == null || nu.isEmpty() || nu.getAsDouble() == 0 ? Optional.empty()
                    : Optional.of(new ReactionSpecies(name, nu.getAsDouble(), thermo));
        } catch (ProblemException e) {
            e.problem().errors().forEach(err -> fields.add(relocate(err.pointer(), p), err.message()));
        } catch (DomainException e) {
            fields.add(relocate(e.field(), p), e.getMessage());
        }
        return Optional.empty();
    }

    /** A pointer inside a species body, as seen from the reaction (the grid belongs to the reaction). */
    private static String relocate(String pointer, String speciesPointer) {
        return pointer.startsWith("/temperatures") ? pointer : speciesPointer + "/input" + pointer;
    }

    private static Map<String, Object> echo(ReactionSpecies s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", s.name());
        m.put("coefficient", s.coefficient());
        m.put("standardState", s.thermo().standardState());
        return m;
    }
}
