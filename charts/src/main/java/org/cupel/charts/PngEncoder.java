package org.cupel.charts;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;
import java.util.zip.Deflater;

/**
 * Encodes an opaque {@link BufferedImage#TYPE_INT_RGB} image as PNG: 8-bit RGB, not interlaced, one IDAT
 * chunk, a pHYs chunk giving the resolution. Format after W3C (2003), "Portable Network Graphics (PNG)
 * Specification (Second Edition)", sections 5 (datastream), 9 (filtering) and 11.3.5.3 (pHYs).
 *
 * <p>Every row uses filter type 2 (Up): a chart is mostly flat colour and axis-parallel lines, which Up
 * turns into runs of zeros, so it compresses about as well as the per-row adaptive choice of the JDK's
 * encoder at a fraction of the time (deflate level 4). The output depends on the pixels and the dpi only,
 * so the same chart always gives the same bytes. {@link #idat} gives the compressed data back for
 * embedding in a PDF without decoding it.
 */
public final class PngEncoder {
    private static final byte[] SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};
    private static final int FILTER_UP = 2;
    private static final int LEVEL = 4;
    private static final double METRES_PER_INCH = 0.0254;

    private PngEncoder() {
    }

    /** The PNG bytes of {@code image}, which must be of type {@link BufferedImage#TYPE_INT_RGB}. */
    public static byte[] encode(BufferedImage image, int dpi) {
        if (image.getType() != BufferedImage.TYPE_INT_RGB) {
            throw new IllegalArgumentException("expected an opaque RGB image, got type " + image.getType());
        }
        int w = image.getWidth();
        int h = image.getHeight();
        ByteArrayOutputStream out = new ByteArrayOutputStream(w * h / 4 + 1024);
        out.writeBytes(SIGNATURE);
        byte[] ihdr = new byte[13];
        putInt(ihdr, 0, w);
        putInt(ihdr, 4, h);
        ihdr[8] = 8; // bit depth
        ihdr[9] = 2; // colour type: truecolour
        chunk(out, "IHDR", ihdr, ihdr.length);
        byte[] phys = new byte[9];
        int perMetre = (int) Math.round(dpi / METRES_PER_INCH);
        putInt(phys, 0, perMetre);
        putInt(phys, 4, perMetre);
        phys[8] = 1; // unit: metre
        chunk(out, "pHYs", phys, phys.length);
        byte[] idat = deflateRows(((DataBufferInt) image.getRaster().getDataBuffer()).getData(), w, h);
        chunk(out, "IDAT", idat, idat.length);
        chunk(out, "IEND", new byte[0], 0);
        return out.toByteArray();
    }

    /** Image width, height and the concatenated IDAT data of a PNG, or null when it is not a PNG. */
    public record Idat(int width, int height, int bitDepth, int colourType, boolean interlaced, byte[] data) {
    }

    /** Splits PNG bytes into their header fields and (still compressed) image data. */
    public static Idat idat(byte[] png) {
        if (png.length < SIGNATURE.length + 25 || !java.util.Arrays.equals(png, 0, SIGNATURE.length, SIGNATURE, 0,
                SIGNATURE.length)) {
            return null;
        }
        ByteArrayOutputStream data = new ByteArrayOutputStream(png.length);
        int w = 0;
        int h = 0;
        int depth = 0;
        int colour = 0;
        boolean interlaced = false;
        int p = SIGNATURE.length;
        while (p + 8 <= png.length) {
            int len = getInt(png, p);
            String type = new String(png, p + 4, 4, StandardCharsets.US_ASCII);
            int body = p + 8;
            if (len < 0 || body + len + 4 > png.length) {
                return null;
            }
            if (type.equals("IHDR")) {
                w = getInt(png, body);
                h = getInt(png, body + 4);
                depth = png[body + 8];
                colour = png[body + 9];
                interlaced = png[body + 12] != 0;
            } else if (type.equals("IDAT")) {
                data.write(png, body, len);
            } else if (type.equals("IEND")) {
                return new Idat(w, h, depth, colour, interlaced, data.toByteArray());
            }
            p = body + len + 4;
        }
        return null;
    }

    private static byte[] deflateRows(int[] pixels, int w, int h) {
        Deflater deflater = new Deflater(LEVEL);
        ByteArrayOutputStream out = new ByteArrayOutputStream(w * h / 4 + 1024);
        byte[] prev = new byte[w * 3];
        byte[] cur = new byte[w * 3];
        byte[] row = new byte[w * 3 + 1];
        byte[] buf = new byte[1 << 16];
        row[0] = FILTER_UP;
        try {
            for (int y = 0; y < h; y++) {
                int base = y * w;
                for (int x = 0, o = 0; x < w; x++) {
                    int rgb = pixels[base + x];
                    cur[o++] = (byte) (rgb >> 16);
                    cur[o++] = (byte) (rgb >> 8);
                    cur[o++] = (byte) rgb;
                }
                for (int i = 0; i < cur.length; i++) {
                    row[i + 1] = (byte) (cur[i] - prev[i]);
                }
                deflater.setInput(row);
                while (!deflater.needsInput()) {
                    out.write(buf, 0, deflater.deflate(buf));
                }
                byte[] t = prev;
                prev = cur;
                cur = t;
            }
            deflater.finish();
            while (!deflater.finished()) {
                out.write(buf, 0, deflater.deflate(buf));
            }
        } finally {
            deflater.end();
        }
        return out.toByteArray();
    }

    private static void chunk(ByteArrayOutputStream out, String type, byte[] data, int len) {
        byte[] head = new byte[8];
        putInt(head, 0, len);
        byte[] name = type.getBytes(StandardCharsets.US_ASCII);
        System.arraycopy(name, 0, head, 4, 4);
        out.writeBytes(head);
        out.write(data, 0, len);
        CRC32 crc = new CRC32();
        crc.update(name);
        crc.update(data, 0, len);
        byte[] tail = new byte[4];
        putInt(tail, 0, (int) crc.getValue());
        out.writeBytes(tail);
    }

    private static void putInt(byte[] b, int at, int v) {
        b[at] = (byte) (v >>> 24);
        b[at + 1] = (byte) (v >>> 16);
        b[at + 2] = (byte) (v >>> 8);
        b[at + 3] = (byte) v;
    }

    private static int getInt(byte[] b, int at) {
        return (b[at] & 0xff) << 24 | (b[at + 1] & 0xff) << 16 | (b[at + 2] & 0xff) << 8 | b[at + 3] & 0xff;
    }
}
