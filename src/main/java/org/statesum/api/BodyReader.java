package org.statesum.api;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.http.Context;
import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.zip.GZIPInputStream;

/**
 * Reads a request body into a JSON tree: 415 unless the media type is JSON, 413 beyond the size
 * limit, 400 for anything the parser will not accept (syntax, NaN tokens, duplicate keys, nesting or
 * string limits), with the JSON Pointer of the place where reading stopped. A body sent with
 * {@code Content-Encoding: gzip} is inflated, and the limit applies to the inflated size.
 */
final class BodyReader {

    /** Inflater input buffer: large enough to keep the inflater busy on a multi-megabyte body. */
    private static final int GZIP_BUFFER_BYTES = 1 << 16;

    private final ObjectMapper mapper;
    private final long maxBodyBytes;

    BodyReader(ObjectMapper mapper, long maxBodyBytes) {
        this.mapper = mapper;
        this.maxBodyBytes = maxBodyBytes;
    }

    JsonNode read(Context ctx) {
        byte[] body = readBounded(ctx);
        if (body.length == 0) {
            throw ProblemException.unreadable("the request body is empty", "");
        }
        try {
            JsonNode root = mapper.readTree(body);
            if (root == null || root.isMissingNode()) {
                throw ProblemException.unreadable("the request body is empty", "");
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
    InputStream open(Context ctx) {
        requireJson(ctx.contentType());
        long declared = ctx.contentLength();
        if (declared > maxBodyBytes) {
            throw tooLarge();
        }
        try {
            InputStream in = ctx.req().getInputStream();
            String coding = ctx.header("Content-Encoding");
            String name = coding == null ? "identity" : coding.trim().toLowerCase(java.util.Locale.ROOT);
            if (name.equals("gzip") || name.equals("x-gzip")) {
                in = new GZIPInputStream(in, GZIP_BUFFER_BYTES);
            } else if (!name.equals("identity") && !name.isEmpty()) {
                throw new ProblemException(Problem.of("unsupported-media-type", "Unsupported content coding", 415,
                        "send the body uncompressed or with Content-Encoding: gzip (got '" + coding + "')",
                        List.of(new FieldError("", "Content-Encoding must be gzip or absent"))));
            }
            return new LimitedInputStream(in, maxBodyBytes, this::tooLarge);
        } catch (IOException e) {
            throw ProblemException.unreadable("the gzip body could not be decoded", "");
        }
    }

    /** The 400 problem for a body the parser rejected or that could not be read. */
    static ProblemException unreadable(IOException failure) {
        if (failure instanceof StreamConstraintsException e) {
            return ProblemException.unreadable("the body exceeds a parser limit: " + limitName(e), pointerOf(e));
        }
        if (failure instanceof JsonParseException e) {
            return ProblemException.unreadable("the body is not valid JSON at line " + e.getLocation().getLineNr()
                    + ", column " + e.getLocation().getColumnNr() + ": " + clean(e.getOriginalMessage()), pointerOf(e));
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
        try (InputStream in = open(ctx)) {
            return in.readAllBytes();
        } catch (IOException e) {
            throw unreadable(e);
        }
    }

    private ProblemException tooLarge() {
        return new ProblemException(Problem.of("body-too-large", "Request body too large", 413,
                "the request body exceeds the limit of " + maxBodyBytes + " bytes (STATESUM_MAX_BODY_BYTES)",
                List.of(new FieldError("", "body larger than " + maxBodyBytes + " bytes"))));
    }

    static void requireJson(String contentType) {
        String type = contentType == null ? "" : contentType.split(";", 2)[0].trim().toLowerCase(java.util.Locale.ROOT);
        if (!type.equals("application/json")) {
            throw new ProblemException(Problem.of("unsupported-media-type", "Unsupported media type", 415,
                    "send the body as application/json (got '" + (contentType == null ? "" : contentType) + "')",
                    List.of(new FieldError("", "Content-Type must be application/json"))));
        }
    }

    private static String limitName(StreamConstraintsException e) {
        String message = String.valueOf(e.getOriginalMessage());
        if (message.contains("nesting")) {
            return "nesting too deep (STATESUM_MAX_NESTING_DEPTH)";
        }
        if (message.contains("String")) {
            return "string too long (STATESUM_MAX_STRING_LENGTH)";
        }
        if (message.contains("Number")) {
            return "number too long (1000 characters)";
        }
        return "document too large";
    }

    /** The parser's message without its advice on parser features or anything after the first line. */
    static String clean(String message) {
        String text = message == null ? "syntax error" : message.split("\n", 2)[0];
        int advice = text.indexOf(": enable");
        if (advice < 0) {
            advice = text.indexOf("; enable");
        }
        text = advice >= 0 ? text.substring(0, advice) : text;
        return text.replaceAll("\\(for [^)]*\\)", "").replace("`", "'").trim();
    }

    private static String pointerOf(JsonProcessingException e) {
        if (e.getProcessor() instanceof JsonParser parser && parser.getParsingContext() != null) {
            return parser.getParsingContext().pathAsPointer().toString();
        }
        return "";
    }
}
