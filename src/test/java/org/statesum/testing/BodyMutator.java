package org.statesum.testing;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Random;

/**
 * Makes request bodies for fuzzing from the contract: a random instance of an endpoint's request
 * schema (small: arrays of at most four items), then zero to two mutations of the tree (a value of the
 * wrong type, a field removed, an unknown field, an extreme number) or of the text (cut short, a
 * character inserted, a non-JSON number, a repeated key).
 */
public final class BodyMutator {

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    private static final double[] NUMBERS = {0, 1, -1, 2.5, 7, 300, 1e-300, 4.9e-324, 1e12, 1e30, 1e300, -1e5,
        -0.0, 0.5, 1e-12, 6.02214076e23, Double.MAX_VALUE};
    /** Small counts keep answers small (a grid of 1e5 temperatures is megabytes); large ones are over the limits. */
    private static final long[] INTEGERS = {0, 1, 2, 3, 5, 64, -1, 100_001, 1_000_000_000L, Long.MAX_VALUE};
    private static final String[] TEXT_MUTANTS = {"NaN", "Infinity", "-Infinity", "1e999", "0x10", "01", ".5",
        "\"\\ud800\"", "99999999999999999999999999999999999999999", "[", "}", "null", "tru", "\u0000"};

    private final JsonNode document;
    private final Random random;

    public BodyMutator(JsonNode openApi, Random random) {
        this.document = openApi;
        this.random = random;
    }

    /** A random instance of the schema, mutated, as text. */
    public String body(JsonNode schema) {
        JsonNode tree = instance(schema, 0);
        int mutations = random.nextInt(3);
        for (int i = 0; i < mutations; i++) {
            tree = mutateTree(tree);
        }
        String text = tree.toString();
        return random.nextInt(6) == 0 ? mutateText(text) : text;
    }

    public JsonNode instance(JsonNode schema, int depth) {
        JsonNode s = resolve(schema);
        if (s.has("const")) {
            return s.get("const");
        }
        if (s.has("enum")) {
            return s.get("enum").get(random.nextInt(s.get("enum").size()));
        }
        JsonNode choices = s.has("oneOf") ? s.get("oneOf") : s.get("anyOf");
        if (choices != null) {
            return instance(choices.get(random.nextInt(choices.size())), depth);
        }
        String type = s.path("type").isArray() ? s.path("type").get(0).asText() : s.path("type").asText("");
        if (depth > 6) {
            return NODES.numberNode(1);
        }
        switch (type) {
            case "object" -> {
                ObjectNode object = NODES.objectNode();
                List<String> required = new ArrayList<>();
                s.path("required").forEach(r -> required.add(r.asText()));
                for (Iterator<String> it = s.path("properties").fieldNames(); it.hasNext(); ) {
                    String name = it.next();
                    if (required.contains(name) || random.nextInt(10) < 6) {
                        object.set(name, instance(s.path("properties").get(name), depth + 1));
                    }
                }
                return object;
            }
            case "array" -> {
                ArrayNode array = NODES.arrayNode();
                int size = random.nextInt(5);
                for (int i = 0; i < size; i++) {
                    array.add(instance(s.path("items"), depth + 1));
                }
                return array;
            }
            case "integer" -> {
                return NODES.numberNode(INTEGERS[random.nextInt(INTEGERS.length)]);
            }
            case "number" -> {
                return random.nextBoolean() ? NODES.numberNode(NUMBERS[random.nextInt(NUMBERS.length)])
                        : NODES.numberNode(random.nextDouble() * 1000);
            }
            case "boolean" -> {
                return NODES.booleanNode(random.nextBoolean());
            }
            case "string" -> {
                return NODES.textNode(random.nextBoolean() ? "x" : "\u00e9\u0301\ud83d\ude00");
            }
            default -> {
                return scalar();
            }
        }
    }

    private JsonNode resolve(JsonNode schema) {
        JsonNode s = schema;
        while (s.has("$ref")) {
            String name = s.get("$ref").asText().replace("#/components/schemas/", "");
            s = document.path("components").path("schemas").path(name);
        }
        return s;
    }

    private JsonNode scalar() {
        return switch (random.nextInt(6)) {
            case 0 -> NODES.nullNode();
            case 1 -> NODES.textNode("7");
            case 2 -> NODES.booleanNode(true);
            case 3 -> NODES.arrayNode();
            case 4 -> NODES.objectNode();
            default -> NODES.numberNode(NUMBERS[random.nextInt(NUMBERS.length)]);
        };
    }

    private JsonNode mutateTree(JsonNode root) {
        List<JsonNode> containers = new ArrayList<>();
        collect(root, containers);
        if (containers.isEmpty()) {
            return scalar();
        }
        JsonNode target = containers.get(random.nextInt(containers.size()));
        if (target instanceof ObjectNode object) {
            List<String> names = new ArrayList<>();
            object.fieldNames().forEachRemaining(names::add);
            int choice = random.nextInt(3);
            if (choice == 0 || names.isEmpty()) {
                object.set("unexpected" + random.nextInt(3), scalar());
            } else if (choice == 1) {
                object.remove(names.get(random.nextInt(names.size())));
            } else {
                object.set(names.get(random.nextInt(names.size())), scalar());
            }
        } else if (target instanceof ArrayNode array) {
            if (array.isEmpty() || random.nextBoolean()) {
                array.add(scalar());
            } else {
                array.set(random.nextInt(array.size()), scalar());
            }
        }
        return root;
    }

    private static void collect(JsonNode node, List<JsonNode> out) {
        if (node.isContainerNode()) {
            out.add(node);
            node.elements().forEachRemaining(child -> collect(child, out));
        }
    }

    private String mutateText(String text) {
        int at = random.nextInt(text.length() + 1);
        return switch (random.nextInt(4)) {
            case 0 -> text.substring(0, at);
            case 1 -> text.substring(0, at) + TEXT_MUTANTS[random.nextInt(TEXT_MUTANTS.length)] + text.substring(at);
            case 2 -> text.replaceFirst("-?[0-9]+(\\.[0-9]+)?([eE][-+]?[0-9]+)?",
                    TEXT_MUTANTS[random.nextInt(4)]);
            default -> text.startsWith("{\"") ? "{\"a\":1,\"a\":2," + text.substring(1) : text + text;
        };
    }
}
