package org.statesum.api.config;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Service settings, read from environment variables prefixed {@code STATESUM_}. Every limit that
 * protects the service is here, with its default; the README lists them.
 *
 * @param port HTTP port ({@code STATESUM_PORT}, 8080; 0 picks a free port)
 * @param maxBodyBytes largest request body after any gzip decoding, for the endpoints that read the
 *        whole body into a JSON tree ({@code STATESUM_MAX_BODY_BYTES}, 64 MiB): 413 beyond. A double
 *        takes at most 25 bytes in compact JSON (24 characters and a comma), so one million levels with
 *        energies and degeneracies at full precision (2 x 25 MB) fit
 * @param maxNestingDepth deepest JSON nesting ({@code STATESUM_MAX_NESTING_DEPTH}, 32)
 * @param maxStringLength longest JSON string ({@code STATESUM_MAX_STRING_LENGTH}, 4096 chars)
 * @param maxLevels most levels in one level set ({@code STATESUM_MAX_LEVELS}, 2 000 000)
 * @param maxTemperatures most temperatures in one grid ({@code STATESUM_MAX_TEMPERATURES}, 100 000)
 * @param computeBudget most (level, temperature) pairs in one job ({@code STATESUM_COMPUTE_BUDGET}, 1e9:
 *        one million levels on a thousand temperatures)
 * @param maxPopulationCells most (level, temperature) populations returned
 *        ({@code STATESUM_MAX_POPULATION_CELLS}, 1 000 000)
 * @param operations overload limits, time limits, batch limits, access control and logging
 *        ({@link OperationsConfig})
 * @param maxStreamedBodyBytes largest body, after gzip decoding, of the endpoints that parse it
 *        incrementally into arrays, /v1/sampled ({@code STATESUM_MAX_STREAMED_BODY_BYTES}, 256 MiB)
 */
public record ServiceConfig(
        int port,
        long maxBodyBytes,
        int maxNestingDepth,
        int maxStringLength,
        int maxLevels,
        int maxTemperatures,
        long computeBudget,
        long maxPopulationCells,
        OperationsConfig operations,
        long maxStreamedBodyBytes) {

    public static final String PREFIX = "STATESUM_";

    /** Default limit of streamed bodies: a 10 x 1e6 reduced-potential matrix at full precision (190 MB). */
    public static final long DEFAULT_MAX_STREAMED_BODY_BYTES = 256L << 20;

    /** The settings above with the default streamed-body limit (or the tree limit, if larger). */
    public ServiceConfig(int port, long maxBodyBytes, int maxNestingDepth, int maxStringLength, int maxLevels,
            int maxTemperatures, long computeBudget, long maxPopulationCells, OperationsConfig operations) {
        this(port, maxBodyBytes, maxNestingDepth, maxStringLength, maxLevels, maxTemperatures, computeBudget,
                maxPopulationCells, operations, Math.max(maxBodyBytes, DEFAULT_MAX_STREAMED_BODY_BYTES));
    }

    /** The settings above with the default operations settings. */
    public ServiceConfig(int port, long maxBodyBytes, int maxNestingDepth, int maxStringLength, int maxLevels,
            int maxTemperatures, long computeBudget, long maxPopulationCells) {
        this(port, maxBodyBytes, maxNestingDepth, maxStringLength, maxLevels, maxTemperatures, computeBudget,
                maxPopulationCells, OperationsConfig.defaults());
    }

    /** The defaults, on port 8080. */
    public static ServiceConfig defaults() {
        return new ServiceConfig(8080, 64L << 20, 32, 4096, 2_000_000, 100_000, 1_000_000_000L, 1_000_000L);
    }

    /** A copy listening on another port (0 for any free port, as tests use). */
    public ServiceConfig withPort(int newPort) {
        return new ServiceConfig(newPort, maxBodyBytes, maxNestingDepth, maxStringLength, maxLevels,
                maxTemperatures, computeBudget, maxPopulationCells, operations, maxStreamedBodyBytes);
    }

    /** A copy with other operations settings. */
    public ServiceConfig withOperations(OperationsConfig newOperations) {
        return new ServiceConfig(port, maxBodyBytes, maxNestingDepth, maxStringLength, maxLevels,
                maxTemperatures, computeBudget, maxPopulationCells, newOperations, maxStreamedBodyBytes);
    }

    /**
     * Reads the settings from an environment map, falling back to the defaults.
     *
     * @throws IllegalArgumentException naming every variable that is not a number in its range
     */
    public static ServiceConfig fromEnvironment(Map<String, String> env) {
        ServiceConfig d = defaults();
        List<String> problems = new ArrayList<>();
        ServiceConfig config = new ServiceConfig(
                (int) read(env, "PORT", d.port, 0, 65535, problems),
                read(env, "MAX_BODY_BYTES", d.maxBodyBytes, 1024, Integer.MAX_VALUE - 8, problems),
                (int) read(env, "MAX_NESTING_DEPTH", d.maxNestingDepth, 4, 1000, problems),
                (int) read(env, "MAX_STRING_LENGTH", d.maxStringLength, 64, 1 << 24, problems),
                (int) read(env, "MAX_LEVELS", d.maxLevels, 1, 50_000_000, problems),
                (int) read(env, "MAX_TEMPERATURES", d.maxTemperatures, 1, 10_000_000, problems),
                read(env, "COMPUTE_BUDGET", d.computeBudget, 1, Long.MAX_VALUE / 2, problems),
                read(env, "MAX_POPULATION_CELLS", d.maxPopulationCells, 0, 100_000_000, problems),
                OperationsConfig.fromEnvironment(env, problems),
                read(env, "MAX_STREAMED_BODY_BYTES", d.maxStreamedBodyBytes, 1024, Integer.MAX_VALUE - 8, problems));
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException(String.join("; ", problems));
        }
        return config;
    }

    static long read(Map<String, String> env, String name, long fallback, long min, long max,
            List<String> problems) {
        String raw = env.get(PREFIX + name);
        if (raw == null || raw.isBlank()) {
            return fallback;
        }
        try {
            long value = Long.parseLong(raw.trim());
            if (value >= min && value <= max) {
                return value;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        problems.add(PREFIX + name + " must be an integer from " + min + " to " + max + ", got '" + raw + "'");
        return fallback;
    }
}
