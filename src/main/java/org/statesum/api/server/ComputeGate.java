package org.statesum.api.server;

import java.util.List;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.request.Problem;

/**
 * Admission and concurrency control for compute work. A request is first admitted (at most
 * {@code maxConcurrentJobs + maxQueuedRequests} at once, else 503 at once: no unbounded queue, and
 * memory bounded by that many bodies), then waits for one of {@code maxConcurrentJobs} compute slots,
 * in arrival order, for at most {@code queueWaitMillis} (else 503). Batch jobs take compute slots from
 * the same pool, so direct and batch work share one bound. Once closed for shutdown, the gate admits
 * nothing more and the work in flight finishes.
 *
 * <p>Requests in flight also share a {@link MemoryBudget} for their bodies and answers: a ticket holds
 * the share of its body, reserved as the body is read and given back once the job is computed or the
 * request ends.
 */
public final class ComputeGate {

    private final OperationsConfig ops;
    private final ServiceMetrics metrics;
    private final Semaphore admissions;
    private final Semaphore slots;
    private final AtomicInteger admitted = new AtomicInteger();
    private final AtomicInteger running = new AtomicInteger();
    private final MemoryBudget memory;
    private volatile boolean closed;

    ComputeGate(OperationsConfig ops, ServiceMetrics metrics) {
        this.ops = ops;
        this.metrics = metrics;
        this.admissions = new Semaphore(ops.maxConcurrentJobs() + ops.maxQueuedRequests());
        this.slots = new Semaphore(ops.maxConcurrentJobs(), true);
        this.memory = new MemoryBudget(ops, metrics);
        metrics.gauge("statesum.compute.running", "compute jobs running", running::get);
        metrics.gauge("statesum.compute.admitted", "requests admitted to compute, running or waiting",
                admitted::get);
        metrics.gauge("statesum.compute.slots", "compute slots (the concurrency limit)", ops::maxConcurrentJobs);
    }

    /** Admits one request or throws a 503 problem; the caller closes the ticket when done. */
    public Ticket admit() {
        if (closed) {
            throw refused("shutting-down", "Service shutting down",
                    "the service is shutting down; send the request to another replica");
        }
        if (!admissions.tryAcquire()) {
            throw refused("overloaded", "Service overloaded", "the service is at its limit of " + ops.maxConcurrentJobs()
                    + " running and " + ops.maxQueuedRequests() + " waiting requests (STATESUM_MAX_CONCURRENT_JOBS, "
                    + "STATESUM_MAX_QUEUED_REQUESTS); try again later");
        }
        admitted.incrementAndGet();
        return new Ticket();
    }

    /** Work admitted and not yet finished. */
    int admitted() {
        return admitted.get();
    }

    /** Refuses all new work from now on (graceful shutdown). */
    void close() {
        closed = true;
    }

    boolean closed() {
        return closed;
    }

    /** The 503 of a refused request; {@code reason} is the problem type and the metric's label. */
    private OverloadedException refused(String reason, String title, String detail) {
        metrics.rejected(reason);
        return new OverloadedException(Problem.of(reason, title, 503, detail, List.of()), ops.retryAfterSeconds());
    }

    /** A new, empty share of the memory budget (for an answer); the caller closes it when the answer is sent. */
    public MemoryBudget.Share memory() {
        return memory.share();
    }

    /** One admitted request: holds its admission until closed; takes compute slots for its jobs. */
    public final class Ticket implements AutoCloseable {

        private boolean open = true;
        /** The share of the memory budget that the request's body takes. */
        private final MemoryBudget.Share body = memory.share();

        /**
         * Makes sure the ticket holds memory for a body of which {@code bytes} have been read, at
         * {@code factor} bytes of heap per byte; a 503 problem when the budget cannot give it now.
         */
        void reserveBody(long bytes, int factor) {
            body.coverBody(bytes, factor);
        }

        /** Gives back the memory of the body once the job has been computed (its tree is no longer used). */
        void releaseBody() {
            body.close();
        }

        /** Waits for a compute slot up to the queue wait (a direct request), else throws a 503 problem. */
        Slot slotOrRefuse() {
            try {
                // a free slot is taken at once; only when all are busy does the request queue, in order
                if (slots.tryAcquire() || slots.tryAcquire(ops.queueWaitMillis(), TimeUnit.MILLISECONDS)) {
                    return new Slot();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            throw refused("overloaded", "Service overloaded", "no compute slot became free within " + ops.queueWaitMillis()
                    + " ms (STATESUM_QUEUE_WAIT_MS); try again later");
        }

        /** Waits for a compute slot without a limit (a job of an admitted batch). */
        public Slot slot() throws InterruptedException {
            slots.acquire();
            return new Slot();
        }

        @Override
        public void close() {
            if (open) {
                open = false;
                body.close();
                admitted.decrementAndGet();
                admissions.release();
            }
        }
    }

    /** One compute slot, held while a job computes. */
    public final class Slot implements AutoCloseable {

        private boolean held = true;

        private Slot() {
            running.incrementAndGet();
        }

        @Override
        public void close() {
            if (held) {
                held = false;
                running.decrementAndGet();
                slots.release();
            }
        }
    }
}
