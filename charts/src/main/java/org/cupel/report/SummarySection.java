package org.cupel.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.control.BatchReview;
import org.cupel.control.BatchVerdict;
import org.cupel.control.BatchVerdicts;
import org.cupel.control.ResubmitEntry;
import org.cupel.control.UmpireLab;
import org.cupel.control.Verdict;
import org.cupel.control.VerdictReason;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.SeriesReview;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.PrecisionSummary;
import org.cupel.duplicates.RuleOutcome;
import org.cupel.recovery.RecoveryResult;
import org.cupel.report.control.CrmSection;
import org.cupel.report.control.VerdictSection;
import org.cupel.report.duplicates.DuplicatesSection;
import org.cupel.report.recovery.TestworkSection;

/**
 * The first section of the appendix: the verdict in plain words, for the reader who signs it. Batches
 * accepted, failed and warned (with why), the umpire lab on its own line, the samples to re-assay and to
 * re-submit and where their lists are, precision per duplicate type, bias per CRM, and the recovery
 * findings. It formats the results the core analyses returned and the sentences the other sections use;
 * it computes nothing.
 */
public final class SummarySection {
    public static final String ID = "summary";
    public static final String TITLE = "Summary";
    /** Samples to re-submit named in the text; the rest are counted and left to the table. */
    static final int RESUBMIT_NAMED = 20;

    private SummarySection() {
    }

    public static ReportSection build(BatchReview batches, CrmReview crms, List<DuplicateReport> duplicates,
                                      Optional<RecoveryResult> testwork) {
        List<ReportBlock> blocks = new ArrayList<>();
        Map<String, Object> headlines = new LinkedHashMap<>();
        batchBlocks(batches, blocks, headlines);
        umpireBlocks(batches, duplicates, blocks);
        listBlocks(batches, blocks, headlines);
        precisionBlocks(duplicates, blocks, headlines);
        crmBlocks(crms, blocks, headlines);
        testwork.ifPresent(r -> blocks.addAll(TestworkSection.findings(r)));
        return new ReportSection(ID, TITLE, blocks, headlines);
    }

    private static void batchBlocks(BatchReview review, List<ReportBlock> blocks, Map<String, Object> headlines) {
        List<BatchVerdict> primary = review.groups().primary();
        int failed = BatchVerdicts.count(primary, Verdict.FAIL);
        int warned = BatchVerdicts.count(primary, Verdict.WARN);
        int unjudged = BatchVerdicts.count(primary, Verdict.CANNOT_JUDGE);
        List<String> accepted = ids(primary, Verdict.PASS);
        ReportBlock.Level level = failed > 0 ? ReportBlock.Level.FAIL : warned > 0 ? ReportBlock.Level.WARN
                : unjudged == primary.size() ? ReportBlock.Level.CANNOT_JUDGE : ReportBlock.Level.PASS;
        String labs = String.join(", ", primary.stream().map(BatchVerdict::lab).filter(l -> !l.isEmpty())
                .distinct().toList());
        blocks.add(new ReportBlock.Callout(level, primary.size() + (primary.size() == 1 ? " batch" : " batches")
                + (labs.isEmpty() ? "" : " from " + labs) + ", judged by their CRMs and blanks: " + accepted.size()
                + " accepted, " + failed + " failed, " + warned + " warned, " + unjudged + " could not be judged."));
        blocks.add(new ReportBlock.Paragraph("Accepted (" + accepted.size() + "): "
                + (accepted.isEmpty() ? "none" : BatchRanges.compact(accepted)) + "."));
        if (failed + warned + unjudged > 0) {
            blocks.add(new ReportBlock.Table(actionTable(primary)));
        }
        headlines.put("batches", primary.size());
        headlines.put("batchesAccepted", accepted.size());
        headlines.put("batchesFailed", failed);
        headlines.put("batchesWarned", warned);
        headlines.put("batchesNotJudged", unjudged);
        headlines.put("failedBatches", ids(primary, Verdict.FAIL));
        headlines.put("warnedBatches", ids(primary, Verdict.WARN));
        headlines.put("umpireBatches", review.groups().umpireBatches());
        headlines.put("umpireCheckAssays", review.groups().umpireLabs().stream().mapToInt(UmpireLab::checkAssays)
                .sum());
    }

