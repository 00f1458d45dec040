package org.statesum.api.server;

import jakarta.servlet.AsyncEvent;
import jakarta.servlet.AsyncListener;
import jakarta.servlet.Filter;
import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.ServletRequest;
import jakarta.servlet.ServletResponse;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.util.Set;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.regex.Pattern;

/**
 * Wraps every request that reaches the application, whatever its route or outcome: gives it a request
 * id (an incoming {@code X-Request-Id} of 1 to 128 characters of {@code A-Za-z0-9._:-}, else 32 random
 * hex digits), echoes the id, sets the security headers, counts it in flight, and afterwards records its
 * latency by route, method and status. The access-log line is written by {@link AccessLogLines} once
 * the exchange is complete.
 *
 * <p>Method-override headers ({@code X-HTTP-Method-Override} and its kin, which the framework would
 * honour) are hidden from everything behind this filter: the method a request runs is the method on
 * its request line, the one proxies, allow-lists and the access log see.
 */
public final class RequestObserver implements Filter {

    static final String REQUEST_ID = "X-Request-Id";
    private static final char[] HEX = "0123456789abcdef".toCharArray();
    private static final Pattern SAFE_ID = Pattern.compile("[A-Za-z0-9._:-]{1,128}");
    /**
     * The methods of RFC 9110 and PATCH (RFC 5789); any other token a client sends is measured and logged
     * as {@code other}, so that made-up methods cannot grow the meter set without bound.
     */
    private static final Set<String> METHODS = Set.of("GET", "HEAD", "POST", "PUT", "DELETE", "CONNECT", "OPTIONS",
            "TRACE", "PATCH");

    private final ServiceMetrics metrics;
    private final Set<String> routes;

    /**
     * @param routes the registered paths (a live view): any other path is logged and measured as
     *        {@code unmatched}
     */
    RequestObserver(ServiceMetrics metrics, Set<String> routes) {
        this.metrics = metrics;
        this.routes = routes;
    }

    @Override
    public void doFilter(ServletRequest request, ServletResponse response, FilterChain chain)
            throws IOException, ServletException {
        HttpServletRequest req = MethodOverride.hidden((HttpServletRequest) request);
        HttpServletResponse res = (HttpServletResponse) response;
        long start = System.nanoTime();
        String incoming = req.getHeader(REQUEST_ID);
        String id = incoming != null && SAFE_ID.matcher(incoming).matches() ? incoming : newId();
        SecurityHeaders.apply(res, REQUEST_ID, id);
        metrics.inFlight().incrementAndGet();
        boolean async = false;
        try {
            chain.doFilter(req, response);
            if (req.isAsyncStarted()) {
                // Javalin may finish writing a large answer asynchronously: count the request until then
                req.getAsyncContext().addListener(new Finish(() -> finish(req, res, start)));
                async = true;
            }
        } finally {
            if (!async) {
                finish(req, res, start);
            }
        }
    }

    private void finish(HttpServletRequest req, HttpServletResponse res, long start) {
        metrics.inFlight().decrementAndGet();
        String path = req.getRequestURI();
        metrics.request(method(req.getMethod()), routes.contains(path) ? path : "unmatched", res.getStatus(),
                System.nanoTime() - start);
    }

    /** The method as measured and logged: one of {@link #METHODS}, else {@code other}. */
    static String method(String method) {
        return METHODS.contains(method) ? method : "other";
    }

    /** Runs once when an asynchronous answer completes, fails or times out. */
    private static final class Finish implements AsyncListener {

        private final Runnable action;
        private final AtomicBoolean done = new AtomicBoolean();

        Finish(Runnable action) {
            this.action = action;
        }

        private void once() {
            if (done.compareAndSet(false, true)) {
                action.run();
            }
        }

        @Override
        public void onComplete(AsyncEvent event) {
            once();
        }

        @Override
        public void onTimeout(AsyncEvent event) {
            once();
        }

        @Override
        public void onError(AsyncEvent event) {
            once();
        }

        @Override
        public void onStartAsync(AsyncEvent event) {
            // the same request again: the listener stays registered only if re-added
            event.getAsyncContext().addListener(this);
        }
    }

    private static String newId() {
        ThreadLocalRandom random = ThreadLocalRandom.current();
        char[] hex = new char[32];
        for (int half = 0; half < 2; half++) {
            long bits = random.nextLong();
            for (int i = 0; i < 16; i++) {
                hex[half * 16 + i] = HEX[(int) (bits >>> (60 - 4 * i)) & 0xf];
            }
        }
        return new String(hex);
    }
}
