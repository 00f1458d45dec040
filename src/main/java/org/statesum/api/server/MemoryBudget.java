package org.statesum.api.server;

import java.util.List;
import java.util.concurrent.Semaphore;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.request.FieldError;
import org.statesum.api.request.Problem;
import org.statesum.api.request.ProblemException;

/**
 * The memory that the bodies and answers of the requests in flight may take at once
 * ({@code STATESUM_MEMORY_BUDGET_BYTES}, a quarter of the heap by default; the rest holds the jobs' own
 * arrays). A body reserves the heap its parsed form may take as it is read ({@link BodyReader}), an
 * answer its bytes as it is written ({@link AnswerBuffer}); whatever would take the budget past its
 * end is refused with 503 at once, so that a few large bodies or answers together cannot run the heap
 * out. A single body larger than the budget takes three quarters of it (the rest stays for answers); a
 * single answer larger than the whole budget is refused with 422, since it would never fit.
 */
public final class MemoryBudget {

    /**
     * Heap per byte of a body parsed into a JSON tree, counted generously: a tree of typical numbers
     * takes 1.8 times its text (2 million doubles: 40 MB of text, 74 MB of tree, measured), short
     * numbers up to about 7 times (a 16-byte node and a reference for "12,"), and the text itself 1.
     */
    static final int TREE_FACTOR = 8;
    /** Heap per byte of a body streamed into arrays of doubles: 8 bytes a number of at least 2 characters. */
    static final int STREAMED_FACTOR = 4;

    private final OperationsConfig ops;
    private final ServiceMetrics metrics;
    /** The budget in KiB (a semaphore counts ints; KiB reach 2 TiB). */
    private final Semaphore freeKib;
    private final int totalKib;

    MemoryBudget(OperationsConfig ops, ServiceMetrics metrics) {
        this.ops = ops;
        this.metrics = metrics;
        this.totalKib = (int) Math.max(1, Math.min(Integer.MAX_VALUE, ops.memoryBudgetBytes() / 1024));
        this.freeKib = new Semaphore(totalKib);
        metrics.gauge("statesum.memory.reserved.bytes", "bytes of the memory budget held by request bodies and answers",
                () -> (totalKib - freeKib.availablePermits()) * 1024L);
    }

    /** A new, empty share; the caller closes it when what it holds is no longer needed. */
    Share share() {
        return new Share();
    }

    /** A share of the budget, grown as a body is read or an answer written, given back on close. */
    public final class Share implements AutoCloseable {

        /** KiB of the budget held. */
        private int heldKib;

        /**
         * Makes sure this share covers {@code bytes} at {@code factor} bytes of heap each (at most the
         * whole budget); a 503 problem when the budget cannot give it now.
         */
        synchronized void cover(long bytes, int factor) {
            cover(bytes, factor, totalKib);
        }

        /** As {@link #cover} for a body: at most three quarters of the budget, so its answer still fits. */
        synchronized void coverBody(long bytes, int factor) {
            cover(bytes, factor, totalKib - totalKib / 4);
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
            cover(bytes, 1, totalKib);
        }

        private void cover(long bytes, int factor, long capKib) {
            long wanted = Math.min(capKib, (bytes * factor + 1023) / 1024);
            if (wanted <= heldKib) {
                return;
            }
            int more = (int) (wanted - heldKib);
            if (!freeKib.tryAcquire(more)) {
                metrics.rejected("memory");
                throw new OverloadedException(Problem.of("overloaded", "Service overloaded", 503,
                        "the requests being handled fill the memory set aside for bodies and answers ("
                                + ops.memoryBudgetBytes() + " bytes, STATESUM_MEMORY_BUDGET_BYTES); try again later",
                        List.of()), ops.retryAfterSeconds());
            }
            heldKib += more;
        }

        @Override
        public synchronized void close() {
            freeKib.release(heldKib);
            heldKib = 0;
        }
    }
}
