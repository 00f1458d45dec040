package org.statesum.api;

/** A 503 problem with the {@code Retry-After} a client should honour; mapped centrally. */
final class OverloadedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final transient Problem problem;
    private final int retryAfterSeconds;

    OverloadedException(Problem problem, int retryAfterSeconds) {
        super(problem.detail(), null, false, false);
        this.problem = problem;
        this.retryAfterSeconds = retryAfterSeconds;
    }

    Problem problem() {
        return problem;
    }

    int retryAfterSeconds() {
        return retryAfterSeconds;
    }
}
