package org.statesum.api.request;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import java.io.IOException;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.statesum.api.config.ServiceConfig;

/**
 * The problems of a body that could not be read: what the JSON parser refused (syntax, a parser
 * limit, a second value) as a 400 with the JSON Pointer of where reading stopped and a message
 * cleaned of the parser's internals, and a body that stalled or arrived too slowly as a 408.
 */
public final class BodyProblems {

    /** Words that betray the parser's internals; a message containing one is replaced by a plain one. */
    private static final Pattern INTERNAL = Pattern.compile(
            "jackson|feature|java|class|source:|redacted|jsonnode|token \\(of type|`", Pattern.CASE_INSENSITIVE);
    /** The limit a constraint message names: "... exceeds the maximum allowed (32, from ...)". */
    private static final Pattern ALLOWED = Pattern.compile("maximum allowed \\((\\d+)");

    private BodyProblems() {
    }

    /** The 408 of a body that stalled or arrived too slowly (RFC 9110, section 15.5.9). */
    public static ProblemException tooSlow(String detail) {
        return new ProblemException(Problem.of("request-timeout", "Request body too slow", 408, detail,
                List.of(new FieldError("", detail))));
    }

    /** The 400 problem for a body the parser rejected or that could not be read (408 if it stalled). */
    public static ProblemException unreadable(IOException failure) {
        for (Throwable cause = failure; cause != null; cause = cause.getCause()) {
            if (cause instanceof java.util.concurrent.TimeoutException) {
                // Jetty's idle timeout for blocking reads (Operations sets it to STATESUM_BODY_TIMEOUT_MS)
                return tooSlow("no byte of the request body arrived for the body timeout ("
                        + ServiceConfig.PREFIX + "BODY_TIMEOUT_MS)");
            }
        }
        if (failure instanceof StreamConstraintsException e) {
            return ProblemException.unreadable("the body exceeds a parser limit: " + limitName(e), pointerOf(e));
        }
        if (failure instanceof JsonParseException e) {
            return ProblemException.unreadable("the body is not valid JSON at line " + e.getLocation().getLineNr()
                    + ", column " + e.getLocation().getColumnNr() + ": " + clean(e.getOriginalMessage()), pointerOf(e));
        }
        if (failure instanceof MismatchedInputException) {
            return ProblemException.unreadable("the body holds more than one JSON value; send exactly one object", "");
        }
        if (failure instanceof JsonProcessingException e) {
            return ProblemException.unreadable("the body is not valid JSON: " + clean(e.getOriginalMessage()),
                    pointerOf(e));
        }
        if (failure instanceof java.util.zip.ZipException) {
            return ProblemException.unreadable("the gzip body could not be decoded", "");
        }
        return ProblemException.unreadable("the body could not be read", "");
    }

    /** Which limit was hit, with its configured value as the parser reports it. */
    private static String limitName(StreamConstraintsException e) {
        String message = String.valueOf(e.getOriginalMessage());
        Matcher allowed = ALLOWED.matcher(message);
        String limit = allowed.find() ? allowed.group(1) : "the configured limit";
        String lower = message.toLowerCase(Locale.ROOT);
        if (lower.startsWith("document nesting")) {
            return "nesting deeper than " + limit + " levels (STATESUM_MAX_NESTING_DEPTH)";
        }
        if (lower.startsWith("name length")) {
            return "a member name longer than " + limit + " characters (STATESUM_MAX_STRING_LENGTH)";
        }
        if (lower.startsWith("string value length")) {
            return "a string longer than " + limit + " characters (STATESUM_MAX_STRING_LENGTH)";
        }
        if (lower.startsWith("number value length")) {
            return "a number longer than " + limit + " characters";
        }
        return "a body longer than " + limit + " bytes (STATESUM_MAX_BODY_BYTES)";
    }

    /**
     * The parser's message reduced to what a client can use: its first line, without advice on parser
     * features, source locations or type names; a message that still mentions internals becomes
     * "syntax error".
     */
    public static String clean(String message) {
        String text = message == null ? "" : message.split("\n", 2)[0];
        for (String cut : new String[] {": enable", "; enable", " (bound as", " (start marker at", " at [Source"}) {
            int at = text.indexOf(cut);
            text = at >= 0 ? text.substring(0, at) : text;
        }
        text = text.replaceAll("\\(for [^)]*\\)", "").replaceAll("\\[Source:[^]]*]", "").trim();
        return text.isEmpty() || INTERNAL.matcher(text).find() ? "syntax error" : text;
    }

    private static String pointerOf(JsonProcessingException e) {
        if (e.getProcessor() instanceof JsonParser parser && parser.getParsingContext() != null) {
            return parser.getParsingContext().pathAsPointer().toString();
        }
        return "";
    }
}
