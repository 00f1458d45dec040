package org.statesum.api;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

/**
 * Rejects, with one 422 naming each place, every number in a request tree that is not a finite
 * double: the tokens NaN and Infinity (which the parser reads so that all of them can be named at
 * once, instead of stopping at the first) and literals such as 1e400 that overflow a double. After
 * this check no endpoint sees a non-finite number.
 */
final class FiniteNumbers {

    private FiniteNumbers() {
    }

    static void check(JsonNode root) {
        List<FieldError> errors = new ArrayList<>();
        walk(root, "", errors);
        if (!errors.isEmpty()) {
            throw ProblemException.invalid(errors);
        }
    }

    private static void walk(JsonNode node, String pointer, List<FieldError> errors) {
        if (node.isNumber()) {
            double value = node.doubleValue();
            if (Double.isNaN(value)) {
                errors.add(new FieldError(pointer, "NaN is not a number; JSON numbers must be finite"));
            } else if (Double.isInfinite(value)) {
                errors.add(new FieldError(pointer, "is infinite or beyond the range of a double (about 1.8e308)"));
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                walk(node.get(i), pointer + "/" + i, errors);
            }
        } else if (node.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> member = it.next();
                walk(member.getValue(), pointer + "/" + Fields.token(member.getKey()), errors);
            }
        }
    }
}
