package org.statesum.api.request;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Reads physical amounts written as {@code {"value": x, "unit": "..."}} or
 * {@code {"values": [...], "unit": "..."}}, converting to SI with a table of factors, and collecting
 * every problem in {@link Fields}. Only positive finite amounts are accepted.
 */
public final class Measures {

    private Measures() {
    }

    /** A positive scalar amount, in SI (the unit's factor times the value). */
    public static OptionalDouble positive(JsonNode node, String pointer, Map<String, Double> units, Fields fields) {
        if (!fields.object(node, pointer, Set.of("value", "unit"))) {
            return OptionalDouble.empty();
        }
        OptionalDouble value = fields.number(fields.required(node, "value", pointer), pointer + "/value");
        Optional<String> unit = fields.oneOf(fields.required(node, "unit", pointer), pointer + "/unit",
                List.copyOf(units.keySet()));
        if (value.isEmpty() || unit.isEmpty()) {
            return OptionalDouble.empty();
        }
        double si = value.getAsDouble() * units.get(unit.get());
        if (!(value.getAsDouble() > 0 && si > 0 && si < Double.POSITIVE_INFINITY)) {
            fields.add(pointer + "/value", "must be positive");
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(si);
    }

    /** Exactly {@code count} positive amounts sharing one unit, in SI. */
    public static Optional<double[]> positives(JsonNode node, String pointer, int count, Map<String, Double> units,
            Fields fields) {
        if (!fields.object(node, pointer, Set.of("values", "unit"))) {
            return Optional.empty();
        }
        Optional<double[]> values = fields.numbers(fields.required(node, "values", pointer), pointer + "/values",
                count);
        Optional<String> unit = fields.oneOf(fields.required(node, "unit", pointer), pointer + "/unit",
                List.copyOf(units.keySet()));
        if (values.isEmpty() || unit.isEmpty()) {
            return Optional.empty();
        }
        double[] v = values.get();
        if (v.length != count) {
            fields.add(pointer + "/values", "needs exactly " + count + " values");
            return Optional.empty();
        }
        boolean good = true;
        double[] si = new double[count];
        for (int i = 0; i < count; i++) {
            si[i] = v[i] * units.get(unit.get());
            if (!(v[i] > 0 && si[i] > 0 && si[i] < Double.POSITIVE_INFINITY)) {
                fields.add(pointer + "/values/" + i, "must be positive");
                good = false;
            }
        }
        return good ? Optional.of(si) : Optional.empty();
    }

    /** A finite number in an inclusive range, or the default when absent. */
    public static OptionalDouble inRange(JsonNode parent, String name, String pointer, double min, double max,
            double fallback, Fields fields) {
        JsonNode node = parent.get(name);
        if (node == null) {
            return OptionalDouble.of(fallback);
        }
        OptionalDouble value = fields.number(node, pointer);
        if (value.isPresent() && !(value.getAsDouble() >= min && value.getAsDouble() <= max)) {
            fields.add(pointer, "must be from " + min + " to " + max);
            return OptionalDouble.empty();
        }
        return value;
    }
}
