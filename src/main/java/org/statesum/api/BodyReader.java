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
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.GZIPInputStream;

/**
 * Reads a request body into a JSON tree: 415 unless the media type is JSON, 413 beyond the size
 * limit (declared or actually sent), 400 for anything the parser will not accept (syntax, duplicate
 * keys, nesting, string or number limits), with the JSON Pointer of the place where reading stopped.
 * NaN and Infinity tokens are read; {@link FiniteNumbers} answers them with a 422. A body sent with
 * {@code Content-Encoding: gzip} is inflated, and the limit applies to the inflated size.
 */
final class BodyReader {

    /** Largest array the JVM allocates reliably. */
    private static final long MAX_ARRAY_BYTES = Integer.MAX_VALUE - 8;
    /** Inflater input buffer: large enough to keep the inflater busy on a multi-megabyte body. */
    private static final int GZIP_BUFFER_BYTES = 1 << 16;
    /** Words that betray the parser's internals; a message containing one is replaced by a plain one. */
    private static final Pattern INTERNAL = Pattern.compile(
            "jackson|feature|java|class|source:|redacted|jsonnode|token \\(of type|`", Pattern.CASE_INSENSITIVE);
    /** The limit a constraint message names: "... exceeds the maximum allowed (32, from ...)". */
    private static final Pattern ALLOWED = Pattern.compile("maximum allowed \\((\\d+)");

    private final ObjectMapper mapper;
    /** For bodies read whole and parsed into a tree (their memory is a multiple of their size). */
    private final Limit treeLimit;
    /** For bodies parsed incrementally into arrays (/v1/sampled). */
    private final Limit streamLimit;
    /** The grace before a body's pace is checked, and the slowest pace allowed after it (0: none). */
    private final long bodyTimeoutMillis;
    private final long minBodyBytesPerSecond;

    /** A size limit and the variable that sets it, for the 413 message. */
    private record Limit(long bytes, String variable) {
    }

    BodyReader(ObjectMapper mapper, ServiceConfig config) {
        this.mapper = mapper;
        this.treeLimit = new Limit(config.maxBodyBytes(), ServiceConfig.PREFIX + "MAX_BODY_BYTES");
        this.streamLimit = new Limit(config.maxStreamedBodyBytes(), ServiceConfig.PREFIX + "MAX_STREAMED_BODY_BYTES");
        this.bodyTimeoutMillis = config.operations().bodyTimeoutMillis();
        this.minBodyBytesPerSecond = config.operations().minBodyBytesPerSecond();
    }

