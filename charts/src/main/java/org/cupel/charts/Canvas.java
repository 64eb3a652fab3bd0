package org.cupel.charts;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.Arrays;

/**
 * An opaque RGB image to paint charts on, one after another, reused while the pixel size stays the same. A
 * print chart is 2,100 × 1,400 pixels, 11.8 MB: drawn each on a new image, the 126 charts of a million-sample
 * report allocated 1.4 GB, and an image still in use when the young generation is collected does not fit its
 * survivor space, so it was promoted and, dead a moment later, filled the old generation until a full
 * collection. One canvas per drawing thread: it is not thread-safe.
 */
public final class Canvas {
    private BufferedImage image;

    /**
     * A {@link BufferedImage#TYPE_INT_RGB} image of the given size with every pixel 0, as a new one has: the
     * previous image cleared when it has that size. It stays valid until the next call.
     */
    public BufferedImage blank(int width, int height) {
        if (image == null || image.getWidth() != width || image.getHeight() != height) {
            image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        } else {
            clear(((DataBufferInt) image.getRaster().getDataBuffer()).getData(), width);
        }
        return image;
    }

    /**
     * Sets every pixel to 0: one row by a loop, then copies of what is cleared, doubling: {@link System#arraycopy}
     * is a memory copy in every compiler, where the loop of {@link Arrays#fill} runs element by element when the
     * JIT compiler is C1 alone (as the launcher runs it).
     */
    private static void clear(int[] pixels, int width) {
        int done = Math.min(width, pixels.length);
        Arrays.fill(pixels, 0, done, 0);
        while (done < pixels.length) {
            int n = Math.min(done, pixels.length - done);
            System.arraycopy(pixels, 0, pixels, done, n);
            done += n;
        }
    }
}
