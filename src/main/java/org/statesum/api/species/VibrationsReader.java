package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.Fields;
import org.statesum.api.request.RequiredFields;
import org.statesum.engine.DomainException;
import org.statesum.models.solid.Crystal;
import org.statesum.models.solid.Crystals;
import org.statesum.models.solid.ModeKind;
import org.statesum.units.FrequencyUnit;

/**
 * Reads one {@code vibrations} object (Einstein, Debye, phonons on a q-point mesh, or a density of states)
 * at a given JSON Pointer into a {@link Crystal}, collecting every bad field, every dynamically unstable
 * mode included. Used by the crystal and quasi-harmonic readers.
 */
public final class VibrationsReader {

    static final List<String> MODELS = List.of("einstein", "debye", "phonons", "density-of-states");
    /** Default mode tolerance: 1 cm-1 (common practice: acoustic modes at Gamma come out within it). */
    static final double DEFAULT_TOLERANCE_WAVENUMBER = 1.0;
    /** Largest Einstein or Debye temperature accepted, K (far above any lattice, still finite in every formula). */
    static final double MAX_THETA_KELVIN = 1e7;
    private static final Set<String> EINSTEIN = Set.of("model", "temperature", "frequency", "frequencyUnit");
    private static final Set<String> DEBYE = Set.of("model", "temperature");
    private static final Set<String> PHONONS = Set.of("model", "frequencyUnit", "modeTolerance", "qPoints");
    private static final Set<String> DOS = Set.of("model", "frequencyUnit", "modeTolerance", "frequencies", "density",
            "normalisation");

    private final ServiceConfig config;

    VibrationsReader(ServiceConfig config) {
        this.config = config;
    }

    Optional<Crystal> read(JsonNode node, String at, int atoms, Fields fields) {
        if (node == null) {
            return Optional.empty(); // reported as missing by the caller
        }
        if (!node.isObject()) {
            fields.add(at, "must be an object with a 'model'");
            return Optional.empty();
        }
        Optional<String> model = fields.oneOf(node.get("model"), at + "/model", MODELS);
        if (model.isEmpty()) {
            return Optional.empty();
        }
        int before = errorCount(fields);
        Optional<Crystal> crystal = switch (model.get()) {
            case "einstein" -> einstein(node, at, atoms, fields);
            case "debye" -> debye(node, at, atoms, fields);
            case "phonons" -> phonons(node, at, atoms, fields);
            default -> density(node, at, atoms, fields);
        };
        return errorCount(fields) == before ? crystal : Optional.empty();
    }

    private Optional<Crystal> einstein(JsonNode node, String at, int atoms, Fields fields) {
        fields.object(node, at, EINSTEIN);
        if (node.has("temperature") == node.has("frequency")) {
            fields.add(at, "give either 'temperature' (K) or 'frequency' with 'frequencyUnit'");
            return Optional.empty();
        }
        if (node.has("temperature")) {
            return theta(node, at, fields).flatMap(t -> atoms > 0 ? Optional.of(Crystals.einstein(t, 0, atoms))
                    : Optional.empty());
        }
        Optional<FrequencyUnit> unit = unit(node, at, fields);
        OptionalDouble nu = fields.number(node.get("frequency"), at + "/frequency");
        if (nu.isPresent() && !(nu.getAsDouble() > 0)) {
            fields.add(at + "/frequency", "must be positive");
            return Optional.empty();
        }
        if (nu.isEmpty() || unit.isEmpty() || atoms <= 0) {
            return Optional.empty();
        }
        double theta = unit.get().toKelvin(nu.getAsDouble());
        if (!(theta <= MAX_THETA_KELVIN && theta >= Crystals.MIN_MODE_KELVIN)) {
            fields.add(at + "/frequency", "h nu / k_B must be between " + Crystals.MIN_MODE_KELVIN + " and "
                    + MAX_THETA_KELVIN + " K");
            return Optional.empty();
        }
        return Optional.of(Crystals.einstein(nu.getAsDouble(), unit.get(), atoms));
    }

    private Optional<Crystal> debye(JsonNode node, String at, int atoms, Fields fields) {
        fields.object(node, at, DEBYE);
        return theta(node, at, fields).flatMap(t -> atoms > 0 ? Optional.of(Crystals.debye(t, atoms)) : Optional.empty());
    }

    private Optional<Crystal> phonons(JsonNode node, String at, int atoms, Fields fields) {
        int start = fields.count();
        fields.object(node, at, PHONONS);
        Optional<FrequencyUnit> unit = unit(node, at, fields);
        OptionalDouble tolerance = tolerance(node, at, unit, fields);
        JsonNode qs = fields.required(node, "qPoints", at);
        if (qs == null) {
            return Optional.empty();
        }
        if (!qs.isArray() || qs.isEmpty() || qs.size() > config.maxLevels()) {
            fields.add(at + "/qPoints", "must be a non-empty array of at most " + config.maxLevels() + " q-points");
            return Optional.empty();
        }
        int n = qs.size();
        double[][] frequencies = new double[n][];
        double[] weights = new double[n];
        long total = 0;
        for (int q = 0; q < n; q++) {
            String qAt = at + "/qPoints/" + q;
            JsonNode point = qs.get(q);
            if (!fields.object(point, qAt, Set.of("weight", "frequencies"))) {
                continue;
            }
            OptionalDouble w = RequiredFields.number(fields, point, "weight", qAt);
            if (w.isPresent() && !(w.getAsDouble() > 0)) {
                fields.add(qAt + "/weight", "must be positive");
            }
            weights[q] = w.orElse(1);
            frequencies[q] = RequiredFields.numbers(fields, point, "frequencies", qAt, config.maxLevels()).orElse(null);
            if (frequencies[q] != null && atoms > 0 && frequencies[q].length != 3 * atoms) {
                fields.add(qAt + "/frequencies", "has " + frequencies[q].length + " branches; a formula unit of "
                        + atoms + " atoms has 3 x " + atoms + " = " + 3 * atoms);
            }
            total += frequencies[q] == null ? 0 : frequencies[q].length;
            if (frequencies[q] != null && tolerance.isPresent()) {
                unstable(frequencies[q], tolerance.getAsDouble(), qAt + "/frequencies", fields);
            }
        }
        if (total > config.maxLevels()) {
            fields.add(at + "/qPoints", total + " frequencies exceed the limit of " + config.maxLevels());
        }
        if (fields.count() > start || unit.isEmpty() || tolerance.isEmpty() || atoms <= 0) {
            return Optional.empty();
        }
        return build(at, fields, () -> Crystals.phonons(frequencies, weights, unit.get(), tolerance.getAsDouble(),
                atoms));
    }

