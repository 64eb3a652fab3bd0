package org.cupel.report;

import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
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
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.config.CupelConfig;
import org.cupel.project.CrmCatalog;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;

/** A small in-memory project with hostile IDs, and a report on it with a chart, for the renderer tests. */
final class ReportFixture {
    static final String SCRIPT = "<script>alert(1)</script>";
    static final String TRAVERSAL = "../../x";
    static final Instant GENERATED = Instant.ofEpochSecond(1767225600L);

    private ReportFixture() {
    }

    static Project project() {
        Batch b1 = new Batch("JOB-" + SCRIPT, "North & Sons <Lab>", LocalDate.of(2025, 3, 3), "lab1.csv");
        Batch b2 = new Batch("JOB-2", "North & Sons <Lab>", LocalDate.of(2025, 3, 10), "lab1.csv");
        SampleTable.Builder t = SampleTable.builder();
        AnalyteColumn.Builder au = AnalyteColumn.builder(new Analyte("Au", org.cupel.units.GradeUnit.G_PER_T));
        String[] ids = {SCRIPT, TRAVERSAL, "=HYPERLINK(\"http://x\")", "S-4", "S-5", "S-6"};
        QcRole[] roles = {QcRole.ROUTINE, QcRole.CRM, QcRole.BLANK, QcRole.ROUTINE, QcRole.FIELD_DUPLICATE,
            QcRole.ROUTINE};
        for (int i = 0; i < ids.length; i++) {
            int r = t.add(ids[i], i < 3 ? b1 : b2, i + 1, roles[i], roles[i] == QcRole.FIELD_DUPLICATE ? "S-4" : "",
                    new SourceLocation("lab1.csv", i + 2, 0));
            au.add(r, new MethodValue("FA-AAS", i == 2 ? AssayValue.belowDetection(0.005)
                    : AssayValue.detected(0.5 + i, 0.005), null));
        }
        Map<String, AnalyteColumn> cols = new LinkedHashMap<>();
        cols.put("Au", au.build(t.size(), MethodSelector.FIRST));
        ExceptionRegister ex = new ExceptionRegister();
        ex.exclude(new SourceLocation("lab1.csv", 9, 3), TRAVERSAL, "=1+1", "not a number",
                "a number such as 1.25", "correct the cell");
        ex.warn(new SourceLocation("lab1.csv", 10, 2), SCRIPT, "-0.5", "negative value read as below detection",
                "", "check the lab's convention");
        return new Project("Test <b>project</b>", null, CupelConfig.defaults(), t.build(), cols, CrmCatalog.empty(),
                ex, List.of(new FileAccount("lab1.csv", "lab results", 7, 6, 1)));
    }

    /** The appendix plus one section with a hostile table ID, a chart with a hostile name, and callouts. */
    static QcReport report() {
        QcReport base = QcAppendix.build(project(), "all batches", GENERATED);
        List<ReportSection> sections = new ArrayList<>(base.sections());
        sections.add(2, extra());
        return new QcReport(base.project(), base.selection(), base.generated(), sections);
    }

    static ReportSection extra() {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < 120; i++) {
            rows.add(List.of(i == 0 ? SCRIPT : "S-" + i, String.format(java.util.Locale.US, "%.3f", -0.5 + i * 0.01),
                    i % 7 == 0 ? "=SUM(A1:A9)" : "ok"));
        }
        List<ReportBlock> blocks = List.of(
                new ReportBlock.Paragraph("Hostile text " + SCRIPT + " & more."),
                new ReportBlock.Callout(ReportBlock.Level.FAIL, "Batch " + SCRIPT + " fails."),
                new ReportBlock.Callout(ReportBlock.Level.PASS, "Batch JOB-2 passes."),
                new ReportBlock.Table(new ReportTable(TRAVERSAL, "Long table " + SCRIPT,
                        List.of("Sample", "Bias (g/t)", "Remark"), rows, "Note " + SCRIPT)),
                new ReportBlock.Figure(SCRIPT, "Chart " + SCRIPT, ReportFixture::chart),
                new ReportBlock.Figure(TRAVERSAL, "Second chart", ReportFixture::chart));
        return new ReportSection("checks" + SCRIPT, "Checks " + SCRIPT, blocks, Map.of("failures", 1,
                "bias", Double.NaN), List.of(Bibliography.get("westgard1981")));
    }

    static XYChart chart() {
        XYChart c = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title("Test control chart").xAxisTitle("Position in sequence").yAxisTitle("Au (g/t)").build();
        ChartStyle.apply(c);
        double[] x = new double[40];
        double[] y = new double[40];
        for (int i = 0; i < x.length; i++) {
            x[i] = i + 1;
            y[i] = 2.5 + 0.1 * Math.sin(i);
        }
        XYSeries s = c.addSeries("Au, " + ChartNotes.count(x.length, x.length), x, y);
        s.setMarkerColor(ChartStyle.DATA);
        s.setLineColor(ChartStyle.DATA);
        return c;
    }
}
