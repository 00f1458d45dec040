package org.statesum.api.server;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Locale;
import java.util.zip.Deflater;
import java.util.zip.GZIPOutputStream;

/**
 * Gzip for large answers when the client accepts it ({@code Accept-Encoding}, RFC 9110, section
 * 12.5.3): JSON of doubles shrinks about threefold, and most HTTP clients ask for gzip and inflate it
 * unseen. Small answers go as they are, where compressing would cost more than it saves.
 */
public final class AnswerEncoding {

    /** Answers below this size go uncompressed (a small spectrum answer is about 1.3 KB). */
    static final int MIN_BYTES = 8 * 1024;

    private AnswerEncoding() {
    }

    /** Whether {@code acceptEncoding} allows gzip: "gzip", "x-gzip" or "*" with a q-value above 0. */
    static boolean acceptsGzip(String acceptEncoding) {
        if (acceptEncoding == null) {
            return false;
        }
        for (String item : acceptEncoding.split(",")) {
            String[] parts = item.split(";");
            String coding = parts[0].trim().toLowerCase(Locale.ROOT);
            if (coding.equals("gzip") || coding.equals("x-gzip") || coding.equals("*")) {
                return quality(parts) > 0;
            }
        }
        return false;
    }

    /** The q-value of one Accept-Encoding item, 1 when absent, 0 when unreadable. */
    private static double quality(String[] parameters) {
        for (int i = 1; i < parameters.length; i++) {
            String p = parameters[i].trim().toLowerCase(Locale.ROOT);
            if (p.startsWith("q=")) {
                try {
                    return Double.parseDouble(p.substring(2).trim());
                } catch (NumberFormatException e) {
                    return 0;
                }
            }
        }
        return 1;
    }

    /** {@code json} gzipped at the fastest level into a buffer on {@code memory} (done under the compute slot). */
    static AnswerBuffer gzip(AnswerBuffer json, MemoryBudget.Share memory) {
        AnswerBuffer out = new AnswerBuffer(memory);
        try (GZIPOutputStream gzip = new GZIPOutputStream(out, 1 << 16) {
            {
                def.setLevel(Deflater.BEST_SPEED);
            }
        }) {
            json.writeTo(gzip);
        } catch (IOException e) {
            throw new UncheckedIOException(e); // memory does not fail
        }
        return out;
    }
}
