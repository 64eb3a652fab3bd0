package org.cupel.report.censored;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.cupel.assay.Numbers;
import org.cupel.censored.AnalyteCensoring;
import org.cupel.censored.BlankLimits;
import org.cupel.censored.CensoredSummary;
import org.cupel.censored.Estimate;
import org.cupel.censored.Quantile;
import org.cupel.censored.Recommendation;
import org.cupel.charts.censored.CensoredProbabilityPlot;
import org.cupel.report.Cell;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportColumn;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;

/**
 * The appendix section "Detection limits and censored values": the limits seen per analyte, how many
 * values were censored below and above, how many reported values came from each method, the standard
 * treatment of censored values in each analysis, and the censored summary of the routine samples with
 * its probability plot. Formats {@link AnalyteCensoring} records only.
 */
public final class DetectionLimitSection {
    public static final String ID = "detection-limits";
    public static final String TITLE = "Detection limits and censored values";

    /** How each analysis treats censored values; the rules themselves live in those analyses. */
    public static final List<String> TREATMENT = List.of(
            "Duplicates: pairs with a censored member are left out of relative precision measures (HARD, RPD, "
                    + "Thompson–Howarth) and counted.",
            "CRMs: a censored CRM result is an exception, never a pass.",
            "Blanks: a censored blank passes at its limit, unless the limit exceeds the failure threshold; then the "
                    + "blank cannot be judged and is reported as such.",
            "Summary statistics use Kaplan–Meier, ROS or maximum likelihood as recommended for each analyte from n "
                    + "and the censored fraction (Helsel 2012); substituting a fraction of the limit is shown only "
                    + "as a comparison and never used.");

    private static final int DIGITS = 4;

    private DetectionLimitSection() {
    }

    public static ReportSection build(List<AnalyteCensoring> analytes) {
        List<ReportBlock> blocks = new ArrayList<>();
        blocks.add(new ReportBlock.Paragraph("Values below the detection limit and above the upper range of a method "
                + "are kept as censored values throughout: none is replaced by a number in any analysis."));
        blocks.add(new ReportBlock.Table(limitsTable(analytes)));
        if (analytes.stream().anyMatch(a -> a.blanks().n() > 0)) {
            blocks.add(new ReportBlock.Table(blankLimitsTable(analytes)));
        }
        blocks.add(new ReportBlock.Paragraph("Treatment of censored values in each analysis:"));
        for (String t : TREATMENT) {
            blocks.add(new ReportBlock.Paragraph("• " + t));
        }
        Map<String, Object> headlines = new LinkedHashMap<>();
        for (AnalyteCensoring a : analytes) {
            Recommendation rec = a.routine().recommendation();
            blocks.add(new ReportBlock.Table(summaryTable(a)));
            blocks.add(new ReportBlock.Callout(rec.method().equals(Recommendation.NONE)
                    ? ReportBlock.Level.CAUTION : ReportBlock.Level.INFO,
                    a.analyteLabel() + ": the report uses " + (rec.method().equals(Recommendation.NONE)
                            ? "no mean estimate" : rec.method()) + ". " + capitalise(rec.reason()) + "."));
            if (!a.routine().ros().points().isEmpty()) {
                blocks.add(new ReportBlock.Figure("censored-probability-" + a.analyteLabel(),
                        "Censored probability plot of " + a.analyteLabel() + ", routine samples (ROS plotting "
                                + "positions, Helsel–Cohn 1988).",
                        () -> CensoredProbabilityPlot.create(a.routine().ros(), a.analyteLabel(),
                                "Censored probability plot: " + a.analyteLabel())));
            }
            headlines.put(a.analyteLabel() + " censored %",
                    Math.round(1000 * a.routine().sample().censoredFraction()) / 10.0);
            headlines.put(a.analyteLabel() + " summary method", rec.method());
        }
        return new ReportSection(ID, TITLE, blocks, headlines);
    }

