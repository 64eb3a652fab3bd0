package org.cupel.report.control;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cupel.assay.Numbers;
import org.cupel.charts.control.CrmBiasChart;
import org.cupel.charts.control.CrmControlChart;
import org.cupel.charts.control.CrmZScoreChart;
import org.cupel.control.crm.AnalyteReview;
import org.cupel.control.crm.BiasEstimate;
import org.cupel.control.crm.CrmException;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.CrmRule;
import org.cupel.control.crm.RuleAction;
import org.cupel.control.crm.RuleFinding;
import org.cupel.control.crm.SeriesReview;
import org.cupel.control.crm.CertifiedLimits;
import org.cupel.control.crm.LinearFit;
import org.cupel.report.Cell;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportColumn;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;

/** The "CRM control" section of the QC appendix, formatted from a {@link CrmReview}; computes nothing. */
public final class CrmSection {
    private CrmSection() {
    }

    public static ReportSection of(CrmReview r) {
        List<ReportBlock> b = new ArrayList<>();
        b.add(headline(r));
        b.add(new ReportBlock.Paragraph("Each CRM result is compared with its certificate: z = (result − certified) "
                + "/ SD, where SD is the certificate's between-lab standard deviation. Warning limits are certified "
                + "± 2 SD and failure limits ± 3 SD. The confidence interval of the certified value is never used "
                + "for limits: it describes how well the mean is known and is far narrower than the spread of single "
                + "results (common practice). z-scores are banded as in ISO 13528 (|z| ≤ 2 satisfactory, 2–3 "
                + "questionable, ≥ 3 unsatisfactory). A result beyond 3 SD that lies within "
                + Numbers.compact(r.settings().swapWithinSd()) + " SD of another CRM in the catalog, or at blank "
                + "level, is reported as a probable swap (after Smee, Bloom, Arne & Heberlein 2024, GEEA 24): a "
                + "warning without re-assay, left out of the bias and drift statistics."));
        b.add(new ReportBlock.Table(certificates(r)));
        b.add(new ReportBlock.Table(summary(r)));
        b.add(new ReportBlock.Table(rules(r)));
        List<RuleFinding> findings = new ArrayList<>();
        r.series().forEach(s -> findings.addAll(s.findings()));
        findings.removeIf(f -> f.rule().equals(CrmRule.W_1_2S.id()));
        if (!findings.isEmpty()) {
            b.add(new ReportBlock.Table(violations(findings)));
        }
        if (r.swaps() > 0) {
            b.add(new ReportBlock.Table(swaps(r)));
        }
        b.add(new ReportBlock.Table(drift(r)));
        if (r.analytes().stream().anyMatch(a -> a.biasVsGrade().fit().estimated())) {
            b.add(new ReportBlock.Table(biasVsGrade(r)));
        }
        if (!r.exceptions().isEmpty()) {
            b.add(new ReportBlock.Table(exceptions(r.exceptions())));
        }
        for (SeriesReview s : r.series()) {
            b.add(new ReportBlock.Figure("crm-" + s.crm() + "-" + s.analyte().name(), "Control chart of CRM " + s.crm()
                    + ", " + s.analyte().label() + ": certified value, ± 2 SD and ± 3 SD from the certificate, "
                    + "the project's running mean; batch boundaries dotted (up to 200 batches).", () -> CrmControlChart.of(s)));
        }
        for (AnalyteReview a : r.analytes()) {
            List<SeriesReview> of = r.series().stream().filter(s -> s.analyte().name().equals(a.analyte())).toList();
            b.add(new ReportBlock.Figure("crm-z-" + a.analyte(), "All CRMs for " + a.analyte()
                    + " as z-scores over time: lab-wide drift shows as a common trend.",
                    () -> CrmZScoreChart.of(a.analyte(), of)));
            b.add(new ReportBlock.Figure("crm-bias-" + a.analyte(), "Mean bias of each CRM for " + a.analyte()
                    + " against its certified value, with 95 % t-intervals.", () -> CrmBiasChart.of(a.biasVsGrade(), of)));
        }
        return new ReportSection("crms", "CRM control", b, headlines(r));
    }

