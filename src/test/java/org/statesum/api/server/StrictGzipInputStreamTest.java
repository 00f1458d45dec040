package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Random;
import java.util.zip.GZIPOutputStream;
import java.util.zip.ZipException;
import org.junit.jupiter.api.Test;

/** Gzip to its last byte (RFC 1952): members checked, members may follow each other, nothing else may. */
class StrictGzipInputStreamTest {

    private static byte[] gzip(byte[] data) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (GZIPOutputStream out = new GZIPOutputStream(bytes)) {
            out.write(data);
        }
        return bytes.toByteArray();
    }

    private static byte[] inflate(byte[] gzip, int buffer) throws IOException {
        try (StrictGzipInputStream in = new StrictGzipInputStream(new ByteArrayInputStream(gzip), buffer)) {
            return in.readAllBytes();
        }
    }

    private static byte[] concat(byte[]... parts) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (byte[] part : parts) {
            out.writeBytes(part);
        }
        return out.toByteArray();
    }

    @Test
    void decodesWhatTheJdkEncodesAtAnyBufferSize() throws IOException {
        byte[] data = new byte[300_000];
        new Random(7).nextBytes(data);
        Arrays.fill(data, 1000, 200_000, (byte) 'a'); // compressible and incompressible stretches
        for (int buffer : new int[] {1, 7, 512, 1 << 16}) {
            assertArrayEquals(data, inflate(gzip(data), buffer));
        }
        assertArrayEquals(new byte[0], inflate(gzip(new byte[0]), 64));
    }

    @Test
    void membersOneAfterAnotherAreOneStream() throws IOException {
        byte[] a = "{\"a\":".getBytes(StandardCharsets.US_ASCII);
        byte[] b = "1}".getBytes(StandardCharsets.US_ASCII);
        assertArrayEquals(concat(a, b), inflate(concat(gzip(a), gzip(b)), 3));
    }

    @Test
    void bytesAfterTheLastMemberAreRefused() throws IOException {
        byte[] good = gzip("{}".getBytes(StandardCharsets.US_ASCII));
        assertThrows(ZipException.class, () -> inflate(concat(good, new byte[] {0}), 64));
        assertThrows(ZipException.class, () -> inflate(concat(good, "garbage".getBytes(StandardCharsets.US_ASCII)), 64));
        assertThrows(IOException.class, () -> inflate(concat(good, new byte[] {0x1f, (byte) 0x8b}), 64));
    }

    @Test
    void aDamagedMemberIsRefused() throws IOException {
        byte[] good = gzip("{\"levels\": [1, 2, 3]}".getBytes(StandardCharsets.US_ASCII));
        byte[] crc = good.clone();
        crc[crc.length - 8] ^= 1; // CRC-32 of the data
        assertThrows(ZipException.class, () -> inflate(crc, 64));
        byte[] size = good.clone();
        size[size.length - 1] ^= 1; // ISIZE
        assertThrows(ZipException.class, () -> inflate(size, 64));
        assertThrows(EOFException.class, () -> inflate(Arrays.copyOf(good, good.length - 3), 64));
        byte[] reserved = good.clone();
        reserved[3] |= (byte) 0x80;
        assertThrows(ZipException.class, () -> inflate(reserved, 64));
        assertThrows(ZipException.class, () -> inflate("not gzip at all".getBytes(StandardCharsets.US_ASCII), 64));
    }

    @Test
    void headerFieldsAreSkipped() throws IOException {
        byte[] data = "{}".getBytes(StandardCharsets.US_ASCII);
        byte[] plain = gzip(data);
        // the same member with FEXTRA (2 bytes), FNAME and FCOMMENT set in the header
        byte[] header = Arrays.copyOf(plain, 10);
        header[3] = 4 | 8 | 16;
        byte[] withFields = concat(header, new byte[] {2, 0, 'x', 'y'}, "name\0".getBytes(StandardCharsets.US_ASCII),
                "comment\0".getBytes(StandardCharsets.US_ASCII), Arrays.copyOfRange(plain, 10, plain.length));
        assertArrayEquals(data, inflate(withFields, 5));
    }
}
