package org.cupel.report.duplicates;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Predicate;
import java.util.stream.Stream;
import org.cupel.charts.duplicates.DuplicateFigures;
import org.cupel.duplicates.BatchPrecision;
import org.cupel.duplicates.BiasResult;
import org.cupel.duplicates.ControlLineCheck;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.duplicates.Estimate;
import org.cupel.duplicates.ExclusionReason;
import org.cupel.duplicates.GradePrecision;
import org.cupel.duplicates.ModelFit;
import org.cupel.duplicates.OrphanDuplicate;
import org.cupel.duplicates.OutlierPair;
import org.cupel.duplicates.PrecisionModelResult;
import org.cupel.duplicates.PrecisionSummary;
import org.cupel.duplicates.RmaFit;
import org.cupel.duplicates.RuleOutcome;
import org.cupel.duplicates.TestResult;
import org.cupel.report.Bibliography;
import org.cupel.report.Cell;
import org.cupel.report.Reference;
import org.cupel.report.ReportColumn;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;

/** The duplicates section of the QC appendix, formatted from the core duplicate results. */
public final class DuplicatesSection {
    /** The sources of the section's formulas, for "Methods and references" (entries of the one bibliography). */
    static final List<Reference> REFERENCES = Stream.of("shaw1997", "stanley2007", "stanley2008", "thompson1978",
            "iso5725", "millerkahn1962", "wilcoxon1945", "efron1993", "nistsematech").map(Bibliography::get).toList();

    /** Outlier rows listed per set; the rest are counted. */
    public static final int OUTLIERS_LISTED = 50;

    private DuplicatesSection() {
    }

