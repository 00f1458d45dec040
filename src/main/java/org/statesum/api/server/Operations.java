package org.statesum.api.server;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.Javalin;
import io.javalin.config.JavalinConfig;
import io.javalin.config.Key;
import io.javalin.http.Context;
import jakarta.servlet.DispatcherType;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.EnumSet;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BiFunction;
import java.util.function.Supplier;
import org.eclipse.jetty.ee10.servlet.FilterHolder;
import org.eclipse.jetty.http.HttpCompliance;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.FiniteNumbers;
import org.statesum.api.request.ProblemMapper;

/**
 * Everything that lets the service run unattended, installed into the Javalin configuration in one
 * call: the request observer (request ids, security headers, metrics, access log), access control
 * (CORS, bearer tokens), overload protection and time limits around every compute route, the
 * machinery the batch route runs on, {@code GET /metrics}, the probes and graceful shutdown.
 */
public final class Operations {

    static final String METRICS_MEDIA_TYPE = "text/plain; version=0.0.4; charset=utf-8";
    /** How long stopping waits for the access log's last lines to be written, ms. */
    private static final long ACCESS_LOG_CLOSE_MILLIS = 1_000;
    private static final Key<ComputeRoutes> COMPUTE_ROUTES = new Key<>("statesum.compute-routes");

    private final ObjectMapper mapper;
    private final BodyReader bodies;
    private final ProblemMapper problems;
    private final OperationsConfig ops;
    private final ServiceMetrics metrics = new ServiceMetrics();
    private final Set<String> routes = ConcurrentHashMap.newKeySet();
    private final ComputeGate gate;
    private final JobRunner runner;
    private final Lifecycle lifecycle;
    private final ExecutorService workers;

    public Operations(ServiceConfig config, ObjectMapper mapper, BodyReader bodies, ProblemMapper problems) {
        this.mapper = mapper;
        this.bodies = bodies;
        this.problems = problems;
        this.ops = config.operations();
        this.gate = new ComputeGate(ops, metrics);
        this.runner = new JobRunner(ops, metrics, gate);
        this.lifecycle = new Lifecycle(gate, metrics.inFlight(), ops);
        this.workers = Executors.newFixedThreadPool(ops.maxConcurrentJobs(), daemonThreads());
    }

    /** The admission gate every compute request passes, direct or in a batch. */
    public ComputeGate gate() {
        return gate;
    }

    /** Runs jobs under their time limit. */
    public JobRunner runner() {
        return runner;
    }

    /** The threads batch jobs run on (as many as compute slots); stopped with the server. */
    public ExecutorService workers() {
        return workers;
    }

    public OperationsConfig config() {
        return ops;
    }

    public ServiceMetrics metrics() {
        return metrics;
    }

    /** A compute route that parses its own body from bytes (streamed into arrays, never held as a tree). */
    @FunctionalInterface
    public interface StreamedEndpoint {
        /** The answer to a complete body (decoded, within the streamed-body limit). */
        Object answer(InputStream body);
    }

