package org.cupel.charts.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.FigureChecks;
import org.cupel.charts.PngWriter;
import org.cupel.config.CupelConfig;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.SeriesReview;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.Project;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;

public class CrmChartsTest {

    /** 24 weekly batches, three CRMs; MID drifts upwards, LOW has one swap with MID, HIGH one failure. */
    public static CrmReview plantedReview() {
        SampleTable.Builder t = SampleTable.builder();
        AnalyteColumn.Builder au = AnalyteColumn.builder(new Analyte("Au", GradeUnit.G_PER_T));
        java.util.Random rnd = new java.util.Random(20250301L);
        int line = 1;
        for (int b = 0; b < 24; b++) {
            Batch batch = new Batch("J" + (100 + b), "Lab", LocalDate.of(2025, 3, 3).plusWeeks(b), "lab.csv");
            double[][] crm = {{0.50, 0.03}, {2.50, 0.10}, {6.80, 0.25}};
            String[] code = {"LOW", "MID", "HIGH"};
            for (int k = 0; k < 3; k++) {
                double v = crm[k][0] + crm[k][1] * rnd.nextGaussian() * 0.8;
                if (k == 1) {
                    v += 0.10 * 0.09 * b;
                }
                if (k == 0 && b == 9) {
                    v = 2.47;
                }
                if (k == 2 && b == 15) {
                    v = 7.75;
                }
                int row = t.add("J" + (100 + b) + "-" + code[k], batch, 10 * k + 5, QcRole.CRM, code[k],
                        new SourceLocation("lab.csv", line++, 0));
                au.add(row, new MethodValue("FA", AssayValue.detected(Math.round(v * 1000) / 1000.0, 0.005), null));
            }
        }
        SampleTable table = t.build();
        List<CrmCertificate> certs = new ArrayList<>();
        certs.add(new CrmCertificate("LOW", "Au", GradeUnit.G_PER_T, 0.50, 0.03, Double.NaN, Double.NaN, ""));
        certs.add(new CrmCertificate("MID", "Au", GradeUnit.G_PER_T, 2.50, 0.10, Double.NaN, Double.NaN, ""));
        certs.add(new CrmCertificate("HIGH", "Au", GradeUnit.G_PER_T, 6.80, 0.25, Double.NaN, Double.NaN, ""));
        Project p = new Project("charts", null, CupelConfig.defaults(), table,
                Map.of("Au", au.build(table.size(), MethodSelector.FIRST)), new CrmCatalog(certs),
                new ExceptionRegister(), List.of());
        return CrmReview.of(p);
    }

    @Test
    void chartsRenderForEveryCrmAndTheAnalyte(@TempDir Path tmp) throws IOException {
        CrmReview r = plantedReview();
        String out = System.getProperty("cupel.chartDir");
        Path dir = out == null ? tmp : Files.createDirectories(Path.of(out));
        for (SeriesReview s : r.series()) {
            ChartFigure f = CrmControlChart.of(s);
            XYChart c = (XYChart) f.charts().get(0);
            assertTrue(c.getSeriesMap().keySet().stream().anyMatch(k -> k.startsWith("Certified")));
            write(f, dir.resolve("crm-" + s.crm() + ".png"));
        }
        ChartFigure zf = CrmZScoreChart.of("Au", r.series());
        assertTrue(((XYChart) zf.charts().get(0)).getSeriesMap().containsKey("MID (n = 24)"));
        write(zf, dir.resolve("crm-z.png"));
        ChartFigure bf = CrmBiasChart.of(r.analytes().get(0).biasVsGrade(), r.series());
        assertTrue(((XYChart) bf.charts().get(0)).getSeriesMap().containsKey("Least-squares line"));
        write(bf, dir.resolve("crm-bias.png"));
        // The planted failure (HIGH 7.75 g/t in batch 16, beyond 6.80 + 3 × 0.25) is drawn as a failure.
        XYChart high = (XYChart) CrmControlChart.of(r.series("HIGH", "Au").orElseThrow()).charts().get(0);
        assertEquals("CRM HIGH: Au in time order", high.getTitle());
        assertTrue(high.getSeriesMap().entrySet().stream().anyMatch(e -> e.getKey().startsWith("Fail")
                && java.util.Arrays.stream(e.getValue().getYData()).anyMatch(y -> y == 7.75)),
                high.getSeriesMap().keySet().toString());
        ChartFigure lowFigure = CrmControlChart.of(r.series("LOW", "Au").orElseThrow());
        XYChart low = (XYChart) lowFigure.charts().get(0);
        assertTrue(low.getSeriesMap().containsKey("Swap 1"));
        // The swap (2.47 under LOW, MID's grade) is off LOW's scale: drawn at the edge, its value in the note.
        assertTrue(lowFigure.panels().get(0).note().contains("off scale, drawn at the edge: no. 10 = 2.47 (MID?)"),
                lowFigure.panels().get(0).note());
    }

    private static void write(ChartFigure c, Path p) throws IOException {
        FigureChecks.writingStaysOutOfThePlots(p.getFileName().toString(), c);
        PngWriter.write(c, p, PngWriter.SCREEN_DPI);
    }
}
