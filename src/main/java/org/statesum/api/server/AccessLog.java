package org.statesum.api.server;

import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.atomic.AtomicLong;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The access log: one line a request, handed to a writer thread through a bounded queue and written
 * to standard error in batches (one write for many lines, not one a line), so that logging neither
 * blocks a request on the log's file or pipe nor costs a system call a request. The writer wakes on a
 * timer ({@link #FLUSH_MILLIS}) rather than on each line: a request only enqueues its line and never
 * wakes a thread, which at saturation cost more than the rest of a small request's own work
 * (bench/load.sh). The logger {@code statesum.access} decides whether the log is on (level INFO). If
 * the writer falls more than {@link #CAPACITY} lines behind, further lines are dropped and counted,
 * never waited for.
 */
public final class AccessLog {

    /** Lines held for the writer: well over a second of saturation on a small machine, a few MiB at most. */
    static final int CAPACITY = 16_384;
    /** The writer's period, ms: how long a line may wait to be written (at 30 000 requests/s, 1 500 lines). */
    static final long FLUSH_MILLIS = 50;
    private static final Logger LOG = LoggerFactory.getLogger("statesum.access");

    private final BlockingQueue<String> lines = new ArrayBlockingQueue<>(CAPACITY);
    private final AtomicLong dropped = new AtomicLong();
    private final boolean enabled;
    private final OutputStream sink;
    private final long flushMillis;
    private final Thread writer;
    private volatile boolean closing;

    /** The log on standard error, on when {@code wanted} and the logger {@code statesum.access} is at INFO. */
    AccessLog(boolean wanted) {
        this(wanted && LOG.isInfoEnabled(), new FileOutputStream(FileDescriptor.err), FLUSH_MILLIS);
    }

    /** A log written to {@code sink} every {@code flushMillis} ms (tests use their own sink). */
    AccessLog(boolean enabled, OutputStream sink, long flushMillis) {
        this.enabled = enabled;
        this.sink = sink;
        this.flushMillis = flushMillis;
        this.writer = enabled ? new Thread(this::write, "statesum-access-log") : null;
        if (enabled) {
            writer.setDaemon(true);
            writer.start();
        }
    }

    boolean enabled() {
        return enabled;
    }

    /** Lines dropped because the writer was behind. */
    long dropped() {
        return dropped.get();
    }

    /** Writes what is queued, then lets the writer thread end (the server has stopped). */
    void close() {
        closing = true;
    }

    /** Waits up to {@code millis} for the writer to write what was queued and end, after {@link #close}. */
    void awaitClosed(long millis) throws InterruptedException {
        if (writer != null) {
            writer.join(millis);
        }
    }

    void add(String line) {
        if (enabled && !lines.offer(line)) {
            dropped.incrementAndGet();
        }
    }

    /**
     * The writer: every {@code flushMillis} ms, all queued lines in one write. It sleeps instead of
     * waiting on the queue, so that adding a line never has a thread to wake.
     */
    private void write() {
        List<String> batch = new ArrayList<>();
        StringBuilder text = new StringBuilder();
        while (true) {
            boolean last = closing; // read before draining: a line queued before close() is written
            lines.drainTo(batch);
            if (!batch.isEmpty()) {
                for (String line : batch) {
                    text.append("[access] INFO statesum.access - ").append(line).append('\n');
                }
                try {
                    sink.write(text.toString().getBytes(StandardCharsets.UTF_8));
                    sink.flush();
                } catch (IOException e) {
                    dropped.addAndGet(batch.size()); // standard error is gone: nothing else to tell
                }
                batch.clear();
                text.setLength(0);
            }
            if (last) {
                return;
            }
            try {
                Thread.sleep(flushMillis);
            } catch (InterruptedException e) {
                return;
            }
        }
    }
}
