package org.cupel.report.control;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cupel.assay.MissingReason;
import org.cupel.control.AnalyteVerdict;
import org.cupel.control.BatchGroups;
import org.cupel.control.BatchVerdict;
import org.cupel.control.BatchVerdicts;
import org.cupel.control.ReassayBracket;
import org.cupel.control.ReassayEntry;
import org.cupel.control.ReassayList;
import org.cupel.control.ReassaySettings;
import org.cupel.control.ResubmitEntry;
import org.cupel.control.ResubmitList;
import org.cupel.control.UmpireLab;
import org.cupel.control.Verdict;
import org.cupel.control.VerdictReason;
import org.cupel.report.BatchRanges;
import org.cupel.report.Cell;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportColumn;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;

/**
 * The verdict summary: every primary batch with pass / warn / fail and the reasons, the umpire-lab batches
 * apart, the re-assay list and the samples to re-submit.
 */
public final class VerdictSection {
    /** The section's title, which the summary names as the place of the lists. */
    public static final String TITLE = "Batch verdicts and re-assay list";

    private VerdictSection() {
    }

    /**
     * @param groups the batch verdicts, primary and umpire-lab batches apart
     * @param reassay the re-assay list
     * @param resubmit the samples the lab reported insufficient or not received
     */
    public static ReportSection build(BatchGroups groups, ReassayList reassay, ResubmitList resubmit) {
        List<ReportBlock> blocks = new ArrayList<>();
        List<BatchVerdict> verdicts = groups.primary();
        int failed = BatchVerdicts.count(verdicts, Verdict.FAIL);
        int warned = BatchVerdicts.count(verdicts, Verdict.WARN);
        int unjudged = BatchVerdicts.count(verdicts, Verdict.CANNOT_JUDGE);
        // Batches without a control result are not passing batches: with none judged, nothing passed.
        ReportBlock.Level level = failed > 0 ? ReportBlock.Level.FAIL : warned > 0 ? ReportBlock.Level.WARN
                : unjudged == verdicts.size() ? ReportBlock.Level.CANNOT_JUDGE : ReportBlock.Level.PASS;
        blocks.add(new ReportBlock.Callout(level, verdicts.size() + " batches: " + failed + " failed, " + warned + " warned, "
                + unjudged + " could not be judged; " + reassay.entries().size() + " sample results to re-assay; "
                + resubmit.entries().size() + " samples to re-submit."
                + batchList(verdicts, Verdict.FAIL, " Failed: ") + batchList(verdicts, Verdict.WARN, " Warned: ")));
        for (UmpireLab u : groups.umpireLabs()) {
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.INFO, umpireLine(u)));
        }
        blocks.add(new ReportBlock.Paragraph("A batch takes the worst verdict of its control results for each "
                + "analyte (fail over warn over cannot judge over pass), and the worst over analytes. A batch "
                + "without a control result for an analyte cannot be judged for it. Re-assay (common practice): "
                + scope(reassay) + " Re-submit: a sample the lab reported insufficient or not received has no "
                + "result to re-assay; it goes back to the lab from the coarse reject or a new split (common "
                + "practice)."));
        if (failed + warned > 0) {
            blocks.add(new ReportBlock.Table(actionTable(verdicts)));
        }
        blocks.add(new ReportBlock.Table(verdictTable(verdicts)));
        if (!groups.umpireLabs().isEmpty()) {
            blocks.add(new ReportBlock.Table(umpireTable(groups)));
        }
        blocks.add(new ReportBlock.Table(reassayTable(reassay)));
        if (!reassay.brackets().isEmpty()) {
            blocks.add(new ReportBlock.Table(bracketTable(reassay)));
        }
        blocks.add(new ReportBlock.Table(resubmitTable(resubmit)));
        Map<String, Object> headlines = new LinkedHashMap<>();
        headlines.put("batches", verdicts.size());
        headlines.put("batchesFailed", failed);
        headlines.put("batchesWarned", warned);
        headlines.put("batchesNotJudged", unjudged);
        headlines.put("umpireBatches", groups.umpireBatches());
        headlines.put("reassayResults", reassay.entries().size());
        headlines.put("reassaySamples", reassay.sampleCount());
        headlines.put("resubmitInsufficient", resubmit.count(MissingReason.INSUFFICIENT_SAMPLE));
        headlines.put("resubmitNotReceived", resubmit.count(MissingReason.NOT_RECEIVED));
        return new ReportSection("verdicts", TITLE, blocks, headlines);
    }

    /**
     * One umpire lab in a sentence: its batches are check assays of the primary lab's samples, judged by the
     * comparison of the two labs, and are not counted among the batches above.
     */
    public static String umpireLine(UmpireLab u) {
        int failed = BatchVerdicts.count(u.batches(), Verdict.FAIL);
        int warned = BatchVerdicts.count(u.batches(), Verdict.WARN);
        int judged = u.batches().size() - BatchVerdicts.count(u.batches(), Verdict.CANNOT_JUDGE);
        String controls = judged == 0 ? "they hold no CRM or blank of their own"
                : "by their own CRMs and blanks " + failed + " failed and " + warned + " warned";
        return "Umpire lab" + (u.lab().isEmpty() ? "" : " (" + u.lab() + ")") + ": " + u.batches().size()
                + (u.batches().size() == 1 ? " batch (" : " batches (")
                + BatchRanges.compact(u.batches().stream().map(BatchVerdict::batch).toList()) + "), "
                + u.checkAssays() + " check assays, not counted among the batches above; " + controls + ". The "
                + "check assays are compared with the primary lab under Duplicates and precision (umpire checks).";
    }

    private static String scope(ReassayList reassay) {
        if (reassay.scope() == ReassaySettings.Scope.WHOLE_BATCH) {
            return "every sample of a batch with a failed control (user setting reassay.scope: WHOLE_BATCH).";
        }
        String crm = reassay.crmBracket() == ReassaySettings.CrmBracket.PASSING_CRM
                ? "the nearest passing CRMs before and after it (a blank does not bound it: it tests contamination, "
                + "not accuracy at grade)"
                : "the nearest passing control samples, CRM or blank, before and after it (user setting "
                + "reassay.crmBracket: PASSING_CONTROL)";
        String blank = reassay.blankFollowing() > 0 ? ", at most " + reassay.blankFollowing() + " samples (user "
                + "setting reassay.blankFollowing)" : "";
        return "for a failed CRM, the samples between " + crm + "; for a failed blank, the samples after it up to "
                + "the next passing blank" + blank + ". Control samples are not listed; a warning does not fail a "
                + "control.";
    }

    static ReportTable umpireTable(BatchGroups groups) {
        List<List<String>> rows = new ArrayList<>();
        for (UmpireLab u : groups.umpireLabs()) {
            for (BatchVerdict v : u.batches()) {
                rows.add(List.of(v.batch(), v.lab(), Integer.toString(v.nSamples()), label(v.verdict())));
            }
        }
        return new ReportTable("umpire-batches", "Umpire-lab batches",
                List.of("Batch", "Lab", "Samples", "Verdict by own controls"), rows,
                "Batches of umpire checks (and at most CRMs and blanks): judged by the comparison with the primary "
                        + "lab, not counted among the batch verdicts.");
    }

    /** The samples to re-submit as a table; also printed by {@code cupel batches}. */
    public static ReportTable resubmitTable(ResubmitList resubmit) {
        List<List<String>> rows = new ArrayList<>();
        for (ResubmitEntry e : resubmit.entries()) {
            rows.add(List.of(e.sampleId(), e.batch(), Integer.toString(e.position()), e.role(),
                    String.join(", ", e.analytes()), String.join(", ", e.labCodes()), e.reasonText(),
                    e.source().file(), Long.toString(e.source().line())));
        }
        return new ReportTable("resubmit-list", "Samples to re-submit (reported insufficient or not received)",
                List.of("Sample ID", "Batch", "Position", "Role", "Analytes", "Lab code", "Reason", "File", "Line"),
                rows, rows.isEmpty() ? "The lab reported no sample insufficient or not received." : "");
    }

    static ReportTable verdictTable(List<BatchVerdict> verdicts) {
        List<List<Cell>> rows = new ArrayList<>();
        for (BatchVerdict v : verdicts) {
            List<String> per = new ArrayList<>();
            for (AnalyteVerdict a : v.analytes()) {
                per.add(a.analyte() + " " + label(a.verdict()) + " (" + a.nControls() + ")");
            }
            List<String> reasons = new ArrayList<>();
            for (VerdictReason r : v.reasons()) {
                reasons.add(reason(r));
            }
            rows.add(List.of(Cell.text(v.batch()), Cell.text(v.lab()), Cell.count(v.nSamples()),
                    Cell.text(label(v.verdict())), Cell.text(String.join("; ", per)),
                    Cell.text(String.join("; ", reasons))));
        }
        return ReportTable.typed("batch-verdicts", "Verdict per batch",
                List.of(ReportColumn.text("Batch", "batch"), ReportColumn.text("Lab", "lab"),
                        ReportColumn.count("Samples", "samples"), ReportColumn.text("Verdict", "verdict"),
                        ReportColumn.text("Per analyte (control results)", "per_analyte"),
                        ReportColumn.text("Reasons", "reasons")), rows,
                "Reasons list every control result that did not pass, with the rule that decided it.");
    }

    private static String batchList(List<BatchVerdict> verdicts, Verdict verdict, String label) {
        List<String> ids = verdicts.stream().filter(v -> v.verdict() == verdict).map(BatchVerdict::batch).toList();
        return ids.isEmpty() ? "" : label + String.join(", ", ids) + ".";
    }

    /**
     * The batches a reviewer acts on, failed before warned, one row per control result that did not pass,
     * so that each reason reads on its own line.
     */
    static ReportTable actionTable(List<BatchVerdict> verdicts) {
        List<List<String>> rows = new ArrayList<>();
        for (Verdict level : List.of(Verdict.FAIL, Verdict.WARN)) {
            for (BatchVerdict v : verdicts) {
                if (v.verdict() != level) {
                    continue;
                }
                for (AnalyteVerdict a : v.analytes()) {
                    for (VerdictReason r : a.reasons()) {
                        if (r.verdict() == Verdict.FAIL || r.verdict() == Verdict.WARN) {
                            rows.add(List.of(v.batch(), label(v.verdict()), r.analyte(), r.sampleId(), r.role(),
                                    r.rule(), label(r.verdict()), r.reason()));
                        }
                    }
                }
            }
        }
        return new ReportTable("batches-to-act-on", "Failed and warned batches",
                List.of("Batch", "Batch verdict", "Analyte", "Control", "Role", "Rule", "Result", "Reason"), rows,
                "Failed batches first, then warned ones; one row per control result that did not pass.");
    }

    /** The re-assay list as a table; also written by {@code cupel batches --reassay-csv}. */
    public static ReportTable reassayTable(ReassayList reassay) {
        List<List<Cell>> rows = new ArrayList<>();
        for (ReassayEntry e : reassay.entries()) {
            rows.add(List.of(Cell.text(e.sampleId()), Cell.text(e.batch()), Cell.count(e.position()),
                    Cell.text(e.analyte()), Cell.text(String.join(", ", e.triggeredBy())), Cell.text(e.reason())));
        }
        return ReportTable.typed("reassay-list", "Re-assay list",
                List.of(ReportColumn.text("Sample ID", "sample_id"), ReportColumn.text("Batch", "batch"),
                        ReportColumn.count("Position", "position"), ReportColumn.text("Analyte", "analyte"),
                        ReportColumn.text("Triggered by", "triggered_by"), ReportColumn.text("Reason", "reason")), rows,
                rows.isEmpty() ? "No control failure calls for re-assay." : "");
    }

    static ReportTable bracketTable(ReassayList reassay) {
        List<List<Cell>> rows = new ArrayList<>();
        for (ReassayBracket b : reassay.brackets()) {
            rows.add(List.of(Cell.text(b.controlId()), Cell.text(b.role()), Cell.text(b.batch()), Cell.text(b.analyte()),
                    Cell.text(b.rule()), b.nSamples() == 0 ? new Cell.Parts(java.util.Arrays.asList(null, null), "none")
                            : new Cell.Parts(List.of(Cell.fixedNumber(b.fromPosition(), 0),
                            Cell.fixedNumber(b.toPosition(), 0)), b.fromPosition() + "–" + b.toPosition()),
                    Cell.count(b.nSamples()), Cell.text(b.note())));
        }
        return ReportTable.typed("reassay-brackets", "Re-assay brackets per failed control",
                List.of(ReportColumn.text("Failed control", "failed_control"), ReportColumn.text("Role", "role"),
                        ReportColumn.text("Batch", "batch"), ReportColumn.text("Analyte", "analyte"),
                        ReportColumn.text("Rule", "rule"), ReportColumn.parts("Positions", "position",
                                new ReportColumn.Part("from", "", ReportColumn.CsvType.LONG),
                                new ReportColumn.Part("to", "", ReportColumn.CsvType.LONG)),
                        ReportColumn.count("Samples", "samples"), ReportColumn.text("Bounded by", "bounded_by")),
                rows, "");
    }

    /** The reason as its source wrote it (it names the sample), then the control's role and rule. */
    public static String reason(VerdictReason r) {
        return r.sampleId().isEmpty() ? r.reason() : r.reason() + " [" + r.role() + ": " + r.rule() + "]";
    }

    public static String label(Verdict v) {
        return v == Verdict.CANNOT_JUDGE ? "cannot judge" : v.name().toLowerCase(Locale.ROOT);
    }
}
