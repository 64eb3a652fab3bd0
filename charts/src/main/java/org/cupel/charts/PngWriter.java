package org.cupel.charts;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * Writes a chart as PNG at a given resolution, atomically: the image is written beside the target under a
 * temporary name, then moved into place. As in XChart, a chart's width and height are in points (1/72 in),
 * so at {@code dpi} the image is {@code width × dpi / 72} pixels wide; the pHYs chunk carries the dpi. The
 * report's print copies are the exception: see {@link #writeForPrint}.
 */
public final class PngWriter {
    /** Print resolution. */
    public static final int PRINT_DPI = 300;
    /** Screen resolution. */
    public static final int SCREEN_DPI = 96;
    /**
     * Width at which the report prints a chart: the text width of a Letter page (8.5 in less 2 × 0.75 in
     * margins); on A4 (6.76 in) the same image prints at 311 dpi.
     */
    public static final double PRINT_WIDTH_INCHES = 7.0;

    private PngWriter() {
    }

    public static void write(Chart<?, ?> chart, Path target, int dpi) throws IOException {
        write(chart, target, dpi, new Canvas());
    }

    /** As {@link #write(Chart, Path, int)}, painting on {@code canvas}. */
    public static void write(Chart<?, ?> chart, Path target, int dpi, Canvas canvas) throws IOException {
        write(PngEncoder.encode(render(chart, dpi / 72.0, canvas), dpi), target);
    }

    /** Writes already encoded PNG bytes to {@code target} atomically. */
    public static void write(byte[] png, Path target) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Path tmp = dir.resolve(".tmp-" + target.getFileName() + "-" + ProcessHandle.current().pid() + "-"
                + Thread.currentThread().getId());
        try {
            Files.write(tmp, png);
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** The PNG bytes at {@code dpi}, for embedding in HTML or PDF. */
    public static byte[] bytes(Chart<?, ?> chart, int dpi) {
        return PngEncoder.encode(render(chart, dpi / 72.0, new Canvas()), dpi);
    }

    /**
     * The chart for print: {@link #PRINT_DPI} at {@link #PRINT_WIDTH_INCHES} wide (2,100 pixels), the size
     * the report prints it at. Drawn at its nominal 1/72-in size (12.5 in) at 300 dpi it would have 3.4 times
     * the pixels, all of them discarded when the PDF scales it to the text width.
     */
    public static void writeForPrint(Chart<?, ?> chart, Path target) throws IOException {
        writeForPrint(chart, target, new Canvas());
    }

    /** As {@link #writeForPrint(Chart, Path)}, painting on {@code canvas}. */
    public static void writeForPrint(Chart<?, ?> chart, Path target, Canvas canvas) throws IOException {
        double scale = PRINT_WIDTH_INCHES * PRINT_DPI / chart.getWidth();
        write(PngEncoder.encode(render(chart, scale, canvas), PRINT_DPI), target);
    }

    /**
     * The chart painted {@code scale} pixels per point on an opaque RGB image of {@code canvas}, as XChart's
     * own encoder does on a new one.
     */
    static BufferedImage render(Chart<?, ?> chart, double scale, Canvas canvas) {
        BufferedImage image = canvas.blank((int) (chart.getWidth() * scale), (int) (chart.getHeight() * scale));
        Graphics2D g = image.createGraphics();
        try {
            g.scale(scale, scale);
            chart.paint(g, chart.getWidth(), chart.getHeight());
        } finally {
            g.dispose();
        }
        return image;
    }
}
