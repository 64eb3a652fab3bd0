package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
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
        assertSame(pixels(first), pixels(again), "the pixels are reused");
        BufferedImage fresh = new BufferedImage(40, 30, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < 30; y++) {
            for (int x = 0; x < 40; x++) {
                assertEquals(fresh.getRGB(x, y), again.getRGB(x, y), x + "," + y);
            }
        }
        BufferedImage smaller = canvas.blank(20, 31);
        assertSame(pixels(first), pixels(smaller), "a smaller image reuses the pixels");
        assertEquals(20, smaller.getWidth());
        assertEquals(31, smaller.getHeight());
        assertEquals(BufferedImage.TYPE_INT_RGB, smaller.getType());
        BufferedImage larger = canvas.blank(41, 30);
        assertNotSame(pixels(first), pixels(larger), "a larger image needs more pixels");
        assertEquals(41, larger.getWidth());
        assertEquals(BufferedImage.TYPE_INT_RGB, larger.getType());
    }

    @Test
    void chartsOfEverySizeDrawnOnOneCanvasHaveTheBytesOfChartsDrawnOnNewImages(@TempDir Path dir)
            throws IOException {
        Canvas canvas = new Canvas();
        int[][] sizes = {{600, 500}, {600, 300}, {400, 520}, {600, 400}, {300, 300}, {700, 450}};
        for (int i = 0; i < sizes.length; i++) {
            XYChart reused = chart("chart " + i, i + 1, sizes[i][0], sizes[i][1]);
            XYChart fresh = chart("chart " + i, i + 1, sizes[i][0], sizes[i][1]);
            PngWriter.writeForPrint(reused, dir.resolve(i + "-reused.png"), canvas);
            PngWriter.writeForPrint(fresh, dir.resolve(i + "-fresh.png"));
            assertArrayEquals(Files.readAllBytes(dir.resolve(i + "-fresh.png")),
                    Files.readAllBytes(dir.resolve(i + "-reused.png")), "chart " + i);
        }
    }

    private static int[] pixels(BufferedImage image) {
        return ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
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
        return chart(title, slope, ChartStyle.WIDTH, ChartStyle.HEIGHT);
    }

    private static XYChart chart(String title, double slope, int width, int height) {
        XYChart c = new XYChartBuilder().width(width).height(height).title(title).build();
        ChartStyle.apply(c);
        c.addSeries("s", new double[] {0, 1, 2, 3}, new double[] {0, slope, 2 * slope, 3 * slope});
        return c;
    }
}
