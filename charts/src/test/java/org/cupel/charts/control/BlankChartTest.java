package org.cupel.charts.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.cupel.charts.PngWriter;
import org.cupel.control.BlankReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.internal.chartpart.Chart;

/** The blank charts render with their series; set -Dcupel.chartsOut=DIR to keep the PNGs for a look. */
class BlankChartTest {

    static Path render(Chart<?, ?> chart, Path dir, String name) throws IOException {
        String keep = System.getProperty("cupel.chartsOut");
        Path target = keep == null ? dir : Path.of(keep);
        Files.createDirectories(target);
        Path file = target.resolve(name + ".png");
        PngWriter.write(chart, file, PngWriter.SCREEN_DPI);
        return file;
    }

    /** Colours other than white in the plot: a blank chart has almost none. */
    static int inkedPixels(Path png) throws IOException {
        BufferedImage img = ImageIO.read(png.toFile());
        int count = 0;
        for (int y = 0; y < img.getHeight(); y += 2) {
            for (int x = 0; x < img.getWidth(); x += 2) {
                if ((img.getRGB(x, y) & 0xFFFFFF) != 0xFFFFFF) {
                    count++;
                }
            }
        }
        return count;
    }

    @Test
    void sequenceChartHasBlanksThresholdsAndFailures(@TempDir Path dir) throws IOException {
        BlankReport r = BlankFixture.report();
        XYChart c = BlankChart.sequence(r.results());
        assertTrue(c.getSeriesMap().containsKey("Failed blank"));
        assertTrue(c.getSeriesMap().containsKey("Preceding sample"));
        assertEquals(60, c.getSeriesMap().get("Fail above 5×DL").getXData().length);
        assertTrue(inkedPixels(render(c, dir, "blank-sequence-Au")) > 5000);
    }

    @Test
    void carryOverScatter(@TempDir Path dir) throws IOException {
        BlankReport r = BlankFixture.report();
        XYChart c = CarryOverChart.scatter(r.results(), r.summaries().get(0).relation());
        assertTrue(c.getSeriesMap().containsKey("1 % carried over"));
        assertTrue(inkedPixels(render(c, dir, "blank-carry-over-Au")) > 5000);
    }
}
