package org.statesum.api.server;

import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;
import org.statesum.api.request.ProblemException;

/**
 * An answer serialized into memory before it is sent (so that its length is known and the compute
 * slot is free before a slow client reads it), held in blocks that are never copied as it grows, each
 * block's memory reserved in the budget before it is allocated ({@link MemoryBudget.Share#coverAnswer}:
 * 503 when the budget is full for now, 422 when the answer alone would exceed it). Blocks start small,
 * for the common answer of a few kilobytes, and double up to 1 MiB.
 */
public final class AnswerBuffer extends OutputStream {

    private static final int FIRST_BLOCK = 4 * 1024;
    private static final int LARGEST_BLOCK = 1 << 20;

    /** The share of the budget to grow, or null for a small fixed answer that needs none. */
    private final MemoryBudget.Share memory;
    private final List<byte[]> blocks = new ArrayList<>();
    private byte[] current;
    private int position;
    private long size;
    private long allocated;

    public AnswerBuffer(MemoryBudget.Share memory) {
        this.memory = memory;
    }

    /** {@code value} as JSON in a new buffer on {@code memory}; the budget's problems come out as themselves. */
    public static AnswerBuffer of(ObjectMapper mapper, Object value, MemoryBudget.Share memory) throws IOException {
        AnswerBuffer buffer = new AnswerBuffer(memory);
        try {
            mapper.writeValue(buffer, value);
        } catch (JsonMappingException e) {
            // the mapper wraps what the stream throws; a full or too small budget is an answer, not a failure
            if (e.getCause() instanceof ProblemException problem) {
                throw problem;
            }
            if (e.getCause() instanceof OverloadedException overloaded) {
                throw overloaded;
            }
            throw e;
        }
        return buffer;
    }

    @Override
    public void write(int b) {
        if (current == null || position == current.length) {
            grow();
        }
        current[position++] = (byte) b;
        size++;
    }

    @Override
    public void write(byte[] bytes, int offset, int length) {
        while (length > 0) {
            if (current == null || position == current.length) {
                grow();
            }
            int n = Math.min(length, current.length - position);
            System.arraycopy(bytes, offset, current, position, n);
            position += n;
            offset += n;
            length -= n;
            size += n;
        }
    }

    private void grow() {
        int next = current == null ? FIRST_BLOCK : Math.min(LARGEST_BLOCK, 2 * current.length);
        if (memory != null) {
            memory.coverAnswer(allocated + next);
        }
        current = new byte[next];
        position = 0;
        allocated += next;
        blocks.add(current);
    }

    /** Bytes written. */
    long size() {
        return size;
    }

    /** Writes every byte held to {@code out}, in order. */
    public void writeTo(OutputStream out) throws IOException {
        for (byte[] block : blocks) {
            out.write(block, 0, block == current ? position : block.length);
        }
    }
}
