package org.cupel.charts.duplicates;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.charts.PngWriter;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;

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
    void everyChartRendersWithItsNotes() throws Exception {
        DuplicateReport report = SimulatedPairs.report(600, 60);
        for (DuplicateSetResult set : report.sets()) {
            String stem = set.type().name().toLowerCase(java.util.Locale.ROOT);
            for (var e : List.of(
                    java.util.Map.entry("scatter", DuplicateCharts.scatter(set, false)),
                    java.util.Map.entry("scatter-log", DuplicateCharts.scatter(set, true)),
                    java.util.Map.entry("ranked-hard", DuplicateCharts.rankedHard(set)),
                    java.util.Map.entry("thompson-howarth", DuplicateCharts.thompsonHowarth(set)),
                    java.util.Map.entry("relative-difference", DuplicateCharts.relativeDifference(set)))) {
                XYChart chart = e.getValue();
                assertTrue(chart.getSeriesMap().size() >= 2, e.getKey());
                Path file = out().resolve(stem + "-" + e.getKey() + ".png");
                PngWriter.write(chart, file, 96);
                assertTrue(Files.size(file) > 10_000, file.toString());
            }
        }
    }

    @Test
    void manyPairsAreThinnedAndTheChartSaysSo() throws Exception {
        DuplicateReport report = SimulatedPairs.report(9000, 0);
        XYChart chart = DuplicateCharts.scatter(report.sets().get(0), true);
        assertTrue(chart.getSeriesMap().get("pairs").getXData().length <= org.cupel.charts.PointBudget.DEFAULT);
        PngWriter.write(chart, out().resolve("thinned-scatter.png"), 96);
        PngWriter.write(DuplicateCharts.thompsonHowarth(report.sets().get(0)), out().resolve("thinned-th.png"), 96);
    }
}
