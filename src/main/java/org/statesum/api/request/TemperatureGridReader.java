package org.statesum.api.request;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.engine.CanonicalEnsemble;

/**
 * Reads {@code temperatures}: either {@code {"values": [...]}} or {@code {"start", "stop", "count"}}
 * (evenly spaced, both ends included), in kelvin. T = 0 is the limit T -> 0; other temperatures lie
 * in the engine's range.
 */
public final class TemperatureGridReader {

    private static final double MIN = CanonicalEnsemble.MIN_POSITIVE_TEMPERATURE_KELVIN;
    private static final double MAX = CanonicalEnsemble.MAX_TEMPERATURE_KELVIN;

    private TemperatureGridReader() {
    }

    public static Optional<double[]> read(JsonNode node, String pointer, int maxTemperatures, Fields fields) {
        if (!fields.object(node, pointer, Set.of("values", "start", "stop", "count"))) {
            return Optional.empty();
        }
        boolean list = node.has("values");
        boolean range = node.has("start") || node.has("stop") || node.has("count");
        if (list == range) {
            fields.add(pointer, "give either 'values' or all of 'start', 'stop' and 'count'");
            return Optional.empty();
        }
        return list ? readValues(node.get("values"), pointer + "/values", maxTemperatures, fields)
                : readRange(node, pointer, maxTemperatures, fields);
    }

    private static Optional<double[]> readValues(JsonNode node, String pointer, int max, Fields fields) {
        int before = fields.count();
        Optional<double[]> values = fields.numbers(node, pointer, max);
        // Every number given is checked, even when some other element is not a number.
        for (int i = 0; node != null && node.isArray() && node.size() <= max && i < node.size(); i++) {
            if (node.get(i).isNumber()) {
                checkOne(node.get(i).doubleValue(), pointer + "/" + i, fields);
            }
        }
        return fields.count() > before ? Optional.empty() : values.map(TemperatureGridReader::withoutNegativeZero);
    }

    /** -0.0 K is the temperature 0 K: answers echo it as 0.0 (x + 0.0 turns -0.0 into +0.0, IEEE 754). */
    private static double[] withoutNegativeZero(double[] grid) {
        for (int j = 0; j < grid.length; j++) {
            grid[j] += 0.0;
        }
        return grid;
    }

    private static Optional<double[]> readRange(JsonNode node, String pointer, int max, Fields fields) {
        int before = fields.count();
        OptionalDouble start = fields.number(fields.required(node, "start", pointer), pointer + "/start");
        OptionalDouble stop = fields.number(fields.required(node, "stop", pointer), pointer + "/stop");
        OptionalDouble count = fields.number(fields.required(node, "count", pointer), pointer + "/count");
        start.ifPresent(v -> checkOne(v, pointer + "/start", fields));
        stop.ifPresent(v -> checkOne(v, pointer + "/stop", fields));
        if (count.isPresent()) {
            double c = count.getAsDouble();
            if (!(c >= 1 && c <= max && Math.rint(c) == c)) {
                fields.add(pointer + "/count", "must be an integer from 1 to " + max);
            }
        }
        if (start.isPresent() && stop.isPresent() && start.getAsDouble() > stop.getAsDouble()) {
            fields.add(pointer + "/start", "must not exceed stop");
        }
        if (start.isPresent() && stop.isPresent() && count.isPresent() && count.getAsDouble() == 1
                && start.getAsDouble() != stop.getAsDouble()) {
            fields.add(pointer + "/count", "a single temperature needs start = stop");
        }
        if (fields.count() > before) {
            return Optional.empty();
        }
        int n = (int) count.getAsDouble();
        double a = start.getAsDouble();
        double b = stop.getAsDouble();
        double[] grid = new double[n];
        for (int j = 0; j < n; j++) {
            // a + j (b - a) / (n - 1), with the end point exact.
            grid[j] = j == n - 1 ? b : a + (b - a) * j / (n - 1);
        }
        return Optional.of(withoutNegativeZero(grid));
    }

    private static void checkOne(double t, String pointer, Fields fields) {
        if (t < 0) {
            fields.add(pointer, "a temperature cannot be negative");
        } else if (t != 0 && (t < MIN || t > MAX)) {
            fields.add(pointer, "must be 0 (the T -> 0 limit) or between " + MIN + " and " + MAX + " K");
        }
    }
}
