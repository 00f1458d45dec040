package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

/** A body read through {@link MeteredInputStream} held to {@link BodyPace}. */
class BodyPaceTest {

    private static final long SECOND = 1_000_000_000L;

    /** A stream of {@code n} bytes read through a pace of 100 bytes/s after 1 s of grace, on a hand clock. */
    private static InputStream paced(int n, AtomicLong clock) {
        return new MeteredInputStream(new ByteArrayInputStream(new byte[n]),
                new BodyPace(SECOND, 100, clock::get, () -> new IllegalStateException("too slow")));
    }

    @Test
    void withinTheGraceAnyPaceIsAccepted() throws IOException {
        AtomicLong clock = new AtomicLong();
        InputStream in = paced(10, clock);
        clock.set(SECOND); // exactly at the end of the grace: not yet checked
        assertEquals(10, in.readAllBytes().length);
    }

    @Test
    void afterTheGraceTheAveragePaceMustReachTheMinimum() throws IOException {
        AtomicLong clock = new AtomicLong();
        InputStream in = paced(1_000, clock);
        byte[] buffer = new byte[150];
        clock.set(SECOND + 1);
        assertEquals(150, in.read(buffer)); // 150 bytes in 1 s: above 100 bytes/s
        clock.set(2 * SECOND);
        assertEquals(150, in.read(buffer)); // 300 bytes in 2 s
        clock.set(4 * SECOND);
        assertEquals(150, in.read(buffer)); // 450 bytes in 4 s: 112.5 bytes/s
        clock.set(7 * SECOND);
        assertThrows(IllegalStateException.class, () -> in.read(buffer)); // 600 bytes in 7 s: 86 bytes/s
    }

    @Test
    void aBodyThatFallsBehindIsStopped() {
        AtomicLong clock = new AtomicLong();
        InputStream in = paced(1_000, clock);
        clock.set(10 * SECOND);
        assertThrows(IllegalStateException.class, in::read); // 1 byte in 10 s
    }

    @Test
    void theBytesPassThroughUnchanged() throws IOException {
        byte[] data = {1, 2, 3, 4, 5};
        InputStream in = new MeteredInputStream(new ByteArrayInputStream(data),
                new BodyPace(SECOND, 1, () -> 0L, IllegalStateException::new));
        assertArrayEquals(data, in.readAllBytes());
    }
}
