package org.cupel.charts.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.FigureChecks;
import org.cupel.charts.PngWriter;
import org.cupel.charts.PointBudget;
import org.cupel.duplicates.DuplicateAnalysis;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.DuplicateSettings;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/** The duplicate figures: a panel per type and one comparing them, the core's flagged pairs marked. */
class DuplicateChartsTest {
    @TempDir
    Path tmp;

    /** Where to write: -Dcupel.chartdir=/some/dir keeps the PNGs for a look, else a temporary folder. */
    private Path out() throws Exception {
        String dir = System.getProperty("cupel.chartdir");
        Path p = dir == null ? tmp : Path.of(dir);
        Files.createDirectories(p);
        return p;
    }

    @Test
    void everyFigureHasItsPanelsAndKeepsItsWritingOutOfThePlots() throws Exception {
        DuplicateReport report = SimulatedPairs.report(600, 60);
        for (Map.Entry<String, ChartFigure> e : Map.of("pairs", DuplicateFigures.pairs(report),
                "bias", DuplicateFigures.bias(report), "precision", DuplicateFigures.precision(report)).entrySet()) {
            ChartFigure f = e.getValue();
            List<ChartFigure.Panel> panels = f.panels();
            assertEquals(3, panels.size(), e.getKey());
            assertTrue(panels.get(0).heading().startsWith("(a) Pulp duplicates"), panels.get(0).heading());
            assertTrue(panels.get(1).heading().startsWith("(b) Umpire checks"), panels.get(1).heading());
            assertTrue(panels.get(2).heading().startsWith("(c) ") && panels.get(2).heading().endsWith("every type"),
                    panels.get(2).heading());
            FigureChecks.writingStaysOutOfThePlots(e.getKey(), f);
            FigureChecks.labelsApart(e.getKey(), f);
            PngWriter.writeForPrint(f, out().resolve("simulated-" + e.getKey() + ".png"));
        }
        assertEquals("(a) pulp duplicates, (b) umpire checks", DuplicateFigures.typePanels(report));
        assertEquals("(c)", DuplicateFigures.summaryLetter(report));
    }

    /**
     * {@link SimulatedPairs#withFlaggedPairs}: D-LO's HARD is 0.08 / 0.10 = 80 %, far beyond the 10 % limit, but
     * it is not judged by HARD (mean below 10 × DL); it is above the 99 % line. The panels mark what the
     * analysis flagged: D-HI beyond the HARD limit, D-LO above the 99 % line only.
     */
    @Test
    void thePanelsMarkThePairsTheAnalysisFlagged() {
        DuplicateSetResult set = DuplicateAnalysis.run("Au", "g/t", SimulatedPairs.withFlaggedPairs(), List.of(),
                new double[0], DuplicateSettings.DEFAULTS).sets().get(0);
        XYChart scatter = (XYChart) DuplicateCharts.scatter(set, "(a)", 450, 270).chart();
        XYSeries flagged = scatter.getSeriesMap().get("flagged pairs");
        assertEquals(count(set.pairs().absoluteFlags().beyondHardLimit()), flagged.getXData().length);
        assertTrue(has(flagged, 1.00, 1.50), "D-HI beyond the HARD limit");
        assertFalse(has(flagged, 0.01, 0.09), "D-LO is not judged by HARD: an 80 % HARD, yet not marked");
        assertTrue(has(scatter.getSeriesMap().get("pairs"), 0.01, 0.09));
        XYChart th = (XYChart) DuplicateCharts.thompsonHowarth(set, "(a)", 450, 270).chart();
        // On the Thompson–Howarth plot a pair is at (mean, |d|): D-LO at (0.05, 0.08).
        assertTrue(has(th.getSeriesMap().get("flagged pairs"), 0.05, 0.08), "D-LO above the 99 % line");
        assertEquals(count(set.pairs().absoluteFlags().aboveLine99()),
                th.getSeriesMap().get("flagged pairs").getXData().length);
    }

    @Test
    void manyPairsAreThinnedAndThePanelSaysSo() throws Exception {
        DuplicateReport report = SimulatedPairs.report(9000, 0);
        ChartFigure.Panel panel = DuplicateCharts.scatter(report.sets().get(0), "(a)", 450, 270);
        XYChart chart = (XYChart) panel.chart();
        int drawn = chart.getSeriesMap().values().stream().mapToInt(s -> s.getName().contains("pairs")
                ? s.getXData().length : 0).sum();
        assertTrue(drawn <= PointBudget.DEFAULT, drawn + " drawn");
        assertTrue(panel.note().contains("drawn") && panel.note().contains("thinned"), panel.note());
        PngWriter.writeForPrint(DuplicateFigures.precision(report), out().resolve("thinned-precision.png"));
    }

    private static boolean has(XYSeries s, double x, double y) {
        for (int i = 0; i < s.getXData().length; i++) {
            if (Math.abs(s.getXData()[i] - x) < 1e-12 && Math.abs(s.getYData()[i] - y) < 1e-12) {
                return true;
            }
        }
        return false;
    }

    private static long count(boolean[] flags) {
        long n = 0;
        for (boolean f : flags) {
            n += f ? 1 : 0;
        }
        return n;
    }
}
