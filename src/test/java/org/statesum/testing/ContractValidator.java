package org.statesum.testing;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Validates real responses against the schemas of {@code openapi/statesum.yaml}, so the document
 * cannot drift from the code. The component schemas are lifted into a JSON Schema 2020-12 document
 * ({@code $defs}) and the schema of an answer is found from its path, method, status and media type.
 */
public final class ContractValidator {

    public static final Path DOCUMENT = Path.of("openapi", "statesum.yaml");
    private static final ContractValidator INSTANCE = new ContractValidator();

    private final JsonNode openApi;
    private final String defsJson;
    private final SchemaRegistry registry = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);
    private final Map<String, Schema> schemas = new ConcurrentHashMap<>();

    private ContractValidator() {
        try {
            openApi = new YAMLMapper().readTree(Files.readString(DOCUMENT));
            ObjectMapper json = new ObjectMapper();
            String components = json.writeValueAsString(openApi.path("components").path("schemas"));
            defsJson = components.replace("#/components/schemas/", "#/$defs/");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static ContractValidator get() {
        return INSTANCE;
    }

    public JsonNode document() {
        return openApi;
    }

    /**
     * The schema errors of one answer, or a single message when the document does not describe that
     * answer at all (an undocumented path, method, status or media type is itself a contract failure).
     */
    public List<String> check(String path, String method, int status, String contentType, String body) {
        JsonNode operation = openApi.path("paths").path(path).path(method.toLowerCase(java.util.Locale.ROOT));
        if (operation.isMissingNode()) {
            if (status == 404 || status == 405) {
                // a HEAD answer carries no content to check (RFC 9110, section 9.3.2)
                return method.equalsIgnoreCase("HEAD") ? List.of() : checkProblem(contentType, body);
            }
            return List.of("undocumented operation " + method + " " + path);
        }
        JsonNode response = operation.path("responses").path(String.valueOf(status));
        if (response.isMissingNode()) {
            return List.of("undocumented status " + status + " for " + method + " " + path);
        }
        if (response.has("$ref")) {
            String name = response.get("$ref").asText().replace("#/components/responses/", "");
            response = openApi.path("components").path("responses").path(name);
        }
        String media = contentType == null ? "" : contentType.split(";", 2)[0].trim();
        if (!response.has("content") && (body == null || body.isEmpty())) {
            return List.of(); // a documented answer without a body, e.g. 204
        }
        JsonNode schemaNode = response.path("content").path(media).path("schema");
        if (schemaNode.isMissingNode()) {
            return List.of("undocumented media type '" + media + "' for " + status + " of " + method + " " + path);
        }
        if (!schemaNode.has("$ref")) {
            return List.of();
        }
        String schemaName = schemaNode.get("$ref").asText().replace("#/components/schemas/", "");
        if (media.equals("application/x-ndjson")) {
            // NDJSON: the schema describes one line; every line must match it
            return body.lines().filter(line -> !line.isBlank()).flatMap(line -> validate(schemaName, line).stream())
                    .toList();
        }
        return validate(schemaName, body);
    }

    private List<String> checkProblem(String contentType, String body) {
        if (contentType == null || !contentType.startsWith("application/problem+json")) {
            return List.of("a 404/405 must be application/problem+json, was " + contentType);
        }
        return validate("Problem", body);
    }

    /** Validates a JSON text against one named component schema. */
    public List<String> validate(String schemaName, String body) {
        Schema schema = schemas.computeIfAbsent(schemaName, name -> registry.getSchema(
                "{\"$schema\":\"https://json-schema.org/draft/2020-12/schema\",\"$defs\":" + defsJson
                        + ",\"$ref\":\"#/$defs/" + name + "\"}", InputFormat.JSON));
        return schema.validate(body, InputFormat.JSON).stream().map(Error::toString).toList();
    }

    /** The component schema node itself, for tests that read the contract (enums, limits). */
    public ObjectNode schemaNode(String name) {
        return (ObjectNode) openApi.path("components").path("schemas").path(name);
    }
}
