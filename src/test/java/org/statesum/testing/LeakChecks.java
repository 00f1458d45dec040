package org.statesum.testing;

import static org.junit.jupiter.api.Assertions.assertFalse;

import io.restassured.response.Response;
import java.util.regex.Pattern;

/** What no answer may show a client: the implementation's vocabulary (library names, stack frames). */
public final class LeakChecks {

    /** Words that would leak the implementation. */
    public static final Pattern INTERNALS = Pattern.compile(
            "jackson|fasterxml|javalin|jetty|java\\.|exception|feature|JsonNode|\\bat org\\.|`|START_OBJECT",
            Pattern.CASE_INSENSITIVE);

    private LeakChecks() {
    }

    public static void assertNoInternals(Response answer) {
        String body = answer.asString();
        assertFalse(INTERNALS.matcher(body).find(), () -> "internal vocabulary in " + body);
    }

    /** A spectrum request with its levels, energy unit and temperatures written out as given. */
    public static String spectrumRequest(String levels, String unit, String temperatures, String extra) {
        return "{\"levels\": " + levels + ", \"energyUnit\": " + unit + ", \"temperatures\": " + temperatures
                + extra + "}";
    }
}