    /** Failed, then warned, then unjudged batches, one row each with why. */
    static ReportTable actionTable(List<BatchVerdict> primary) {
        List<List<String>> rows = new ArrayList<>();
        for (Verdict level : List.of(Verdict.FAIL, Verdict.WARN, Verdict.CANNOT_JUDGE)) {
            for (BatchVerdict v : primary) {
                if (v.verdict() == level) {
                    rows.add(List.of(v.batch(), VerdictSection.label(level), why(v)));
                }
            }
        }
        return new ReportTable("summary-batches", "Batches failed, warned or not judged, and why",
                List.of("Batch", "Verdict", "Why"), rows, "Every control result behind each verdict is listed under "
                        + VerdictSection.TITLE + ".");
    }

    /** The reasons of the batch's own verdict, then how many milder ones it also has. */
    private static String why(BatchVerdict v) {
        List<String> own = new ArrayList<>();
        int milder = 0;
        for (VerdictReason r : v.reasons()) {
            if (r.verdict() == v.verdict()) {
                own.add(r.reason());
            } else if (r.verdict() == Verdict.WARN) {
                milder++;
            }
        }
        String more = milder == 0 ? "" : " (also " + milder + (milder == 1 ? " warning)" : " warnings)");
        return String.join("; ", own) + more;
    }

