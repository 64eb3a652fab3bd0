package org.cupel.report;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.SequenceInputStream;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;

/**
 * Bytes written in memory and read back once, kept in chunks of {@value #CHUNK} bytes. A
 * {@link java.io.ByteArrayOutputStream} grows by doubling one array and copying it: saving the 75 MB Word
 * package of a million-sample report made arrays of 1, 2, 4 … 128 MB (255 MB allocated, 128 MB of it at
 * once), the largest too large for the young generation, so allocated in the old one, which it filled
 * until a full collection. Chunks are written once and never copied.
 */
final class ChunkedBytes extends OutputStream {
    static final int CHUNK = 1 << 20;

    private final List<byte[]> chunks = new ArrayList<>();
    /** Bytes used in the last chunk. */
    private int used = CHUNK;
    private long size;

    @Override
    public void write(int b) {
        room();
        chunks.get(chunks.size() - 1)[used++] = (byte) b;
        size++;
    }

    @Override
    public void write(byte[] b, int off, int len) {
        Objects.checkFromIndexSize(off, len, b.length);
        while (len > 0) {
            room();
            int n = Math.min(len, CHUNK - used);
            System.arraycopy(b, off, chunks.get(chunks.size() - 1), used, n);
            used += n;
            off += n;
            len -= n;
            size += n;
        }
    }

    private void room() {
        if (used == CHUNK) {
            chunks.add(new byte[CHUNK]);
            used = 0;
        }
    }

    /** How many bytes were written. */
    long size() {
        return size;
    }

    /** The bytes written so far, in order; later writes are not seen by it. */
    InputStream input() {
        List<InputStream> parts = new ArrayList<>(chunks.size());
        for (int i = 0; i < chunks.size(); i++) {
            int length = i == chunks.size() - 1 ? used : CHUNK;
            parts.add(new ByteArrayInputStream(chunks.get(i), 0, length));
        }
        return new SequenceInputStream(Collections.enumeration(parts));
    }
}