    /**
     * Installs the operations features and serves every compute route of {@code compute} through them;
     * the paths in {@code streamed} are served directly by their streamed reader, and from a batch by
     * their {@link org.statesum.api.request.ComputeEndpoint}.
     */
    public void install(JavalinConfig javalin, ComputeRoutes compute, Map<String, StreamedEndpoint> streamed) {
        javalin.appData(COMPUTE_ROUTES, compute);
        // A blocking read of a request body that sees no byte for this long fails (408, see BodyReader);
        // the connector's own idle timeout still governs idle keep-alive connections.
        // RFC 9112 section 3.2.2: with an absolute-form target the Host header is ignored, not compared.
        javalin.jetty.modifyHttpConfiguration(http -> {
            http.setIdleTimeout(ops.bodyTimeoutMillis());
            http.setHttpCompliance(HttpCompliance.RFC9110.with("RFC9112 absolute-form",
                    HttpCompliance.Violation.MISMATCHED_AUTHORITY));
        });
        javalin.events.handlerAdded(handler -> {
            if (!handler.getPath().contains("*") && !handler.getPath().contains("{")) {
                routes.add(handler.getPath());
            }
        });
        AccessLog accessLog = new AccessLog(ops.accessLog());
        metrics.gauge("statesum.access.log.dropped", "access-log lines dropped because the writer was behind",
                accessLog::dropped);
        RequestObserver observer = new RequestObserver(metrics, routes);
        javalin.jetty.modifyServer(server -> server.setRequestLog(new AccessLogLines(accessLog)));
        javalin.jetty.modifyServletContextHandler(context -> context.addFilter(new FilterHolder(observer), "/*",
                EnumSet.of(DispatcherType.REQUEST)));
        javalin.routes.exception(OverloadedException.class, (e, ctx) -> {
            ctx.header("Retry-After", String.valueOf(e.retryAfterSeconds()));
            problems.write(ctx, e.problem());
        });
        AccessControl access = new AccessControl(ops, metrics, problems);
        javalin.routes.before(access::before);
        compute.all().forEach((path, endpoint) -> javalin.routes.post(problems.allow("POST", path),
                streamed.containsKey(path)
                ? ctx -> direct(ctx, path, (c, ticket) -> {
                    byte[] body = bodies.readStreamed(c, ticket);
                    return () -> streamed.get(path).answer(new ByteArrayInputStream(body));
                })
                : ctx -> direct(ctx, path, (c, ticket) -> {
                    JsonNode body = bodies.read(c, ticket);
                    return () -> FiniteNumbers.answer(body, endpoint);
                })));
        ReadRoutes.add(javalin, problems, "/metrics", ctx -> ctx.contentType(METRICS_MEDIA_TYPE).result(metrics.scrape()));
        ReadRoutes.add(javalin, problems, "/health/live", lifecycle::live);
        ReadRoutes.add(javalin, problems, "/health/ready", lifecycle::ready);
        javalin.events.serverStopping(lifecycle::drain);
        javalin.events.serverStopped(() -> {
            workers.shutdownNow();
            accessLog.close();
            try {
                accessLog.awaitClosed(ACCESS_LOG_CLOSE_MILLIS); // the last lines, before the JVM exits
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
    }

    /**
     * One compute request: its body read whole under the memory budget and the pace limits (429 when its
     * client already sends too many bodies), then admitted or 503 at once, a compute slot or 503,
     * computed under the time limit and serialized (and gzipped, for a large answer to a client that
     * accepts it) while the slot is held (a large answer is CPU work too), then written. A slow body
     * holds no admission and no slot.
     */
    private void direct(Context ctx, String path, BiFunction<Context, ComputeGate.Ticket, Supplier<Object>> prepare)
            throws IOException {
        try (ComputeGate.Ticket ticket = gate.open(ctx.req().getRemoteAddr());
                MemoryBudget.Share answerMemory = gate.memory()) {
            Supplier<Object> work = prepare.apply(ctx, ticket);
            ticket.admit();
            AnswerBuffer answer;
            boolean large;
            boolean gzip;
            try (ComputeGate.Slot slot = ticket.slotOrRefuse()) {
                Object result = runner.run(path, work, JobRunner.noOuterDeadline(), () -> false);
                work = null; // the body's tree is garbage from here on: its memory makes room for the answer
                ticket.releaseBody();
                answer = AnswerBuffer.of(mapper, result, answerMemory);
                large = answer.size() >= AnswerEncoding.MIN_BYTES;
                gzip = large && AnswerEncoding.acceptsGzip(ctx.header("Accept-Encoding"));
                if (gzip) {
                    answer = AnswerEncoding.gzip(answer, answerMemory);
                }
            }
            ctx.status(200).contentType("application/json");
            if (large) {
                ctx.res().setHeader("Vary", "Accept-Encoding");
            }
            if (gzip) {
                ctx.res().setHeader("Content-Encoding", "gzip");
            }
            // written straight to the response: no copy through Javalin's result stream
            ctx.res().setContentLengthLong(answer.size());
            answer.writeTo(ctx.res().getOutputStream());
        }
    }

    /** The paths of every compute endpoint an application serves (for tests that must cover them all). */
    public static Set<String> computePaths(Javalin app) {
        return app.unsafe.appDataManager.get(COMPUTE_ROUTES).all().keySet();
    }

    private static java.util.concurrent.ThreadFactory daemonThreads() {
        AtomicInteger count = new AtomicInteger();
        return task -> {
            Thread thread = new Thread(task, "statesum-batch-" + count.incrementAndGet());
            thread.setDaemon(true);
            return thread;
        };
    }
}
