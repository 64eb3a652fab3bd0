package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Random;
import java.util.zip.CRC32;
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
        assertEquals(new PngEncoder.Size(257, 131), PngEncoder.size(png));
        assertNull(PngEncoder.size(new byte[40]), "not a PNG");
        assertNull(PngEncoder.size(Arrays.copyOf(png, 20)), "too short for a header");
    }

    /**
     * The PNG format allows the image data in several consecutive IDAT chunks (W3C 2003, "Portable Network
     * Graphics (PNG) Specification (Second Edition)", section 11.2.4): they are joined in order.
     */
    @Test
    void imageDataSplitOverSeveralChunksIsJoined() throws Exception {
        BufferedImage img = new BufferedImage(64, 48, BufferedImage.TYPE_INT_RGB);
        img.setRGB(10, 10, 0xff8800);
        byte[] png = PngEncoder.encode(img, 96);
        byte[] data = PngEncoder.idat(png).data();
        int headerEnd = 8 + 12 + 13 + 12 + 9; // signature, IHDR, pHYs
        ByteArrayOutputStream split = new ByteArrayOutputStream();
        split.write(png, 0, headerEnd);
        int cut = data.length / 3;
        chunk(split, "tEXt", "Comment\0before the data".getBytes(StandardCharsets.ISO_8859_1));
        chunk(split, "IDAT", Arrays.copyOfRange(data, 0, cut));
        chunk(split, "IDAT", Arrays.copyOfRange(data, cut, 2 * cut));
        chunk(split, "IDAT", Arrays.copyOfRange(data, 2 * cut, data.length));
        chunk(split, "IEND", new byte[0]);
        byte[] joined = split.toByteArray();
        assertArrayEquals(data, PngEncoder.idat(joined).data());
        BufferedImage back = ImageIO.read(new ByteArrayInputStream(joined));
        assertEquals(0xff8800, back.getRGB(10, 10) & 0xffffff, "the JDK decoder reads the split file too");
    }

    private static void chunk(ByteArrayOutputStream out, String type, byte[] body) {
        byte[] name = type.getBytes(StandardCharsets.US_ASCII);
        out.writeBytes(ByteBuffer.allocate(4).putInt(body.length).array());
        out.writeBytes(name);
        out.writeBytes(body);
        CRC32 crc = new CRC32();
        crc.update(name);
        crc.update(body);
        out.writeBytes(ByteBuffer.allocate(4).putInt((int) crc.getValue()).array());
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
