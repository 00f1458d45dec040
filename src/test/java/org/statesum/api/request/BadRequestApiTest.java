package org.statesum.api.request;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertFalse;

import io.restassured.response.Response;
import java.nio.charset.StandardCharsets;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.statesum.testing.LeakChecks;
import org.statesum.testing.TestServer;

/**
 * Every kind of bad body gives an RFC 9457 problem with the right 4xx status and names the bad
 * fields by JSON Pointer, all at once; no message shows a Java or parser class name.
 */
class BadRequestApiTest {

    /** A valid request with one part replaced: levels, unit, temperatures as given. */
    private static final String GOOD_LEVELS = "{\"energies\": [0, 1], \"degeneracies\": [1, 3]}";
    private static final String GOOD_T = "{\"values\": [10, 300]}";

    private final TestServer server = TestServer.shared();

    private static String request(String levels, String unit, String temperatures, String extra) {
        return LeakChecks.spectrumRequest(levels, unit, temperatures, extra);
    }

    static Stream<Arguments> unreadable() {
        return Stream.of(
                Arguments.of("not JSON at all", "temperatures please", ""),
                Arguments.of("an empty body", "", ""),
                Arguments.of("only white space", "  \n ", ""),
                Arguments.of("a truncated object", "{\"levels\": {\"energies\": [0, 1", "/levels/energies/1"),
                Arguments.of("two JSON values", request(GOOD_LEVELS, "\"K\"", GOOD_T, "") + " {}", ""),
                Arguments.of("a duplicate key", "{\"energyUnit\": \"K\", \"energyUnit\": \"eV\"}", "/energyUnit"),
                Arguments.of("a duplicate nested key",
                        "{\"levels\": {\"energies\": [1], \"energies\": [2]}}", "/levels/energies"),
                Arguments.of("a single-quoted string", "{'energyUnit': 'K'}", ""),
                Arguments.of("a leading zero", "{\"energyUnit\": 01}", "/energyUnit"),
                Arguments.of("a trailing comma", "{\"energyUnit\": \"K\",}", "/energyUnit"),
                Arguments.of("a comment", "{\"energyUnit\": \"K\" /* unit */}", "/energyUnit"));
    }

    @ParameterizedTest(name = "{0} is 400")
    @MethodSource("unreadable")
    void unreadableBodiesAre400(String what, String body, String pointer) {
        Response answer = post(body);
        answer.then().statusCode(400).contentType("application/problem+json")
                .body("type", equalTo("https://statesum.org/problems/unreadable-body"))
                .body("title", equalTo("Unreadable request body"))
                .body("status", equalTo(400))
                .body("errors", hasSize(1))
                .body("errors[0].pointer", equalTo(pointer));
        assertNoInternals(answer);
    }

