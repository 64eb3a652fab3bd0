package org.cupel.charts.control;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.FigureChecks;
import org.cupel.charts.PngWriter;
import org.cupel.control.BlankReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.internal.chartpart.PlotArea;
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
        ChartFigure f = BlankChart.sequence(r.results());
        XYChart c = (XYChart) f.charts().get(0);
        assertTrue(c.getSeriesMap().containsKey("Failed blank"));
        assertTrue(c.getSeriesMap().containsKey("Preceding sample"));
        // One threshold for all 60 blanks (one DL): a step line from the first blank to the last, two vertices.
        assertArrayEquals(new double[] {0.5, 60.5}, c.getSeriesMap().get("Fail above 5×DL").getXData());
        assertTrue(inkedPixels(render(f, dir, "blank-sequence-Au")) > 5000);
        // The failed blank is named under the chart, not over its points.
        assertTrue(f.panels().get(0).note().contains("BLK-134 (no. 35, carry-over)"), f.panels().get(0).note());
        FigureChecks.writingStaysOutOfThePlots("blanks", f);
    }

    @Test
    void carryOverScatter(@TempDir Path dir) throws IOException {
        BlankReport r = BlankFixture.report();
        ChartFigure f = CarryOverChart.scatter(r.results(), r.summaries().get(0).relation());
        XYChart c = (XYChart) f.charts().get(0);
        assertTrue(c.getSeriesMap().containsKey("1 % carried over"));
        assertTrue(inkedPixels(render(f, dir, "blank-carry-over-Au")) > 5000);
        FigureChecks.writingStaysOutOfThePlots("carry-over", f);
    }

    /**
     * The warn line is dashed on the plot as in its legend entry. XChart draws a line segment by segment and
     * starts each segment's dash pattern afresh: with a vertex per blank (240 blanks, segments of about 4 units
     * against a dash of 8) the line was drawn solid under a dashed legend entry.
     */
    @Test
    void theWarnLineIsDashedOnThePlotAsInItsLegend(@TempDir Path dir) throws IOException {
        BlankReport r = BlankFixture.report(24);
        ChartFigure f = BlankChart.sequence(r.results());
        XYChart c = (XYChart) f.charts().get(0);
        XYSeries warn = c.getSeriesMap().values().stream().filter(s -> s.getName().startsWith(BlankChart.WARN))
                .findFirst().orElseThrow();
        assertSame(BlankChart.WARN_LINE, warn.getLineStyle(), "the legend draws the series' own stroke");
        assertTrue(warn.getLineStyle().getDashArray() != null, "dashed");
        BufferedImage img = ImageIO.read(render(f, dir, "blank-warn-dashes").toFile());
        double scale = img.getWidth() / (double) f.getWidth();
        java.awt.geom.Rectangle2D plot = PlotArea.of(c);
        int y = (int) Math.round(c.getScreenYFromChart(r.results().get(0).threshold().warn()) * scale);
        int dashes = 0;
        int lastOn = -1;
        for (int x = (int) (plot.getX() * scale) + 2; x < (int) (plot.getMaxX() * scale) - 2; x++) {
            if (near(img.getRGB(x, y), ChartStyle.WARNING)) {
                // A gap of a few pixels is a dash's end; one or two lighter pixels only where segments join.
                if (lastOn >= 0 && x - lastOn > 3) {
                    dashes++;
                }
                lastOn = x;
            }
        }
        // 8 units on, 5 off (ChartStyle.dashed) over a plot about 950 units wide: some 70 gaps between dashes.
        assertTrue(dashes > 40, dashes + " gaps between dashes");
    }

    private static boolean near(int rgb, java.awt.Color c) {
        java.awt.Color p = new java.awt.Color(rgb);
        return Math.abs(p.getRed() - c.getRed()) + Math.abs(p.getGreen() - c.getGreen())
                + Math.abs(p.getBlue() - c.getBlue()) < 60;
    }
}
