package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.statesum.api.request.Fields;
import org.statesum.api.request.ProblemException;
import org.statesum.engine.DomainException;
import org.statesum.models.reaction.SpeciesThermo;

/**
 * Reads one named species entry of a composite body ({@code {name, model, input, ...}}: a reaction's
 * species, an ensemble's members): the name (unique among its siblings), the model kind and its
 * {@code input}, the body of that model's endpoint without the temperature grid and output unit, which
 * the composite sets once. Errors inside the input are named under {@code <entry>/input}, those of the
 * grid under {@code /temperatures}; all are collected in {@code fields}.
 */
public final class SpeciesEntryReader {

    /** A grid to check a species on when the composite's own grid is bad (and already reported). */
    private static final JsonNode STAND_IN_GRID = JsonNodeFactory.instance.objectNode()
            .set("values", JsonNodeFactory.instance.arrayNode().add(298.15));

    private final SpeciesKinds kinds;

    public SpeciesEntryReader(SpeciesKinds kinds) {
        this.kinds = kinds;
    }

    /** A named species read from an entry. */
    public record Entry(String name, SpeciesThermo thermo) {
    }

    /**
     * @param node the entry
     * @param p its pointer
     * @param keys the members the entry may have (name, model and input among them)
     * @param grid the composite's temperature grid (its body), and whether it read without error
     * @param names the names taken by earlier siblings; this one is added
     * @return the species, or empty when anything about it is bad (then named in {@code fields})
     */
    public Optional<Entry> read(JsonNode node, String p, Set<String> keys, JsonNode grid, boolean gridGood,
            Set<String> names, Fields fields) {
        if (!fields.object(node, p, keys)) {
            return Optional.empty();
        }
        JsonNode nameNode = fields.required(node, "name", p);
        String name = null;
        if (nameNode != null && (!nameNode.isTextual() || nameNode.textValue().isBlank())) {
            fields.add(p + "/name", "must be a non-empty string");
        } else if (nameNode != null && !names.add(nameNode.textValue())) {
            fields.add(p + "/name", "another entry already has this name");
        } else if (nameNode != null) {
            name = nameNode.textValue();
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
                    fields.add(p + "/input/" + shared, "is set once for the whole body, at /" + shared);
                }
            }
        }
        if (kind.isEmpty() || input == null) {
            return Optional.empty();
        }
        ObjectNode withGrid = ((ObjectNode) input).deepCopy();
        // An entry's own grid or output unit was reported above; the rest of its input is still checked.
        withGrid.remove("outputUnit");
        // With a bad grid (already reported) the entry is still checked, on a stand-in grid.
        withGrid.set("temperatures", gridGood ? grid : STAND_IN_GRID);
        try {
            SpeciesThermo thermo = kind.get().read(withGrid);
            return name == null ? Optional.empty() : Optional.of(new Entry(name, thermo));
        } catch (ProblemException e) {
            e.problem().errors().forEach(err -> fields.add(relocate(err.pointer(), p), err.message()));
        } catch (DomainException e) {
            fields.add(relocate(e.field(), p), e.getMessage());
        }
        return Optional.empty();
    }

    /** A pointer inside an entry's input, as seen from the composite (the grid belongs to the composite). */
    private static String relocate(String pointer, String entryPointer) {
        return pointer.startsWith("/temperatures") ? pointer : entryPointer + "/input" + pointer;
    }
}
