package org.cupel.charts;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * Writes a chart as PNG at a given resolution (the pHYs chunk carries the dpi), atomically: the image
 * is written beside the target under a temporary name, then moved into place.
 */
public final class PngWriter {
    /** Print resolution. */
    public static final int PRINT_DPI = 300;
    /** Screen resolution. */
    public static final int SCREEN_DPI = 96;

    private PngWriter() {
    }

    public static void write(Chart<?, ?> chart, Path target, int dpi) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Path tmpBase = dir.resolve(".tmp-" + target.getFileName() + "-" + ProcessHandle.current().pid());
        Path tmp = dir.resolve(tmpBase.getFileName() + ".png");
        try {
            // XChart appends the extension to the name it is given.
            BitmapEncoder.saveBitmapWithDPI(chart, tmpBase.toString(), BitmapEncoder.BitmapFormat.PNG, dpi);
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** The PNG bytes at {@code dpi}, for embedding in HTML or PDF. */
    public static byte[] bytes(Chart<?, ?> chart, int dpi) throws IOException {
        Path dir = Files.createTempDirectory("cupel-chart");
        try {
            Path file = dir.resolve("chart.png");
            write(chart, file, dpi);
            return Files.readAllBytes(file);
        } finally {
            try (var s = Files.list(dir)) {
                for (Path p : (Iterable<Path>) s::iterator) {
                    Files.deleteIfExists(p);
                }
            }
            Files.deleteIfExists(dir);
        }
    }
}
