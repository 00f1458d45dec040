package org.statesum.api.request;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeSet;

/**
 * Reads typed values out of a JSON tree while collecting every problem with its JSON Pointer, so
 * that one answer names all bad fields. A reader method returns empty when its field is absent or
 * bad; {@link #throwIfAny()} ends validation with a 422 listing everything found.
 */
public final class Fields {

    /** The problems by pointer, in the order found (constant time a problem, however many a body holds). */
    private final Map<String, FieldError> errors = new LinkedHashMap<>();
    /** Problems found after {@link ProblemException#MAX_LISTED_ERRORS} were kept: counted, not held. */
    private int unlisted;

    /**
     * Records a problem; only the first one found at a pointer is kept ("is required", not also "must be
     * a number"). Beyond {@link ProblemException#MAX_LISTED_ERRORS} problems are only counted, so that a
     * body of a million bad fields costs neither quadratic time nor a problem document of its size.
     */
    public void add(String pointer, String message) {
        if (errors.containsKey(pointer)) {
            return;
        }
        if (errors.size() >= ProblemException.MAX_LISTED_ERRORS) {
            unlisted++;
            return;
        }
        errors.put(pointer, new FieldError(pointer, message));
    }

    public boolean hasErrors() {
        return !errors.isEmpty();
    }

    /** How many problems have been collected so far (to tell whether one part of a request added any). */
    public int count() {
        return errors.size() + unlisted;
    }

    public void throwIfAny() {
        if (!errors.isEmpty()) {
            throw problem();
        }
    }

    /** The 422 naming the problems collected (at least one). */
    ProblemException problem() {
        return ProblemException.invalid(new ArrayList<>(errors.values()), unlisted);
    }

    /** Escapes a member name as one RFC 6901 reference token. */
    static String token(String name) {
        return name.replace("~", "~0").replace("/", "~1");
    }

    /** The node at {@code pointer} must be an object with only the given member names. */
    public boolean object(JsonNode node, String pointer, Set<String> allowed) {
        if (node == null || !node.isObject()) {
            add(pointer, "must be an object");
            return false;
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
            String name = it.next().getKey();
            if (!allowed.contains(name)) {
                add(pointer + "/" + token(name), "unknown field; allowed here: "
                        + String.join(", ", new TreeSet<>(allowed)));
            }
        }
        return true;
    }

    /** A required member: reports it missing. */
    public JsonNode required(JsonNode parent, String name, String parentPointer) {
        JsonNode child = parent.get(name);
        if (child == null || child.isNull()) {
            add(parentPointer + "/" + token(name), "is required");
            return null;
        }
        return child;
    }

    /** A finite JSON number. */
    public OptionalDouble number(JsonNode node, String pointer) {
        if (node == null || !node.isNumber()) {
            add(pointer, "must be a number");
            return OptionalDouble.empty();
        }
        double value = node.doubleValue();
        if (!Double.isFinite(value)) {
            add(pointer, "is beyond the range of a double");
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(value);
    }

    /** A non-empty array of finite numbers, at most {@code maxLength} long; every bad element is named. */
    public Optional<double[]> numbers(JsonNode node, String pointer, int maxLength) {
        if (node == null || !node.isArray()) {
            add(pointer, "must be an array of numbers");
            return Optional.empty();
        }
        int size = node.size();
        if (size == 0) {
            add(pointer, "must not be empty");
            return Optional.empty();
        }
        if (size > maxLength) {
            add(pointer, "has " + size + " elements; the limit is " + maxLength);
            return Optional.empty();
        }
        double[] values = new double[size];
        int before = errors.size();
        for (int i = 0; i < size; i++) {
            JsonNode element = node.get(i);
            if (!element.isNumber()) {
                add(pointer + "/" + i, "must be a number");
                continue;
            }
            values[i] = element.doubleValue();
            if (!Double.isFinite(values[i])) {
                add(pointer + "/" + i, "is beyond the range of a double");
            }
        }
        return errors.size() == before ? Optional.of(values) : Optional.empty();
    }

    /** A string that must be one of {@code allowed}. */
    public Optional<String> oneOf(JsonNode node, String pointer, List<String> allowed) {
        if (node == null || !node.isTextual()) {
            add(pointer, "must be one of " + quoted(allowed));
            return Optional.empty();
        }
        String value = node.textValue();
        if (!allowed.contains(value)) {
            add(pointer, "unknown value '" + value + "'; use one of " + quoted(allowed));
            return Optional.empty();
        }
        return Optional.of(value);
    }

    private static String quoted(List<String> values) {
        return "'" + String.join("', '", values) + "'";
    }
}
