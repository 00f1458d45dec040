package org.statesum.api.batch;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.statesum.api.request.Fields;
import org.statesum.api.server.ComputeRoutes;

/**
 * Reads the envelope of {@code POST /v1/batch}: a JSON array of 1 to {@code STATESUM_MAX_BATCH_JOBS}
 * objects {@code {id, path, body}}. Only the envelope can fail the whole batch (a 422 naming every bad
 * field): a missing, non-string, over-long or repeated {@code id}, a job that is not an object, an
 * unknown member. A job whose path is not a compute endpoint or whose body is missing or invalid fails
 * alone, in its own line of the answer.
 */
public final class BatchRequestReader {

    /** Longest id: ids name jobs in a workflow engine, not documents. */
    static final int MAX_ID_LENGTH = 200;
    private static final Set<String> MEMBERS = Set.of("id", "path", "body");

    private final ComputeRoutes routes;
    private final int maxJobs;

    BatchRequestReader(ComputeRoutes routes, int maxJobs) {
        this.routes = routes;
        this.maxJobs = maxJobs;
    }

    List<BatchJob> read(JsonNode root) {
        Fields fields = new Fields();
        if (!root.isArray() || root.isEmpty()) {
            fields.add("", "a batch is a non-empty array of jobs {id, path, body}");
            fields.throwIfAny();
        }
        if (root.size() > maxJobs) {
            fields.add("", "a batch holds at most " + maxJobs + " jobs (STATESUM_MAX_BATCH_JOBS), got " + root.size());
            fields.throwIfAny();
        }
        List<BatchJob> jobs = new ArrayList<>(root.size());
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < root.size(); i++) {
            JsonNode job = root.get(i);
            String at = "/" + i;
            if (!fields.object(job, at, MEMBERS)) {
                continue;
            }
            JsonNode id = job.get("id");
            if (id == null || !id.isTextual() || id.asText().isEmpty() || id.asText().length() > MAX_ID_LENGTH) {
                fields.add(at + "/id", "is required: a string of 1 to " + MAX_ID_LENGTH + " characters");
            } else if (!seen.add(id.asText())) {
                fields.add(at + "/id", "repeats the id of an earlier job; ids name the lines of the answer");
            }
            JsonNode path = job.get("path");
            if (path == null || !path.isTextual()) {
                fields.add(at + "/path", "is required: the path of a compute endpoint, e.g. /v1/spectrum");
            }
            if (!fields.hasErrors()) {
                JsonNode body = job.get("body");
                jobs.add(new BatchJob(i, id.asText(), path.asText(), routes.find(path.asText()),
                        body == null || body.isNull() ? null : body));
            }
        }
        fields.throwIfAny();
        return jobs;
    }
}
