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
import org.cupel.report.ReportBlock;
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
        List<List<String>> rows = new ArrayList<>();
        for (AnalyteCensoring a : analytes) {
            rows.add(List.of(a.analyteLabel(), list(a.detectionLimits()), list(a.upperLimits()),
                    Integer.toString(a.values()), count(a.below(), a.values()), count(a.above(), a.values()),
                    Integer.toString(a.missing()), methods(a.methodCounts())));
        }
        return new ReportTable("detection-limits", "Detection limits seen and censored values, all samples",
                List.of("Analyte", "Detection limits", "Upper limits", "Values", "Below detection", "Above range",
                        "Missing", "Reported values by method"), rows,
                "Limits as stated by the laboratory on each value; the method of each reported value as selected by "
                        + "the configured method priority, every other result kept in the data.");
    }

    /** Detection limits estimated from the project's blanks, each labelled with its definition in the note. */
    static ReportTable blankLimitsTable(List<AnalyteCensoring> analytes) {
        List<List<String>> rows = new ArrayList<>();
        for (AnalyteCensoring a : analytes) {
            BlankLimits b = a.blanks();
            if (b.n() == 0) {
                continue;
            }
            List<String> notes = new ArrayList<>();
            b.limits().stream().filter(l -> !l.value().note().isEmpty()).map(l -> l.name() + ": " + l.value().note())
                    .distinct().forEach(notes::add);
            rows.add(List.of(a.analyteLabel(), b.n() + " (" + b.detected() + " with a number, " + b.below()
                            + " below detection)", list(a.detectionLimits()), limit(b, "EPA MDL_b"), limit(b, "3·s"),
                    limit(b, "Currie L_C (t)"), limit(b, "Currie L_D (t)"), limit(b, "EPA MDL_s"),
                    b.sd().isAvailable() ? String.join("; ", notes) : b.sd().note()));
        }
        return new ReportTable("blank-detection-limits", "Detection limits estimated from the project's blanks",
                List.of("Analyte", "Blanks", "Stated detection limits", "EPA MDL_b", "3·s", "Currie L_C (t)",
                        "Currie L_D (t)", "EPA MDL_s", "Notes"), rows,
                "EPA MDL_b (US EPA, 40 CFR 136 App. B Rev. 2): the blank mean + t(n − 1, 0.99)·s when every blank has "
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

    private static String limit(BlankLimits b, String name) {
        return value(b.limit(name).value());
    }

    static ReportTable summaryTable(AnalyteCensoring a) {
        List<CensoredSummary> s = a.routine().summaries();
        List<String> columns = new ArrayList<>();
        columns.add("Statistic");
        s.forEach(x -> columns.add(x.method()));
        List<List<String>> rows = new ArrayList<>();
        rows.add(row("n", s, x -> Integer.toString(x.n())));
        rows.add(row("Censored", s, x -> Integer.toString(x.nCensored())));
        rows.add(row("Mean", s, x -> value(x.mean())));
        rows.add(row("SE of mean", s, x -> se(x.mean())));
        rows.add(row("95 % CI of mean", s, x -> ci(x.mean())));
        rows.add(row("SD", s, x -> value(x.sd())));
        rows.add(row("Median", s, x -> value(x.median())));
        for (int i = 0; i < CensoredSummary.PROBABILITIES.length; i++) {
            int k = i;
            rows.add(row("P" + Math.round(100 * CensoredSummary.PROBABILITIES[i]), s,
                    x -> value(percentile(x.percentiles(), k))));
        }
        String notes = s.stream().filter(x -> !x.notes().isEmpty())
                .map(x -> x.method() + ": " + String.join("; ", x.notes())).collect(Collectors.joining(". "));
        return new ReportTable("censored-summary-" + a.analyteLabel(),
                "Censored summary of " + a.analyteLabel() + ", routine samples", columns, rows,
                "Substitution columns are a comparison only. — = not estimated (see notes). " + notes);
    }

    private static Estimate percentile(List<Quantile> qs, int k) {
        return qs.get(k).estimate();
    }

    private static List<String> row(String label, List<CensoredSummary> s, Function<CensoredSummary, String> cell) {
        List<String> r = new ArrayList<>();
        r.add(label);
        s.forEach(x -> r.add(cell.apply(x)));
        return r;
    }

    static String value(Estimate e) {
        return e.isAvailable() ? Numbers.significant(e.value(), DIGITS) : "—";
    }

    private static String se(Estimate e) {
        return e.isAvailable() && !Double.isNaN(e.standardError()) ? Numbers.significant(e.standardError(), DIGITS)
                : "—";
    }

    private static String ci(Estimate e) {
        return e.hasInterval() ? Numbers.significant(e.lower(), DIGITS) + " – " + Numbers.significant(e.upper(), DIGITS)
                : "—";
    }

    private static String list(List<Double> xs) {
        return xs.isEmpty() ? "none" : xs.stream().map(Numbers::compact).collect(Collectors.joining(", "));
    }

    private static String count(int k, int n) {
        return n == 0 ? "0" : k + " (" + Numbers.compact(Math.round(1000.0 * k / n) / 10.0) + " %)";
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
