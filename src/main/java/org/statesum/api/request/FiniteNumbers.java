package org.statesum.api.request;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Iterator;
import java.util.Map;

/**
 * Keeps every number that is not a finite double away from the endpoints while still naming every
 * bad field in one 422: the tokens NaN and Infinity (which the parser reads for this purpose) and
 * literals such as 1e400 that overflow a double are replaced by null, the endpoint validates the rest,
 * and the answer is a 422 listing the non-finite numbers together with whatever else the endpoint
 * found. An endpoint never computes with, nor answers for, a request that held one.
 */
public final class FiniteNumbers {

    private FiniteNumbers() {
    }

    /** The endpoint's answer to {@code root}, or a 422 if {@code root} held a non-finite number. */
    public static Object answer(JsonNode root, ComputeEndpoint endpoint) {
        if (allFinite(root)) {
            // the common case: one walk without pointers or allocation, and the endpoint answers
            return endpoint.answer(root);
        }
        // Fields keeps the first problem at each pointer and holds at most MAX_LISTED_ERRORS of them
        Fields bad = new Fields();
        if (root.isNumber()) {
            check(root, "", bad);
        } else {
            scrub(root, "", bad);
        }
        if (!bad.hasErrors()) {
            return endpoint.answer(root);
        }
        if (!root.isNumber()) {
            try {
                endpoint.answer(root);
            } catch (ProblemException e) {
                e.problem().errors().forEach(f -> bad.add(f.pointer(), f.message()));
            } catch (RuntimeException e) {
                // Anything else the endpoint says about a request with holes in it is beside the point.
            }
        }
        throw bad.problem();
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
    private static void scrub(JsonNode node, String pointer, Fields bad) {
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
    private static boolean check(JsonNode node, String pointer, Fields bad) {
        if (!node.isNumber()) {
            return false;
        }
        double value = node.doubleValue();
        if (Double.isNaN(value)) {
            bad.add(pointer, "NaN is not a number; JSON numbers must be finite");
            return true;
        }
        if (Double.isInfinite(value)) {
            bad.add(pointer, "is infinite or beyond the range of a double (about 1.8e308)");
            return true;
        }
        return false;
    }
}
