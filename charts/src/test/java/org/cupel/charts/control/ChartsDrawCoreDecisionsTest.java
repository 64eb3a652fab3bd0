package org.cupel.charts.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
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
import org.cupel.config.CupelConfig;
import org.cupel.control.BlankObservation;
import org.cupel.control.BlankReport;
import org.cupel.control.BlankResult;
import org.cupel.control.BlankReview;
import org.cupel.control.BlankSettings;
import org.cupel.control.Verdict;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.SeriesReview;
import org.cupel.control.crm.ZBand;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.Project;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The control charts mark exactly the results core flagged, read from the results, never judged again: a
 * value exactly on a limit in its reported decimals is not beyond it ({@link org.cupel.assay.LimitComparison}),
 * although its double arithmetic lands a hair beyond (1.100 on 1.000 ± 0.050 gives z = 2.0000000000000018).
 */
class ChartsDrawCoreDecisionsTest {
    /**
     * One CRM certified 1.000 g/t, SD 0.050, one result a week. By hand, z = (x − 1)/0.05: 1.100 → +2 and
     * 0.900 → −2 (on the limit: satisfactory), 1.1001 → +2.002 (questionable), 1.150 → +3 (on 3: unsatisfactory,
     * ISO 13528 puts |z| = 3 there), 0.840 → −3.2 (unsatisfactory), 0.850 → −3 (unsatisfactory).
     */
    private static final double[] EDGE = {1.000, 1.100, 0.990, 0.900, 1.010, 1.1001, 0.995, 1.150, 1.005, 0.840,
        1.000, 0.980, 1.020, 0.850, 1.000};
    private static final LocalDate FIRST = LocalDate.of(2025, 3, 3);

    @Test
    void theZScoreChartMarksTheResultsOutsideTheSatisfactoryBand() {
        SeriesReview s = review(EDGE);
        List<CrmResult> rs = s.results();
        assertEquals(ZBand.SATISFACTORY, rs.get(1).band(), "1.100 is exactly +2 SD");
        assertEquals(ZBand.SATISFACTORY, rs.get(3).band(), "0.900 is exactly −2 SD");
        XYChart c = (XYChart) CrmZScoreChart.of("Au", List.of(s)).charts().get(0);
        assertEquals(expected(rs, r -> r.band() == ZBand.QUESTIONABLE, true),
                points(series(c, CrmZScoreChart.QUESTIONABLE)));
        assertEquals(expected(rs, r -> r.band() == ZBand.UNSATISFACTORY, true),
                points(series(c, CrmZScoreChart.UNSATISFACTORY)));
        // The flagged series hold the 2.002 SD result and the three at or beyond 3 SD, and not the two on 2 SD.
        assertEquals(1, series(c, CrmZScoreChart.QUESTIONABLE).getXData().length);
        assertEquals(3, series(c, CrmZScoreChart.UNSATISFACTORY).getXData().length);
        assertFalse(points(series(c, CrmZScoreChart.QUESTIONABLE)).contains(List.of(7.0, rs.get(1).z())));
    }

    @Test
    void theControlChartMarksTheReviewsVerdicts() {
        SeriesReview s = review(EDGE);
        List<CrmResult> rs = s.results();
        assertEquals(Verdict.PASS, rs.get(1).verdict(), "1.100 is on +2 SD: no 1-2s warning");
        assertEquals(Verdict.PASS, rs.get(3).verdict(), "0.900 is on −2 SD: no 1-2s warning");
        XYChart c = (XYChart) CrmControlChart.of(s).charts().get(0);
        assertEquals(expected(rs, r -> r.verdict() == Verdict.WARN && !r.isSwap(), false), points(series(c, "Warn ")));
        assertEquals(expected(rs, r -> r.verdict() == Verdict.FAIL, false), points(series(c, "Fail ")));
        assertEquals(expected(rs, r -> r.verdict() == Verdict.PASS, false), points(series(c, "Pass ")));
    }

