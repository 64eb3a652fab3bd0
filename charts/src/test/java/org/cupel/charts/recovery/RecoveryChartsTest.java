package org.cupel.charts.recovery;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.FigureChecks;
import org.cupel.charts.FigureLabel;
import org.cupel.charts.PngWriter;
import org.cupel.ingest.ValueConventions;
import org.cupel.recovery.ConditionRecovery;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.XYChart;

/** Builds every recovery chart on the invented fixture testwork and writes it as PNG (to a temporary folder). */
class RecoveryChartsTest {

    static RecoveryResult fixture() {
        Path dir = Path.of(System.getProperty("cupel.testdata", "../testdata"), "recovery", "testwork");
        return RecoveryAnalysis.run(TestworkReader.read(dir, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS),
                RecoverySettings.DEFAULTS);
    }

    @Test
    void chartsDrawEveryConditionAndPairWithTheirNamesOutsideThePlot(@TempDir Path tmp) throws Exception {
        RecoveryResult r = fixture();
        // -Dcupel.chartDir=<folder> keeps the PNGs to look at; by default they go to a temporary folder.
        String keep = System.getProperty("cupel.chartDir");
        Path out = keep == null ? tmp : Files.createDirectories(Path.of(keep));
        for (String analyte : r.analytes()) {
            ChartFigure rec = RecoveryByConditionChart.of(r, analyte);
            assertTrue(((XYChart) rec.charts().get(0)).getSeriesMap().containsKey("Smelts"));
            assertEquals(11, ((XYChart) rec.charts().get(0)).getSeriesMap().get("Smelts").getXData().length);
            ChartFigure diff = DifferenceChart.of(r, analyte);
            assertEquals(6, ((XYChart) diff.charts().get(0)).getSeriesMap().keySet().stream()
                    .filter(k -> k.startsWith("d-")).count());
            ChartFigure dep = DeportmentChart.of(r, analyte);
            assertEquals(java.util.Set.of("button", "slag", "matte"),
                    ((CategoryChart) dep.charts().get(0)).getSeriesMap().keySet());
            for (ChartFigure f : List.of(rec, diff)) {
                FigureChecks.writingStaysOutOfThePlots(analyte, f);
                FigureChecks.labelsStayOutOfThePlots(analyte, f);
                FigureChecks.labelsApart(analyte, f);
            }
            FigureChecks.writingStaysOutOfThePlots(analyte, dep);
            FigureChecks.labelsApart(analyte, dep);
            List<String> names = rec.layout().labels().stream().map(FigureLabel::text).toList();
            for (ConditionRecovery c : r.conditions().stream().filter(c -> c.analyte().equals(analyte)).toList()) {
                assertTrue(names.contains(c.condition() + " (n = " + c.n() + ")"), names.toString());
            }
            PngWriter.write(rec, out.resolve("recovery-" + analyte + ".png"), PngWriter.SCREEN_DPI);
            PngWriter.write(diff, out.resolve("differences-" + analyte + ".png"), PngWriter.SCREEN_DPI);
            PngWriter.write(dep, out.resolve("deportment-" + analyte + ".png"), PngWriter.SCREEN_DPI);
        }
    }

    @Test
    void theRecoveryAxisHoldsEveryIntervalAndSmeltAndSaysWhereItStarts() {
        RecoveryResult r = fixture();
        for (String analyte : r.analytes()) {
            XYChart c = (XYChart) RecoveryByConditionChart.of(r, analyte).charts().get(0);
            double lo = c.getStyler().getYAxisMin();
            double hi = c.getStyler().getYAxisMax();
            for (ConditionRecovery cr : r.conditions().stream().filter(x -> x.analyte().equals(analyte)).toList()) {
                if (cr.tInterval().computed()) {
                    assertTrue(lo <= cr.tInterval().lower() && cr.tInterval().upper() <= hi,
                            cr.condition() + " interval inside " + lo + " to " + hi);
                }
                for (double v : cr.replicates()) {
                    assertTrue(lo <= v && v <= hi, v + " inside " + lo + " to " + hi);
                }
            }
            assertTrue(lo > 0, "zoomed in: " + lo);
            assertTrue(c.getYAxisTitle().contains("axis from " + org.cupel.assay.Numbers.compact(lo) + " %, not zero"),
                    c.getYAxisTitle());
        }
    }

    /**
     * Hand-worked: recoveries from 91.5 to 98.9 % span 7.4; a fifth of it, 1.48, rounds up to the step 2; with
     * the 4 % margin (0.296) the axis runs from floor(91.204 / 2)·2 = 90 to ceil(99.196 / 2)·2 = 100. From 81.3
     * to 99.3 % (step 5, margin 0.72) it would end at ceil(100.02 / 5)·5 = 105, and stops at 100, above which
     * none lies. From 0.5 to 3 % (step 0.5, margin 0.1) it starts at zero and ends at 3.5.
     */
    @Test
    void theAxisRangeIsRoundedOutwardAndExcludesZeroForHighRecoveries() {
        assertArrayEquals(new double[] {90, 100}, RecoveryByConditionChart.axisRange(91.5, 98.9), 1e-12);
        assertArrayEquals(new double[] {80, 100}, RecoveryByConditionChart.axisRange(81.3, 99.3), 1e-12);
        assertArrayEquals(new double[] {0, 3.5}, RecoveryByConditionChart.axisRange(0.5, 3), 1e-12);
        assertEquals(2, RecoveryByConditionChart.roundStep(1.85), 1e-12);
        assertEquals(2.5, RecoveryByConditionChart.roundStep(2.1), 1e-12);
        assertEquals(0.05, RecoveryByConditionChart.roundStep(0.05), 1e-12);
    }
}
