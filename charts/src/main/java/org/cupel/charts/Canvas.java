package org.cupel.charts;

import java.awt.Point;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.awt.image.DirectColorModel;
import java.awt.image.Raster;
import java.awt.image.WritableRaster;
import java.util.Arrays;

/**
 * Opaque RGB images to paint charts on, one after another, all backed by one reused pixel array. A print
 * chart is 2,100 pixels wide and 1,166 to 2,935 high (the key below the plot sets the height), 10 to 25 MB:
 * drawn each on a new image, the 126 charts of a million-sample report allocated 0.9–1.4 GB, and an image
 * still in use when the young generation is collected does not fit its survivor space, so it was promoted
 * and, dead a moment later, filled the old generation until a full collection. Keeping one image per size
 * did not help, as nearly every chart has a height of its own; the array is kept instead, as large as the
 * largest chart so far, and each image is a new view of its first {@code width × height} pixels. One canvas
 * per drawing thread: it is not thread-safe.
 */
public final class Canvas {
    /** The packed RGB layout of {@link BufferedImage#TYPE_INT_RGB}. */
    private static final DirectColorModel RGB = new DirectColorModel(24, 0xff0000, 0x00ff00, 0x0000ff, 0);

    private int[] pixels = new int[0];

    /**
     * A {@link BufferedImage#TYPE_INT_RGB} image of the given size with every pixel 0, as a new one has. Its
     * pixels start at index 0 of its data array, one row of {@code width} after another, as in a new image;
     * the array may be longer. It stays valid until the next call.
     */
    public BufferedImage blank(int width, int height) {
        int size = Math.multiplyExact(width, height);
        if (pixels.length < size) {
            pixels = new int[size];
        } else {
            clear(pixels, size, width);
        }
        WritableRaster raster = Raster.createPackedRaster(new DataBufferInt(pixels, size), width, height, width,
                RGB.getMasks(), new Point(0, 0));
        return new BufferedImage(RGB, raster, false, null);
    }

    /**
     * Sets the first {@code size} pixels to 0: one row by a loop, then copies of what is cleared, doubling:
     * {@link System#arraycopy} is a memory copy in every compiler, where the loop of {@link Arrays#fill} runs
     * element by element when the JIT compiler is C1 alone (as the launcher runs it).
     */
    private static void clear(int[] pixels, int size, int width) {
        int done = Math.min(width, size);
        Arrays.fill(pixels, 0, done, 0);
        while (done < size) {
            int n = Math.min(done, size - done);
            System.arraycopy(pixels, 0, pixels, done, n);
            done += n;
        }
    }
}