    /**
     * @param reports one per analyte
     * @param userSet whether a config key ("duplicates.pulpHardLimitPercent") was set by the user, for labels
     */
    public static ReportSection build(List<DuplicateReport> reports, Predicate<String> userSet) {
        List<ReportBlock> blocks = new ArrayList<>();
        Map<String, Object> headlines = new LinkedHashMap<>();
        blocks.add(new ReportBlock.Paragraph("Precision of duplicate assays by type and analyte: share of pairs "
                + "within the type's HARD limit (HARD = |a − b|/(a + b), Shaw 1997), RMS CV (Stanley & Lawie 2007), "
                + "repeatability s_r and r = 2.8·s_r (ISO 5725), the concentration-dependent precision by "
                + "Thompson–Howarth and by the unbiased RMS SD regression (Stanley & Lawie 2008), and bias between "
                + "duplicates and originals (reduced major axis after Miller & Kahn 1962, paired t and Wilcoxon "
                + "signed-rank tests)."));
        if (reports.isEmpty()) {
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.INFO, "No duplicate pairs were found."));
        } else {
            blocks.add(new ReportBlock.Paragraph(settingsText(reports.get(0).settings(), userSet)));
        }
        for (DuplicateReport report : reports) {
            analyteBlocks(report, blocks, headlines);
        }
        return new ReportSection("duplicates", "Duplicates and precision", blocks, headlines, REFERENCES);
    }

    private static void analyteBlocks(DuplicateReport report, List<ReportBlock> blocks, Map<String, Object> headlines) {
        String a = report.analyte();
        blocks.add(new ReportBlock.Paragraph(a + ": " + report.detectionLimits() + "."));
        for (DuplicateSetResult set : report.sets()) {
            PrecisionSummary p = set.precision();
            ReportBlock.Level level = p.rule() == RuleOutcome.FAIL ? ReportBlock.Level.FAIL
                    : p.rule() == RuleOutcome.PASS ? ReportBlock.Level.PASS : ReportBlock.Level.INFO;
            blocks.add(new ReportBlock.Callout(level, a + " " + set.type().label() + "s: " + ruleText(p)));
            String key = a + "." + typeKey(set);
            headlines.put(key + ".pairsUsed", p.usedRelative());
            if (p.percentWithinLimit().available()) {
                headlines.put(key + ".percentWithinLimit", round(p.percentWithinLimit().value(), 1));
            }
            if (p.rmsCv().available()) {
                headlines.put(key + ".rmsCvPercent", round(100 * p.rmsCv().value(), 2));
            }
            headlines.put(key + ".rule", p.rule().name());
            headlines.put(key + ".batchesFailingRule", set.batches().stream().filter(BatchPrecision::failsRule).count());
            headlines.put(key + ".batchesTooFewPairs", set.batches().stream().filter(BatchPrecision::tooFewPairs)
                    .count());
            headlines.put(key + ".batchesLessPrecise",
                    set.batches().stream().filter(BatchPrecision::lessPrecise).count());
            if (set.bias().meanRelativeBias().available()) {
                headlines.put(key + ".meanRelativeBiasPercent", round(100 * set.bias().meanRelativeBias().value(), 2));
            }
        }
        blocks.add(new ReportBlock.Table(precisionTable(report)));
        blocks.add(new ReportBlock.Table(batchTable(report)));
        List<BatchPrecision> flagged = report.sets().stream().flatMap(x -> x.batches().stream())
                .filter(BatchPrecision::lessPrecise).toList();
        if (!flagged.isEmpty()) {
            StringBuilder sb = new StringBuilder(a + ": batches significantly less precise than their set: ");
            for (int i = 0; i < flagged.size(); i++) {
                BatchPrecision b = flagged.get(i);
                sb.append(i == 0 ? "" : "; ").append(b.batch().isEmpty() ? "(no batch)" : b.batch()).append(" (")
                        .append(b.precision().type().label()).append(", ")
                        .append("RMS CV ").append(pct2(b.precision().rmsCv().value())).append(", ")
                        .append(fmt(b.dispersion().ratio(), 2)).append("× the set's, p = ")
                        .append(p(b.dispersion().pValue())).append(')');
            }
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.FAIL, sb.toString()));
        }
        blocks.add(new ReportBlock.Table(modelTable(report)));
        for (DuplicateSetResult set : report.sets()) {
            if (set.model().available() && !set.model().fitNote().isEmpty()) {
                blocks.add(new ReportBlock.Callout(ReportBlock.Level.WARN, a + " " + set.type().label() + "s: "
                        + set.model().fitNote() + "."));
            }
        }
        ReportTable grades = gradeTable(report);
        if (!grades.rows().isEmpty()) {
            blocks.add(new ReportBlock.Table(grades));
        }
        blocks.add(new ReportBlock.Table(biasTable(report)));
        for (DuplicateSetResult set : report.sets()) {
            if (set.bias().n() > 0) {
                blocks.add(new ReportBlock.Callout(set.bias().significant() ? ReportBlock.Level.WARN
                        : ReportBlock.Level.INFO, a + " " + set.type().label() + "s: " + set.bias().verdict()));
            }
        }
        blocks.add(new ReportBlock.Table(outlierTable(report)));
        if (!report.orphans().isEmpty()) {
            blocks.add(new ReportBlock.Table(orphanTable(report)));
        }
        if (!report.sets().isEmpty()) {
            figures(report, blocks);
        }
    }

    private static void figures(DuplicateReport r, List<ReportBlock> blocks) {
        String stem = "duplicates-" + r.analyte();
        String types = DuplicateFigures.typePanels(r);
        String last = DuplicateFigures.summaryLetter(r);
        blocks.add(new ReportBlock.Figure(stem + "-pairs", r.analyte() + " duplicates, original against duplicate: "
                + types + " on log axes, with the 1:1 line, the type's HARD-limit lines and, for umpire checks, the "
                + "reduced major axis; the pairs beyond the HARD limit are marked. " + last + " Ranked HARD of every "
                + "type, with a marker where each curve meets its type's limit and the rule's required share.",
                () -> DuplicateFigures.pairs(r)));
        blocks.add(new ReportBlock.Figure(stem + "-bias", r.analyte() + " duplicates, relative difference "
                + "(duplicate − original) / pair mean against pair mean: " + types + ", with the mean and its 95 % "
                + "interval and the HARD limit; the pairs beyond it are marked. " + last + " Mean relative bias of "
                + "every type with its 95 % interval.", () -> DuplicateFigures.bias(r)));
        blocks.add(new ReportBlock.Figure(stem + "-precision", r.analyte() + " duplicates, Thompson–Howarth plots of "
                + "|original − duplicate| against pair mean: " + types + ", with the group medians, the fitted model "
                + "and its 90 % and 99 % control lines; the pairs above the 99 % line are marked. " + last
                + " Precision 2σc/c by grade from each type's model.", () -> DuplicateFigures.precision(r)));
    }

    static String settingsText(DuplicateSettings s, Predicate<String> userSet) {
        return String.format(Locale.ROOT, "Acceptance: %s of pairs within HARD %s (field), %s (coarse reject), %s "
                        + "(pulp), %s (lab repeat), %s (umpire) — %s. Pairs with a below-detection member are %s; "
                        + "pairs with mean below %s× the detection limit are left out of relative measures (%s). "
                        + "Intervals: %d bootstrap resamples, seed %d, for statistics over up to %d pairs; above that, "
                        + "large-sample normal intervals (HC3 standard errors for the precision models). "
                        + "Thompson–Howarth: groups of %d, at least %d pairs.",
                compact(s.acceptancePercent()) + " %", compact(s.fieldHardLimitPercent()) + " %",
                compact(s.coarseHardLimitPercent()) + " %", compact(s.pulpHardLimitPercent()) + " %",
                compact(s.labRepeatHardLimitPercent()) + " %", compact(s.umpireHardLimitPercent()) + " %",
                anyUserSet(userSet, "duplicates.acceptancePercent", "duplicates.fieldHardLimitPercent",
                        "duplicates.coarseHardLimitPercent", "duplicates.pulpHardLimitPercent",
                        "duplicates.labRepeatHardLimitPercent", "duplicates.umpireHardLimitPercent")
                        ? "user settings" : "common practice defaults, not a published standard",
                s.censoredAtHalfLimit() ? "taken at half the limit in relative measures" : "not used in relative "
                        + "measures", compact(s.limitMultipleOfDetection()),
                userSet.test("duplicates.limitMultipleOfDetection") ? "user setting" : "common practice default",
                s.bootstrapResamples(), s.bootstrapSeed(), s.bootstrapMaxPairs(), s.thGroupSize(), s.thMinimumPairs());
    }

    private static boolean anyUserSet(Predicate<String> userSet, String... keys) {
        for (String k : keys) {
            if (userSet.test(k)) {
                return true;
            }
        }
        return false;
    }

    /** The acceptance rule's outcome and the RMS CV of one set, in a sentence (also used by the summary). */
    public static String ruleText(PrecisionSummary p) {
        if (p.rule() == RuleOutcome.NOT_JUDGED) {
            return "not judged: " + p.percentWithinLimit().note();
        }
        return String.format(Locale.ROOT, "%s of %d pairs within HARD %s (rule: %s%%) — %s; RMS CV %s",
                pct1(p.percentWithinLimit().value() / 100), p.usedRelative(), pct0(p.hardLimit()),
                compact(p.acceptancePercent()), p.rule() == RuleOutcome.PASS ? "pass" : "fail", estimatePct(p.rmsCv()));
    }

    private static ReportTable precisionTable(DuplicateReport r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (DuplicateSetResult s : r.sets()) {
            PrecisionSummary p = s.precision();
            rows.add(List.of(Cell.text(s.type().label()), Cell.count(p.pairs()), Cell.count(p.usedRelative()),
                    Cell.text(exclusions(p.excludedRelative())), Cell.percent(100 * p.hardLimit(), 0),
                    percentCell(p.percentWithinLimit(), 1), Cell.text(ruleWord(p.rule())),
                    percentInterval(p.rmsCv()), p.meanCv().available() ? Cell.percent(100 * p.meanCv().value(), 2)
                            : Cell.notComputed(p.meanCv().note()),
                    significantCell(p.repeatabilitySd(), 4), significantCell(p.repeatabilityLimit(), 4)));
        }
        return ReportTable.typed("duplicates-precision-" + r.analyte(), r.analyte() + ": precision by duplicate type",
                List.of(ReportColumn.text("Type", "type"), ReportColumn.count("Pairs", "pairs"),
                        ReportColumn.count("Used (relative)", "pairs_used_relative"),
                        ReportColumn.text("Excluded (reason: n)", "excluded"),
                        ReportColumn.number("HARD limit", "hard_limit", "%"),
                        ReportColumn.number("% within limit", "within_limit", "%").withNote(),
                        ReportColumn.text("Rule", "rule"),
                        ReportColumn.interval("RMS CV (95 % CI)", "rms_cv", "%").withNote(),
                        ReportColumn.number("Mean CV (biased low)", "mean_cv", "%").withNote(),
                        ReportColumn.number("s_r (" + r.unit() + ")", "s_r", r.unit()).withNote(),
                        ReportColumn.number("r = 2.8·s_r (" + r.unit() + ")", "r", r.unit()).withNote()), rows,
                "RMS CV after Stanley & Lawie (2007); the arithmetic mean CV is shown only for comparison, it is "
                        + "biased low. s_r and r over pairs with two detected values (ISO 5725-2, -6).");
    }

    private static ReportTable batchTable(DuplicateReport r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (DuplicateSetResult s : r.sets()) {
            for (BatchPrecision b : s.batches()) {
                PrecisionSummary p = b.precision();
                rows.add(List.of(Cell.text(b.batch().isEmpty() ? "(no batch)" : b.batch()), Cell.text(s.type().label()),
                        Cell.count(p.pairs()), Cell.count(p.usedRelative()), percentCell(p.percentWithinLimit(), 1),
                        Cell.text(ruleWord(p.rule())),
                        b.rule().n() > 0 ? Cell.pValue(b.rule().pValue()) : Cell.notComputed(b.rule().note()),
                        p.rmsCv().available() ? Cell.percent(100 * p.rmsCv().value(), 2)
                                : Cell.notComputed(p.rmsCv().note()),
                        b.dispersion().available() ? Cell.significant(b.dispersion().ratio(), 3) : Cell.blank(),
                        b.dispersion().available() ? Cell.pValue(b.dispersion().pValue())
                                : Cell.notComputed(b.dispersion().note()),
                        Cell.text(b.lessPrecise() ? "less precise than the set" : "")));
            }
        }
        return ReportTable.typed("duplicates-batches-" + r.analyte(), r.analyte() + ": precision by batch",
                List.of(ReportColumn.text("Batch", "batch"), ReportColumn.text("Type", "type"),
                        ReportColumn.count("Pairs", "pairs"), ReportColumn.count("Used (relative)", "pairs_used_relative"),
                        ReportColumn.number("% within limit", "within_limit", "%").withNote(),
                        ReportColumn.text("Rule", "rule"),
                        ReportColumn.number("p (binomial)", "p_binomial", "").withNote(),
                        ReportColumn.number("RMS CV", "rms_cv", "%").withNote(),
                        ReportColumn.number("RMS CV / set's", "rms_cv_ratio_to_set", ""),
                        ReportColumn.number("p (chi-square)", "p_chi_square", "").withNote(),
                        ReportColumn.text("Flag", "flag")), rows,
                "A batch has few pairs, and one wide pair moves its share by tens of points, so it fails the rule "
                        + "only when the one-sided exact binomial test rejects \"share within the HARD limit ≥ the "
                        + "required share\" (p below duplicates.batchRuleAlpha, default 0.05); a share below the rule "
                        + "that the test cannot show is \"too few pairs\" (to judge), not a failure. The chi-square "
                        + "test of the batch's RMS CV against the set's (NIST/SEMATECH e-Handbook 7.2.3.1) flags a batch that is "
                        + "significantly less precise; it assumes one relative error over the grade range, and with "
                        + "many batches about 1 in 100 is flagged by chance at the default level.");
    }

    private static ReportTable modelTable(DuplicateReport r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (DuplicateSetResult s : r.sets()) {
            PrecisionModelResult m = s.model();
            if (!m.available()) {
                rows.add(List.of(Cell.text(s.type().label()), Cell.text("—"), Cell.notComputed(m.note()), Cell.blank(),
                        Cell.blank(), Cell.blank(), Cell.blank(), Cell.blank(), Cell.blank(), Cell.text("")));
                continue;
            }
            for (ModelFit f : List.of(m.thompsonHowarth(), m.rmsRegression())) {
                boolean th = f == m.thompsonHowarth();
                String notes = String.join("; ", java.util.stream.Stream.of(f.constraint(), th ? m.fitNote() : "")
                        .filter(x -> !x.isEmpty()).toList());
                rows.add(List.of(Cell.text(s.type().label()), Cell.text(f.method()), significantInterval(f.sigma0(), 4),
                        significantInterval(f.k(), 4), Cell.significant(f.rSquared(), 3),
                        Cell.count(m.groups().groups()), Cell.count(m.groups().dropped()),
                        th ? line(m.line90()) : Cell.blank(), th ? line(m.line99()) : Cell.blank(), Cell.text(notes)));
            }
        }
        ReportColumn.Part count = new ReportColumn.Part("", "", ReportColumn.CsvType.LONG);
        ReportColumn.Part expected = new ReportColumn.Part("expected", "", ReportColumn.CsvType.DOUBLE);
        ReportColumn.Part p = new ReportColumn.Part("p", "", ReportColumn.CsvType.DOUBLE);
        return ReportTable.typed("duplicates-model-" + r.analyte(), r.analyte() + ": precision model σ_c = σ₀ + k·c",
                List.of(ReportColumn.text("Type", "type"), ReportColumn.text("Method", "method"),
                        ReportColumn.interval("σ₀ (" + r.unit() + ", 95 % CI)", "sigma0", r.unit()).withNote(),
                        ReportColumn.interval("k (95 % CI)", "k", "").withNote(), ReportColumn.number("R²", "r_squared", ""),
                        ReportColumn.count("Groups", "groups"), ReportColumn.count("Pairs dropped", "pairs_dropped"),
                        ReportColumn.parts("Above 90 % line (expected; p)", "above_90_line", count, expected, p),
                        ReportColumn.parts("Above 99 % line (expected; p)", "above_99_line", count, expected, p),
                        ReportColumn.text("Notes", "notes")),
                rows,
                "Thompson–Howarth (1978): pairs sorted by mean (runs of equal means in a fixed pseudo-random order), "
                        + "groups of 11 from the lowest, median |d| regressed on group mean by least squares with "
                        + "σ₀ ≥ 0 and k ≥ 0, scaled by 1.048358. RMS SD regression: group √(Σd²/2n) on group mean "
                        + "(Stanley & Lawie 2008), unbiased when errors are not normal, same bounds. p: binomial "
                        + "upper tail of the exceedance count; a p below 0.01 says the model does not fit. "
                        + "See docs/duplicates.md.");
    }

    private static ReportTable gradeTable(DuplicateReport r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (DuplicateSetResult s : r.sets()) {
            for (GradePrecision g : s.model().atGrades()) {
                rows.add(List.of(Cell.text(s.type().label()), new Cell.Number(g.grade(), compact(g.grade()),
                        compact(g.grade())), percentInterval(g.thompsonHowarth()), percentInterval(g.rmsRegression())));
            }
        }
        return ReportTable.typed("duplicates-grades-" + r.analyte(),
                r.analyte() + ": precision P_c = 2σ_c/c at chosen grades",
                List.of(ReportColumn.text("Type", "type"), ReportColumn.number("Grade (" + r.unit() + ")", "grade", r.unit()),
                        ReportColumn.interval("Thompson–Howarth (95 % CI)", "precision_thompson_howarth", "%").withNote(),
                        ReportColumn.interval("RMS SD regression (95 % CI)", "precision_rms_sd_regression", "%").withNote()),
                rows, "Grades: the project's CRM grades unless set in duplicates.precisionGrades.");
    }

    private static ReportTable biasTable(DuplicateReport r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (DuplicateSetResult s : r.sets()) {
            BiasResult b = s.bias();
            RmaFit rma = b.rma();
            rows.add(List.of(Cell.text(s.type().label()), Cell.count(b.n()),
                    rma.available() ? Cell.interval(Cell.significantNumber(rma.slope(), 4), rma.slopeCi95()[0],
                            rma.slopeCi95()[1], x -> Cell.significantNumber(x, 4)) : Cell.notComputed(rma.note()),
                    rma.available() ? Cell.interval(Cell.significantNumber(rma.intercept(), 4), rma.interceptCi95()[0],
                            rma.interceptCi95()[1], x -> Cell.significantNumber(x, 4)) : Cell.blank(),
                    signedPercentInterval(b.meanRelativeBias()), test(b.pairedT()), test(b.wilcoxon())));
        }
        return ReportTable.typed("duplicates-bias-" + r.analyte(), r.analyte() + ": bias of duplicate against original",
                List.of(ReportColumn.text("Type", "type"), ReportColumn.count("Pairs", "pairs"),
                        ReportColumn.interval("RMA slope (95 % CI)", "rma_slope", "").withNote(),
                        ReportColumn.interval("RMA intercept (" + r.unit() + ", 95 % CI)", "rma_intercept", r.unit()),
                        ReportColumn.interval("Mean relative bias (95 % CI)", "mean_relative_bias", "%").withNote(),
                        ReportColumn.number("Paired t p", "p_paired_t", "").withNote(),
                        ReportColumn.number("Wilcoxon p", "p_wilcoxon", "").withNote()), rows,
                "Reduced major axis after Miller & Kahn (1962); relative bias = mean of (duplicate − original)/pair "
                        + "mean with a Student-t interval. For umpire checks the duplicate is the second lab.");
    }

    private static ReportTable outlierTable(DuplicateReport r) {
        List<List<Cell>> rows = new ArrayList<>();
        int more = 0;
        for (DuplicateSetResult s : r.sets()) {
            more += outlierRows(s, s.outliers(), o -> Cell.percent(100 * o.hard(), 1), rows);
            String notJudged = "not used: mean < " + compact(s.precision().limitMultiple()) + "× DL";
            more += outlierRows(s, s.outliersBelowRelativeThreshold(), o -> Cell.notComputed(notJudged), rows);
        }
        return ReportTable.typed("duplicates-outliers-" + r.analyte(), r.analyte() + ": pairs flagged",
                List.of(ReportColumn.text("Type", "type"), ReportColumn.text("Original ID", "original_id"),
                        ReportColumn.text("Duplicate ID", "duplicate_id"), ReportColumn.text("Batch", "batch"),
                        ReportColumn.assay("Original (" + r.unit() + ")", "original", r.unit()),
                        ReportColumn.assay("Duplicate (" + r.unit() + ")", "duplicate", r.unit()),
                        ReportColumn.number("HARD", "hard", "%").withNote(), ReportColumn.text("Flagged by", "flagged_by")),
                rows, "Values as the lab reported them. Per type, the pairs used in relative measures come first, "
                        + "largest HARD first; then the pairs "
                        + "whose mean is below the detection-limit multiple, which are not judged or ranked by HARD and "
                        + "are flagged only by the Thompson–Howarth 99 % line, largest |d| first."
                        + (more > 0 ? " " + more + " further flagged pairs not listed (the first " + OUTLIERS_LISTED
                        + " of each list per type are shown)." : ""));
    }

    /** Adds up to {@link #OUTLIERS_LISTED} rows of {@code list}, original first; returns how many were left out. */
    private static int outlierRows(DuplicateSetResult s, List<OutlierPair> list,
                                   java.util.function.Function<OutlierPair, Cell> hard, List<List<Cell>> rows) {
        for (OutlierPair o : list.subList(0, Math.min(OUTLIERS_LISTED, list.size()))) {
            rows.add(List.of(Cell.text(s.type().label()), Cell.text(o.originalId()), Cell.text(o.id()),
                    Cell.text(o.batch()), Cell.assay(o.originalValue()), Cell.assay(o.duplicateValue()), hard.apply(o),
                    Cell.text(o.testLabels())));
        }
        return Math.max(0, list.size() - OUTLIERS_LISTED);
    }

    private static ReportTable orphanTable(DuplicateReport r) {
        List<List<String>> rows = new ArrayList<>();
        for (OrphanDuplicate o : r.orphans()) {
            rows.add(List.of(o.id(), o.type().label(), o.batch(), o.originalId(), o.reason()));
        }
        return new ReportTable("duplicates-unpaired-" + r.analyte(), r.analyte() + ": duplicates without an original",
                List.of("Duplicate ID", "Type", "Batch", "Original ID given", "Why not paired"), rows,
                "Fix the original sample ID in the sample register, or add the original's assay.");
    }

    private static String exclusions(Map<ExclusionReason, Integer> m) {
        if (m.isEmpty()) {
            return "none";
        }
        StringBuilder sb = new StringBuilder();
        for (ExclusionReason e : ExclusionReason.values()) {
            Integer n = m.get(e);
            if (n != null) {
                sb.append(sb.length() == 0 ? "" : "; ").append(e.label()).append(": ").append(n);
            }
        }
        return sb.toString();
    }

    private static Cell line(ControlLineCheck c) {
        Cell.Number count = Cell.fixedNumber(c.exceedances(), 0);
        Cell.Number expected = Cell.fixedNumber(c.expected(), 1);
        Cell.Number p = (Cell.Number) (Double.isFinite(c.pValue()) ? Cell.pValue(c.pValue()) : null);
        return new Cell.Parts(java.util.Arrays.asList(count, expected, p), String.format(Locale.ROOT,
                "%d (%.1f; p = %s)", c.exceedances(), c.expected(), p(c.pValue())));
    }

    private static Cell test(TestResult t) {
        return t.available() ? Cell.pValue(t.pValue()) : Cell.notComputed(t.note());
    }

    private static String p(double p) {
        return p < 0.001 ? "< 0.001" : String.format(Locale.ROOT, "%.3f", p);
    }

    private static String ruleWord(RuleOutcome r) {
        return r.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    /** A share in percent ({@code 95.2 %}), or why it is not computable. */
    private static Cell percentCell(Estimate e, int decimals) {
        return e.available() ? Cell.percent(e.value(), decimals) : Cell.notComputed(e.note());
    }

    private static Cell significantCell(Estimate e, int digits) {
        return e.available() ? Cell.significant(e.value(), digits) : Cell.notComputed(e.note());
    }

    /** A fraction as a percentage with two decimals and its interval, or why it is not computable. */
    private static Cell percentInterval(Estimate e) {
        if (!e.available()) {
            return Cell.notComputed(e.note());
        }
        return Cell.interval(Cell.percentNumber(100 * e.value(), 2), 100 * e.ciLow(), 100 * e.ciHigh(),
                x -> Cell.percentNumber(x, 2));
    }

    /** A signed fraction (a bias) as a percentage with its interval: the sign is the finding. */
    private static Cell signedPercentInterval(Estimate e) {
        if (!e.available()) {
            return Cell.notComputed(e.note());
        }
        return Cell.interval(Cell.signedPercentNumber(100 * e.value(), 2), 100 * e.ciLow(), 100 * e.ciHigh(),
                x -> Cell.signedPercentNumber(x, 2));
    }

    private static Cell significantInterval(Estimate e, int digits) {
        if (!e.available()) {
            return Cell.notComputed(e.note());
        }
        return Cell.interval(Cell.significantNumber(e.value(), digits), e.ciLow(), e.ciHigh(),
                x -> Cell.significantNumber(x, digits));
    }

    private static String estimatePct(Estimate e) {
        return percentInterval(e).display();
    }

    private static String typeKey(DuplicateSetResult s) {
        return s.type().name().toLowerCase(Locale.ROOT);
    }

    private static String fmt(double v, int significant) {
        return org.cupel.assay.Numbers.significant(v, significant);
    }

    private static String compact(double v) {
        return org.cupel.assay.Numbers.compact(v);
    }

    private static double round(double v, int decimals) {
        double f = Math.pow(10, decimals);
        return Math.round(v * f) / f;
    }

    private static String pct0(double fraction) {
        return String.format(Locale.ROOT, "%.0f %%", 100 * fraction);
    }

    private static String pct1(double fraction) {
        return String.format(Locale.ROOT, "%.1f %%", 100 * fraction);
    }

    private static String pct2(double fraction) {
        return String.format(Locale.ROOT, "%.2f %%", 100 * fraction);
    }
}
