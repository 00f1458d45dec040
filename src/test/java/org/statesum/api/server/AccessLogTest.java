package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import org.junit.jupiter.api.Test;

class AccessLogTest {

    @Test
    void everyLineQueuedBeforeCloseIsWrittenInOrder() throws Exception {
        ByteArrayOutputStream sink = new ByteArrayOutputStream();
        AccessLog log = new AccessLog(true, sink, 5);
        for (int i = 0; i < 10_000; i++) {
            log.add("line " + i);
        }
        log.close();
        log.awaitClosed(10_000);
        List<String> lines = sink.toString(StandardCharsets.UTF_8).lines().toList();
        assertEquals(10_000, lines.size());
        assertEquals("[access] INFO statesum.access - line 0", lines.get(0));
        assertEquals("[access] INFO statesum.access - line 9999", lines.get(9_999));
        assertEquals(0, log.dropped());
    }

    @Test
    void aWriterThatIsBehindDropsAndCountsLinesInsteadOfBlocking() throws Exception {
        CountDownLatch entered = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        OutputStream stuck = new OutputStream() {
            @Override
            public void write(int b) {
            }

            @Override
            public void write(byte[] b, int off, int len) throws IOException {
                entered.countDown();
                try {
                    release.await(); // a pipe nobody reads
                } catch (InterruptedException e) {
                    throw new IOException(e);
                }
            }
        };
        AccessLog log = new AccessLog(true, stuck, 1);
        log.add("first");
        assertTrue(entered.await(10, java.util.concurrent.TimeUnit.SECONDS)); // the writer took "first" and is stuck
        for (int i = 0; i < AccessLog.CAPACITY + 100; i++) {
            log.add("more");
        }
        assertEquals(100, log.dropped());
        release.countDown();
        log.close();
        log.awaitClosed(10_000);
    }

    @Test
    void offWritesNothing() throws Exception {
        ByteArrayOutputStream sink = new ByteArrayOutputStream();
        AccessLog log = new AccessLog(false, sink, 1);
        log.add("ignored");
        log.close();
        log.awaitClosed(100);
        assertEquals(0, sink.size());
    }

    @Test
    void aLineNamesTheRequestWithMillisecondsToThreeDecimals() {
        assertEquals("id=abc method=POST path=/v1/spectrum status=200 ms=0.087 bytesIn=88 bytesOut=1200 client=127.0.0.1",
                AccessLogLines.line("abc", "POST", "/v1/spectrum", 200, 87_654, 88, 1200, "127.0.0.1"));
        assertEquals("id=abc method=GET path=/x status=404 ms=1234.005 bytesIn=0 bytesOut=0 client=::1",
                AccessLogLines.line("abc", "GET", "/x", 404, 1_234_005_999L, -1, -1, "::1"));
        String longPath = "/" + "a".repeat(300);
        assertTrue(AccessLogLines.line("abc", "GET", longPath, 404, 0, 0, 0, "h")
                .contains(" path=/" + "a".repeat(199) + "... status=404 ms=0.000 "));
    }
}
