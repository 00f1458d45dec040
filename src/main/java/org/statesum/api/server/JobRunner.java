package org.statesum.api.server;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import java.util.function.Supplier;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.FieldError;
import org.statesum.api.request.FiniteNumbers;
import org.statesum.api.request.Problem;
import org.statesum.api.request.ProblemException;
import org.statesum.engine.Cancellation;

/**
 * Runs one compute job (a direct request or a batch job) under its time limit: installs a
 * {@link Cancellation} check that stops the engine between units of work once the deadline has passed
 * (a 422 problem: the job is too large for the limit, so retrying will not help), once the job is no
 * longer wanted (a client gone: {@link CancellationException}) or once a shutdown's grace period is over
 * (a 503 {@code shutting-down} problem, also for a job that had not started), and records the compute
 * time.
 */
public final class JobRunner {

    private final OperationsConfig ops;
    private final ServiceMetrics metrics;
    private final ComputeGate gate;

    JobRunner(OperationsConfig ops, ServiceMetrics metrics, ComputeGate gate) {
        this.ops = ops;
        this.metrics = metrics;
        this.gate = gate;
    }

    /**
     * The endpoint's answer to one body.
     *
     * @param notAfterNanos an outer deadline ({@link System#nanoTime()} scale), e.g. the batch's
     * @param unwanted true once the answer will not be read
     */
    public Object run(String path, ComputeEndpoint endpoint, JsonNode body, long notAfterNanos, BooleanSupplier unwanted) {
        return run(path, () -> FiniteNumbers.answer(body, endpoint), notAfterNanos, unwanted);
    }

    /** As above, for work that reads its own body (a streamed endpoint). */
    public Object run(String path, Supplier<Object> work, long notAfterNanos, BooleanSupplier unwanted) {
        long start = System.nanoTime();
        long ownDeadline = start + ops.timeLimitMillis() * 1_000_000L;
        long deadline = ownDeadline - notAfterNanos < 0 ? ownDeadline : notAfterNanos;
        Runnable check = () -> {
            if (gate.cancelled()) {
                throw gate.shuttingDown();
            }
            if (unwanted.getAsBoolean()) {
                throw new CancellationException("the answer is no longer wanted");
            }
            if (System.nanoTime() - deadline > 0) {
                throw timeLimit(deadline == ownDeadline);
            }
        };
        String outcome = "error";
        try {
            check.run();
            Object answer = Cancellation.during(check, work);
            outcome = "answered";
            return answer;
        } catch (ProblemException e) {
            outcome = e.problem().type().endsWith("time-limit-exceeded") ? "time-limit" : "invalid";
            throw e;
        } catch (CancellationException e) {
            outcome = "cancelled";
            throw e;
        } catch (RuntimeException e) {
            outcome = e instanceof org.statesum.engine.DomainException ? "invalid"
                    : e instanceof OverloadedException ? "refused" : "error";
            throw e;
        } finally {
            metrics.compute(path, outcome, System.nanoTime() - start);
        }
    }

    private ProblemException timeLimit(boolean own) {
        String detail = own
                ? "the job did not finish within the time limit of " + ops.timeLimitMillis()
                        + " ms (STATESUM_TIME_LIMIT_MS); make it smaller (fewer levels or temperatures)"
                : "the batch did not finish within its time limit of " + ops.batchTimeLimitMillis()
                        + " ms (STATESUM_BATCH_TIME_LIMIT_MS); send the remaining jobs again";
        return new ProblemException(Problem.of("time-limit-exceeded", "Time limit exceeded", 422, detail,
                List.of(new FieldError("", detail))));
    }

    /** A deadline far enough away never to bind. */
    static long noOuterDeadline() {
        return System.nanoTime() + Long.MAX_VALUE / 4;
    }
}