    static ReportTable limitsTable(List<AnalyteCensoring> analytes) {
        List<List<Cell>> rows = new ArrayList<>();
        for (AnalyteCensoring a : analytes) {
            rows.add(List.of(Cell.text(a.analyteLabel()), Cell.text(list(a.detectionLimits())),
                    Cell.text(list(a.upperLimits())), Cell.count(a.values()), countAndShare(a.below(), a.values()),
                    countAndShare(a.above(), a.values()), Cell.count(a.missing()), Cell.text(methods(a.methodCounts()))));
        }
        return ReportTable.typed("detection-limits", "Detection limits seen and censored values, all samples",
                List.of(ReportColumn.text("Analyte", "analyte"), ReportColumn.text("Detection limits", "detection_limits"),
                        ReportColumn.text("Upper limits", "upper_limits"), ReportColumn.count("Values", "values"),
                        shareColumn("Below detection", "below_detection"), shareColumn("Above range", "above_range"),
                        ReportColumn.count("Missing", "missing"),
                        ReportColumn.text("Reported values by method", "reported_values_by_method")), rows,
                "Limits as stated by the laboratory on each value; the method of each reported value as selected by "
                        + "the configured method priority, every other result kept in the data.");
    }

    private static ReportColumn shareColumn(String header, String key) {
        return ReportColumn.parts(header, key, new ReportColumn.Part("", "", ReportColumn.CsvType.LONG),
                new ReportColumn.Part("share", "%", ReportColumn.CsvType.DOUBLE));
    }

    /** Detection limits estimated from the project's blanks, each labelled with its definition in the note. */
    static ReportTable blankLimitsTable(List<AnalyteCensoring> analytes) {
        List<List<Cell>> rows = new ArrayList<>();
        for (AnalyteCensoring a : analytes) {
            BlankLimits b = a.blanks();
            if (b.n() == 0) {
                continue;
            }
            List<String> notes = new ArrayList<>();
            b.limits().stream().filter(l -> !l.value().note().isEmpty()).map(l -> l.name() + ": " + l.value().note())
                    .distinct().forEach(notes::add);
            rows.add(List.of(Cell.text(a.analyteLabel()), new Cell.Parts(List.of(Cell.fixedNumber(b.n(), 0),
                            Cell.fixedNumber(b.detected(), 0), Cell.fixedNumber(b.below(), 0)), b.n() + " ("
                            + b.detected() + " with a number, " + b.below() + " below detection)"),
                    Cell.text(list(a.detectionLimits())), limit(b, "EPA MDL_b"), limit(b, "3·s"),
                    limit(b, "Currie L_C (t)"), limit(b, "Currie L_D (t)"), limit(b, "EPA MDL_s"),
                    Cell.text(b.sd().isAvailable() ? String.join("; ", notes) : b.sd().note())));
        }
        return ReportTable.typed("blank-detection-limits", "Detection limits estimated from the project's blanks",
                List.of(ReportColumn.text("Analyte", "analyte"), ReportColumn.parts("Blanks", "blanks",
                                new ReportColumn.Part("", "", ReportColumn.CsvType.LONG),
                                new ReportColumn.Part("with_number", "", ReportColumn.CsvType.LONG),
                                new ReportColumn.Part("below_detection", "", ReportColumn.CsvType.LONG)),
                        ReportColumn.text("Stated detection limits", "stated_detection_limits"),
                        ReportColumn.number("EPA MDL_b", "epa_mdl_b", "").withNote(),
                        ReportColumn.number("3·s", "three_s", "").withNote(),
                        ReportColumn.number("Currie L_C (t)", "currie_l_c", "").withNote(),
                        ReportColumn.number("Currie L_D (t)", "currie_l_d", "").withNote(),
                        ReportColumn.number("EPA MDL_s", "epa_mdl_s", "").withNote(),
                        ReportColumn.text("Notes", "notes")), rows,
                "In the unit of each analyte. "
                        + "EPA MDL_b (US EPA, 40 CFR 136 App. B Rev. 2): the blank mean + t(n − 1, 0.99)·s when every blank has "
                        + "a number; the highest numerical blank (n < 100) or the blank of rank round(0.99·n) when some "
                        + "are below detection; not applicable when none has a number. It includes the blank mean. "
                        + "EPA MDL_s = t(n − 1, 0.99)·s is the spiked-sample formula, shown for comparison: applied to "
                        + "blanks it leaves out their mean. 3·s (common practice) and Currie's critical level L_C and "
                        + "detection limit L_D (t-based with s₀ = s·√(1 + 1/n), Currie 1995, IUPAC) are net levels "
                        + "above the blank mean. With censored blanks s comes from the censored-data summary "
                        + "(Helsel 2012), and above 80 % censored no s is estimated. Project blanks also carry "
                        + "contamination and carry-over, so these describe the whole blank process. — = not "
                        + "estimated (see notes).");
    }

