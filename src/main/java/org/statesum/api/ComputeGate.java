package org.statesum.api;

import java.util.List;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Admission and concurrency control for compute work. A request is first admitted (at most
 * {@code maxConcurrentJobs + maxQueuedRequests} at once, else 503 at once: no unbounded queue, and
 * memory bounded by that many bodies), then waits for one of {@code maxConcurrentJobs} compute slots,
 * in arrival order, for at most {@code queueWaitMillis} (else 503). Batch jobs take compute slots from
 * the same pool, so direct and batch work share one bound. Once closed for shutdown, the gate admits
 * nothing more and the work in flight finishes.
 *
 * <p>Requests in flight also share a memory budget ({@code MEMORY_BUDGET_BYTES}) for their bodies and
 * answers: a ticket reserves the memory of its body as the body is read, an answer reserves its own
 * as it is written ({@link AnswerBuffer}), and whatever would take the budget past its end is refused
 * with 503 at once, so that a few large bodies or answers together cannot run the heap out. A single
 * body larger than the budget takes three quarters of it (the rest stays for answers); a single answer
 * larger than the whole budget is refused with 422, since it would never fit.
 */
final class ComputeGate {

    /**
     * Heap per byte of a body parsed into a JSON tree, counted generously: a tree of typical numbers
     * takes 1.8 times its text (2 million doubles: 40 MB of text, 74 MB of tree, measured), short
     * numbers up to about 7 times (a 16-byte node and a reference for "12,"), and the text itself 1.
     */
    static final int TREE_MEMORY_FACTOR = 8;
    /** Heap per byte of a body streamed into arrays of doubles: 8 bytes a number of at least 2 characters. */
    static final int STREAMED_MEMORY_FACTOR = 4;

    private final OperationsConfig ops;
    private final ServiceMetrics metrics;
    private final Semaphore admissions;
    private final Semaphore slots;
    private final AtomicInteger admitted = new AtomicInteger();
    private final AtomicInteger running = new AtomicInteger();
    /** The memory budget for bodies and answers in KiB (a semaphore counts ints; KiB reach 2 TiB). */
    private final Semaphore memoryKib;
    private final int totalKib;
    private volatile boolean closed;

    ComputeGate(OperationsConfig ops, ServiceMetrics metrics) {
        this.ops = ops;
        this.metrics = metrics;
        this.admissions = new Semaphore(ops.maxConcurrentJobs() + ops.maxQueuedRequests());
        this.slots = new Semaphore(ops.maxConcurrentJobs(), true);
        this.totalKib = (int) Math.max(1, Math.min(Integer.MAX_VALUE, ops.memoryBudgetBytes() / 1024));
        this.memoryKib = new Semaphore(totalKib);
        metrics.gauge("statesum.memory.reserved.bytes", "bytes of the memory budget held by request bodies and answers",
                () -> (totalKib - memoryKib.availablePermits()) * 1024L);
        metrics.gauge("statesum.compute.running", "compute jobs running", running::get);
        metrics.gauge("statesum.compute.admitted", "requests admitted to compute, running or waiting",
                admitted::get);
        metrics.gauge("statesum.compute.slots", "compute slots (the concurrency limit)", ops::maxConcurrentJobs);
    }

    /** Admits one request or throws a 503 problem; the caller closes the ticket when done. */
    Ticket admit() {
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

    /** The 503 of a refused request; {@code reason} names the metric, the problem type is the same for memory. */
    private OverloadedException refused(String reason, String title, String detail) {
        metrics.rejected(reason);
        String type = reason.equals("memory") ? "overloaded" : reason;
        return new OverloadedException(Problem.of(type, title, 503, detail, List.of()), ops.retryAfterSeconds());
    }

    /** A new, empty share of the memory budget (for an answer); the caller closes it when the answer is sent. */
    Memory memory() {
        return new Memory();
    }

    /** A share of the memory budget, grown as a body is read or an answer written, given back on close. */
    final class Memory implements AutoCloseable {

        /** KiB of the budget held. */
        private int heldKib;

        /**
         * Makes sure this share covers {@code bytes} at {@code factor} bytes of heap each (at most the
         * whole budget); a 503 problem when the budget cannot give it now.
         */
        synchronized void cover(long bytes, int factor) {
            cover(bytes, factor, totalKib);
        }

        /** As {@link #cover}, holding at most {@code capKib}. */
        private void cover(long bytes, int factor, long capKib) {
            long wanted = Math.min(capKib, (bytes * factor + 1023) / 1024);
            if (wanted <= heldKib) {
                return;
            }
            int more = (int) (wanted - heldKib);
            if (!memoryKib.tryAcquire(more)) {
                throw refused("memory", "Service overloaded", "the requests being handled fill the memory set "
                        + "aside for bodies and answers (" + ops.memoryBudgetBytes()
                        + " bytes, STATESUM_MEMORY_BUDGET_BYTES); try again later");
            }
            heldKib += more;
        }

        /** As {@link #cover} for an answer of {@code bytes}: 422 when it alone would exceed the whole budget. */
        synchronized void coverAnswer(long bytes) {
            if (bytes > (long) totalKib * 1024) {
                String detail = "the answer would exceed the " + ops.memoryBudgetBytes() + " bytes of memory set aside "
                        + "for bodies and answers (STATESUM_MEMORY_BUDGET_BYTES); ask for fewer temperatures, "
                        + "pressures, species or populations";
                throw new ProblemException(Problem.of("answer-too-large", "Answer too large", 422, detail,
                        List.of(new FieldError("", detail))));
            }
            cover(bytes, 1);
        }

        @Override
        public synchronized void close() {
            memoryKib.release(heldKib);
            heldKib = 0;
        }
    }

    /** One admitted request: holds its admission until closed; takes compute slots for its jobs. */
    final class Ticket implements AutoCloseable {

        private boolean open = true;
        /** The share of the memory budget that the request's body takes. */
        private final Memory body = new Memory();

        /**
         * Makes sure the ticket holds memory for a body of which {@code bytes} have been read, at
         * {@code factor} bytes of heap per byte; a 503 problem when the budget cannot give it now.
         */
        void reserveBody(long bytes, int factor) {
            synchronized (body) {
                body.cover(bytes, factor, totalKib - totalKib / 4); // a quarter stays for answers
            }
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
        Slot slot() throws InterruptedException {
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
    final class Slot implements AutoCloseable {

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
