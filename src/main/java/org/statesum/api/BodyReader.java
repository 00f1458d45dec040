package org.statesum.api;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import io.javalin.http.Context;
import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Reads a request body into a JSON tree: 415 unless the media type is JSON, 413 beyond the size
 * limit (declared or actually sent), 400 for anything the parser will not accept (syntax, duplicate
 * keys, nesting, string or number limits), with the JSON Pointer of the place where reading stopped.
 * NaN and Infinity tokens are read; {@link FiniteNumbers} answers them with a 422.
 */
final class BodyReader {

    /** Words that betray the parser's internals; a message containing one is replaced by a plain one. */
    private static final Pattern INTERNAL = Pattern.compile(
            "jackson|feature|java|class|source:|redacted|jsonnode|token \\(of type|`", Pattern.CASE_INSENSITIVE);

    private final ObjectMapper mapper;
    private final ServiceConfig config;

    BodyReader(ObjectMapper mapper, ServiceConfig config) {
        this.mapper = mapper;
        this.config = config;
    }

    JsonNode read(Context ctx) {
        requireJson(ctx.contentType());
        long declared = ctx.contentLength();
        if (declared > config.maxBodyBytes()) {
            // A client that waits for "100 Continue" has sent nothing; one that did not is sending now
            // and would see a broken pipe instead of the answer, so a modest excess is read and dropped.
            if (!expectsContinue(ctx) && declared <= config.maxBodyBytes() + drainLimit()) {
                drain(ctx, declared);
            }
            throw tooLarge();
        }
        return parse(readBounded(ctx));
    }

    /** Parses a complete body; 400 for an empty body or anything the parser refuses. */
    JsonNode parse(byte[] body) {
        try {
            JsonNode root = body.length == 0 ? null : mapper.readTree(body);
            if (root == null || root.isMissingNode()) {
                throw ProblemException.unreadable("the request body is empty; send one JSON object", "");
            }
            return root;
        } catch (StreamConstraintsException e) {
            throw ProblemException.unreadable("the body exceeds a parser limit: " + limitName(e), pointerOf(e));
        } catch (JsonParseException e) {
            throw ProblemException.unreadable("the body is not valid JSON at line " + e.getLocation().getLineNr()
                    + ", column " + e.getLocation().getColumnNr() + ": " + clean(e.getOriginalMessage()), pointerOf(e));
        } catch (MismatchedInputException e) {
            throw ProblemException.unreadable("the body holds more than one JSON value; send exactly one object", "");
        } catch (JsonProcessingException e) {
            throw ProblemException.unreadable("the body is not valid JSON: " + clean(e.getOriginalMessage()),
                    pointerOf(e));
        } catch (IOException e) {
            throw ProblemException.unreadable("the request body could not be read", "");
        }
    }

    /** Reads at most the limit plus one byte, so a body without Content-Length cannot exhaust memory. */
    private byte[] readBounded(Context ctx) {
        long limit = config.maxBodyBytes();
        try (InputStream in = ctx.req().getInputStream()) {
            byte[] body = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, limit + 1));
            if (body.length > limit) {
                drainStream(in, drainLimit());
                throw tooLarge();
            }
            return body;
        } catch (IOException e) {
            throw ProblemException.unreadable("the request body could not be read", "");
        }
    }

    /** How much of an oversized body is read and dropped so that the client gets the 413: the limit again. */
    private long drainLimit() {
        return config.maxBodyBytes();
    }

    private static boolean expectsContinue(Context ctx) {
        String expect = ctx.header("Expect");
        return expect != null && expect.trim().equalsIgnoreCase("100-continue");
    }

    private static void drain(Context ctx, long bytes) {
        try (InputStream in = ctx.req().getInputStream()) {
            drainStream(in, bytes);
        } catch (IOException e) {
            // the client went away; the 413 is written if it still can be
        }
    }

    /** Reads and drops up to {@code bytes} bytes, 8 KiB at a time. */
    private static void drainStream(InputStream in, long bytes) {
        byte[] sink = new byte[8192];
        long left = bytes;
        try {
            for (int n; left > 0 && (n = in.read(sink, 0, (int) Math.min(sink.length, left))) > 0; ) {
                left -= n;
            }
        } catch (IOException e) {
            // the client went away; nothing more to drop
        }
    }

    private ProblemException tooLarge() {
        long limit = config.maxBodyBytes();
        return new ProblemException(Problem.of("body-too-large", "Request body too large", 413,
                "the request body exceeds the limit of " + limit + " bytes (STATESUM_MAX_BODY_BYTES)",
                List.of(new FieldError("", "body larger than " + limit + " bytes"))));
    }

    static void requireJson(String contentType) {
        String type = contentType == null ? "" : contentType.split(";", 2)[0].trim().toLowerCase(Locale.ROOT);
        if (!type.equals("application/json")) {
            throw new ProblemException(Problem.of("unsupported-media-type", "Unsupported media type", 415,
                    "send the body as application/json (got '" + (contentType == null ? "" : contentType) + "')",
                    List.of(new FieldError("", "Content-Type must be application/json"))));
        }
    }

    private String limitName(StreamConstraintsException e) {
        String message = String.valueOf(e.getOriginalMessage()).toLowerCase(Locale.ROOT);
        if (message.startsWith("document nesting")) {
            return "nesting deeper than " + config.maxNestingDepth() + " levels (STATESUM_MAX_NESTING_DEPTH)";
        }
        if (message.startsWith("name length")) {
            return "a member name longer than " + config.maxStringLength()
                    + " characters (STATESUM_MAX_STRING_LENGTH)";
        }
        if (message.startsWith("string value length")) {
            return "a string longer than " + config.maxStringLength() + " characters (STATESUM_MAX_STRING_LENGTH)";
        }
        if (message.startsWith("number value length")) {
            return "a number longer than " + JsonSupport.MAX_NUMBER_LENGTH + " characters";
        }
        return "a body longer than " + config.maxBodyBytes() + " bytes (STATESUM_MAX_BODY_BYTES)";
    }

    /**
     * The parser's message reduced to what a client can use: its first line, without advice on parser
     * features, source locations or type names; a message that still mentions internals becomes
     * "syntax error".
     */
    static String clean(String message) {
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
