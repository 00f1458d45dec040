package org.statesum.api.server;

import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.PushbackInputStream;
import java.util.zip.CRC32;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;
import java.util.zip.ZipException;

/**
 * Decodes a gzip body (RFC 1952) and refuses anything that is not gzip to its last byte: each member's
 * header, deflate data (RFC 1951), CRC-32 and length are checked, members may follow one another (as
 * RFC 1952 section 2.2 allows), and any other byte after a member is a {@link ZipException}.
 * {@link java.util.zip.GZIPInputStream} instead stops quietly at trailing bytes that do not start a
 * member, so garbage after the data would be accepted. Not thread-safe; closing closes the source.
 */
final class StrictGzipInputStream extends InputStream {

    private static final int ID1 = 0x1f;
    private static final int ID2 = 0x8b;
    private static final int DEFLATE = 8;
    private static final int FHCRC = 2;
    private static final int FEXTRA = 4;
    private static final int FNAME = 8;
    private static final int FCOMMENT = 16;
    /** Flag bits RFC 1952 reserves: a header with any of them set must be refused. */
    private static final int RESERVED = 0xe0;
    /** Longest file name or comment accepted in a header: they are never used, only skipped. */
    private static final int MAX_HEADER_TEXT = 1 << 16;

    private final PushbackInputStream in;
    private final Inflater inflater = new Inflater(true);
    private final CRC32 crc = new CRC32();
    private final byte[] input;
    private int inputLength;
    private long memberBytes;
    private boolean ended;

    StrictGzipInputStream(InputStream source, int bufferBytes) throws IOException {
        this.input = new byte[bufferBytes];
        this.in = new PushbackInputStream(source, bufferBytes);
        readHeader();
    }

    @Override
    public int read() throws IOException {
        byte[] one = new byte[1];
        return read(one, 0, 1) < 0 ? -1 : one[0] & 0xff;
    }

    @Override
    public int read(byte[] b, int off, int len) throws IOException {
        if (len == 0) {
            return 0;
        }
        while (!ended) {
            int n;
            try {
                n = inflater.inflate(b, off, len);
            } catch (DataFormatException e) {
                throw new ZipException("invalid deflate data");
            }
            if (n > 0) {
                crc.update(b, off, n);
                memberBytes += n;
                return n;
            }
            if (inflater.finished()) {
                endMember();
            } else if (inflater.needsDictionary()) {
                throw new ZipException("deflate data needs a preset dictionary");
            } else if (inflater.needsInput()) {
                inputLength = in.read(input, 0, input.length);
                if (inputLength < 0) {
                    throw new EOFException("the gzip body ends inside its data");
                }
                inflater.setInput(input, 0, inputLength);
            }
        }
        return -1;
    }

    /** Checks the trailer of the member just inflated; then the body ends or another member starts. */
    private void endMember() throws IOException {
        int unread = inflater.getRemaining();
        if (unread > 0) {
            in.unread(input, inputLength - unread, unread);
        }
        long expectedCrc = readLittleEndian(4);
        long expectedSize = readLittleEndian(4);
        if (expectedCrc != crc.getValue() || expectedSize != (memberBytes & 0xffffffffL)) {
            throw new ZipException("gzip trailer does not match the data");
        }
        int next = in.read();
        if (next < 0) {
            ended = true;
            return;
        }
        in.unread(next);
        inflater.reset();
        crc.reset();
        memberBytes = 0;
        readHeader();
    }

    private void readHeader() throws IOException {
        if (readByte() != ID1 || readByte() != ID2) {
            throw new ZipException("not gzip data (or bytes after the gzip data)");
        }
        if (readByte() != DEFLATE) {
            throw new ZipException("gzip compression method is not deflate");
        }
        int flags = readByte();
        if ((flags & RESERVED) != 0) {
            throw new ZipException("gzip header has reserved flags set");
        }
        skip(6); // MTIME, XFL, OS
        if ((flags & FEXTRA) != 0) {
            skip((int) readLittleEndian(2));
        }
        if ((flags & FNAME) != 0) {
            skipZeroTerminated();
        }
        if ((flags & FCOMMENT) != 0) {
            skipZeroTerminated();
        }
        if ((flags & FHCRC) != 0) {
            skip(2);
        }
    }

    private int readByte() throws IOException {
        int b = in.read();
        if (b < 0) {
            throw new EOFException("the gzip body ends inside a header or trailer");
        }
        return b;
    }

    private long readLittleEndian(int bytes) throws IOException {
        long value = 0;
        for (int i = 0; i < bytes; i++) {
            value |= (long) readByte() << (8 * i);
        }
        return value;
    }

    private void skip(int bytes) throws IOException {
        for (int i = 0; i < bytes; i++) {
            readByte();
        }
    }

    private void skipZeroTerminated() throws IOException {
        for (int i = 0; readByte() != 0; i++) {
            if (i >= MAX_HEADER_TEXT) {
                throw new ZipException("gzip header name or comment is too long");
            }
        }
    }

    @Override
    public void close() throws IOException {
        inflater.end();
        in.close();
    }
}
