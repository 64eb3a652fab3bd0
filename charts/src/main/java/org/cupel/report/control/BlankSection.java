package org.cupel.report.control;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.Numbers;
import org.cupel.config.CupelConfig;
import org.cupel.charts.control.BlankChart;
import org.cupel.charts.control.CarryOverChart;
import org.cupel.control.BlankReport;
import org.cupel.control.BlankResult;
import org.cupel.control.BlankSettings;
import org.cupel.control.BlankSummary;
import org.cupel.control.CarryOverRelation;
import org.cupel.report.Cell;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportColumn;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;

/** Blanks: summary per analyte, the blanks that did not pass with their preceding sample, and the charts. */
public final class BlankSection {
    private BlankSection() {
    }

    /** With every threshold described as the default (use {@link #build(BlankReport, CupelConfig)} in reports). */
    public static ReportSection build(BlankReport report) {
        return build(report, CupelConfig.defaults());
    }

    /** @param config the project config, to say which thresholds the user set */
    public static ReportSection build(BlankReport report, CupelConfig config) {
        BlankSettings s = report.settings();
        List<ReportBlock> blocks = new ArrayList<>();
        int fails = report.summaries().stream().mapToInt(BlankSummary::fail).sum();
        int carry = report.summaries().stream().mapToInt(BlankSummary::carryOver).sum();
        blocks.add(new ReportBlock.Callout(fails > 0 ? ReportBlock.Level.FAIL
                : report.results().isEmpty() ? ReportBlock.Level.CANNOT_JUDGE : ReportBlock.Level.PASS,
                "Blank results failed: " + fails + " of " + report.results().size() + "; right after a high-grade "
                        + "sample (probable carry-over): " + carry + "."));
        blocks.add(new ReportBlock.Paragraph("A blank fails above " + Numbers.compact(s.failMultiple())
                + "× the detection limit of its method" + origin(config, "failMultiple", "5×") + " and warns above "
                + Numbers.compact(s.warnMultiple()) + "×" + origin(config, "warnMultiple", "3×")
                + " (common practice is 5× and 3×; some use 10× for failure), unless an absolute threshold is set "
                + "for the analyte"
                + (s.absolute().isEmpty() ? "" : " (set for " + String.join(", ", new java.util.TreeSet<>(
                        s.absolute().keySet())) + ")") + ". A result exactly at a threshold is not above it. "
                + "A blank below detection passes at its limit; one whose detection limit is above the failure "
                + "threshold cannot be judged. A failing blank is flagged as probable carry-over when the sample "
                + "run before it assayed at least " + Numbers.compact(s.highGradeMultiple())
                + "× the failure threshold" + origin(config, "highGradeMultiple", "10×") + ". Across the project, blanks are compared with the grade of the preceding "
                + "sample by Spearman's rank correlation (Spearman 1904; p by the t approximation, Zar 1972) and "
                + "by least squares of blank on preceding grade (the slope is the average fraction carried over)."));
        blocks.add(new ReportBlock.Table(summaryTable(report)));
        blocks.add(new ReportBlock.Table(findingsTable(report)));
        for (BlankSummary sum : report.summaries()) {
            List<BlankResult> rs = report.results(sum.analyte());
            if (rs.isEmpty()) {
                continue;
            }
            blocks.add(new ReportBlock.Figure("blanks-" + sum.analyte(), sum.analyte() + " blanks in run order with the "
                    + "warning and failure thresholds and the grade of the sample run before each blank; failed blanks "
                    + "are named; dotted lines separate batches (up to 200 batches).", () -> BlankChart.sequence(rs)));
            blocks.add(new ReportBlock.Figure("blank-carry-over-" + sum.analyte(), sum.analyte() + " blank against the "
                    + "grade of the preceding sample (log axes), with lines for 1 % and 0.1 % carried over.",
                    () -> CarryOverChart.scatter(rs, sum.relation())));
        }
        Map<String, Object> headlines = new LinkedHashMap<>();
        headlines.put("blankResults", report.results().size());
        headlines.put("blankFailures", fails);
        headlines.put("blankCarryOver", carry);
        return new ReportSection("blanks", "Blanks", blocks, headlines);
    }

    static ReportTable summaryTable(BlankReport report) {
        List<List<Cell>> rows = new ArrayList<>();
        for (BlankSummary s : report.summaries()) {
            CarryOverRelation r = s.relation();
            rows.add(List.of(Cell.text(s.analyte()), Cell.count(s.n()), Cell.count(s.pass()), Cell.count(s.warn()),
                    Cell.count(s.fail()), Cell.count(s.cannotJudge()), Cell.count(s.missing()), Cell.count(s.carryOver()),
                    withN(Double.isNaN(r.spearmanRho()) ? null : Cell.significantNumber(r.spearmanRho(), 3),
                            num(r.spearmanRho(), 3), r.nRank()),
                    pCell(r.spearmanP()), slopeCell(r), pCell(r.slopeP())));
        }
        String notes = String.join(" ", report.summaries().stream().filter(s -> !s.relation().note().isEmpty())
                .map(s -> s.analyte() + ": " + s.relation().note() + ".").toList());
        ReportColumn.Part n = new ReportColumn.Part("n", "", ReportColumn.CsvType.LONG);
        ReportColumn.Part value = new ReportColumn.Part("", "", ReportColumn.CsvType.DOUBLE);
        return ReportTable.typed("blank-summary", "Blank results per analyte",
                List.of(ReportColumn.text("Analyte", "analyte"), ReportColumn.count("n", "n"),
                        ReportColumn.count("Pass", "pass"), ReportColumn.count("Warn", "warn"),
                        ReportColumn.count("Fail", "fail"), ReportColumn.count("Cannot judge", "cannot_judge"),
                        ReportColumn.count("Missing", "missing"), ReportColumn.count("Carry-over", "carry_over"),
                        ReportColumn.parts("Spearman ρ", "spearman_rho", value, n),
                        ReportColumn.number("p (ρ)", "p_spearman_rho", "").withNote(),
                        ReportColumn.parts("Slope ± SE", "slope", value,
                                new ReportColumn.Part("se", "", ReportColumn.CsvType.DOUBLE), n),
                        ReportColumn.number("p (slope)", "p_slope", "").withNote()), rows,
                "Slope: least squares of blank on the preceding sample's grade, detected pairs only. " + notes);
    }

