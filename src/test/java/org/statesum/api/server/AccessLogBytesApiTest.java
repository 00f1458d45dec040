package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.javalin.Javalin;
import jakarta.servlet.DispatcherType;
import java.io.ByteArrayOutputStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Flow;
import org.eclipse.jetty.ee10.servlet.FilterHolder;
import org.junit.jupiter.api.Test;

/**
 * The access log's byte counts are the bytes that crossed the wire: a body sent without Content-Length
 * (chunked) is counted as it arrived, and what the answer wrote is counted too.
 */
class AccessLogBytesApiTest {

    @Test
    void bytesInAndOutAreTheBytesReadAndWritten() throws Exception {
        ByteArrayOutputStream sink = new ByteArrayOutputStream();
        AccessLog log = new AccessLog(true, sink, 5);
        RequestObserver observer = new RequestObserver(new ServiceMetrics(), Set.of("/echo"));
        Javalin app = Javalin.create(javalin -> {
            javalin.startup.showJavalinBanner = false;
            javalin.jetty.port = 0;
            javalin.jetty.modifyServletContextHandler(context -> context.addFilter(new FilterHolder(observer), "/*",
                    EnumSet.of(DispatcherType.REQUEST)));
            javalin.jetty.modifyServer(server -> server.setRequestLog(new AccessLogLines(log)));
            javalin.routes.post("/echo", ctx -> ctx.result("got " + ctx.bodyAsBytes().length));
        }).start();
        try {
            byte[] body = "x".repeat(12_345).getBytes(StandardCharsets.US_ASCII);
            // a publisher without a known length: the JDK client sends it chunked, with no Content-Length
            HttpRequest.BodyPublisher chunked = new HttpRequest.BodyPublisher() {
                private final HttpRequest.BodyPublisher inner = HttpRequest.BodyPublishers.ofByteArray(body);

                @Override
                public long contentLength() {
                    return -1;
                }

                @Override
                public void subscribe(Flow.Subscriber<? super java.nio.ByteBuffer> subscriber) {
                    inner.subscribe(subscriber);
                }
            };
            HttpResponse<String> answer = HttpClient.newHttpClient().send(HttpRequest.newBuilder(
                    URI.create("http://localhost:" + app.port() + "/echo")).POST(chunked).build(),
                    HttpResponse.BodyHandlers.ofString());
            assertEquals("got 12345", answer.body());
        } finally {
            app.stop();
            log.close();
            log.awaitClosed(10_000);
        }
        List<String> lines = sink.toString(StandardCharsets.UTF_8).lines().toList();
        assertEquals(1, lines.size(), lines.toString());
        assertTrue(lines.get(0).contains(" bytesIn=12345 bytesOut=9 "), lines.get(0));
    }
}
