package org.statesum.api.sampled;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.statesum.api.request.Fields;
import org.statesum.api.request.ProblemException;
import org.statesum.engine.sampling.ReducedPotentials;

/**
 * Reads a {@code POST /v1/sampled} body token by token: the reduced-potential matrix goes straight
 * into {@code double[]} rows (8 bytes a number instead of a tree node of several times that), every
 * other member into a small JSON tree for {@link SampledRequestReader}. Bad matrix elements are
 * named by JSON Pointer, up to {@link #MAX_REPORTED} of them. The shape limits are checked while
 * reading, so an oversized matrix is refused before it is stored.
 */
public final class SampledBodyParser {

    /** Most states K. */
    static final int MAX_STATES = 100;
    /** Most pooled samples N. */
    static final int MAX_SAMPLES = 1_000_000;
    /** Most matrix elements K x N: 80 MB of doubles, a 10-state, million-sample run. */
    static final long MAX_CELLS = 10_000_000L;
    /** Bad elements named one by one before the rest are summarised. */
    static final int MAX_REPORTED = 50;
    static final String MATRIX = "reducedPotentials";

    private SampledBodyParser() {
    }

    /** What was read: the other members, the matrix (null if absent or bad) and any matrix problems. */
    record Body(ObjectNode members, double[][] matrix, boolean matrixPresent) {
    }

    /**
     * @throws IOException when the parser rejects the document (mapped to 400 by the caller)
     */
    static Body read(JsonParser parser, ObjectMapper mapper, Fields fields) throws IOException {
        parser.enable(JsonParser.Feature.USE_FAST_DOUBLE_PARSER);
        JsonToken token = parser.nextToken();
        if (token == null) {
            throw ProblemException.unreadable("the request body is empty", "");
        }
        ObjectNode members = mapper.createObjectNode();
        if (token != JsonToken.START_OBJECT) {
            parser.skipChildren();
            requireEnd(parser);
            fields.add("", "must be an object");
            fields.throwIfAny();
        }
        double[][] matrix = null;
        boolean present = false;
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String name = parser.currentName();
            parser.nextToken();
            if (MATRIX.equals(name)) {
                present = parser.currentToken() != JsonToken.VALUE_NULL;
                matrix = readMatrix(parser, fields);
            } else {
                // A member's value is read where it stands; the rest of the document follows it.
                JsonNode value = mapper.readerFor(JsonNode.class)
                        .without(DeserializationFeature.FAIL_ON_TRAILING_TOKENS).readValue(parser);
                members.set(name, value == null ? NullNode.getInstance() : value);
            }
        }
        requireEnd(parser);
        return new Body(members, matrix, present);
    }

    private static void requireEnd(JsonParser parser) throws IOException {
        if (parser.nextToken() != null) {
            throw ProblemException.unreadable("the body has content after the end of the JSON value", "");
        }
    }

    private static double[][] readMatrix(JsonParser parser, Fields fields) throws IOException {
        String pointer = "/" + MATRIX;
        if (parser.currentToken() == JsonToken.VALUE_NULL) {
            return null;
        }
        if (parser.currentToken() != JsonToken.START_ARRAY) {
            parser.skipChildren();
            fields.add(pointer, "must be an array with one array of numbers per state");
            return null;
        }
        List<double[]> rows = new ArrayList<>();
        int[] reported = {0};
        long cells = 0;
        boolean good = true;
        int k = 0;
        for (JsonToken token = parser.nextToken(); token != JsonToken.END_ARRAY; token = parser.nextToken(), k++) {
            String rowPointer = pointer + "/" + k;
            if (token != JsonToken.START_ARRAY) {
                parser.skipChildren();
                good &= report(fields, rowPointer, "must be an array of numbers", reported);
                continue;
            }
            if (k >= MAX_STATES) {
                parser.skipChildren();
                if (k == MAX_STATES) {
                    fields.add(pointer, "has more than " + MAX_STATES + " states, the limit");
                }
                good = false;
                continue;
            }
            double[] row = new double[rows.isEmpty() ? 1024 : Math.max(1, rows.get(0).length)];
            int n = 0;
            boolean overflow = false;
            for (JsonToken t = parser.nextToken(); t != JsonToken.END_ARRAY; t = parser.nextToken(), n++) {
                if (t != JsonToken.VALUE_NUMBER_INT && t != JsonToken.VALUE_NUMBER_FLOAT) {
                    parser.skipChildren();
                    good &= report(fields, rowPointer + "/" + n, "must be a number", reported);
                    continue;
                }
                if (n >= MAX_SAMPLES || cells + n >= MAX_CELLS) {
                    overflow = true;
                    continue;
                }
                double v = parser.getDoubleValue();
                if (!(Math.abs(v) <= ReducedPotentials.MAX_ABS_REDUCED_POTENTIAL)) {
                    good &= report(fields, rowPointer + "/" + n, "must be at most "
                            + ReducedPotentials.MAX_ABS_REDUCED_POTENTIAL + " in magnitude", reported);
                    continue;
                }
                if (n >= row.length) { // n may have passed row.length over skipped bad elements
                    row = Arrays.copyOf(row, (int) Math.min(Math.max((long) n * 2, n + 1L), MAX_SAMPLES));
                }
                row[n] = v;
            }
            if (overflow) {
                fields.add(rowPointer, "has " + n + " samples; the limits are " + MAX_SAMPLES + " samples and "
                        + MAX_CELLS + " elements in the whole matrix");
                good = false;
                continue;
            }
            cells += n;
            rows.add(n == row.length ? row : Arrays.copyOf(row, n));
        }
        if (reported[0] > MAX_REPORTED) {
            fields.add(pointer, (reported[0] - MAX_REPORTED) + " more bad elements not listed");
        }
        return good ? rows.toArray(new double[0][]) : null;
    }

    private static boolean report(Fields fields, String pointer, String message, int[] reported) {
        if (reported[0]++ < MAX_REPORTED) {
            fields.add(pointer, message);
        }
        return false;
    }
}