    private static void listBlocks(BatchReview review, List<ReportBlock> blocks, Map<String, Object> headlines) {
        long samples = review.reassay().sampleCount();
        int results = review.reassay().entries().size();
        String reassayCsv = csv("reassay-list");
        // An empty list is a note, not a pass: with no control sample, nothing fails and nothing is shown sound.
        blocks.add(new ReportBlock.Callout(samples == 0 ? ReportBlock.Level.INFO : ReportBlock.Level.WARN,
                samples == 0 ? "Re-assay: no control failure calls for re-assay."
                        : "Re-assay: " + samples + " samples" + (results == samples ? ""
                        : " (" + results + " results by analyte)") + ", listed under "
                        + VerdictSection.TITLE + " (table Re-assay list) and in " + reassayCsv + "."));
        List<ResubmitEntry> resubmit = review.resubmit().entries();
        String resubmitCsv = csv("resubmit-list");
        blocks.add(resubmit.isEmpty()
                ? new ReportBlock.Callout(ReportBlock.Level.INFO, "Re-submit: the lab reported no sample insufficient "
                        + "or not received.")
                : new ReportBlock.Callout(ReportBlock.Level.WARN, "Re-submit " + resubmit.size() + " samples the lab "
                        + "returned without a result (re-assay cannot help: the material is short or missing). "
                        + resubmitText(resubmit) + " Listed under " + VerdictSection.TITLE + " and in " + resubmitCsv
                        + "."));
        headlines.put("reassaySamples", samples);
        headlines.put("reassayResults", results);
        headlines.put("reassayList", reassayCsv);
        headlines.put("resubmitList", resubmitCsv);
        List<Map<String, Object>> listed = new ArrayList<>();
        for (ResubmitEntry e : resubmit) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("sampleId", e.sampleId());
            m.put("batch", e.batch());
            m.put("analytes", e.analytes());
            m.put("labCodes", e.labCodes());
            m.put("reason", e.reasonText());
            listed.add(m);
        }
        headlines.put("resubmit", listed);
    }

    /** "Insufficient sample (IS): VH1 (J1), VH2 (J4). Not received (NR): VH3 (J2)." */
    static String resubmitText(List<ResubmitEntry> entries) {
        List<String> parts = new ArrayList<>();
        int named = 0;
        for (MissingReason reason : List.of(MissingReason.INSUFFICIENT_SAMPLE, MissingReason.NOT_RECEIVED)) {
            List<ResubmitEntry> mine = entries.stream().filter(e -> e.reason() == reason).toList();
            if (mine.isEmpty()) {
                continue;
            }
            Set<String> codes = new LinkedHashSet<>();
            List<String> samples = new ArrayList<>();
            for (ResubmitEntry e : mine) {
                codes.addAll(e.labCodes());
                if (named < RESUBMIT_NAMED) {
                    samples.add(e.sampleId() + " (" + e.batch() + ")");
                    named++;
                }
            }
            int rest = mine.size() - samples.size();
            String label = mine.get(0).reasonText();
            parts.add(Character.toUpperCase(label.charAt(0)) + label.substring(1)
                    + (codes.isEmpty() ? "" : " (" + String.join(", ", codes) + ")") + ": "
                    + String.join(", ", samples) + (rest > 0 ? (samples.isEmpty() ? "" : " and ") + rest + " more" : "")
                    + ".");
        }
        return String.join(" ", parts);
    }

    private static void precisionBlocks(List<DuplicateReport> reports, List<ReportBlock> blocks,
                                        Map<String, Object> headlines) {
        if (reports.isEmpty()) {
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.CANNOT_JUDGE, "Precision: no duplicate pairs were "
                    + "found."));
            return;
        }
        Map<String, Object> precision = new LinkedHashMap<>();
        for (QcRole type : QcRole.values()) {
            if (!type.isDuplicate() || type == QcRole.UMPIRE) {
                continue;
            }
            List<String> parts = new ArrayList<>();
            List<RuleOutcome> rules = new ArrayList<>();
            Map<String, Object> byAnalyte = new LinkedHashMap<>();
            for (DuplicateReport r : reports) {
                for (DuplicateSetResult set : r.sets()) {
                    if (set.type() == type) {
                        PrecisionSummary p = set.precision();
                        parts.add(r.analyte() + ": " + DuplicatesSection.ruleText(p));
                        rules.add(p.rule());
                        byAnalyte.put(r.analyte(), precisionFigures(p));
                    }
                }
            }
            if (!rules.isEmpty()) {
                blocks.add(new ReportBlock.Callout(level(rules), "Precision, " + type.label() + "s — "
                        + String.join("; ", parts) + "."));
                precision.put(type.label(), byAnalyte);
            }
        }
        headlines.put("precision", precision);
    }

    /**
     * Each umpire lab on its own line, and the bias of the umpire checks against the primary lab per analyte
     * (the umpire duplicate set pools every umpire lab): on the lab's line when there is one umpire lab, else
     * on a line of its own.
     */
    private static void umpireBlocks(BatchReview review, List<DuplicateReport> reports, List<ReportBlock> blocks) {
        List<String> parts = new ArrayList<>();
        boolean significant = false;
        for (DuplicateReport r : reports) {
            for (DuplicateSetResult set : r.sets()) {
                if (set.type() == QcRole.UMPIRE && set.bias().n() > 0) {
                    parts.add(r.analyte() + ": " + set.bias().verdict()
                            + (set.bias().significant() ? ", a significant bias" : ""));
                    significant |= set.bias().significant();
                }
            }
        }
        String bias = parts.isEmpty() ? "" : "Umpire checks against the primary lab — " + String.join("; ", parts)
                + ".";
        ReportBlock.Level level = significant ? ReportBlock.Level.WARN : ReportBlock.Level.INFO;
        List<UmpireLab> labs = review.groups().umpireLabs();
        for (UmpireLab u : labs) {
            blocks.add(new ReportBlock.Callout(level, VerdictSection.umpireLine(u)
                    + (labs.size() == 1 && !bias.isEmpty() ? " " + bias : "")));
        }
        if (labs.size() != 1 && !bias.isEmpty()) {
            blocks.add(new ReportBlock.Callout(level, bias));
        }
    }

    private static Map<String, Object> precisionFigures(PrecisionSummary p) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("pairsUsed", p.usedRelative());
        m.put("percentWithinHardLimit", p.percentWithinLimit().available() ? p.percentWithinLimit().value() : null);
        m.put("hardLimitPercent", 100 * p.hardLimit());
        m.put("acceptancePercent", p.acceptancePercent());
        m.put("rmsCvPercent", p.rmsCv().available() ? 100 * p.rmsCv().value() : null);
        m.put("rmsCvLowPercent", p.rmsCv().hasInterval() ? 100 * p.rmsCv().ciLow() : null);
        m.put("rmsCvHighPercent", p.rmsCv().hasInterval() ? 100 * p.rmsCv().ciHigh() : null);
        m.put("rule", p.rule().name());
        return m;
    }

    /** Fail when an analyte fails the rule, pass when one passes and none fails, else cannot judge. */
    private static ReportBlock.Level level(List<RuleOutcome> rules) {
        return rules.contains(RuleOutcome.FAIL) ? ReportBlock.Level.FAIL
                : rules.contains(RuleOutcome.PASS) ? ReportBlock.Level.PASS : ReportBlock.Level.CANNOT_JUDGE;
    }

    private static void crmBlocks(CrmReview crms, List<ReportBlock> blocks, Map<String, Object> headlines) {
        if (crms.series().isEmpty()) {
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.CANNOT_JUDGE, "CRM bias: no CRM result, so the "
                    + "accuracy of the lab cannot be judged."));
            return;
        }
        Map<String, List<SeriesReview>> byCrm = new LinkedHashMap<>();
        crms.series().forEach(s -> byCrm.computeIfAbsent(s.crm(), k -> new ArrayList<>()).add(s));
        Map<String, Object> bias = new LinkedHashMap<>();
        for (Map.Entry<String, List<SeriesReview>> e : byCrm.entrySet()) {
            List<String> parts = new ArrayList<>();
            boolean flagged = false;
            long failures = 0;
            long warnings = 0;
            long swaps = 0;
            Map<String, Object> byAnalyte = new LinkedHashMap<>();
            for (SeriesReview s : e.getValue()) {
                parts.add(s.analyte().name() + " " + CrmSection.biasText(s.bias()) + " (n = " + s.bias().n() + ")"
                        + (s.drift().drifting() ? ", drifting" : ""));
                boolean significant = Double.isFinite(s.bias().meanLowPct()) && !s.bias().certifiedInsideMeanInterval();
                flagged |= significant || s.drift().drifting() || s.warnings() > 0 || s.swaps() > 0;
                failures += s.failures();
                warnings += s.warnings();
                swaps += s.swaps();
                byAnalyte.put(s.analyte().name(), crmFigures(s, significant));
            }
            ReportBlock.Level level = failures > 0 ? ReportBlock.Level.FAIL
                    : flagged ? ReportBlock.Level.WARN : ReportBlock.Level.PASS;
            blocks.add(new ReportBlock.Callout(level, "CRM " + e.getKey() + ", mean bias against the certified value — "
                    + String.join("; ", parts) + ". Control rules: " + failures + " failed, " + warnings + " warned"
                    + (swaps > 0 ? ", " + swaps + " probable swaps" : "") + "."));
            bias.put(e.getKey(), byAnalyte);
        }
        headlines.put("crmBias", bias);
    }

    private static Map<String, Object> crmFigures(SeriesReview s, boolean significant) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("n", s.bias().n());
        m.put("meanBiasPercent", finite(s.bias().meanBiasPct()));
        m.put("lowPercent", finite(s.bias().meanLowPct()));
        m.put("highPercent", finite(s.bias().meanHighPct()));
        m.put("significant", significant);
        m.put("failures", s.failures());
        m.put("drifting", s.drift().drifting());
        return m;
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    private static List<String> ids(List<BatchVerdict> verdicts, Verdict v) {
        return verdicts.stream().filter(b -> b.verdict() == v).map(BatchVerdict::batch).toList();
    }

    /** Where a table of the appendix is written (its ID is unique in the report, so its name is not changed). */
    private static String csv(String tableId) {
        return "tables/" + FileNames.safe(tableId) + ".csv";
    }
}
