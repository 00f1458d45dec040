package org.statesum.api.request;

import java.util.List;

/** Thrown by handlers and readers to answer with a {@link Problem}; mapped centrally. */
public final class ProblemException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final transient Problem problem;

    public ProblemException(Problem problem) {
        super(problem.detail(), null, false, false);
        this.problem = problem;
    }

    public Problem problem() {
        return problem;
    }

    /** The most problems one answer lists; beyond, the detail says how many more were found. */
    public static final int MAX_LISTED_ERRORS = 10_000;

    /** 422: well-formed but invalid, naming every bad field (up to {@link #MAX_LISTED_ERRORS}). */
    public static ProblemException invalid(List<FieldError> errors) {
        return invalid(errors, 0);
    }

    /** As {@link #invalid(List)}, with {@code unlisted} further problems found but not held. */
    static ProblemException invalid(List<FieldError> errors, int unlisted) {
        List<FieldError> listed = errors.size() > MAX_LISTED_ERRORS ? errors.subList(0, MAX_LISTED_ERRORS) : errors;
        boolean cut = unlisted > 0 || listed.size() < errors.size();
        String detail = cut ? "more than " + listed.size() + " fields are invalid; the first " + listed.size()
                + " are listed in errors"
                : listed.size() == 1 ? "1 field is invalid; see errors" : listed.size() + " fields are invalid; see errors";
        return new ProblemException(Problem.of("invalid-request", "Invalid request", 422, detail,
                List.copyOf(listed)));
    }

    /** 400: the body is not JSON this service can read. */
    public static ProblemException unreadable(String detail, String pointer) {
        return new ProblemException(Problem.of("unreadable-body", "Unreadable request body", 400, detail,
                List.of(new FieldError(pointer, detail))));
    }
}
