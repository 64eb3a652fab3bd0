package org.cupel.charts.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.FigureChecks;
import org.cupel.charts.PngWriter;
import org.cupel.charts.PointBudget;
import org.cupel.duplicates.DuplicateAnalysis;
import org.cupel.duplicates.DuplicatePair;
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

    /**
     * A pair exactly on the 10 % pulp HARD limit is not marked, a pair a hair beyond it is, and every panel marks
     * exactly the pairs core flags. By hand: O-ON / D-ON = 0.90 / 1.10 has HARD 0.20 / 2.00 = 10 % exactly in its
     * reported decimals, although the double (1.1 − 0.9)/(1.1 + 0.9) is 0.10000000000000003, which a plain
     * {@code >} would call beyond; {@link org.cupel.assay.LimitComparison} calls it on the limit. O-OUT / D-OUT =
     * 0.90 / 1.1001 has HARD 0.2001 / 2.0001 = 10.0045 %, beyond. Both means (1.0) are above 10 × DL (0.1), so
     * both are judged by HARD.
     */
    @Test
    void aPairOnTheHardLimitIsNotMarkedAndEveryMarkIsCoresFlag() {
        List<DuplicatePair> pairs = new ArrayList<>(SimulatedPairs.withFlaggedPairs());
        pairs.add(new DuplicatePair("D-ON", "O-ON", "J2", QcRole.PULP_DUPLICATE, AssayValue.detected(0.90, 0.01),
                AssayValue.detected(1.10, 0.01)));
        pairs.add(new DuplicatePair("D-OUT", "O-OUT", "J2", QcRole.PULP_DUPLICATE, AssayValue.detected(0.90, 0.01),
                AssayValue.detected(1.1001, 0.01)));
        DuplicateSetResult set = DuplicateAnalysis.run("Au", "g/t", pairs, List.of(), new double[0],
                DuplicateSettings.DEFAULTS).sets().get(0);
        assertEquals(0.10, set.precision().hardLimit(), 0.0, "the default pulp HARD limit this test is built on");
        DuplicateSetResult.PairValues v = set.pairs();
        double[] a = v.absoluteA();
        double[] b = v.absoluteB();
        boolean[] hard = v.absoluteFlags().beyondHardLimit();

        XYChart scatter = (XYChart) DuplicateCharts.scatter(set, "(a)", 450, 270).chart();
        XYSeries flagged = scatter.getSeriesMap().get("flagged pairs");
        assertFalse(has(flagged, 0.90, 1.10), "on the HARD limit: not beyond it");
        assertTrue(has(scatter.getSeriesMap().get("pairs"), 0.90, 1.10));
        assertTrue(has(flagged, 0.90, 1.1001), "a hair beyond the HARD limit");
        assertEquals(marked(a, b, hard, (x, y) -> new double[] {x, y}), points(flagged));

        double[] ra = v.relativeA();
        double[] rb = v.relativeB();
        XYChart relative = (XYChart) DuplicateCharts.relativeDifference(set, "(a)", 450, 270).chart();
        assertEquals(marked(ra, rb, v.relativeFlags().beyondHardLimit(),
                (x, y) -> new double[] {(x + y) / 2, 100 * (y - x) / ((x + y) / 2)}),
                points(relative.getSeriesMap().get("flagged pairs")));

        XYChart th = (XYChart) DuplicateCharts.thompsonHowarth(set, "(a)", 450, 270).chart();
        assertEquals(marked(a, b, v.absoluteFlags().aboveLine99(), (x, y) -> new double[] {(x + y) / 2,
            Math.abs(x - y)}), points(th.getSeriesMap().get("flagged pairs")));
    }

    /** Where a panel places each flagged pair, sorted, to compare with what it drew. */
    private static List<List<Double>> marked(double[] a, double[] b, boolean[] flags,
                                             java.util.function.BiFunction<Double, Double, double[]> at) {
        List<List<Double>> out = new ArrayList<>();
        for (int i = 0; i < a.length; i++) {
            if (flags[i]) {
                double[] p = at.apply(a[i], b[i]);
                out.add(List.of(p[0], p[1]));
            }
        }
        out.sort(POINT_ORDER);
        return out;
    }

    private static List<List<Double>> points(XYSeries s) {
        List<List<Double>> out = new ArrayList<>();
        for (int i = 0; i < s.getXData().length; i++) {
            out.add(List.of(s.getXData()[i], s.getYData()[i]));
        }
        out.sort(POINT_ORDER);
        return out;
    }

    private static final java.util.Comparator<List<Double>> POINT_ORDER =
            java.util.Comparator.<List<Double>, Double>comparing(p -> p.get(0)).thenComparing(p -> p.get(1));

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