    private static ReportBlock headline(CrmReview r) {
        long n = r.series().stream().mapToLong(SeriesReview::n).sum();
        long drifting = r.series().stream().filter(s -> s.drift().drifting()).count();
        String text = String.format(Locale.ROOT, "%d CRM results in %d series: %d failures, %d warnings, %d probable "
                        + "swaps, %d series with drift signals, %d results listed as exceptions.", n, r.series().size(),
                r.failures(), r.warnings(), r.swaps(), drifting, r.exceptions().size());
        ReportBlock.Level level = r.failures() > 0 ? ReportBlock.Level.FAIL
                : r.warnings() + r.swaps() + drifting + r.exceptions().size() > 0 ? ReportBlock.Level.WARN
                : n == 0 ? ReportBlock.Level.CANNOT_JUDGE : ReportBlock.Level.PASS;
        return new ReportBlock.Callout(level, text);
    }

    /**
     * The certificates in use and the limits they set: certified value and SD as the certificate writes them,
     * the limits with {@link CertifiedLimits#limitDecimals()} decimals.
     */
    private static ReportTable certificates(CrmReview r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (SeriesReview s : r.series()) {
            CertifiedLimits lim = s.limits();
            rows.add(List.of(Cell.text(s.crm()), Cell.text(s.analyte().name()), Cell.text(s.analyte().unit().symbol()),
                    onCertificate(lim.certified(), lim.certifiedText()), onCertificate(lim.sd(), lim.sdText()),
                    limits(lim, 2), limits(lim, 3)));
        }
        ReportColumn.Part low = new ReportColumn.Part("low", "", ReportColumn.CsvType.DOUBLE);
        ReportColumn.Part high = new ReportColumn.Part("high", "", ReportColumn.CsvType.DOUBLE);
        return ReportTable.typed("crm-certificates", "Certificates and control limits",
                List.of(ReportColumn.text("CRM", "crm"), ReportColumn.text("Analyte", "analyte"),
                        ReportColumn.text("Unit", "unit"), ReportColumn.number("Certified", "certified", ""),
                        ReportColumn.number("Certificate SD", "certificate_sd", ""),
                        ReportColumn.parts("Warning limits (± 2 SD)", "warning_limit", low, high),
                        ReportColumn.parts("Failure limits (± 3 SD)", "failure_limit", low, high)),
                rows, "Certified value and between-lab SD as the certificate gives them (crm-catalog.csv), in the "
                        + "unit of the Unit column; limits = certified ± 2 and ± 3 SD, shown with at most one "
                        + "decimal more than the certified value (the judgement uses them unrounded).");
    }

    /** Each CRM's results against its certificate; means on the limits' scale, an SD of results to 3 digits. */
    private static ReportTable summary(CrmReview r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (SeriesReview s : r.series()) {
            BiasEstimate bias = s.bias();
            CertifiedLimits lim = s.limits();
            rows.add(List.of(Cell.text(s.crm()), Cell.text(s.analyte().label()),
                    onCertificate(lim.certified(), lim.certifiedText()), Cell.count(bias.n()),
                    bias.n() > 0 ? onCertificate(bias.meanResult(), lim.limitText(bias.meanResult())) : Cell.dash("no result"),
                    Cell.significant(bias.sdResult(), 3),
                    biasInterval(bias.meanBiasPct(), bias.meanLowPct(), bias.meanHighPct()),
                    biasInterval(bias.median().median(), bias.median().low(), bias.median().high()),
                    Cell.text(inside(bias)), Cell.count(s.failures()), Cell.count(s.warnings()), Cell.count(s.swaps()),
                    s.projectLimits().available() ? projectLimits(lim, s.projectLimits().mean(), s.projectLimits().sd())
                            : Cell.notComputed(s.projectLimits().note())));
        }
        return ReportTable.typed("crm-summary", "CRM results per CRM and analyte",
                List.of(ReportColumn.text("CRM", "crm"), ReportColumn.text("Analyte", "analyte"),
                        ReportColumn.number("Certified", "certified", ""), ReportColumn.count("n", "n"),
                        ReportColumn.number("Mean", "mean", "").withNote(),
                        ReportColumn.number("SD of results", "sd_of_results", "").withNote(),
                        ReportColumn.interval("Mean bias % (95 % CI)", "mean_bias", "%").withNote(),
                        ReportColumn.interval("Median bias % (95 % CI)", "median_bias", "%").withNote(),
                        ReportColumn.text("Certified inside CI", "certified_inside_ci"),
                        ReportColumn.count("Failures", "failures"), ReportColumn.count("Warnings", "warnings"),
                        ReportColumn.count("Swaps", "swaps"),
                        ReportColumn.parts("Project mean ± 2 SD", "project_mean",
                                new ReportColumn.Part("", "", ReportColumn.CsvType.DOUBLE),
                                new ReportColumn.Part("two_sd", "", ReportColumn.CsvType.DOUBLE)).withNote()),
                rows, "In the unit of each analyte. n, mean, SD and bias exclude probable swaps. Mean-bias interval: "
                        + "Student t; median-bias interval: distribution-free sign-test interval (Conover 1999).");
    }

