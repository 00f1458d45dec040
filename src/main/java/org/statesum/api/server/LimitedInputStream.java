package org.statesum.api.server;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.function.Supplier;

/**
 * Passes at most {@code limit} bytes through and throws the supplied exception on the first byte
 * beyond, so that neither a large body nor a small gzip body that inflates enormously can exhaust
 * memory.
 */
public final class LimitedInputStream extends FilterInputStream {

    private final long limit;
    private final Supplier<? extends RuntimeException> overflow;
    private long count;

    LimitedInputStream(InputStream in, long limit, Supplier<? extends RuntimeException> overflow) {
        super(in);
        this.limit = limit;
        this.overflow = overflow;
    }

    @Override
    public int read() throws IOException {
        int b = super.read();
        if (b >= 0) {
            count(1);
        }
        return b;
    }

    @Override
    public int read(byte[] buffer, int offset, int length) throws IOException {
        int n = super.read(buffer, offset, (int) Math.min(length, limit - count + 1));
        if (n > 0) {
            count(n);
        }
        return n;
    }

    @Override
    public long skip(long n) throws IOException {
        long skipped = super.skip(Math.min(n, limit - count + 1));
        count(skipped);
        return skipped;
    }

    @Override
    public boolean markSupported() {
        return false;
    }

    private void count(long n) {
        count += n;
        if (count > limit) {
            throw overflow.get();
        }
    }
}
