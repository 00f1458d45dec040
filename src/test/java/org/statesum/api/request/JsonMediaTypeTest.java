package org.statesum.api.request;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Which Content-Type values a JSON body may carry (RFC 8259 section 8.1, RFC 9110 sections 5.6.6, 8.3). */
class JsonMediaTypeTest {

    @ParameterizedTest
    @ValueSource(strings = {
        "application/json",
        "APPLICATION/JSON",
        "Application/Json ",
        "application/json; charset=utf-8",
        "application/json;charset=UTF-8",
        "application/json ; charset = \"utf-8\"",
        "application/json; charset=us-ascii",
        "application/json;",
        "application/json;;",
        "application/json; boundary=x",
        "application/json; profile=\"https://example.org/a;b\"",
        "application/json; charset=utf-8; charset=UTF-8",
    })
    void accepted(String contentType) {
        assertDoesNotThrow(() -> JsonMediaType.require(contentType));
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "application/json; charset=latin-1",
        "application/json; charset=foo",
        "application/json; charset=UTF-7",
        "application/json; charset=iso-8859-1",
        "application/json; charset=utf-16",
        "application/json; charset=",
        "application/json; charset=\"\"",
        "application/json; charset=utf-8; charset=latin-1",
        "application/json; charset",
        "application/json; =utf-8",
    })
    void refusedNamingTheParameter(String contentType) {
        ProblemException e = assertThrows(ProblemException.class, () -> JsonMediaType.require(contentType));
        assertEquals(415, e.problem().status());
        assertEquals("", e.problem().errors().get(0).pointer());
        assertTrue(e.problem().errors().get(0).message().contains("charset")
                || e.problem().errors().get(0).message().contains("parameter"), e.problem().toString());
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "text/plain", "application/problem+json", "application/jsonx", "json",
        "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", "application/json-seq",
        "\"application/json\"", "application/json, text/plain"})
    void otherMediaTypesAreRefused(String contentType) {
        ProblemException e = assertThrows(ProblemException.class, () -> JsonMediaType.require(contentType));
        assertEquals(415, e.problem().status());
        assertEquals("Content-Type must be application/json", e.problem().errors().get(0).message());
    }

    @org.junit.jupiter.api.Test
    void aMissingContentTypeIsRefused() {
        assertEquals(415, assertThrows(ProblemException.class, () -> JsonMediaType.require(null)).problem().status());
    }
}