    private Optional<Crystal> density(JsonNode node, String at, int atoms, Fields fields) {
        int start = fields.count();
        fields.object(node, at, DOS);
        Optional<FrequencyUnit> unit = unit(node, at, fields);
        OptionalDouble tolerance = tolerance(node, at, unit, fields);
        Optional<double[]> grid = RequiredFields.numbers(fields, node, "frequencies", at, config.maxLevels());
        Optional<double[]> density = RequiredFields.numbers(fields, node, "density", at, config.maxLevels());
        boolean apply = !node.has("normalisation")
                || fields.oneOf(node.get("normalisation"), at + "/normalisation", List.of("check", "apply"))
                        .map("apply"::equals).orElse(false);
        if (grid.isEmpty() || density.isEmpty()) {
            return Optional.empty();
        }
        double[] g = grid.get();
        double[] d = density.get();
        if (g.length != d.length) {
            fields.add(at + "/density", "has " + d.length + " elements but frequencies has " + g.length);
            return Optional.empty();
        }
        if (g.length < 2) {
            fields.add(at + "/frequencies", "needs at least 2 grid points");
        }
        for (int i = 0; i < g.length; i++) {
            if (i > 0 && !(g[i] > g[i - 1])) {
                fields.add(at + "/frequencies/" + i, "the grid must increase strictly");
            }
            if (!(d[i] >= 0)) {
                fields.add(at + "/density/" + i, "a density of states cannot be negative");
            } else if (d[i] > 0 && tolerance.isPresent() && ModeKind.of(g[i], tolerance.getAsDouble()) == ModeKind.UNSTABLE) {
                fields.add(at + "/frequencies/" + i, "imaginary frequency beyond the mode tolerance with non-zero "
                        + "density: the structure is dynamically unstable");
            }
        }
        if (fields.count() > start || unit.isEmpty() || tolerance.isEmpty() || atoms <= 0) {
            return Optional.empty();
        }
        return build(at, fields, () -> Crystals.densityOfStates(g, d, unit.get(), tolerance.getAsDouble(), atoms,
                apply));
    }

    private static Optional<Crystal> build(String at, Fields fields, java.util.function.Supplier<Crystal> make) {
        try {
            return Optional.of(make.get());
        } catch (DomainException e) {
            fields.add(at + e.field(), e.getMessage());
            return Optional.empty();
        }
    }

    private static void unstable(double[] nu, double tolerance, String at, Fields fields) {
        for (int b = 0; b < nu.length; b++) {
            if (ModeKind.of(nu[b], tolerance) == ModeKind.UNSTABLE) {
                fields.add(at + "/" + b, "imaginary mode (" + nu[b] + ") beyond the mode tolerance (-" + tolerance
                        + "): the structure is dynamically unstable");
            }
        }
    }

    private static Optional<Double> theta(JsonNode node, String at, Fields fields) {
        OptionalDouble t = RequiredFields.number(fields, node, "temperature", at);
        if (t.isPresent() && !(t.getAsDouble() >= Crystals.MIN_MODE_KELVIN && t.getAsDouble() <= MAX_THETA_KELVIN)) {
            fields.add(at + "/temperature", "must be between " + Crystals.MIN_MODE_KELVIN + " and " + MAX_THETA_KELVIN
                    + " K");
            return Optional.empty();
        }
        return t.isPresent() ? Optional.of(t.getAsDouble()) : Optional.empty();
    }

    private static Optional<FrequencyUnit> unit(JsonNode node, String at, Fields fields) {
        return RequiredFields.oneOf(fields, node, "frequencyUnit", at, FrequencyUnit.symbols())
                .flatMap(FrequencyUnit::bySymbol);
    }

    private static OptionalDouble tolerance(JsonNode node, String at, Optional<FrequencyUnit> unit, Fields fields) {
        if (!node.has("modeTolerance")) {
            return unit.map(u -> OptionalDouble.of(DEFAULT_TOLERANCE_WAVENUMBER
                    * FrequencyUnit.WAVENUMBER.joulesPerUnit() / u.joulesPerUnit())).orElse(OptionalDouble.empty());
        }
        OptionalDouble t = fields.number(node.get("modeTolerance"), at + "/modeTolerance");
        if (t.isPresent() && !(t.getAsDouble() >= 0)) {
            fields.add(at + "/modeTolerance", "must be 0 or positive");
            return OptionalDouble.empty();
        }
        return t;
    }

    private static int errorCount(Fields fields) {
        return fields.count();
    }
}
