package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** A sprite marker covers what the shape itself covers, where the shape would be drawn. */
class SpriteMarkerTest {
    private static final double SCALE = 2100 / 900.0;

    @Test
    void aSpriteCoversTheSamePixelsAsTheShape() {
        for (Marker shape : new Marker[] {SeriesMarkers.CIRCLE, SeriesMarkers.DIAMOND, SeriesMarkers.TRIANGLE_DOWN}) {
            Marker sprite = new SpriteMarker(shape);
            for (double x : new double[] {10, 10.13, 10.37, 10.5, 10.81}) {
                BufferedImage a = draw(shape, x, 11.29);
                BufferedImage b = draw(sprite, x, 11.29);
                double inkA = ink(a);
                // Same amount of colour (to 2 %) and the same centre of it (to a quarter of a pixel).
                assertEquals(inkA, ink(b), 0.02 * inkA, shape + " at " + x);
                assertEquals(centreX(a), centreX(b), 0.25, shape + " at " + x);
                assertTrue(inkA > 0);
            }
        }
    }

    private static BufferedImage draw(Marker m, double x, double y) {
        BufferedImage img = new BufferedImage(64, 64, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, 64, 64);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.scale(SCALE, SCALE);
        g.setColor(ChartStyle.DATA);
        m.paint(g, x, y, 6);
        g.dispose();
        return img;
    }

    /** Darkness summed over the image: 0 for white. */
    private static double ink(BufferedImage img) {
        double sum = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                sum += 255 - (img.getRGB(x, y) >> 16 & 0xff);
            }
        }
        return sum;
    }

    private static double centreX(BufferedImage img) {
        double sum = 0;
        double weighted = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                double d = 255 - (img.getRGB(x, y) >> 16 & 0xff);
                sum += d;
                weighted += d * (x + 0.5);
            }
        }
        return weighted / sum;
    }
}
