package org.statesum.api.config;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * The settings that keep the service up under load and let operators control access, read from
 * {@code STATESUM_*} environment variables; the README lists every one with its default.
 *
 * @param maxConcurrentJobs compute jobs running at once, direct or in a batch ({@code MAX_CONCURRENT_JOBS},
 *        the number of processors)
 * @param maxQueuedRequests requests admitted beyond those computing; more get 503 at once
 *        ({@code MAX_QUEUED_REQUESTS}, 32)
 * @param queueWaitMillis longest wait of an admitted request for a compute slot before 503
 *        ({@code QUEUE_WAIT_MS}, 2 000)
 * @param timeLimitMillis compute time limit of one job; a job over it stops with a 422 problem
 *        ({@code TIME_LIMIT_MS}, 30 000)
 * @param retryAfterSeconds the {@code Retry-After} of a 503 ({@code RETRY_AFTER_SECONDS}, 1)
 * @param maxBatchJobs most jobs in one batch ({@code MAX_BATCH_JOBS}, 10 000)
 * @param batchParallelism jobs of one batch computed at once ({@code BATCH_PARALLELISM}, the number of
 *        processors)
 * @param batchTimeLimitMillis wall-clock limit of a whole batch; jobs not finished by then answer a
 *        problem line ({@code BATCH_TIME_LIMIT_MS}, 600 000)
 * @param shutdownGraceMillis how long a stopping service waits for work in flight before it cancels
 *        what is left (a 503 {@code shutting-down} problem, a problem line per unfinished batch job)
 *        ({@code SHUTDOWN_GRACE_MS}, 40 000: longer than the default time limit, so that any direct job
 *        admitted before SIGTERM can finish)
 * @param tokens bearer tokens that grant access; none means no authentication ({@code AUTH_TOKENS},
 *        comma-separated, and {@code AUTH_TOKENS_FILE}, one a line)
 * @param corsOrigins browser origins allowed to call the service, or {@code *}; none means no CORS
 *        ({@code CORS_ORIGINS}, comma-separated)
 * @param accessLog whether to write one log line per request ({@code ACCESS_LOG}, true)
 * @param bodyTimeoutMillis longest wait for the next byte of a request body, and the grace before
 *        its pace is checked ({@code BODY_TIMEOUT_MS}, 10 000)
 * @param minBodyBytesPerSecond the slowest average pace a body may arrive at once the grace is over,
 *        0 for no check ({@code MIN_BODY_BYTES_PER_SECOND}, 16 384)
 * @param memoryBudgetBytes the memory the bodies and answers of the requests in flight may take at
 *        once, a body counted {@code MemoryBudget.TREE_FACTOR} (server) times its size when parsed whole
 *        and {@code MemoryBudget.STREAMED_FACTOR} times when streamed; beyond it 503
 *        ({@code MEMORY_BUDGET_BYTES}, a quarter of the maximum heap: the rest holds the jobs' own arrays)
 * @param maxBodiesPerClient request bodies one client address may be sending at once; more get a 429
 *        problem at once, so that a client that sends slowly on many connections cannot hold the
 *        server's threads ({@code MAX_BODIES_PER_CLIENT}, 8; 0 for no cap)
 * @param host the address the service listens on, empty for every interface ({@code HOST}, empty;
 *        {@code 127.0.0.1} for loopback only, or the address of one interface)
 */
public record OperationsConfig(
        int maxConcurrentJobs,
        int maxQueuedRequests,
        long queueWaitMillis,
        long timeLimitMillis,
        int retryAfterSeconds,
        int maxBatchJobs,
        int batchParallelism,
        long batchTimeLimitMillis,
        long shutdownGraceMillis,
        BearerTokens tokens,
        List<String> corsOrigins,
        boolean accessLog,
        long bodyTimeoutMillis,
        long minBodyBytesPerSecond,
        long memoryBudgetBytes,
        int maxBodiesPerClient,
        String host) {

    /** An IPv4 or IPv6 literal or a DNS name (letters, digits, dots, hyphens, colons, brackets stripped). */
    private static final java.util.regex.Pattern HOST = java.util.regex.Pattern.compile("[A-Za-z0-9.:-]{1,253}");

    public OperationsConfig {
        corsOrigins = List.copyOf(corsOrigins);
    }

    /** A copy listening on another address. */
    public OperationsConfig withHost(String newHost) {
        return new OperationsConfig(maxConcurrentJobs, maxQueuedRequests, queueWaitMillis, timeLimitMillis,
                retryAfterSeconds, maxBatchJobs, batchParallelism, batchTimeLimitMillis, shutdownGraceMillis, tokens,
                corsOrigins, accessLog, bodyTimeoutMillis, minBodyBytesPerSecond, memoryBudgetBytes, maxBodiesPerClient,
                newHost);
    }

    /** A copy with another cap on the bodies one client address may be sending at once. */
    public OperationsConfig withBodiesPerClient(int bodies) {
        return new OperationsConfig(maxConcurrentJobs, maxQueuedRequests, queueWaitMillis, timeLimitMillis,
                retryAfterSeconds, maxBatchJobs, batchParallelism, batchTimeLimitMillis, shutdownGraceMillis, tokens,
                corsOrigins, accessLog, bodyTimeoutMillis, minBodyBytesPerSecond, memoryBudgetBytes, bodies, host);
    }

    /** A copy with another shutdown grace. */
    public OperationsConfig withShutdownGrace(long millis) {
        return new OperationsConfig(maxConcurrentJobs, maxQueuedRequests, queueWaitMillis, timeLimitMillis,
                retryAfterSeconds, maxBatchJobs, batchParallelism, batchTimeLimitMillis, millis, tokens,
                corsOrigins, accessLog, bodyTimeoutMillis, minBodyBytesPerSecond, memoryBudgetBytes, maxBodiesPerClient,
                host);
    }

    /** The defaults: no authentication, no CORS, limits scaled to the processors. */
    public static OperationsConfig defaults() {
        int cores = Runtime.getRuntime().availableProcessors();
        return new OperationsConfig(cores, 32, 2_000, 30_000, 1, 10_000, cores, 600_000, 40_000,
                BearerTokens.none(), List.of(), true, 10_000, 16_384, Runtime.getRuntime().maxMemory() / 4, 8, "");
    }

    /** A copy with other concurrency limits (tests and benchmarks). */
    public OperationsConfig withConcurrency(int jobs, int queued, long queueWait) {
        return new OperationsConfig(jobs, queued, queueWait, timeLimitMillis, retryAfterSeconds, maxBatchJobs,
                Math.min(batchParallelism, jobs), batchTimeLimitMillis, shutdownGraceMillis, tokens, corsOrigins,
                accessLog, bodyTimeoutMillis, minBodyBytesPerSecond, memoryBudgetBytes, maxBodiesPerClient, host);
    }

    /** A copy with another job time limit. */
    public OperationsConfig withTimeLimit(long millis) {
        return new OperationsConfig(maxConcurrentJobs, maxQueuedRequests, queueWaitMillis, millis,
                retryAfterSeconds, maxBatchJobs, batchParallelism, batchTimeLimitMillis, shutdownGraceMillis, tokens,
                corsOrigins, accessLog, bodyTimeoutMillis, minBodyBytesPerSecond, memoryBudgetBytes, maxBodiesPerClient, host);
    }

    /** A copy with other access rules. */
    public OperationsConfig withAccess(BearerTokens newTokens, List<String> origins) {
        return new OperationsConfig(maxConcurrentJobs, maxQueuedRequests, queueWaitMillis, timeLimitMillis,
                retryAfterSeconds, maxBatchJobs, batchParallelism, batchTimeLimitMillis, shutdownGraceMillis,
                newTokens, origins, accessLog, bodyTimeoutMillis, minBodyBytesPerSecond, memoryBudgetBytes, maxBodiesPerClient, host);
    }

    /** A copy with another batch parallelism. */
    public OperationsConfig withBatchParallelism(int parallelism) {
        return new OperationsConfig(maxConcurrentJobs, maxQueuedRequests, queueWaitMillis, timeLimitMillis,
                retryAfterSeconds, maxBatchJobs, parallelism, batchTimeLimitMillis, shutdownGraceMillis, tokens,
                corsOrigins, accessLog, bodyTimeoutMillis, minBodyBytesPerSecond, memoryBudgetBytes, maxBodiesPerClient, host);
    }

    /** A copy with another pace for request bodies. */
    public OperationsConfig withBodyPace(long timeoutMillis, long bytesPerSecond) {
        return new OperationsConfig(maxConcurrentJobs, maxQueuedRequests, queueWaitMillis, timeLimitMillis,
                retryAfterSeconds, maxBatchJobs, batchParallelism, batchTimeLimitMillis, shutdownGraceMillis, tokens,
                corsOrigins, accessLog, timeoutMillis, bytesPerSecond, memoryBudgetBytes, maxBodiesPerClient, host);
    }

    /** A copy with another memory budget for request bodies. */
    public OperationsConfig withMemoryBudget(long bytes) {
        return new OperationsConfig(maxConcurrentJobs, maxQueuedRequests, queueWaitMillis, timeLimitMillis,
                retryAfterSeconds, maxBatchJobs, batchParallelism, batchTimeLimitMillis, shutdownGraceMillis, tokens,
                corsOrigins, accessLog, bodyTimeoutMillis, minBodyBytesPerSecond, bytes, maxBodiesPerClient, host);
    }

    /** Reads the settings, adding a sentence to {@code problems} for every bad variable. */
    static OperationsConfig fromEnvironment(Map<String, String> env, List<String> problems) {
        OperationsConfig d = defaults();
        int jobs = (int) ServiceConfig.read(env, "MAX_CONCURRENT_JOBS", d.maxConcurrentJobs, 1, 4096, problems);
        return new OperationsConfig(
                jobs,
                (int) ServiceConfig.read(env, "MAX_QUEUED_REQUESTS", d.maxQueuedRequests, 0, 100_000, problems),
                ServiceConfig.read(env, "QUEUE_WAIT_MS", d.queueWaitMillis, 0, 3_600_000, problems),
                ServiceConfig.read(env, "TIME_LIMIT_MS", d.timeLimitMillis, 1, 86_400_000, problems),
                (int) ServiceConfig.read(env, "RETRY_AFTER_SECONDS", d.retryAfterSeconds, 0, 3600, problems),
                (int) ServiceConfig.read(env, "MAX_BATCH_JOBS", d.maxBatchJobs, 1, 1_000_000, problems),
                (int) ServiceConfig.read(env, "BATCH_PARALLELISM", Math.min(jobs, d.batchParallelism), 1, 4096,
                        problems),
                ServiceConfig.read(env, "BATCH_TIME_LIMIT_MS", d.batchTimeLimitMillis, 1, 86_400_000, problems),
                ServiceConfig.read(env, "SHUTDOWN_GRACE_MS", d.shutdownGraceMillis, 0, 3_600_000, problems),
                tokens(env, problems),
                list(env.get(ServiceConfig.PREFIX + "CORS_ORIGINS")),
                !"false".equalsIgnoreCase(String.valueOf(env.get(ServiceConfig.PREFIX + "ACCESS_LOG")).trim()),
                ServiceConfig.read(env, "BODY_TIMEOUT_MS", d.bodyTimeoutMillis, 100, 3_600_000, problems),
                ServiceConfig.read(env, "MIN_BODY_BYTES_PER_SECOND", d.minBodyBytesPerSecond, 0, 1L << 40, problems),
                ServiceConfig.read(env, "MEMORY_BUDGET_BYTES", d.memoryBudgetBytes, 1L << 20, 1L << 50, problems),
                (int) ServiceConfig.read(env, "MAX_BODIES_PER_CLIENT", d.maxBodiesPerClient, 0, 100_000, problems),
                host(env, d.host, problems));
    }

    /** The address to listen on: an IP literal or a host name; no scheme, port or path. */
    private static String host(Map<String, String> env, String fallback, List<String> problems) {
        String raw = env.get(ServiceConfig.PREFIX + "HOST");
        if (raw == null || raw.isBlank()) {
            return fallback;
        }
        String host = raw.trim();
        if (!HOST.matcher(host).matches()) {
            problems.add(ServiceConfig.PREFIX + "HOST must be an IP address or a host name, got '" + raw + "'");
            return fallback;
        }
        return host;
    }

    private static BearerTokens tokens(Map<String, String> env, List<String> problems) {
        List<String> tokens = new ArrayList<>(list(env.get(ServiceConfig.PREFIX + "AUTH_TOKENS")));
        String file = env.get(ServiceConfig.PREFIX + "AUTH_TOKENS_FILE");
        if (file != null && !file.isBlank()) {
            try {
                Files.readAllLines(Path.of(file.trim()), StandardCharsets.UTF_8).stream().map(String::trim)
                        .filter(line -> !line.isEmpty() && !line.startsWith("#")).forEach(tokens::add);
            } catch (IOException | RuntimeException e) {
                problems.add(ServiceConfig.PREFIX + "AUTH_TOKENS_FILE names a file that cannot be read: " + file);
            }
        }
        for (String token : tokens) {
            if (!BearerTokens.wellFormed(token)) {
                problems.add("a bearer token must be 16 to 512 characters of A-Z a-z 0-9 - . _ ~ + / =");
                return BearerTokens.none();
            }
        }
        return BearerTokens.of(tokens);
    }

    private static List<String> list(String raw) {
        if (raw == null || raw.isBlank()) {
            return List.of();
        }
        return Arrays.stream(raw.split(",")).map(String::trim).filter(s -> !s.isEmpty()).toList();
    }
}
