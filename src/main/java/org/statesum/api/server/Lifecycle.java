package org.statesum.api.server;

import io.javalin.http.Context;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.request.Problem;

/**
 * Readiness and graceful shutdown. When the server is asked to stop (SIGTERM runs the JVM's shutdown
 * hook, which stops the server), the gate is closed first: readiness turns 503 so that load balancers
 * stop sending work, new compute requests get 503 with {@code Retry-After}, and the work in flight,
 * direct or batch, runs to its end for up to {@code STATESUM_SHUTDOWN_GRACE_MS}. Work still running
 * then is cancelled: a direct request answers a 503 {@code shutting-down} problem, each unfinished batch
 * job its own problem line, and the batch stream ends properly; the drain waits up to
 * {@link #CANCEL_WAIT_MILLIS} more for those answers to be written. Only then does the HTTP server stop.
 */
public final class Lifecycle {

    private static final Logger LOG = LoggerFactory.getLogger(Lifecycle.class);
    private static final byte[] UP = "{\"status\":\"up\"}".getBytes(StandardCharsets.UTF_8);
    /** How often the drain looks at the work in flight, ms: short against any grace period. */
    private static final long POLL_MILLIS = 20;
    /**
     * How long cancelled work may take to answer, ms: the engine checks for cancellation between units
     * of work (a temperature, a volume, an iteration), well under a second apart for any job the limits
     * admit, and writing a problem takes microseconds.
     */
    static final long CANCEL_WAIT_MILLIS = 5_000;

    private final ComputeGate gate;
    private final AtomicInteger requestsInFlight;
    private final long graceMillis;
    private final int retryAfterSeconds;

    /** @param requestsInFlight HTTP requests not yet fully answered (the drain waits for them too) */
    Lifecycle(ComputeGate gate, AtomicInteger requestsInFlight, OperationsConfig ops) {
        this.gate = gate;
        this.requestsInFlight = requestsInFlight;
        this.graceMillis = ops.shutdownGraceMillis();
        this.retryAfterSeconds = ops.retryAfterSeconds();
    }

    void live(Context ctx) {
        ctx.contentType("application/json").result(UP);
    }

    void ready(Context ctx) {
        if (gate.closed()) {
            throw new OverloadedException(Problem.of("shutting-down", "Service shutting down", 503,
                    "this replica is shutting down", List.of()), retryAfterSeconds);
        }
        ctx.contentType("application/json").result(UP);
    }

    private boolean busy() {
        return gate.admitted() > 0 || requestsInFlight.get() > 0;
    }

    /**
     * Closes the gate and waits for the work in flight to finish, at most the grace period; then cancels
     * what is left and waits for its answers, at most {@link #CANCEL_WAIT_MILLIS}.
     */
    void drain() {
        gate.close();
        if (!waitIdle(graceMillis)) {
            LOG.warn("cancelling {} requests still in flight after the grace period", requestsInFlight.get());
            gate.cancel();
            waitIdle(CANCEL_WAIT_MILLIS);
        }
        if (busy()) {
            LOG.warn("stopping with {} requests still in flight", requestsInFlight.get());
        } else {
            LOG.info("drained; stopping");
        }
    }

    /** Waits until no work is in flight or {@code millis} have passed; whether it is idle. */
    private boolean waitIdle(long millis) {
        long deadline = System.nanoTime() + millis * 1_000_000L;
        while (busy() && System.nanoTime() - deadline < 0) {
            try {
                Thread.sleep(POLL_MILLIS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                break;
            }
        }
        return !busy();
    }
}