    /** A number from the certificate, or on its scale, as {@code text} shows it. */
    private static Cell onCertificate(double v, String text) {
        return Double.isFinite(v) ? new Cell.Number(v, text, text) : Cell.dash("not computed");
    }

    private static Cell limits(CertifiedLimits lim, int k) {
        double lo = lim.certified() - k * lim.sd();
        double hi = lim.certified() + k * lim.sd();
        Cell.Number low = new Cell.Number(lo, lim.limitText(lo), lim.limitText(lo));
        Cell.Number high = new Cell.Number(hi, lim.limitText(hi), lim.limitText(hi));
        return new Cell.Parts(List.of(low, high), low.display() + " to " + high.display());
    }

    private static Cell projectLimits(CertifiedLimits lim, double mean, double sd) {
        Cell.Number m = new Cell.Number(mean, lim.limitText(mean), lim.limitText(mean));
        Cell.Number twoSd = Cell.significantNumber(2 * sd, 3);
        return new Cell.Parts(List.of(m, twoSd), m.display() + " ± " + twoSd.display());
    }

    /** A bias in percent with its interval; the sign is the finding. */
    private static Cell biasInterval(double v, double lo, double hi) {
        if (!Double.isFinite(v)) {
            return Cell.dash("not computed");
        }
        return Cell.interval(Cell.signedFixedNumber(v, 2), lo, hi, x -> Cell.signedFixedNumber(x, 2));
    }

    private static ReportTable rules(CrmReview r) {
        List<List<String>> rows = new ArrayList<>();
        for (Map.Entry<CrmRule, RuleAction> e : r.settings().actions().entrySet()) {
            if (e.getValue() != RuleAction.OFF) {
                rows.add(List.of(e.getKey().id(), e.getValue().label(), e.getKey().description(),
                        e.getKey().source().citation()));
            }
        }
        return new ReportTable("crm-rules", "Rules in force", List.of("Rule", "Action", "Looks for", "Source"), rows,
                "Limits are strict (beyond 2 SD means |z| > 2; a result exactly on a limit in its reported decimals is "
                        + "not beyond it); runs count consecutive results of one CRM across "
                        + "batches; R-4s looks within one batch. See docs/control-rules.md.");
    }

    private static ReportTable violations(List<RuleFinding> findings) {
        List<List<String>> rows = new ArrayList<>();
        for (RuleFinding f : findings) {
            rows.add(List.of(f.crm(), f.analyte(), f.rule(), f.action().label(), f.sampleId(), f.batchId(),
                    String.join(", ", f.involved())));
        }
        return new ReportTable("crm-violations", "Run-rule violations (beyond the single 2 SD warning)",
                List.of("CRM", "Analyte", "Rule", "Action", "Sample", "Batch", "Results in the pattern"), rows, "");
    }