    JsonNode read(Context ctx) {
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
        } catch (IOException e) {
            throw unreadable(e);
        }
    }

    /**
     * The body as a stream for endpoints that parse it incrementally: the media type checked, a gzip
     * body ({@code Content-Encoding: gzip}) inflated on the fly, and at most the size limit read after
     * decoding (413 beyond, so a small compressed body cannot expand without bound). Any other
     * content coding is refused with 415 (RFC 9110, section 15.5.16).
     */
    InputStream openStreamed(Context ctx) {
        return open(ctx, streamLimit);
    }

    private InputStream open(Context ctx, Limit limit) {
        long maxBodyBytes = limit.bytes();
        requireJson(ctx.contentType());
        try {
            InputStream raw = paced(ctx.req().getInputStream());
            long declared = ctx.contentLength();
            if (declared > maxBodyBytes) {
                // A client that waits for "100 Continue" has sent nothing; one that did not is sending
                // now and would see a broken pipe instead of the answer, so a modest excess is dropped.
                if (!expectsContinue(ctx) && declared <= 2 * maxBodyBytes) {
                    drain(raw, declared);
                }
                throw tooLarge(limit);
            }
            InputStream in = raw;
            String coding = ctx.header("Content-Encoding");
            String name = coding == null ? "identity" : coding.trim().toLowerCase(Locale.ROOT);
            if (name.equals("gzip") || name.equals("x-gzip")) {
                in = new GZIPInputStream(raw, GZIP_BUFFER_BYTES);
            } else if (!name.equals("identity") && !name.isEmpty()) {
                throw new ProblemException(Problem.of("unsupported-media-type", "Unsupported content coding", 415,
                        "send the body uncompressed or with Content-Encoding: gzip (got '" + coding + "')",
                        List.of(new FieldError("", "Content-Encoding must be gzip or absent"))));
            }
            return new LimitedInputStream(in, maxBodyBytes, () -> {
                drain(raw, maxBodyBytes);
                return tooLarge(limit);
            });
        } catch (IOException e) {
            throw ProblemException.unreadable("the gzip body could not be decoded", "");
        }
    }

    /** The body stream held to the minimum pace, when one is set. */
    private InputStream paced(InputStream raw) {
        if (minBodyBytesPerSecond <= 0) {
            return raw;
        }
        return new PacedInputStream(raw, bodyTimeoutMillis * 1_000_000L, minBodyBytesPerSecond, System::nanoTime,
                () -> tooSlow("the request body arrived at less than " + minBodyBytesPerSecond
                        + " bytes/s after " + bodyTimeoutMillis + " ms (" + ServiceConfig.PREFIX
                        + "MIN_BODY_BYTES_PER_SECOND)"));
    }

    /** The 408 of a body that stalled or arrived too slowly (RFC 9110, section 15.5.9). */
    static ProblemException tooSlow(String detail) {
        return new ProblemException(Problem.of("request-timeout", "Request body too slow", 408, detail,
                List.of(new FieldError("", detail))));
    }

    /** The 400 problem for a body the parser rejected or that could not be read (408 if it stalled). */
    static ProblemException unreadable(IOException failure) {
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

    /** Reads at most the limit plus one byte, so a body without Content-Length cannot exhaust memory. */
    private byte[] readBounded(Context ctx) {
        long declared = ctx.contentLength();
        boolean framed = declared >= 0 && declared <= MAX_ARRAY_BYTES && ctx.header("Content-Encoding") == null;
        try (InputStream in = open(ctx, treeLimit)) {
            return framed ? readDeclared(in, (int) declared) : in.readAllBytes();
        } catch (IOException e) {
            throw unreadable(e);
        }
    }

    /**
     * An uncompressed body framed by its Content-Length (already checked against the limit): read into
     * an array of that size, without the growing buffers and the extra read for the end of the stream
     * that {@link InputStream#readAllBytes} needs. A body cut short yields what arrived, as before.
     */
    private static byte[] readDeclared(InputStream in, int declared) throws IOException {
        byte[] body = new byte[declared];
        int n = 0;
        for (int read; n < declared && (read = in.read(body, n, declared - n)) >= 0; ) {
            n += read;
        }
        return n == declared ? body : Arrays.copyOf(body, n);
    }

    private static boolean expectsContinue(Context ctx) {
        String expect = ctx.header("Expect");
        return expect != null && expect.trim().equalsIgnoreCase("100-continue");
    }

    /** Reads and drops up to {@code bytes} bytes, 8 KiB at a time. */
    private static void drain(InputStream in, long bytes) {
        byte[] sink = new byte[8192];
        long left = bytes;
        try {
            for (int n; left > 0 && (n = in.read(sink, 0, (int) Math.min(sink.length, left))) > 0; ) {
                left -= n;
            }
        } catch (IOException | ProblemException e) {
            // the client went away or sends too slowly; nothing more to drop
        }
    }

    /** The 413; an oversized body is first read and dropped up to the limit again, so the client sees it. */
    private static ProblemException tooLarge(Limit limit) {
        return new ProblemException(Problem.of("body-too-large", "Request body too large", 413,
                "the request body exceeds the limit of " + limit.bytes() + " bytes (" + limit.variable() + ")",
                List.of(new FieldError("", "body larger than " + limit.bytes() + " bytes"))));
    }

    static void requireJson(String contentType) {
        int end = contentType == null ? -1 : contentType.indexOf(';');
        String type = contentType == null ? "" : (end < 0 ? contentType : contentType.substring(0, end)).trim()
                .toLowerCase(Locale.ROOT);
        if (!type.equals("application/json")) {
            throw new ProblemException(Problem.of("unsupported-media-type", "Unsupported media type", 415,
                    "send the body as application/json (got '" + (contentType == null ? "" : contentType) + "')",
                    List.of(new FieldError("", "Content-Type must be application/json"))));
        }
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
