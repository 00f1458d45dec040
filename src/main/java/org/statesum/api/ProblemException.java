package org.statesum.api;

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

    /** 422: well-formed but invalid, naming every bad field. */
    public static ProblemException invalid(List<FieldError> errors) {
        String detail = errors.size() == 1 ? "1 field is invalid" : errors.size() + " fields are invalid";
        return new ProblemException(Problem.of("invalid-request", "Invalid request", 422,
                detail + "; see errors", errors));
    }

    /** 400: the body is not JSON this service can read. */
    public static ProblemException unreadable(String detail, String pointer) {
        return new ProblemException(Problem.of("unreadable-body", "Unreadable request body", 400, detail,
                List.of(new FieldError(pointer, detail))));
    }
}