    private static ReportTable swaps(CrmReview r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (SeriesReview s : r.series()) {
            for (CrmResult x : s.probableSwaps()) {
                rows.add(List.of(Cell.text(x.point().sampleId()), Cell.text(x.point().batchId()), Cell.text(s.crm()),
                        Cell.text(s.analyte().name()), Cell.assay(x.point().value()),
                        Cell.text(s.analyte().unit().symbol()), Cell.text(x.swapWith()), Cell.text(x.reason())));
            }
        }
        return ReportTable.typed("crm-swaps", "Probable swapped or mislabelled CRMs",
                List.of(ReportColumn.text("Sample", "sample"), ReportColumn.text("Batch", "batch"),
                        ReportColumn.text("Labelled as", "labelled_as"), ReportColumn.text("Analyte", "analyte"),
                        ReportColumn.assay("Result", "result", ""), ReportColumn.text("Unit", "unit"),
                        ReportColumn.text("Matches", "matches"), ReportColumn.text("Reason", "reason")), rows,
                "Results as the lab reported them. Not counted as lab failures and not sent for re-assay; check the "
                        + "insertion record.");
    }

    private static ReportTable drift(CrmReview r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (SeriesReview s : r.series()) {
            rows.add(driftRow(s.crm(), s.analyte().name(), s.drift()));
        }
        for (AnalyteReview a : r.analytes()) {
            rows.add(driftRow("all CRMs", a.analyte(), a.drift()));
        }
        return ReportTable.typed("crm-drift", "Drift: trend of z on time, EWMA and tabular CUSUM",
                List.of(ReportColumn.text("Series", "series"), ReportColumn.text("Analyte", "analyte"),
                        ReportColumn.text("Time axis", "time_axis"), trendColumn("Trend of z (SD per time unit)",
                                "trend_z"), ReportColumn.text("Findings", "findings")), rows, String.format(Locale.ROOT,
                        "EWMA λ = %s, L = %s (NIST/SEMATECH e-Handbook 6.3.2.4); CUSUM k = %s, h = %s (Montgomery, "
                                + "Introduction to Statistical Quality Control); trend reported when p < %s. A result "
                                + "beyond 3 SD whose neighbours in its series are not beyond 2 SD on its side is an "
                                + "outlier (a 1-3s matter), not drift, and is left out of trend, EWMA and CUSUM.",
                        Numbers.compact(r.settings().ewmaLambda()), Numbers.compact(r.settings().ewmaWidth()),
                        Numbers.compact(r.settings().cusumK()), Numbers.compact(r.settings().cusumH()),
                        Numbers.compact(r.settings().driftAlpha())));
    }

    /** Bias against grade across the CRMs of each analyte, where it could be fitted. */
    private static ReportTable biasVsGrade(CrmReview r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (AnalyteReview a : r.analytes()) {
            var f = a.biasVsGrade().fit();
            rows.add(List.of(Cell.text(a.analyte()), trend(f), Cell.text(!f.estimated() ? ""
                    : f.pValue() < r.settings().driftAlpha() ? "bias changes with grade" : "no grade dependence shown")));
        }
        return ReportTable.typed("crm-bias-vs-grade", "Mean bias against certified grade, across the CRMs",
                List.of(ReportColumn.text("Analyte", "analyte"), trendColumn("Slope (% bias per unit grade)", "slope"),
                        ReportColumn.text("Finding", "finding")), rows,
                "Least-squares line of each CRM's mean bias (%) on its certified value; n counts CRMs.");
    }

    private static ReportColumn trendColumn(String header, String key) {
        return ReportColumn.parts(header, key, new ReportColumn.Part("", "", ReportColumn.CsvType.DOUBLE),
                new ReportColumn.Part("lower", "", ReportColumn.CsvType.DOUBLE),
                new ReportColumn.Part("upper", "", ReportColumn.CsvType.DOUBLE),
                new ReportColumn.Part("p", "", ReportColumn.CsvType.DOUBLE),
                new ReportColumn.Part("n", "", ReportColumn.CsvType.LONG)).withNote();
    }

