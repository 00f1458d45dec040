package org.statesum.api.server;

import java.util.function.LongConsumer;
import java.util.function.LongSupplier;
import java.util.function.Supplier;

/**
 * Holds a request body to a minimum average pace, told the bytes read so far after every read
 * ({@link MeteredInputStream}). The service admits a request before it reads the body (so that
 * admission bounds the bodies held in memory); without a pace, a client that sends a byte now and
 * then would keep its admission, and a few dozen such clients would keep everyone else out. Once
 * {@code graceNanos} have passed since reading began, a read that finds the body arriving at less
 * than {@code minBytesPerSecond} on average throws the supplied exception (a 408). A client that
 * sends nothing at all is stopped by Jetty's idle timeout for blocking reads instead
 * ({@link Operations}), which shares the grace.
 */
public final class BodyPace implements LongConsumer {

    private final long graceNanos;
    private final long minBytesPerSecond;
    private final LongSupplier clock;
    private final Supplier<? extends RuntimeException> tooSlow;
    private final long start;

    BodyPace(long graceNanos, long minBytesPerSecond, LongSupplier clock, Supplier<? extends RuntimeException> tooSlow) {
        this.graceNanos = graceNanos;
        this.minBytesPerSecond = minBytesPerSecond;
        this.clock = clock;
        this.tooSlow = tooSlow;
        this.start = clock.getAsLong();
    }

    @Override
    public void accept(long count) {
        long elapsed = clock.getAsLong() - start;
        // count / elapsed < rate, as count * 1e9 < rate * elapsed in doubles (no overflow, no division)
        if (elapsed > graceNanos && (double) count * 1e9 < (double) minBytesPerSecond * elapsed) {
            throw tooSlow.get();
        }
    }
}