    static Stream<Arguments> invalid() {
        return Stream.of(
                Arguments.of("NaN and Infinity tokens, every one named with the other bad fields",
                        request("{\"energies\": [0, NaN, Infinity], \"degeneracies\": [1, -Infinity, -1]}",
                                "\"Q\"", "{\"values\": [NaN]}", ", \"particles\": {\"count\": Infinity}"),
                        new String[] {"/levels/energies/1", "/levels/energies/2", "/levels/degeneracies/1",
                                "/levels/degeneracies/2", "/temperatures/values/0", "/particles/count",
                                "/particles/statistics", "/energyUnit"}),
                Arguments.of("a NaN where an object belongs", request("NaN", "\"K\"", GOOD_T, ""),
                        new String[] {"/levels"}),
                Arguments.of("a top-level NaN", "NaN", new String[] {""}),
                Arguments.of("1e400 literals", request("{\"energies\": [1e400, -1e400]}", "\"K\"",
                        "{\"start\": 1, \"stop\": 1e400, \"count\": 2}", ""),
                        new String[] {"/levels/energies/0", "/levels/energies/1", "/temperatures/stop"}),
                Arguments.of("strings for numbers", request("{\"energies\": [\"0\", 1], \"degeneracies\": [1, \"2\"]}",
                        "\"K\"", "{\"start\": \"1\", \"stop\": 2, \"count\": \"3\"}", ""),
                        new String[] {"/levels/energies/0", "/levels/degeneracies/1", "/temperatures/start",
                                "/temperatures/count"}),
                Arguments.of("negative and zero degeneracies",
                        request("{\"energies\": [0, 1, 2], \"degeneracies\": [-1, 0, 2]}", "\"K\"", GOOD_T, ""),
                        new String[] {"/levels/degeneracies/0", "/levels/degeneracies/1"}),
                Arguments.of("lengths that differ",
                        request("{\"energies\": [0, 1, 2], \"degeneracies\": [1, 2]}", "\"K\"", GOOD_T, ""),
                        new String[] {"/levels/degeneracies"}),
                Arguments.of("empty arrays", request("{\"energies\": []}", "\"K\"", "{\"values\": []}", ""),
                        new String[] {"/levels/energies", "/temperatures/values"}),
                Arguments.of("an unknown unit and output unit",
                        request(GOOD_LEVELS, "\"kelvin\"", GOOD_T, ", \"outputUnit\": \"Ry\""),
                        new String[] {"/energyUnit", "/outputUnit"}),
                Arguments.of("unknown fields at every level",
                        request("{\"energies\": [0], \"weights\": [1]}", "\"K\"",
                                "{\"values\": [1], \"unit\": \"K\"}", ", \"pressure\": 1, \"a/b~c\": 2"),
                        new String[] {"/levels/weights", "/temperatures/unit", "/pressure", "/a~1b~0c"}),
                Arguments.of("a negative temperature", request(GOOD_LEVELS, "\"K\"", "{\"values\": [300, -1]}", ""),
                        new String[] {"/temperatures/values/1"}),
                Arguments.of("start above stop", request(GOOD_LEVELS, "\"K\"",
                        "{\"start\": 300, \"stop\": 10, \"count\": 5}", ""), new String[] {"/temperatures/start"}),
                Arguments.of("count 0", request(GOOD_LEVELS, "\"K\"", "{\"start\": 1, \"stop\": 10, \"count\": 0}", ""),
                        new String[] {"/temperatures/count"}),
                Arguments.of("a fractional count", request(GOOD_LEVELS, "\"K\"",
                        "{\"start\": 1, \"stop\": 10, \"count\": 2.5}", ""), new String[] {"/temperatures/count"}),
                Arguments.of("a grid both listed and ranged", request(GOOD_LEVELS, "\"K\"",
                        "{\"values\": [1], \"start\": 1, \"stop\": 2, \"count\": 2}", ""), new String[] {"/temperatures"}),
                Arguments.of("both degeneracies and logDegeneracies", request(
                        "{\"energies\": [0, 1], \"degeneracies\": [1, -2], \"logDegeneracies\": [0, 0]}", "\"K\"",
                        GOOD_T, ""), new String[] {"/levels/logDegeneracies", "/levels/degeneracies/1"}),
                Arguments.of("0 particles", request(GOOD_LEVELS, "\"K\"", GOOD_T,
                        ", \"particles\": {\"count\": 0, \"statistics\": \"distinguishable\"}"),
                        new String[] {"/particles/count"}),
                Arguments.of("1.5 particles", request(GOOD_LEVELS, "\"K\"", GOOD_T,
                        ", \"particles\": {\"count\": 1.5, \"statistics\": \"distinguishable\"}"),
                        new String[] {"/particles/count"}),
                Arguments.of("1e31 particles and unknown statistics", request(GOOD_LEVELS, "\"K\"", GOOD_T,
                        ", \"particles\": {\"count\": 1e31, \"statistics\": \"bosons\"}"),
                        new String[] {"/particles/count", "/particles/statistics"}),
                Arguments.of("particles without their members", request(GOOD_LEVELS, "\"K\"", GOOD_T,
                        ", \"particles\": {}"), new String[] {"/particles/count", "/particles/statistics"}),
                Arguments.of("bad basis, output unit and include", request(GOOD_LEVELS, "\"K\"", GOOD_T,
                        ", \"basis\": \"molar\", \"outputUnit\": 3, \"include\": [\"populations\", \"entropy\"]"),
                        new String[] {"/basis", "/outputUnit", "/include/1"}),
                Arguments.of("include that is not an array", request(GOOD_LEVELS, "\"K\"", GOOD_T,
                        ", \"include\": \"populations\""), new String[] {"/include"}),
                Arguments.of("nulls for required members", request("null", "null", "null", ""),
                        new String[] {"/levels", "/energyUnit", "/temperatures"}),
                Arguments.of("every required member missing", "{}",
                        new String[] {"/levels", "/energyUnit", "/temperatures"}),
                Arguments.of("a top-level array", "[1, 2]", new String[] {""}),
                Arguments.of("a top-level number", "42", new String[] {""}),
                Arguments.of("a top-level string", "\"levels\"", new String[] {""}),
                Arguments.of("a top-level null", "null", new String[] {""}),
                Arguments.of("an energy far beyond any physical scale", request("{\"energies\": [0, 1e300]}",
                        "\"hartree\"", GOOD_T, ""), new String[] {"/levels/energies/1"}),
                Arguments.of("a temperature above the engine's range", request(GOOD_LEVELS, "\"K\"",
                        "{\"values\": [1e300]}", ""), new String[] {"/temperatures/values/0"}));
    }

