package org.statesum.api;

import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The access log: one line a request, handed to a writer thread through a bounded queue and written
 * to standard error in batches (one write for many lines, not one a line), so that logging neither
 * blocks a request on the log's file or pipe nor costs a system call a request. The logger
 * {@code statesum.access} decides whether the log is on (level INFO). If the writer falls more than
 * {@link #CAPACITY} lines behind, further lines are dropped and counted, never waited for.
 */
final class AccessLog {

    /** Lines held for the writer: some seconds of saturation on a small machine, a few MiB at most. */
    private static final int CAPACITY = 16_384;
    /** The writer's idle wake-up, ms: how long a quiet service may hold a finished batch. */
    private static final long IDLE_MILLIS = 200;
    private static final Logger LOG = LoggerFactory.getLogger("statesum.access");

    private final BlockingQueue<String> lines = new ArrayBlockingQueue<>(CAPACITY);
    private final AtomicLong dropped = new AtomicLong();
    private final boolean enabled;
    private volatile boolean closing;

    AccessLog(boolean wanted) {
        this.enabled = wanted && LOG.isInfoEnabled();
        if (enabled) {
            Thread writer = new Thread(this::write, "statesum-access-log");
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

    void add(String line) {
        if (enabled && !lines.offer(line)) {
            dropped.incrementAndGet();
        }
    }

    private void write() {
        OutputStream err = new FileOutputStream(FileDescriptor.err);
        List<String> batch = new ArrayList<>();
        StringBuilder text = new StringBuilder();
        while (!(closing && lines.isEmpty())) {
            try {
                String first = lines.poll(IDLE_MILLIS, TimeUnit.MILLISECONDS);
                if (first == null) {
                    continue;
                }
                batch.add(first);
                lines.drainTo(batch, 1024);
                for (String line : batch) {
                    text.append("[access] INFO statesum.access - ").append(line).append('\n');
                }
                err.write(text.toString().getBytes(StandardCharsets.UTF_8));
                err.flush();
            } catch (InterruptedException e) {
                return;
            } catch (IOException e) {
                dropped.addAndGet(batch.size()); // standard error is gone: nothing else to tell
            } finally {
                batch.clear();
                text.setLength(0);
            }
        }
    }
}
