package org.statesum.api.request;

import java.util.List;

/**
 * An RFC 9457 problem detail, served as {@code application/problem+json}, with the bad fields of the
 * request listed in {@code errors} by JSON Pointer.
 */
public record Problem(String type, String title, int status, String detail, List<FieldError> errors) {

    public static final String MEDIA_TYPE = "application/problem+json";
    private static final String TYPE_BASE = "https://statesum.org/problems/";

    /** A problem of a named kind, e.g. {@code of("invalid-request", "Invalid request", 422, ...)}. */
    public static Problem of(String kind, String title, int status, String detail, List<FieldError> errors) {
        return new Problem(TYPE_BASE + kind, title, status, detail, List.copyOf(errors));
    }
}
