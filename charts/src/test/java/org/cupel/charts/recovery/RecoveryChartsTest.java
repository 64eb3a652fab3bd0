package org.cupel.charts.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.cupel.charts.PngWriter;
import org.cupel.ingest.ValueConventions;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.XYChart;

/** Builds every recovery chart on the invented fixture testwork and writes it to target/recovery-charts. */
class RecoveryChartsTest {

    static RecoveryResult fixture() {
        Path dir = Path.of(System.getProperty("cupel.testdata", "../testdata"), "recovery", "testwork");
        return RecoveryAnalysis.run(TestworkReader.read(dir, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS),
                RecoverySettings.DEFAULTS);
    }

    @Test
    void chartsDrawEveryConditionAndPair() throws Exception {
        RecoveryResult r = fixture();
        Path out = Path.of("target", "recovery-charts");
        Files.createDirectories(out);
        for (String analyte : r.analytes()) {
            XYChart rec = RecoveryByConditionChart.of(r, analyte);
            assertTrue(rec.getSeriesMap().containsKey("Smelts"));
            assertEquals(11, rec.getSeriesMap().get("Smelts").getXData().length);
            XYChart diff = DifferenceChart.of(r, analyte);
            assertEquals(6, diff.getSeriesMap().keySet().stream().filter(k -> k.startsWith("d-")).count());
            CategoryChart dep = DeportmentChart.of(r, analyte);
            assertEquals(java.util.Set.of("button", "slag", "matte"), dep.getSeriesMap().keySet());
            PngWriter.write(rec, out.resolve("recovery-" + analyte + ".png"), PngWriter.SCREEN_DPI);
            PngWriter.write(diff, out.resolve("differences-" + analyte + ".png"), PngWriter.SCREEN_DPI);
            PngWriter.write(dep, out.resolve("deportment-" + analyte + ".png"), PngWriter.SCREEN_DPI);
            assertTrue(Files.size(out.resolve("recovery-" + analyte + ".png")) > 1000);
        }
    }
}
