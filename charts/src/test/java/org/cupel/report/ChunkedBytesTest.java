package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ChunkedBytesTest {

    /** Property over seeded sizes: single bytes and runs, across chunk ends, read back as written. */
    @Test
    void readsBackWhatWasWrittenWhateverTheWriteSizes() throws IOException {
        Random random = new Random(20261203L);
        for (int trial = 0; trial < 20; trial++) {
            int total = trial == 0 ? 0 : trial == 1 ? ChunkedBytes.CHUNK : random.nextInt(3 * ChunkedBytes.CHUNK);
            byte[] data = new byte[total];
            random.nextBytes(data);
            ChunkedBytes bytes = new ChunkedBytes();
            int at = 0;
            while (at < total) {
                if (random.nextInt(4) == 0) {
                    bytes.write(data[at++]);
                } else {
                    int n = Math.min(total - at, random.nextInt(2 * ChunkedBytes.CHUNK / 3) + 1);
                    byte[] padded = new byte[n + 7];
                    System.arraycopy(data, at, padded, 3, n);
                    bytes.write(padded, 3, n);
                    at += n;
                }
            }
            assertEquals(total, bytes.size(), "trial " + trial);
            try (InputStream in = bytes.input()) {
                assertArrayEquals(data, in.readAllBytes(), "trial " + trial + ", " + total + " bytes");
            }
        }
    }
}
