package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.statesum.api.request.BodyProblems;
import org.statesum.testing.LeakChecks;

/** Parser messages reach clients only without the parser's vocabulary. */
class BodyReaderTest {

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "Non-standard token 'NaN': enable `JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS` to allow | Non-standard token 'NaN'",
        "Unexpected end-of-input: expected close marker for Object (start marker at [Source: REDACTED "
                + "(`StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION` disabled); line: 1, column: 1]) "
                + "| Unexpected end-of-input: expected close marker for Object",
        "Trailing token (of type START_OBJECT) found after value (bound as `com.fasterxml.jackson.databind.JsonNode`): "
                + "not allowed as per `DeserializationFeature.FAIL_ON_TRAILING_TOKENS` | syntax error",
        "Unexpected character ('}' (code 125)): was expecting double-quote to start field name\\n at [Source: x] "
                + "| Unexpected character ('}' (code 125)): was expecting double-quote to start field name",
        "Cannot deserialize value of type `java.lang.Double` from String | syntax error",
        "Duplicate field 'levels' | Duplicate field 'levels'",
        "'' | syntax error"})
    void cleanKeepsWhatHelpsAndDropsInternals(String message, String expected) {
        String cleaned = BodyProblems.clean(message.replace("\\n", "\n"));
        assertEquals(expected, cleaned);
        assertFalse(LeakChecks.INTERNALS.matcher(cleaned).find(), cleaned);
    }

    @org.junit.jupiter.api.Test
    void aMissingMessageIsASyntaxError() {
        assertEquals("syntax error", BodyProblems.clean(null));
    }
}
