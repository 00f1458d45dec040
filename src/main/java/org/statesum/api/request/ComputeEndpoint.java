package org.statesum.api.request;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * One compute route ({@code POST /v1/...}): a validated JSON body in, an answer body out. Implementations
 * read and validate the tree (throwing {@link ProblemException} or letting the models' domain exceptions
 * through), call a model, and return the answer object for the shared mapper. The same endpoint serves a
 * direct request and a job inside a batch.
 */
@FunctionalInterface
public interface ComputeEndpoint {

    Object answer(JsonNode body);
}
