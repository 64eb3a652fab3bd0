package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.util.Random;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageInputStream;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;

/** Our PNG encoder, read back by the JDK's own PNG decoder (an implementation independent of ours). */
class PngEncoderTest {

    @Test
    void theJdkDecoderReadsBackEveryPixelAndTheResolution() throws Exception {
        Random r = new Random(7);
        BufferedImage img = new BufferedImage(257, 131, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                img.setRGB(x, y, y % 3 == 0 ? r.nextInt(1 << 24) : (x * 7) << 8 | y);
            }
        }
        byte[] png = PngEncoder.encode(img, 300);
        try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(png))) {
            ImageReader reader = ImageIO.getImageReaders(in).next();
            reader.setInput(in);
            BufferedImage back = reader.read(0);
            for (int y = 0; y < img.getHeight(); y++) {
                for (int x = 0; x < img.getWidth(); x++) {
                    assertEquals(img.getRGB(x, y), back.getRGB(x, y), x + "," + y);
                }
            }
            IIOMetadataNode root = (IIOMetadataNode) reader.getImageMetadata(0).getAsTree("javax_imageio_1.0");
            IIOMetadataNode size = (IIOMetadataNode) root.getElementsByTagName("HorizontalPixelSize").item(0);
            // 300 dpi = 11,811 pixels per metre = 0.08467 mm per pixel.
            assertEquals(25.4 / 300, Double.parseDouble(size.getAttribute("value")), 1e-4);
        }
        PngEncoder.Idat idat = PngEncoder.idat(png);
        assertNotNull(idat);
        assertEquals(257, idat.width());
        assertEquals(2, idat.colourType());
    }

    @Test
    void theSameChartGivesTheSameBytes() {
        XYChart a = chart();
        XYChart b = chart();
        assertArrayEquals(PngWriter.bytes(a, PngWriter.SCREEN_DPI), PngWriter.bytes(b, PngWriter.SCREEN_DPI));
    }

    private static XYChart chart() {
        XYChart c = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT).title("t").build();
        ChartStyle.apply(c);
        c.addSeries("s", new double[] {1, 2, 3}, new double[] {3, 1, 2});
        return c;
    }
}
