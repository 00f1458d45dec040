package org.statesum.api.request;

/** One bad field of a request: where it is (RFC 6901 JSON Pointer) and what is wrong with it. */
public record FieldError(String pointer, String message) {
}
