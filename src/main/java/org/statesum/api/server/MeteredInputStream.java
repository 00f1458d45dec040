package org.statesum.api.server;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.function.LongConsumer;

/** Tells {@code onProgress} the number of bytes read so far after every read (it may throw to stop). */
public final class MeteredInputStream extends FilterInputStream {

    private final LongConsumer onProgress;
    private long count;

    MeteredInputStream(InputStream in, LongConsumer onProgress) {
        super(in);
        this.onProgress = onProgress;
    }

    @Override
    public int read() throws IOException {
        int b = super.read();
        if (b >= 0) {
            onProgress.accept(++count);
        }
        return b;
    }

    @Override
    public int read(byte[] buffer, int offset, int length) throws IOException {
        int n = super.read(buffer, offset, length);
        if (n > 0) {
            count += n;
            onProgress.accept(count);
        }
        return n;
    }

    @Override
    public long skip(long n) throws IOException {
        long skipped = super.skip(n);
        count += skipped;
        onProgress.accept(count);
        return skipped;
    }

    @Override
    public boolean markSupported() {
        return false;
    }
}
