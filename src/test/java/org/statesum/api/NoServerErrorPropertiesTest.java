package org.statesum.api;

import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.response.Response;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.statesum.testing.TestServer;
import org.statesum.testing.LeakChecks;

/**
 * No body gets a 5xx: a valid request with one piece cut out or replaced by an arbitrary JSON
 * fragment (or garbage) is answered with 200 or a 4xx problem, and the contract filter checks the
 * shape of every answer.
 */
class NoServerErrorPropertiesTest {

    private static final String VALID = "{\"levels\": {\"energies\": [0, 1.5, 3], \"degeneracies\": [1, 2, 1]}, "
            + "\"energyUnit\": \"eV\", \"temperatures\": {\"start\": 0, \"stop\": 500, \"count\": 3}, "
            + "\"particles\": {\"count\": 10, \"statistics\": \"indistinguishable\"}, \"basis\": \"total\", "
            + "\"outputUnit\": \"kJ/mol\", \"include\": [\"populations\"]}";

    @Provide
    Arbitrary<String> fragments() {
        return Arbitraries.oneOf(
                Arbitraries.of("null", "true", "[]", "{}", "\"\"", "-0", "0", "1e400", "-1e-400", "NaN", "-Infinity",
                        "1e30", "4.9e-324", "1.7976931348623157e308", "[null]", "[[]]", "{\"values\": []}",
                        "\"per-particle\"", "\"eV\"", "[\"populations\", \"populations\"]", "\"\\u0000\"",
                        "9223372036854775808", "{\"count\": 1e30, \"statistics\": \"distinguishable\"}"),
                Arbitraries.doubles().map(d -> Double.isFinite(d) ? Double.toString(d) : "0"),
                Arbitraries.strings().ofMaxLength(12).map(s -> "\"" + s.replace("\\", "").replace("\"", "") + "\""),
                Arbitraries.strings().ofMaxLength(6));
    }

    @Provide
    Arbitrary<String> bodies() {
        // A span of the valid body replaced by a fragment.
        Arbitrary<Integer> start = Arbitraries.integers().between(0, VALID.length());
        Arbitrary<Integer> length = Arbitraries.integers().between(0, 12);
        return Combinators.combine(start, length, fragments()).as((from, n, fragment) ->
                VALID.substring(0, from) + fragment + VALID.substring(Math.min(VALID.length(), from + n)));
    }

    @Property(tries = 60)
    void noBodyGetsAServerError(@ForAll("bodies") String body) {
        Response answer = TestServer.shared().request().contentType("application/json").body(body)
                .post("/v1/spectrum");
        int status = answer.statusCode();
        assertTrue(status == 200 || status == 400 || status == 422, status + " for " + body);
        if (status != 200) {
            LeakChecks.assertNoInternals(answer);
        }
    }
}
