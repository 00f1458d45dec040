package org.statesum.api.server;

import io.micrometer.core.instrument.Counter;
import io.micrometer.core.instrument.Gauge;
import io.micrometer.core.instrument.Tags;
import io.micrometer.core.instrument.Timer;
import io.micrometer.core.instrument.binder.jvm.ClassLoaderMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmGcMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmMemoryMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmThreadMetrics;
import io.micrometer.core.instrument.binder.system.ProcessorMetrics;
import io.micrometer.core.instrument.binder.system.UptimeMetrics;
import io.micrometer.prometheusmetrics.PrometheusConfig;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.time.Duration;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Supplier;

/**
 * The service's meters, served by {@code GET /metrics} in the Prometheus text format: requests by
 * route, method and status (a histogram of latency), requests in flight, requests refused (by reason),
 * compute time by endpoint, compute slots in use and waiting, batch jobs by outcome, and the JVM's own
 * meters (memory, GC, threads, classes, CPU, uptime). Routes are the registered path templates; any
 * other path is counted as {@code unmatched}, so a scan of random URLs cannot grow the meter set.
 */
public final class ServiceMetrics {

    /** Latency histogram buckets: from a small spectrum (~0.1 ms) to the default time limit (30 s). */
    private static final Duration[] BUCKETS = {
        Duration.ofNanos(250_000), Duration.ofMillis(1), Duration.ofMillis(5), Duration.ofMillis(25),
        Duration.ofMillis(100), Duration.ofMillis(250), Duration.ofSeconds(1), Duration.ofMillis(2_500),
        Duration.ofSeconds(10), Duration.ofSeconds(30)};

    private final PrometheusMeterRegistry registry = new PrometheusMeterRegistry(PrometheusConfig.DEFAULT);
    private final Map<RequestKey, Timer> requestTimers = new ConcurrentHashMap<>();
    private final Map<ComputeKey, Timer> computeTimers = new ConcurrentHashMap<>();
    private final Map<String, Counter> counters = new ConcurrentHashMap<>();
    private final AtomicInteger inFlight = new AtomicInteger();

    ServiceMetrics() {
        new JvmMemoryMetrics().bindTo(registry);
        new JvmGcMetrics().bindTo(registry);
        new JvmThreadMetrics().bindTo(registry);
        new ClassLoaderMetrics().bindTo(registry);
        new ProcessorMetrics().bindTo(registry);
        new UptimeMetrics().bindTo(registry);
        Gauge.builder("http.server.requests.active", inFlight, AtomicInteger::get)
                .description("HTTP requests being served").register(registry);
    }

    /** Counts a request in flight until the returned guard is closed. */
    AtomicInteger inFlight() {
        return inFlight;
    }

    void gauge(String name, String description, Supplier<Number> value) {
        Gauge.builder(name, value).description(description).register(registry);
    }

    void request(String method, String route, int status, long nanos) {
        requestTimers.computeIfAbsent(new RequestKey(method, route, status), k -> Timer.builder("http.server.requests")
                .description("HTTP requests by route, method and status")
                .tags(Tags.of("method", method, "route", route, "status", String.valueOf(status)))
                .serviceLevelObjectives(BUCKETS)
                .register(registry)).record(nanos, TimeUnit.NANOSECONDS);
    }

    void compute(String endpoint, String outcome, long nanos) {
        computeTimers.computeIfAbsent(new ComputeKey(endpoint, outcome), k -> Timer.builder("statesum.compute")
                .description("time spent computing one job (reading, validating, engine, answer), by endpoint")
                .tags(Tags.of("endpoint", endpoint, "outcome", outcome))
                .serviceLevelObjectives(BUCKETS)
                .register(registry)).record(nanos, TimeUnit.NANOSECONDS);
    }

    /** A request timer's tags, as a key (no string built per request to find the timer). */
    private record RequestKey(String method, String route, int status) {
    }

    /** A compute timer's tags, as a key. */
    private record ComputeKey(String endpoint, String outcome) {
    }

    /** Counts a refused request: {@code overloaded}, {@code shutting-down} or {@code unauthorized}. */
    void rejected(String reason) {
        count("statesum.requests.rejected", "requests refused before any work", "reason", reason);
    }

    /** Counts a batch job: {@code answered}, {@code failed} (a problem line) or {@code cancelled}. */
    public void batchJob(String outcome) {
        count("statesum.batch.jobs", "batch jobs by outcome", "outcome", outcome);
    }

    private void count(String name, String description, String tag, String value) {
        counters.computeIfAbsent(name + ' ' + value, k -> Counter.builder(name).description(description)
                .tag(tag, value).register(registry)).increment();
    }

    /** The Prometheus text exposition (format 0.0.4). */
    String scrape() {
        return registry.scrape();
    }
}
