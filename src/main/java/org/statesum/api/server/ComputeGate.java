package org.statesum.api.server;

import java.util.List;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.request.Problem;

/**
 * Admission and concurrency control for compute work. A request's ticket is opened before its body
 * is read; the body is then read under the {@link MemoryBudget} and the body pace limits only, and
 * under a cap of {@code maxBodiesPerClient} bodies being read at once from one client address (429
 * beyond, at once), so that slow senders cannot hold the compute admissions. Once the body is complete
 * the request is admitted (at most {@code maxConcurrentJobs + maxQueuedRequests} at once, else 503 at
 * once: no unbounded queue), then waits for one of {@code maxConcurrentJobs} compute slots, in arrival
 * order, for at most {@code queueWaitMillis} (else 503). Batch jobs take compute slots from the same
 * pool, so direct and batch work share one bound.
 *
 * <p>Once closed for shutdown the gate opens and admits nothing more and the work in flight goes on;
 * once {@linkplain #cancel() cancelled} (the grace period is over) the work in flight stops at its next
 * checkpoint with a 503 {@code shutting-down} problem ({@link JobRunner}).
 *
 * <p>A ticket holds the share of the memory budget its body takes, reserved as the body is read and
 * given back once the job is computed or the request ends.
 */
public final class ComputeGate {

    private final OperationsConfig ops;
    private final ServiceMetrics metrics;
    private final Semaphore admissions;
    private final Semaphore slots;
    private final AtomicInteger admitted = new AtomicInteger();
    private final AtomicInteger running = new AtomicInteger();
    private final MemoryBudget memory;
    /** Bodies being read, by client address (entries removed at zero, so the map holds only readers). */
    private final ConcurrentHashMap<String, Integer> reading = new ConcurrentHashMap<>();
    private volatile boolean closed;
    private volatile boolean cancelled;

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

    /**
     * Opens a ticket for a request from {@code client} whose body is about to be read, or throws: 503
     * while shutting down, 429 when that client is already sending {@code maxBodiesPerClient} bodies.
     * The caller closes the ticket when done.
     */
    public Ticket open(String client) {
        if (closed) {
            throw shuttingDown();
        }
        String key = client == null ? "" : client;
        int cap = ops.maxBodiesPerClient();
        if (cap > 0 && reading.merge(key, 1, Integer::sum) > cap) {
            reading.computeIfPresent(key, (k, n) -> n == 1 ? null : n - 1);
            metrics.rejected("client-limit");
            throw new OverloadedException(Problem.of("too-many-bodies", "Too many request bodies from one client", 429,
                    "this client address is already sending " + cap + " request bodies (STATESUM_MAX_BODIES_PER_CLIENT); "
                            + "finish those before sending more", List.of()), ops.retryAfterSeconds());
        }
        return new Ticket(cap > 0 ? key : null);
    }

    /** Opens a ticket and admits it at once, for work that has no body to read first (tests). */
    Ticket admit() {
        Ticket ticket = open(null);
        ticket.admit();
        return ticket;
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

    /** Stops the work in flight at its next checkpoint (the grace period of a shutdown is over). */
    void cancel() {
        closed = true;
        cancelled = true;
    }

    boolean cancelled() {
        return cancelled;
    }

    /** The 503 of work refused or stopped because the service is shutting down. */
    OverloadedException shuttingDown() {
        return refused("shutting-down", "Service shutting down",
                "the service is shutting down; send the request to another replica");
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

    /**
     * One request: counted against its client while its body is read, then admitted (holding its
     * admission until closed); takes compute slots for its jobs.
     */
    public final class Ticket implements AutoCloseable {

        private boolean open = true;
        /** The share of the memory budget that the request's body takes. */
        private final MemoryBudget.Share body = memory.share();
        /** The client whose count of bodies being read includes this one, or null once it no longer does. */
        private String client;
        private boolean holdsAdmission;

        private Ticket(String client) {
            this.client = client;
        }

        /**
         * Admits the request to compute once its body is complete, or throws a 503 problem when
         * {@code maxConcurrentJobs + maxQueuedRequests} requests are admitted already.
         */
        public void admit() {
            stopReading();
            if (closed) {
                throw shuttingDown();
            }
            if (!admissions.tryAcquire()) {
                throw refused("overloaded", "Service overloaded", "the service is at its limit of "
                        + ops.maxConcurrentJobs() + " running and " + ops.maxQueuedRequests()
                        + " waiting requests (STATESUM_MAX_CONCURRENT_JOBS, STATESUM_MAX_QUEUED_REQUESTS); "
                        + "try again later");
            }
            holdsAdmission = true;
            admitted.incrementAndGet();
        }

        private void stopReading() {
            if (client != null) {
                reading.computeIfPresent(client, (k, n) -> n == 1 ? null : n - 1);
                client = null;
            }
        }

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
                stopReading();
                if (holdsAdmission) {
                    admitted.decrementAndGet();
                    admissions.release();
                }
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