    /** "0.152 (n = 125)"; "– (n = 2)" when the statistic could not be computed. */
    private static Cell withN(Cell.Number v, String shown, int n) {
        return new Cell.Parts(java.util.Arrays.asList(v, Cell.fixedNumber(n, 0)), shown + " (n = " + n + ")");
    }

    private static Cell slopeCell(CarryOverRelation r) {
        boolean none = Double.isNaN(r.slope());
        return new Cell.Parts(java.util.Arrays.asList(none ? null : Cell.significantNumber(r.slope(), 3),
                none ? null : Cell.significantNumber(r.slopeStdErr(), 2), Cell.fixedNumber(r.nRegression(), 0)),
                slope(r));
    }

    private static Cell pCell(double p) {
        return Double.isNaN(p) ? Cell.dash("not computed") : new Cell.Number(p, Numbers.significant(p, 2), pValue(p));
    }

    static ReportTable findingsTable(BlankReport report) {
        List<List<Cell>> rows = new ArrayList<>();
        for (BlankResult r : report.notPassing()) {
            var o = r.observation();
            boolean perDl = o.detectionLimit() > 0 && o.value().isDetected();
            rows.add(List.of(Cell.text(o.sampleId()), Cell.text(o.batch()), Cell.count(o.position()),
                    Cell.text(o.analyte()), Cell.text(o.unit()), Cell.assay(o.value()),
                    perDl ? Cell.significant(o.value().value() / o.detectionLimit(), 3) : Cell.blank(),
                    r.threshold() == null ? Cell.notComputed("none") : Cell.fixed(r.threshold().fail(), -1),
                    Cell.text(VerdictSection.label(r.verdict().verdict())), Cell.text(r.verdict().rule()),
                    Cell.text(o.precedingId().isEmpty() ? "(first in batch)" : o.precedingId()),
                    o.precedingGrade().isMissing() ? Cell.blank() : Cell.assay(o.precedingGrade()),
                    Double.isNaN(r.contaminationRatio()) ? Cell.notComputed(r.ratioNote())
                            : new Cell.Number(100 * r.contaminationRatio(),
                            Numbers.significant(100 * r.contaminationRatio(), 2),
                            Numbers.significant(100 * r.contaminationRatio(), 2) + " %"),
                    Cell.text(r.carryOver() ? "yes" : "no")));
        }
        return ReportTable.typed("blank-findings", "Blanks that did not pass",
                List.of(ReportColumn.text("Blank", "blank"), ReportColumn.text("Batch", "batch"),
                        ReportColumn.count("Position", "position"), ReportColumn.text("Analyte", "analyte"),
                        ReportColumn.text("Unit", "unit"), ReportColumn.assay("Result", "result", ""),
                        ReportColumn.number("Result ÷ DL", "result_per_detection_limit", ""),
                        ReportColumn.number("Fail above", "fail_above", "").withNote(),
                        ReportColumn.text("Verdict", "verdict"), ReportColumn.text("Rule", "rule"),
                        ReportColumn.text("Preceding sample", "preceding_sample"),
                        ReportColumn.assay("Its grade", "preceding_grade", ""),
                        ReportColumn.number("Blank ÷ grade", "blank_per_grade", "%").withNote(),
                        ReportColumn.text("Carry-over", "carry_over")), rows,
                rows.isEmpty() ? "Every blank passed." : "Values as the lab reported them, in the unit of the Unit "
                        + "column.");
    }

    /** " (user setting blanks.x; default 5×)" or " (default)". */
    private static String origin(CupelConfig config, String key, String defaultValue) {
        return config.isUserSet("blanks." + key) ? " (user setting blanks." + key + "; default " + defaultValue + ")"
                : " (default)";
    }

    /** "0.0031 ± 0.00018 (n = 17)", or "– (n = 2)" when there is no slope. */
    static String slope(CarryOverRelation r) {
        String n = " (n = " + r.nRegression() + ")";
        return Double.isNaN(r.slope()) ? "–" + n : num(r.slope(), 3) + " ± " + num(r.slopeStdErr(), 2) + n;
    }

    static String num(double v, int digits) {
        return Double.isNaN(v) ? "–" : Numbers.significant(v, digits);
    }

    static String pValue(double p) {
        return Double.isNaN(p) ? "–" : p < 1e-4 ? "< 0.0001" : Numbers.significant(p, 2);
    }
}
