package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.Fields;
import org.statesum.api.request.TemperatureGridReader;
import org.statesum.models.reaction.EnsembleThermo;

/**
 * Reads an ensemble: {@code {"members": [{name, model, input, degeneracy}], "temperatures": ...}}, each
 * member any species kind (an ensemble too), {@code degeneracy} a positive integer (equivalent copies:
 * mirror images, rotamers the structure makes identical; default 1). All members must share one standard
 * state, so that their G can be compared.
 */
public final class EnsembleReader {

    /** Most members of one ensemble. */
    public static final int MAX_MEMBERS = 64;
    /** Largest degeneracy accepted. */
    public static final double MAX_DEGENERACY = 1e6;
    private static final Set<String> TOP = Set.of("members", "temperatures");
    private static final Set<String> MEMBER = Set.of("name", "model", "input", "degeneracy");

    private final SpeciesEntryReader entries;
    private final ServiceConfig config;

    EnsembleReader(SpeciesKinds kinds, ServiceConfig config) {
        this.entries = new SpeciesEntryReader(kinds);
        this.config = config;
    }

    /** The ensemble of a body with its temperature grid; throws a 422 problem naming every bad field. */
    public EnsembleThermo read(JsonNode root) {
        Fields fields = new Fields();
        EnsembleThermo ensemble = read(root, TOP, fields);
        fields.throwIfAny();
        return ensemble;
    }

    /** As above with other top-level members allowed (an endpoint's own, such as outputUnit); null if bad. */
    public EnsembleThermo read(JsonNode root, Set<String> top, Fields fields) {
        if (!fields.object(root, "", top)) {
            return null;
        }
        JsonNode grid = fields.required(root, "temperatures", "");
        Optional<double[]> temperatures = Optional.ofNullable(grid)
                .flatMap(t -> TemperatureGridReader.read(t, "/temperatures", config.maxTemperatures(), fields));
        JsonNode list = fields.required(root, "members", "");
        if (list == null) {
            return null;
        }
        if (!list.isArray() || list.isEmpty() || list.size() > MAX_MEMBERS) {
            fields.add("/members", "must be an array of 1 to " + MAX_MEMBERS + " members");
            return null;
        }
        List<String> names = new ArrayList<>();
        List<Double> degeneracies = new ArrayList<>();
        List<org.statesum.models.reaction.SpeciesThermo> members = new ArrayList<>();
        Set<String> taken = new HashSet<>();
        String state = null;
        for (int i = 0; i < list.size(); i++) {
            String p = "/members/" + i;
            JsonNode node = list.get(i);
            Optional<SpeciesEntryReader.Entry> entry = entries.read(node, p, MEMBER, grid, temperatures.isPresent(),
                    taken, fields);
            double d = 1;
            if (node != null && node.isObject() && node.has("degeneracy")) {
                d = fields.number(node.get("degeneracy"), p + "/degeneracy").orElse(1);
                if (!(d >= 1 && d <= MAX_DEGENERACY && Math.rint(d) == d)) {
                    fields.add(p + "/degeneracy", "must be an integer from 1 to " + (long) MAX_DEGENERACY);
                }
            }
            if (entry.isPresent()) {
                String own = entry.get().thermo().standardState();
                if (state == null) {
                    state = own;
                } else if (!state.equals(own)) {
                    fields.add(p + "/model", "members must share one standard state to be compared: this one is '"
                            + own + "', the first '" + state + "'");
                }
                names.add(entry.get().name());
                degeneracies.add(d);
                members.add(entry.get().thermo());
            }
        }
        if (fields.hasErrors()) {
            return null;
        }
        return new EnsembleThermo(List.copyOf(names), degeneracies.stream().mapToDouble(Double::doubleValue).toArray(),
                List.copyOf(members));
    }
}
