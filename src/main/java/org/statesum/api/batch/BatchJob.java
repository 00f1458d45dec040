package org.statesum.api.batch;

import com.fasterxml.jackson.databind.JsonNode;
import org.statesum.api.request.ComputeEndpoint;

/**
 * One job of a batch: its client-chosen {@code id}, the compute {@code path} it is for, and its body.
 * {@code endpoint} is null when no compute endpoint has that path; {@code body} is null when absent.
 */
public record BatchJob(int index, String id, String path, ComputeEndpoint endpoint, JsonNode body) {
}