    /** "0.0266 (95 % CI 0.0216 to 0.0317, p < 0.0001, n = 31)", one CSV column per number. */
    private static Cell trend(LinearFit f) {
        if (!f.estimated()) {
            return Cell.notComputed(f.note());
        }
        Cell.Number slope = Cell.significantNumber(f.slope(), 3);
        Cell.Number lo = Cell.significantNumber(f.slopeLow(), 3);
        Cell.Number hi = Cell.significantNumber(f.slopeHigh(), 3);
        Cell.Number p = Double.isFinite(f.pValue()) ? Cell.significantNumber(f.pValue(), 2) : null;
        return new Cell.Parts(java.util.Arrays.asList(slope, lo, hi, p, Cell.fixedNumber(f.n(), 0)),
                String.format(Locale.ROOT, "%s (95 %% CI %s to %s, %s, n = %d)", slope.display(), lo.display(),
                        hi.display(), f.pText(), f.n()));
    }

    private static List<Cell> driftRow(String series, String analyte, org.cupel.control.crm.SeriesDrift d) {
        List<String> found = new ArrayList<>(d.findings());
        d.outliers().forEach(o -> found.add("outlier, not drift: " + o.finding()));
        return List.of(Cell.text(series), Cell.text(analyte), Cell.text(d.timeAxis()), trend(d.trend()),
                Cell.text(found.isEmpty() ? "none" : String.join("; ", found)));
    }

    private static ReportTable exceptions(List<CrmException> xs) {
        List<List<String>> rows = new ArrayList<>();
        for (CrmException x : xs) {
            rows.add(List.of(x.sampleId(), x.batchId(), x.crm(), x.analyte(), x.found(), x.rule(), x.problem()));
        }
        return new ReportTable("crm-exceptions", "CRM results that cannot be judged",
                List.of("Sample", "Batch", "CRM", "Analyte", "Reported", "Kind", "What to do"), rows,
                "Listed, not passed: each counts as 'cannot judge' in the batch verdicts.");
    }

    private static Map<String, Object> headlines(CrmReview r) {
        Map<String, Object> h = new LinkedHashMap<>();
        h.put("crmResults", r.series().stream().mapToLong(SeriesReview::n).sum());
        h.put("crmSeries", r.series().size());
        h.put("crmFailures", r.failures());
        h.put("crmWarnings", r.warnings());
        h.put("crmSwaps", r.swaps());
        h.put("crmExceptions", r.exceptions().size());
        h.put("crmDriftingSeries", r.series().stream().filter(s -> s.drift().drifting()).count());
        return h;
    }

    private static String num(double v) {
        return Double.isFinite(v) ? Numbers.significant(v, 3) : "–";
    }

    private static String pct(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%+.2f", v) : "–";
    }

    private static String interval(double lo, double hi) {
        return Double.isFinite(lo) && Double.isFinite(hi)
                ? String.format(Locale.ROOT, " (%+.2f to %+.2f)", lo, hi) : "";
    }

    /**
     * The mean bias of one CRM series in words for the summary: "+6.20 % (95 % CI +4.10 to +8.30), significant",
     * significant when the interval excludes zero (the certified value lies outside it).
     */
    public static String biasText(BiasEstimate b) {
        if (!Double.isFinite(b.meanBiasPct())) {
            return "no bias estimate (" + b.note() + ")";
        }
        if (!Double.isFinite(b.meanLowPct())) {
            return pct(b.meanBiasPct()) + " % (" + b.note() + ")";
        }
        return String.format(Locale.ROOT, "%s %% (%d %% CI %s to %s), %s", pct(b.meanBiasPct()),
                Math.round(100 * b.confidence()), pct(b.meanLowPct()), pct(b.meanHighPct()),
                b.certifiedInsideMeanInterval() ? "not significant" : "significant");
    }

    private static String inside(BiasEstimate b) {
        if (!Double.isFinite(b.meanLowPct())) {
            return "–";
        }
        return (b.certifiedInsideMeanInterval() ? "yes" : "no") + " (mean), "
                + (b.median().estimated() ? (b.certifiedInsideMedianInterval() ? "yes" : "no") : "–") + " (median)";
    }
}
