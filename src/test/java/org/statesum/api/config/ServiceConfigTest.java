package org.statesum.api.config;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;

class ServiceConfigTest {

    @Test
    void anEmptyEnvironmentGivesTheDefaults() {
        assertEquals(ServiceConfig.defaults(), ServiceConfig.fromEnvironment(Map.of()));
        assertEquals(new ServiceConfig(8080, 64L << 20, 32, 4096, 2_000_000, 100_000, 1_000_000_000L, 1_000_000L),
                ServiceConfig.defaults());
    }

    @Test
    void blankValuesAndForeignVariablesAreIgnored() {
        assertEquals(ServiceConfig.defaults(), ServiceConfig.fromEnvironment(
                Map.of("STATESUM_PORT", "  ", "PORT", "1", "STATESUM_UNKNOWN", "x")));
    }

    @Test
    void everyLimitCanBeOverridden() {
        ServiceConfig config = ServiceConfig.fromEnvironment(Map.of(
                "STATESUM_PORT", "9090",
                "STATESUM_MAX_BODY_BYTES", "2048",
                "STATESUM_MAX_NESTING_DEPTH", " 8 ",
                "STATESUM_MAX_STRING_LENGTH", "100",
                "STATESUM_MAX_LEVELS", "10",
                "STATESUM_MAX_TEMPERATURES", "5",
                "STATESUM_COMPUTE_BUDGET", "20",
                "STATESUM_MAX_POPULATION_CELLS", "6"));
        assertEquals(new ServiceConfig(9090, 2048, 8, 100, 10, 5, 20, 6), config);
    }

    @Test
    void theStreamedBodyLimitIsSetApartFromTheTreeLimit() {
        assertEquals(256L << 20, ServiceConfig.defaults().maxStreamedBodyBytes());
        ServiceConfig config = ServiceConfig.fromEnvironment(Map.of("STATESUM_MAX_STREAMED_BODY_BYTES", "4096"));
        assertEquals(4096, config.maxStreamedBodyBytes());
        assertEquals(64L << 20, config.maxBodyBytes());
    }

    @Test
    void theBodyPaceIsReadAndCheckedLikeEveryOtherLimit() {
        OperationsConfig ops = ServiceConfig.fromEnvironment(Map.of("STATESUM_BODY_TIMEOUT_MS", "2500",
                "STATESUM_MIN_BODY_BYTES_PER_SECOND", "0")).operations();
        assertEquals(2_500, ops.bodyTimeoutMillis());
        assertEquals(0, ops.minBodyBytesPerSecond());
        assertEquals(10_000, OperationsConfig.defaults().bodyTimeoutMillis());
        assertEquals(16_384, OperationsConfig.defaults().minBodyBytesPerSecond());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ServiceConfig.fromEnvironment(
                Map.of("STATESUM_BODY_TIMEOUT_MS", "0", "STATESUM_MIN_BODY_BYTES_PER_SECOND", "-5")));
        assertTrue(e.getMessage().contains("STATESUM_BODY_TIMEOUT_MS"), e.getMessage());
        assertTrue(e.getMessage().contains("STATESUM_MIN_BODY_BYTES_PER_SECOND"), e.getMessage());
    }

    @Test
    void theListeningAddressAndThePerClientBodyCapAreRead() {
        assertEquals("", OperationsConfig.defaults().host(), "every interface by default");
        assertEquals(8, OperationsConfig.defaults().maxBodiesPerClient());
        OperationsConfig ops = ServiceConfig.fromEnvironment(Map.of("STATESUM_HOST", " 127.0.0.1 ",
                "STATESUM_MAX_BODIES_PER_CLIENT", "0")).operations();
        assertEquals("127.0.0.1", ops.host());
        assertEquals(0, ops.maxBodiesPerClient());
        assertEquals("::1", ServiceConfig.fromEnvironment(Map.of("STATESUM_HOST", "::1")).operations().host());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ServiceConfig.fromEnvironment(
                Map.of("STATESUM_HOST", "http://0.0.0.0:80/", "STATESUM_MAX_BODIES_PER_CLIENT", "-1")));
        assertTrue(e.getMessage().contains("STATESUM_HOST must be an IP address or a host name"), e.getMessage());
        assertTrue(e.getMessage().contains("STATESUM_MAX_BODIES_PER_CLIENT"), e.getMessage());
    }

    @Test
    void theShutdownGraceOutlastsTheTimeLimit() {
        // a direct job admitted just before SIGTERM can still finish inside the grace
        assertTrue(OperationsConfig.defaults().shutdownGraceMillis() > OperationsConfig.defaults().timeLimitMillis());
    }

    @Test
    void badValuesAreRejectedNamingEveryBadVariable() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () ->
                ServiceConfig.fromEnvironment(Map.of(
                        "STATESUM_PORT", "70000",
                        "STATESUM_MAX_BODY_BYTES", "40MiB",
                        "STATESUM_MAX_NESTING_DEPTH", "-1",
                        "STATESUM_MAX_STRING_LENGTH", "1.5",
                        "STATESUM_MAX_LEVELS", "0",
                        "STATESUM_MAX_TEMPERATURES", "1e3",
                        "STATESUM_COMPUTE_BUDGET", "99999999999999999999",
                        "STATESUM_MAX_POPULATION_CELLS", "lots")));
        for (String name : new String[] {"PORT", "MAX_BODY_BYTES", "MAX_NESTING_DEPTH", "MAX_STRING_LENGTH",
                "MAX_LEVELS", "MAX_TEMPERATURES", "COMPUTE_BUDGET", "MAX_POPULATION_CELLS"}) {
            assertTrue(e.getMessage().contains("STATESUM_" + name + " must be an integer"), name + ": " + e.getMessage());
        }
        assertTrue(e.getMessage().contains("got '40MiB'"), e.getMessage());
    }

    @Test
    void theDefaultsFitOneMillionLevelsOnAThousandTemperatures() {
        ServiceConfig d = ServiceConfig.defaults();
        int levels = 1_000_000;
        int temperatures = 1_000;
        assertTrue(d.maxLevels() >= levels);
        assertTrue(d.maxTemperatures() >= temperatures);
        assertTrue(d.computeBudget() >= (long) levels * temperatures);
        // The longest shortest-round-trip form of a double has 24 characters (sign, 17 digits, point,
        // "E-", three exponent digits), as Java and Python print it; with its comma, 25 bytes.
        assertEquals(24, Double.toString(-2.2250738585072014E-308).length());
        long worstBody = 2L * levels * 25 + 200; // energies and (log-)degeneracies, plus the rest
        assertTrue(worstBody <= d.maxBodyBytes(), worstBody + " > " + d.maxBodyBytes());
    }
}
