package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;

class CanvasTest {

    @Test
    void aReusedImageIsClearedToWhatANewImageHolds() {
        Canvas canvas = new Canvas();
        BufferedImage first = canvas.blank(40, 30);
        Graphics2D g = first.createGraphics();
        g.setColor(Color.ORANGE);
        g.fillRect(0, 0, 40, 30);
        g.dispose();
        BufferedImage again = canvas.blank(40, 30);
        assertSame(first, again);
        BufferedImage fresh = new BufferedImage(40, 30, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < 30; y++) {
            for (int x = 0; x < 40; x++) {
                assertEquals(fresh.getRGB(x, y), again.getRGB(x, y), x + "," + y);
            }
        }
        BufferedImage other = canvas.blank(41, 30);
        assertNotSame(first, other, "another size is a new image");
        assertEquals(41, other.getWidth());
        assertEquals(BufferedImage.TYPE_INT_RGB, other.getType());
    }

    @Test
    void aChartDrawnOnAUsedCanvasHasTheBytesOfOneDrawnOnANewImage(@TempDir Path dir) throws IOException {
        Canvas canvas = new Canvas();
        PngWriter.writeForPrint(chart("first", 1), dir.resolve("first.png"), canvas);
        PngWriter.writeForPrint(chart("second", 5), dir.resolve("reused.png"), canvas);
        PngWriter.writeForPrint(chart("second", 5), dir.resolve("fresh.png"));
        assertArrayEquals(Files.readAllBytes(dir.resolve("fresh.png")), Files.readAllBytes(dir.resolve("reused.png")));
        PngWriter.write(chart("second", 5), dir.resolve("screen-reused.png"), PngWriter.SCREEN_DPI, canvas);
        PngWriter.write(chart("second", 5), dir.resolve("screen-fresh.png"), PngWriter.SCREEN_DPI);
        assertArrayEquals(Files.readAllBytes(dir.resolve("screen-fresh.png")),
                Files.readAllBytes(dir.resolve("screen-reused.png")));
    }

    private static XYChart chart(String title, double slope) {
        XYChart c = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT).title(title).build();
        ChartStyle.apply(c);
        c.addSeries("s", new double[] {0, 1, 2, 3}, new double[] {0, slope, 2 * slope, 3 * slope});
        return c;
    }
}
