package org.statesum.api.server;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.http.Context;
import java.io.IOException;
import java.io.InputStream;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.BodyProblems;
import org.statesum.api.request.FieldError;
import org.statesum.api.request.JsonMediaType;
import org.statesum.api.request.Problem;
import org.statesum.api.request.ProblemException;

/**
 * Reads a request body into a JSON tree: 415 unless the media type is JSON, 413 beyond the size
 * limit (declared or actually sent), 400 for anything the parser will not accept (syntax, duplicate
 * keys, nesting, string or number limits; see {@link BodyProblems}), with the JSON Pointer of the place
 * where reading stopped.
 * NaN and Infinity tokens are read; {@link org.statesum.api.request.FiniteNumbers} answers them with a 422. A body sent with
 * {@code Content-Encoding: gzip} is inflated, and the limit applies to the inflated size.
 */
public final class BodyReader {

    /** Largest array the JVM allocates reliably. */
    private static final long MAX_ARRAY_BYTES = Integer.MAX_VALUE - 8;
    /** Inflater input buffer: large enough to keep the inflater busy on a multi-megabyte body. */
    private static final int GZIP_BUFFER_BYTES = 1 << 16;

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

    public BodyReader(ObjectMapper mapper, ServiceConfig config) {
        this.mapper = mapper;
        this.treeLimit = new Limit(config.maxBodyBytes(), ServiceConfig.PREFIX + "MAX_BODY_BYTES");
        this.streamLimit = new Limit(config.maxStreamedBodyBytes(), ServiceConfig.PREFIX + "MAX_STREAMED_BODY_BYTES");
        this.bodyTimeoutMillis = config.operations().bodyTimeoutMillis();
        this.minBodyBytesPerSecond = config.operations().minBodyBytesPerSecond();
    }

    /** The body as a JSON tree, its memory reserved on {@code ticket} as it is read (503 if there is none). */
    public JsonNode read(Context ctx, ComputeGate.Ticket ticket) {
        return parse(readBounded(ctx, ticket));
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
            throw BodyProblems.unreadable(e);
        }
    }

    /**
     * The whole body for endpoints that parse it incrementally from bytes (no tree): the media type
     * checked, a gzip body ({@code Content-Encoding: gzip}) inflated, and at most the streamed-body
     * limit read after decoding (413 beyond, so a small compressed body cannot expand without bound);
     * its memory (the bytes and the arrays parsed from them) reserved on {@code ticket} as it is read.
     * Any other content coding is refused with 415 (RFC 9110, section 15.5.16).
     */
    public byte[] readStreamed(Context ctx, ComputeGate.Ticket ticket) {
        try (InputStream in = new MeteredInputStream(open(ctx, streamLimit),
                bytes -> ticket.reserveBody(bytes, MemoryBudget.STREAMED_FACTOR + 1))) {
            return in.readAllBytes();
        } catch (IOException e) {
            throw BodyProblems.unreadable(e);
        }
    }

    private InputStream open(Context ctx, Limit limit) {
        long maxBodyBytes = limit.bytes();
        JsonMediaType.require(ctx.header("Content-Type"));
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
                in = new StrictGzipInputStream(raw, GZIP_BUFFER_BYTES);
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
        return new MeteredInputStream(raw, new BodyPace(bodyTimeoutMillis * 1_000_000L, minBodyBytesPerSecond,
                System::nanoTime, () -> BodyProblems.tooSlow("the request body arrived at less than " + minBodyBytesPerSecond
                        + " bytes/s after " + bodyTimeoutMillis + " ms (" + ServiceConfig.PREFIX
                        + "MIN_BODY_BYTES_PER_SECOND)")));
    }

    /**
     * Reads at most the limit plus one byte, so a body without Content-Length cannot exhaust memory,
     * reserving the memory of its tree on the ticket: for the declared length before reading, else as
     * the bytes arrive.
     */
    private byte[] readBounded(Context ctx, ComputeGate.Ticket ticket) {
        long declared = ctx.contentLength();
        boolean framed = declared >= 0 && declared <= MAX_ARRAY_BYTES && ctx.header("Content-Encoding") == null;
        try (InputStream in = new MeteredInputStream(open(ctx, treeLimit),
                bytes -> ticket.reserveBody(bytes, MemoryBudget.TREE_FACTOR))) {
            if (framed) {
                ticket.reserveBody(declared, MemoryBudget.TREE_FACTOR);
                return readDeclared(in, (int) declared);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw BodyProblems.unreadable(e);
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
}
