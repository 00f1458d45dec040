package org.statesum.api;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Keeps every number that is not a finite double away from the endpoints while still naming every
 * bad field in one 422: the tokens NaN and Infinity (which the parser reads for this purpose) and
 * literals such as 1e400 that overflow a double are replaced by null, the endpoint validates the rest,
 * and the answer is a 422 listing the non-finite numbers together with whatever else the endpoint
 * found. An endpoint never computes with, nor answers for, a request that held one.
 */
final class FiniteNumbers {

    private FiniteNumbers() {
    }

    /** The endpoint's answer to {@code root}, or a 422 if {@code root} held a non-finite number. */
    static Object answer(JsonNode root, ComputeEndpoint endpoint) {
        if (allFinite(root)) {
            // the common case: one walk without pointers or allocation, and the endpoint answers
            return endpoint.answer(root);
        }
        List<FieldError> bad = new ArrayList<>();
        if (root.isNumber()) {
            check(root, "", bad);
        } else {
            scrub(root, "", bad);
        }
        if (bad.isEmpty()) {
            return endpoint.answer(root);
        }
        List<FieldError> all = new ArrayList<>(bad);
        if (!root.isNumber()) {
            try {
                endpoint.answer(root);
            } catch (ProblemException e) {
                Set<String> named = bad.stream().map(FieldError::pointer).collect(Collectors.toSet());
                e.problem().errors().stream().filter(f -> !named.contains(f.pointer())).forEach(all::add);
            } catch (RuntimeException e) {
                // Anything else the endpoint says about a request with holes in it is beside the point.
            }
        }
        throw ProblemException.invalid(all);
    }

    /** Whether every number in {@code node} is a finite double (no pointers built: the usual case). */
    private static boolean allFinite(JsonNode node) {
        if (node.isContainerNode()) {
            for (JsonNode child : node) {
                if (!allFinite(child)) {
                    return false;
                }
            }
            return true;
        }
        return !node.isNumber() || Double.isFinite(node.doubleValue());
    }

    /** Replaces each non-finite number below {@code node} by null, recording where it was. */
    private static void scrub(JsonNode node, String pointer, List<FieldError> bad) {
        if (node instanceof ArrayNode array) {
            for (int i = 0; i < array.size(); i++) {
                String at = pointer + "/" + i;
                if (check(array.get(i), at, bad)) {
                    array.set(i, NullNode.getInstance());
                } else {
                    scrub(array.get(i), at, bad);
                }
            }
        } else if (node instanceof ObjectNode object) {
            for (Iterator<Map.Entry<String, JsonNode>> it = object.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> member = it.next();
                String at = pointer + "/" + Fields.token(member.getKey());
                if (check(member.getValue(), at, bad)) {
                    member.setValue(NullNode.getInstance());
                } else {
                    scrub(member.getValue(), at, bad);
                }
            }
        }
    }

    /** Whether {@code node} is a non-finite number; if so, records why. */
    private static boolean check(JsonNode node, String pointer, List<FieldError> bad) {
        if (!node.isNumber()) {
            return false;
        }
        double value = node.doubleValue();
        if (Double.isNaN(value)) {
            bad.add(new FieldError(pointer, "NaN is not a number; JSON numbers must be finite"));
            return true;
        }
        if (Double.isInfinite(value)) {
            bad.add(new FieldError(pointer, "is infinite or beyond the range of a double (about 1.8e308)"));
            return true;
        }
        return false;
    }
}
