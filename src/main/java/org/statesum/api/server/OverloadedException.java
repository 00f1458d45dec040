package org.statesum.api.server;

import org.statesum.api.request.Problem;

/** A 503 problem with the {@code Retry-After} a client should honour; mapped centrally. */
public final class OverloadedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final transient Problem problem;
    private final int retryAfterSeconds;

    OverloadedException(Problem problem, int retryAfterSeconds) {
        super(problem.detail(), null, false, false);
        this.problem = problem;
        this.retryAfterSeconds = retryAfterSeconds;
    }

    public Problem problem() {
        return problem;
    }

    int retryAfterSeconds() {
        return retryAfterSeconds;
    }
}
