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

/**
 * Reads a request body into a JSON tree: 415 unless the media type is JSON, 413 beyond the size
 * limit, 400 for anything the parser will not accept (syntax, NaN tokens, duplicate keys, nesting or
 * string limits), with the JSON Pointer of the place where reading stopped.
 */
final class BodyReader {

    private final ObjectMapper mapper;
    private final long maxBodyBytes;

    BodyReader(ObjectMapper mapper, long maxBodyBytes) {
        this.mapper = mapper;
        this.maxBodyBytes = maxBodyBytes;
    }

    JsonNode read(Context ctx) {
        requireJson(ctx.contentType());
        long declared = ctx.contentLength();
        if (declared > maxBodyBytes) {
            throw tooLarge();
        }
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
        } catch (StreamConstraintsException e) {
            throw ProblemException.unreadable("the body exceeds a parser limit: " + limitName(e), pointerOf(e));
        } catch (JsonParseException e) {
            throw ProblemException.unreadable("the body is not valid JSON at line " + e.getLocation().getLineNr()
                    + ", column " + e.getLocation().getColumnNr() + ": " + clean(e.getOriginalMessage()), pointerOf(e));
        } catch (JsonProcessingException e) {
            throw ProblemException.unreadable("the body is not valid JSON: " + clean(e.getOriginalMessage()),
                    pointerOf(e));
        } catch (IOException e) {
            throw ProblemException.unreadable("the body could not be read", "");
        }
    }

    /** Reads at most the limit plus one byte, so a body without Content-Length cannot exhaust memory. */
    private byte[] readBounded(Context ctx) {
        try (InputStream in = ctx.req().getInputStream()) {
            byte[] body = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, maxBodyBytes + 1));
            if (body.length > maxBodyBytes) {
                throw tooLarge();
            }
            return body;
        } catch (IOException e) {
            throw ProblemException.unreadable("the request body could not be read", "");
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