    private static Cell limit(BlankLimits b, String name) {
        return valueCell(b.limit(name).value());
    }

    /**
     * Rows are statistics, columns the methods compared; every cell is a number in the analyte's unit (n and
     * the censored count are counts), the 95 % interval of the mean on two rows so that each cell holds one.
     */
    static ReportTable summaryTable(AnalyteCensoring a) {
        List<CensoredSummary> s = a.routine().summaries();
        List<ReportColumn> columns = new ArrayList<>();
        columns.add(ReportColumn.text("Statistic", "statistic"));
        s.forEach(x -> columns.add(ReportColumn.number(x.method(), null, "").withNote()));
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(row("n", s, x -> Cell.count(x.n())));
        rows.add(row("Censored", s, x -> Cell.count(x.nCensored())));
        rows.add(row("Mean", s, x -> valueCell(x.mean())));
        rows.add(row("SE of mean", s, x -> x.mean().isAvailable() && !Double.isNaN(x.mean().standardError())
                ? Cell.significantNumber(x.mean().standardError(), DIGITS) : Cell.dash("not estimated")));
        rows.add(row("95 % CI of mean, lower", s, x -> x.mean().hasInterval()
                ? Cell.significantNumber(x.mean().lower(), DIGITS) : Cell.dash("not estimated")));
        rows.add(row("95 % CI of mean, upper", s, x -> x.mean().hasInterval()
                ? Cell.significantNumber(x.mean().upper(), DIGITS) : Cell.dash("not estimated")));
        rows.add(row("SD", s, x -> valueCell(x.sd())));
        rows.add(row("Median", s, x -> valueCell(x.median())));
        for (int i = 0; i < CensoredSummary.PROBABILITIES.length; i++) {
            int k = i;
            rows.add(row("P" + Math.round(100 * CensoredSummary.PROBABILITIES[i]), s,
                    x -> valueCell(percentile(x.percentiles(), k))));
        }
        String notes = s.stream().filter(x -> !x.notes().isEmpty())
                .map(x -> x.method() + ": " + String.join("; ", x.notes())).collect(Collectors.joining(". "));
        return ReportTable.typed("censored-summary-" + a.analyteLabel(),
                "Censored summary of " + a.analyteLabel() + ", routine samples", columns, rows,
                "Substitution columns are a comparison only. — = not estimated (see notes). " + notes);
    }

    private static Estimate percentile(List<Quantile> qs, int k) {
        return qs.get(k).estimate();
    }

    private static List<Cell> row(String label, List<CensoredSummary> s, Function<CensoredSummary, Cell> cell) {
        List<Cell> r = new ArrayList<>();
        r.add(Cell.text(label));
        s.forEach(x -> r.add(cell.apply(x)));
        return r;
    }

    /** The estimate with {@value #DIGITS} significant digits, or a dash with the reason in the CSV note. */
    static Cell valueCell(Estimate e) {
        return e.isAvailable() ? Cell.significantNumber(e.value(), DIGITS)
                : new Cell.NotComputed(e.note().isEmpty() ? "not estimated" : e.note(), "—");
    }

    private static Cell countAndShare(int k, int n) {
        Cell.Number count = Cell.fixedNumber(k, 0);
        if (n == 0) {
            return new Cell.Parts(java.util.Arrays.asList(count, null), "0");
        }
        Cell.Number share = Cell.fixedNumber(100.0 * k / n, 1);
        return new Cell.Parts(List.of(count, share), k + " (" + share.display() + " %)");
    }

    private static String list(List<Double> xs) {
        return xs.isEmpty() ? "none" : xs.stream().map(Numbers::compact).collect(Collectors.joining(", "));
    }

    private static String methods(Map<String, Integer> counts) {
        if (counts.isEmpty()) {
            return "none";
        }
        return counts.entrySet().stream().map(e -> (e.getKey().isEmpty() ? "not stated" : e.getKey()) + ": "
                + e.getValue()).collect(Collectors.joining(", "));
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