    @ParameterizedTest(name = "{0} is 422")
    @MethodSource("invalid")
    void wellFormedButInvalidBodiesAre422NamingEveryBadField(String what, String body, String[] pointers) {
        Response answer = post(body);
        answer.then().statusCode(422).contentType("application/problem+json")
                .body("type", equalTo("https://statesum.org/problems/invalid-request"))
                .body("status", equalTo(422))
                .body("errors", hasSize(pointers.length))
                .body("errors.pointer", hasItems(pointers));
        assertNoInternals(answer);
    }

    static Stream<Arguments> mediaTypes() {
        return Stream.of(Arguments.of("text/plain"), Arguments.of("application/xml"),
                Arguments.of("application/jsonx"), Arguments.of("multipart/form-data; boundary=x"));
    }

    @ParameterizedTest(name = "Content-Type {0} is 415")
    @MethodSource("mediaTypes")
    void otherMediaTypesAre415(String mediaType) {
        server.request().contentType(mediaType)
                .body(request(GOOD_LEVELS, "\"K\"", GOOD_T, "").getBytes(StandardCharsets.UTF_8))
                .post("/v1/spectrum")
                .then().statusCode(415).contentType("application/problem+json")
                .body("type", equalTo("https://statesum.org/problems/unsupported-media-type"))
                .body("errors.pointer", hasItems(""));
    }

    @Test
    void aMissingContentTypeIs415() {
        server.request().body(request(GOOD_LEVELS, "\"K\"", GOOD_T, "").getBytes(StandardCharsets.UTF_8))
                .post("/v1/spectrum")
                .then().statusCode(415).contentType("application/problem+json")
                .body("detail", containsString("application/json"));
    }

    @Test
    void jsonWithCharsetParameterIsAccepted() {
        server.request().contentType("application/json; charset=UTF-8").body(request(GOOD_LEVELS, "\"K\"", GOOD_T, ""))
                .post("/v1/spectrum")
                .then().statusCode(200);
    }

    @Test
    void aTrailingValueIsNamedWithoutParserVocabulary() {
        post(request(GOOD_LEVELS, "\"K\"", GOOD_T, "") + "[]").then().statusCode(400)
                .body("detail", startsWith("the body holds more than one JSON value"))
                .body("detail", not(containsString("token")));
    }

    private Response post(String body) {
        return server.request().contentType("application/json").body(body).post("/v1/spectrum");
    }

    private static void assertNoInternals(Response answer) {
        LeakChecks.assertNoInternals(answer);
    }
}
