package org.statesum.api.sampled;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.request.Fields;
import org.statesum.engine.sampling.ReducedPotentials;
import org.statesum.units.EnergyUnit;

/** Validates a parsed {@code POST /v1/sampled} body, collecting every bad field, into a {@link SampledJob}. */
public final class SampledRequestReader {

    static final List<String> METHODS = List.of("exponential-averaging", "bar", "mbar");
    private static final List<String> DIRECTIONS = List.of("forward", "reverse");
    private static final Set<String> TOP = Set.of("method", "direction", SampledBodyParser.MATRIX, "sampleCounts",
            "temperature", "outputUnit");
    /** Highest accepted temperature, K: the limit of the temperature grids. */
    private static final double MAX_TEMPERATURE_KELVIN = 1e12;
    private static final EnergyUnit DEFAULT_UNIT = EnergyUnit.KILOJOULE_PER_MOLE;

    private SampledRequestReader() {
    }

    static SampledJob read(SampledBodyParser.Body body, Fields fields) {
        JsonNode root = body.members();
        fields.object(root, "", TOP);
        Optional<String> method = fields.oneOf(fields.required(root, "method", ""), "/method", METHODS);
        boolean forward = true;
        if (root.has("direction")) {
            Optional<String> direction = fields.oneOf(root.get("direction"), "/direction", DIRECTIONS);
            forward = !direction.equals(Optional.of("reverse"));
            if (method.isPresent() && !method.get().equals("exponential-averaging")) {
                fields.add("/direction", "applies to exponential-averaging only");
            }
        }
        double[][] u = body.matrix();
        if (!body.matrixPresent()) {
            fields.add("/" + SampledBodyParser.MATRIX, "is required");
        } else if (u != null) {
            checkShape(u, fields);
        }
        int[] counts = readCounts(fields.required(root, "sampleCounts", ""), fields);
        double temperature = Double.NaN;
        if (root.has("temperature")) {
            OptionalDouble t = fields.number(root.get("temperature"), "/temperature");
            if (t.isPresent() && !(t.getAsDouble() > 0 && t.getAsDouble() <= MAX_TEMPERATURE_KELVIN)) {
                fields.add("/temperature", "must be above 0 K and at most " + MAX_TEMPERATURE_KELVIN + " K");
            }
            temperature = t.orElse(Double.NaN);
        }
        EnergyUnit unit = DEFAULT_UNIT;
        if (root.has("outputUnit")) {
            unit = fields.oneOf(root.get("outputUnit"), "/outputUnit", EnergyUnit.symbols())
                    .flatMap(EnergyUnit::bySymbol).orElse(DEFAULT_UNIT);
            if (!root.has("temperature")) {
                fields.add("/outputUnit", "needs a temperature: answers in energy units are f k_B T");
            }
        }
        if (u != null && counts != null && u.length != counts.length) {
            fields.add("/sampleCounts", "has " + counts.length + " elements but there are " + u.length + " states");
        } else if (u != null && counts != null && u.length >= 2) {
            checkCounts(u, counts, method.orElse(""), forward, fields);
        }
        fields.throwIfAny();
        return new SampledJob(ReducedPotentials.of(u, counts), method.get(), forward, temperature, unit);
    }

    private static void checkShape(double[][] u, Fields fields) {
        String pointer = "/" + SampledBodyParser.MATRIX;
        if (u.length < 2) {
            fields.add(pointer, "needs at least two states (rows)");
            return;
        }
        if (u[0].length == 0) {
            fields.add(pointer + "/0", "must not be empty");
        }
        for (int k = 1; k < u.length; k++) {
            if (u[k].length != u[0].length) {
                fields.add(pointer + "/" + k, "has " + u[k].length + " samples but row 0 has " + u[0].length
                        + "; every state is evaluated on every pooled sample");
            }
        }
    }

    private static int[] readCounts(JsonNode node, Fields fields) {
        if (node == null) {
            return null;
        }
        if (!node.isArray() || node.isEmpty()) {
            fields.add("/sampleCounts", "must be a non-empty array of integers, one per state");
            return null;
        }
        if (node.size() > SampledBodyParser.MAX_STATES) {
            fields.add("/sampleCounts", "has " + node.size() + " elements; the limit is "
                    + SampledBodyParser.MAX_STATES);
            return null;
        }
        int[] counts = new int[node.size()];
        boolean good = true;
        for (int k = 0; k < counts.length; k++) {
            JsonNode c = node.get(k);
            double v = c.isNumber() ? c.doubleValue() : Double.NaN;
            if (!(v >= 0 && v <= SampledBodyParser.MAX_SAMPLES && Math.rint(v) == v)) {
                fields.add("/sampleCounts/" + k, "must be an integer from 0 to " + SampledBodyParser.MAX_SAMPLES);
                good = false;
            } else {
                counts[k] = (int) v;
            }
        }
        return good ? counts : null;
    }

    private static void checkCounts(double[][] u, int[] counts, String method, boolean forward, Fields fields) {
        long total = 0;
        for (int c : counts) {
            total += c;
        }
        if (total != u[0].length) {
            fields.add("/sampleCounts", "the counts sum to " + total + " but there are " + u[0].length
                    + " pooled samples (columns)");
        }
        int k = counts.length;
        for (int s = 0; s < k; s++) {
            boolean needed = switch (method) {
                case "bar" -> true;
                case "exponential-averaging" -> forward ? s < k - 1 : s > 0;
                default -> false;
            };
            if (needed && counts[s] < 2) {
                fields.add("/sampleCounts/" + s, method + (method.equals("bar") ? "" : forward ? " (forward)"
                        : " (reverse)") + " needs at least 2 samples from state " + s);
            }
        }
        if (method.equals("mbar") && total == 0) {
            fields.add("/sampleCounts", "mbar needs samples from at least one state");
        }
    }
}