    /**
     * Blanks with a detection limit of 0.005: failure above 5 × DL = 0.025, warning above 3 × DL = 0.015
     * (BlankSettings defaults). 0.025 is on the failure limit (the double product 5 × 0.005 is
     * 0.025000000000000001), 0.0251 and 0.031 are above it.
     */
    @Test
    void theBlankChartsMarkTheFailedBlanks() {
        double[] values = {0.002, 0.025, 0.0251, 0.015, 0.004, 0.031, 0.003};
        BlankReport report = blanks(values);
        List<BlankResult> rs = report.results();
        assertEquals(Verdict.WARN, rs.get(1).verdict().verdict(), "0.025 is on 5 × DL: warned, not failed");
        List<List<Double>> failedInRunOrder = new ArrayList<>();
        List<List<Double>> failedAgainstGrade = new ArrayList<>();
        for (int i = 0; i < rs.size(); i++) {
            BlankResult r = rs.get(i);
            if (r.verdict().verdict() == Verdict.FAIL) {
                failedInRunOrder.add(List.of(i + 1.0, r.observation().value().value()));
                failedAgainstGrade.add(List.of(r.observation().precedingGrade().value(), r.observation().value().value()));
            }
        }
        assertEquals(2, failedInRunOrder.size());
        XYChart sequence = (XYChart) BlankChart.sequence(rs).charts().get(0);
        assertEquals(failedInRunOrder, points(series(sequence, BlankChart.FAILED)));
        ChartFigure scatter = CarryOverChart.scatter(rs, report.summaries().get(0).relation());
        assertEquals(failedAgainstGrade, points(series((XYChart) scatter.charts().get(0), BlankChart.FAILED)));
    }

    /** (x, y) of the results {@code which} selects, as the chart places them: days and z, or number and value. */
    private static List<List<Double>> expected(List<CrmResult> rs, Predicate<CrmResult> which, boolean zChart) {
        List<List<Double>> out = new ArrayList<>();
        for (int i = 0; i < rs.size(); i++) {
            CrmResult r = rs.get(i);
            if (which.test(r)) {
                out.add(zChart ? List.of((double) ChronoUnit.DAYS.between(FIRST, r.point().date()), r.z())
                        : List.of(i + 1.0, r.point().value().value()));
            }
        }
        return out;
    }

    private static XYSeries series(XYChart c, String prefix) {
        return c.getSeriesMap().values().stream().filter(s -> s.getName().startsWith(prefix)).findFirst()
                .orElseThrow(() -> new AssertionError("no series " + prefix + " in " + c.getSeriesMap().keySet()));
    }

    private static List<List<Double>> points(XYSeries s) {
        List<List<Double>> out = new ArrayList<>();
        for (int i = 0; i < s.getXData().length; i++) {
            out.add(List.of(s.getXData()[i], s.getYData()[i]));
        }
        return out;
    }

    /** The review of one CRM, EDGE, with {@code values} one a week. */
    private static SeriesReview review(double[] values) {
        SampleTable.Builder t = SampleTable.builder();
        AnalyteColumn.Builder au = AnalyteColumn.builder(new Analyte("Au", GradeUnit.G_PER_T));
        for (int b = 0; b < values.length; b++) {
            Batch batch = new Batch("J" + (100 + b), "Lab", FIRST.plusWeeks(b), "lab.csv");
            int row = t.add("J" + (100 + b) + "-EDGE", batch, 5, QcRole.CRM, "EDGE",
                    new SourceLocation("lab.csv", b + 2, 0));
            au.add(row, new MethodValue("FA", AssayValue.detected(values[b], 0.005), null));
        }
        SampleTable table = t.build();
        CrmCatalog catalog = new CrmCatalog(List.of(new CrmCertificate("EDGE", "Au", GradeUnit.G_PER_T, 1.000, 0.050,
                Double.NaN, Double.NaN, "")));
        Project p = new Project("edges", null, CupelConfig.defaults(), table,
                Map.of("Au", au.build(table.size(), MethodSelector.FIRST)), catalog, new ExceptionRegister(), List.of());
        return CrmReview.of(p).series("EDGE", "Au").orElseThrow();
    }

    /** One batch of blanks, each after a sample of 1 g/t, detection limit 0.005. */
    private static BlankReport blanks(double[] values) {
        List<BlankObservation> obs = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            obs.add(new BlankObservation(i, "BLK-" + i, "J1", 10 * i + 5, "Au", "g/t",
                    AssayValue.detected(values[i], 0.005), 0.005, "S-" + i, AssayValue.detected(1.0 + i, 0.005)));
        }
        return BlankReview.review(obs, BlankSettings.DEFAULTS);
    }
}
