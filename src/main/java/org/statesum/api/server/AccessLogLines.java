package org.statesum.api.server;

import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.RequestLog;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.NanoTime;

/**
 * Jetty's request-log hook, called once an exchange is complete (also for requests refused before any
 * route): one line on the {@link AccessLog} per request, with the bytes of content read from and
 * written to the wire (compressed where the body or answer was), so that a client that declared a
 * Content-Length it did not send, or sent none, is logged as it behaved.
 */
final class AccessLogLines implements RequestLog {

    private final AccessLog log;

    AccessLogLines(AccessLog log) {
        this.log = log;
    }

    @Override
    public void log(Request request, Response response) {
        if (!log.enabled()) {
            return;
        }
        String id = response.getHeaders().get(RequestObserver.REQUEST_ID);
        log.add(line(id == null ? "-" : id, RequestObserver.method(request.getMethod()), request.getHttpURI().getPath(),
                response.getStatus(), NanoTime.since(request.getBeginNanoTime()), Request.getContentBytesRead(request),
                Response.getContentBytesWritten(response), Request.getRemoteAddr(request)));
    }

    /**
     * One access-log line: {@code id=... method=... path=... status=... ms=... bytesIn=... bytesOut=...
     * client=...}, the path cut at 200 characters, the time in milliseconds with three decimals (integer
     * arithmetic: a double's decimal formatting cost more than the rest of the line).
     */
    static String line(String id, String method, String path, int status, long nanos, long bytesIn, long bytesOut,
            String client) {
        String shown = path == null ? "" : path;
        long micros = Math.max(0, nanos) / 1_000;
        int fraction = (int) (micros % 1_000);
        StringBuilder line = new StringBuilder(170).append("id=").append(id).append(" method=").append(method)
                .append(" path=").append(shown.length() > 200 ? shown.substring(0, 200) + "..." : shown)
                .append(" status=").append(status).append(" ms=").append(micros / 1_000).append('.');
        if (fraction < 100) {
            line.append(fraction < 10 ? "00" : "0");
        }
        return line.append(fraction).append(" bytesIn=").append(Math.max(0, bytesIn)).append(" bytesOut=")
                .append(Math.max(0, bytesOut)).append(" client=").append(client).toString();
    }
}
