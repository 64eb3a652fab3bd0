package org.cupel.charts.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.cupel.censored.CensoredSample;
import org.cupel.censored.Ros;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.FigureChecks;
import org.cupel.charts.PngWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;

class CensoredProbabilityPlotTest {

    /** USEPA (2009) Unified Guidance Example 15-1 manganese (ppb). */
    static CensoredSample manganese() {
        CensoredSample.Builder b = CensoredSample.builder().below(2).below(2).below(2).below(5).below(5).below(5);
        for (double v : new double[] {3.3, 5.3, 6.3, 7.7, 8.4, 9.5, 10.0, 11.9, 12.1, 12.6, 16.9, 17.9, 21.6, 22.7,
            34.5, 45.9, 53.6, 77.2, 106.3}) {
            b.detected(v);
        }
        return b.build();
    }

    @Test
    void drawsDetectsImputedValuesLimitsAndLine(@TempDir Path dir) throws Exception {
        ChartFigure figure = CensoredProbabilityPlot.create(Ros.fit(manganese()), "Mn (ppb)",
                "Censored probability plot");
        XYChart chart = (XYChart) figure.charts().get(0);
        // n and the censored share under the plot, not over its lowest points.
        assertEquals("n = 25; 6 censored (24 %)", figure.panels().get(0).note());
        FigureChecks.writingStaysOutOfThePlots("probability plot", figure);
        assertEquals(19, chart.getSeriesMap().get("Detected (19)").getXData().length);
        assertEquals(6, chart.getSeriesMap().get("Below detection (imputed by ROS) (6)").getXData().length);
        assertTrue(chart.getSeriesMap().containsKey("Detection limits 2, 5"));
        // Every imputed nondetect lies below the highest detection limit (5 ppb), under the detects' scale.
        for (double y : chart.getSeriesMap().get("Below detection (imputed by ROS) (6)").getYData()) {
            assertTrue(y < 5, "imputed " + y + " below the limit 5");
        }
        assertTrue(chart.getSeriesMap().keySet().stream().anyMatch(k -> k.startsWith("ROS line: ln x = ")),
                "the ROS line with its equation: " + chart.getSeriesMap().keySet());
        assertTrue(chart.getStyler().isYAxisLogarithmic());
        assertEquals("Censored probability plot", chart.getTitle());
        PngWriter.write(chart, dir.resolve("plot.png"), PngWriter.SCREEN_DPI);
        String out = System.getProperty("cupel.chart.out");
        if (out != null) {
            PngWriter.write(chart, Path.of(out), PngWriter.SCREEN_DPI);
        }
    }

    /**
     * A large sample reaching far below its limit: counts written with thousands separators, the decades under
     * 0.001 labelled as the numbers they are (the report's three-decimal pattern wrote 0.0001 as "0"), and the
     * key wrapped under the plot instead of one legend line running off the chart's right edge.
     */
    @Test
    void aLargeSampleFarBelowItsLimitKeepsEveryLabelReadable() {
        java.util.Random r = new java.util.Random(11);
        CensoredSample.Builder b = CensoredSample.builder();
        int below = 0;
        for (int i = 0; i < 20_000; i++) {
            double v = Math.exp(-2.3 + 1.6 * r.nextGaussian());
            if (v < 0.005) {
                b.below(0.005);
                below++;
            } else {
                b.detected(Math.round(v * 1000) / 1000.0);
            }
        }
        ChartFigure figure = CensoredProbabilityPlot.create(Ros.fit(b.build()), "Au (ppm)", "Censored probability plot");
        XYChart chart = (XYChart) figure.charts().get(0);
        String detected = String.format(java.util.Locale.US, "Detected (%,d)", 20_000 - below);
        assertTrue(detected.contains(","), detected);
        java.util.List<String> key = figure.panels().get(0).key().stream().map(org.cupel.charts.KeyEntry::label)
                .toList();
        assertEquals(detected, key.get(0));
        assertEquals(String.format(java.util.Locale.US, "Below detection (imputed by ROS) (%,d)", below), key.get(1));
        assertTrue(key.get(2).startsWith("ROS line: ln x = "), key.get(2));
        assertEquals("Detection limit 0.005", key.get(3));
        assertTrue(!chart.getStyler().isLegendVisible(), "the figure's wrapping key, not XChart's one-line legend");
        assertTrue(figure.panels().get(0).note().endsWith(String.format(java.util.Locale.US, "; %,d censored (3 %%)",
                below)), figure.panels().get(0).note());
        java.text.DecimalFormat ticks = new java.text.DecimalFormat(chart.getStyler().getYAxisDecimalPattern(),
                java.text.DecimalFormatSymbols.getInstance(java.util.Locale.US));
        assertEquals("0.0001", ticks.format(1e-4));
        assertEquals("0.00001", ticks.format(1.0000000000000001e-5));
        assertEquals("1,000", ticks.format(1000));
        FigureChecks.writingStaysOutOfThePlots("probability plot", figure);
    }

    @Test
    void notApplicableSaysWhyInsteadOfDrawingPoints(@TempDir Path dir) throws Exception {
        CensoredSample over = CensoredSample.builder().detected(1).detected(2).detected(3).above(10).build();
        XYChart chart = (XYChart) CensoredProbabilityPlot.create(Ros.fit(over), "Au (g/t)", "Censored probability plot")
                .charts().get(0);
        assertEquals(1, chart.getSeriesMap().size());
        Path png = dir.resolve("empty.png");
        PngWriter.write(chart, png, PngWriter.SCREEN_DPI);
        String out = System.getProperty("cupel.chart.out");
        if (out != null) {
            PngWriter.write(chart, Path.of(out + ".empty.png"), PngWriter.SCREEN_DPI);
        }
    }
}
