package org.statesum.api.request;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/** Required members read through {@link Fields}, reporting a missing member once ("is required") and nothing more. */
public final class RequiredFields {

    private RequiredFields() {
    }

    public static OptionalDouble number(Fields fields, JsonNode parent, String name, String at) {
        JsonNode node = fields.required(parent, name, at);
        return node == null ? OptionalDouble.empty() : fields.number(node, at + "/" + name);
    }

    public static Optional<String> oneOf(Fields fields, JsonNode parent, String name, String at, List<String> allowed) {
        JsonNode node = fields.required(parent, name, at);
        return node == null ? Optional.empty() : fields.oneOf(node, at + "/" + name, allowed);
    }

    public static Optional<double[]> numbers(Fields fields, JsonNode parent, String name, String at, int maxLength) {
        JsonNode node = fields.required(parent, name, at);
        return node == null ? Optional.empty() : fields.numbers(node, at + "/" + name, maxLength);
    }
}
