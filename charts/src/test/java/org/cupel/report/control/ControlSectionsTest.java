package org.cupel.report.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.Batch;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.control.BatchGroups;
import org.cupel.control.BatchSequence;
import org.cupel.control.BatchVerdicts;
import org.cupel.control.BlankObservation;
import org.cupel.control.BlankReport;
import org.cupel.control.BlankReview;
import org.cupel.control.BlankSettings;
import org.cupel.control.ControlOutcome;
import org.cupel.control.InsertionRates;
import org.cupel.control.InsertionSettings;
import org.cupel.control.ReassayList;
import org.cupel.control.ReassaySettings;
import org.cupel.control.ResubmitEntry;
import org.cupel.control.ResubmitList;
import org.cupel.control.Verdict;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;
import org.junit.jupiter.api.Test;

/** The control sections format the core results faithfully (no computation of their own). */
class ControlSectionsTest {

    private static SampleTable table() {
        SampleTable.Builder b = SampleTable.builder();
        Batch j = new Batch("J1", "Lab", null, "j1.csv");
        String code = "RRCRRBRRRR";
        for (int i = 0; i < code.length(); i++) {
            QcRole role = code.charAt(i) == 'C' ? QcRole.CRM : code.charAt(i) == 'B' ? QcRole.BLANK : QcRole.ROUTINE;
            b.add("S" + (i + 1), j, i + 1, role, "", new SourceLocation("j1.csv", i + 2, 0));
        }
        return b.build();
    }

    private static ReportTable table(ReportSection s, String id) {
        return s.blocks().stream().filter(x -> x instanceof ReportBlock.Table).map(x -> ((ReportBlock.Table) x).table())
                .filter(t -> t.id().equals(id)).findFirst().orElseThrow();
    }

    @Test
    void verdictSectionListsBatchReasonsAndReassay() {
        SampleTable t = table();
        List<ControlOutcome> outs = List.of(
                new ControlOutcome(2, "Au", Verdict.PASS, "within 2 SD", "ok", false),
                new ControlOutcome(5, "Au", Verdict.FAIL, "blank > 5×DL", "S6 Au: 0.3 g/t is above 0.025 g/t", true));
        ReassayList r = ReassayList.build(t, outs, ReassaySettings.DEFAULTS);
        ReportSection s = VerdictSection.build(BatchGroups.of(t, BatchSequence.of(t), BatchVerdicts.judge(t, outs)), r,
                new ResubmitList(List.of()));
        ReportTable v = table(s, "batch-verdicts");
        assertEquals("fail", v.rows().get(0).get(3));
        assertEquals("S6 Au: 0.3 g/t is above 0.025 g/t [blank: blank > 5×DL]", v.rows().get(0).get(5));
        ReportTable re = table(s, "reassay-list");
        assertEquals(List.of("S7", "S8", "S9", "S10"), re.rows().stream().map(x -> x.get(0)).toList());
        assertEquals(1, s.headlines().get("batchesFailed"));
        assertEquals(4, s.headlines().get("reassayResults"));
        ReportTable act = table(s, "batches-to-act-on");
        assertEquals(List.of(List.of("J1", "fail", "Au", "S6", "blank", "blank > 5×DL", "fail",
                "S6 Au: 0.3 g/t is above 0.025 g/t")), act.rows(), "only the result that did not pass");
        assertTrue(((ReportBlock.Callout) s.blocks().get(0)).text().endsWith("Failed: J1."));
        assertEquals(List.of(), table(s, "resubmit-list").rows());
        assertTrue(s.blocks().indexOf(s.blocks().stream().filter(b -> b instanceof ReportBlock.Table x
                && x.table().id().equals("batches-to-act-on")).findFirst().orElseThrow())
                < s.blocks().indexOf(s.blocks().stream().filter(b -> b instanceof ReportBlock.Table x
                && x.table().id().equals("batch-verdicts")).findFirst().orElseThrow()), "failures lead");
    }

    @Test
    void verdictSectionCountsUmpireBatchesApartAndListsTheSamplesToResubmit() {
        SampleTable.Builder b = SampleTable.builder();
        Batch j = new Batch("J1", "Lab", null, "j1.csv");
        Batch u = new Batch("U1", "Check Lab", null, "u1.csv");
        b.add("S1", j, 1, QcRole.ROUTINE, "", new SourceLocation("j1.csv", 2, 0));
        b.add("S2", j, 2, QcRole.CRM, "K", new SourceLocation("j1.csv", 3, 0));
        b.add("S1U", u, 1, QcRole.UMPIRE, "S1", new SourceLocation("u1.csv", 2, 0));
        SampleTable t = b.build();
        List<ControlOutcome> outs = List.of(new ControlOutcome(1, "Au", Verdict.PASS, "within 2 SD", "ok", false));
        ResubmitList resubmit = new ResubmitList(List.of(new ResubmitEntry("S1", "J1", "Lab", 1, "routine",
                MissingReason.INSUFFICIENT_SAMPLE, List.of("IS"), List.of("Au"), new SourceLocation("j1.csv", 2, 0))));
        ReportSection s = VerdictSection.build(BatchGroups.of(t, BatchSequence.of(t), BatchVerdicts.judge(t, outs)),
                ReassayList.build(t, outs, ReassaySettings.DEFAULTS), resubmit);
        String verdict = ((ReportBlock.Callout) s.blocks().get(0)).text();
        // The umpire batch U1 has no control: among the primary batches it would be "could not be judged".
        assertTrue(verdict.startsWith("1 batches: 0 failed, 0 warned, 0 could not be judged;"), verdict);
        assertTrue(verdict.contains("1 samples to re-submit"), verdict);
        String umpire = ((ReportBlock.Callout) s.blocks().get(1)).text();
        assertTrue(umpire.startsWith("Umpire lab (Check Lab): 1 batch (U1), 1 check assays, not counted"), umpire);
        assertEquals(List.of("J1"), table(s, "batch-verdicts").rows().stream().map(r -> r.get(0)).toList());
        assertEquals(List.of(List.of("U1", "Check Lab", "1", "cannot judge")), table(s, "umpire-batches").rows());
        assertEquals(List.of(List.of("S1", "J1", "1", "routine", "Au", "IS", "insufficient sample", "j1.csv", "2")),
                table(s, "resubmit-list").rows());
        assertEquals(0, s.headlines().get("batchesNotJudged"));
        assertEquals(1, s.headlines().get("umpireBatches"));
        assertEquals(1L, s.headlines().get("resubmitInsufficient"));
    }

    @Test
    void blankSectionShowsFindingsWithPrecedingGrade() {
        BlankObservation o = new BlankObservation(5, "S6", "J1", 6, "Au", "g/t", AssayValue.detected(0.3, 0.005), 0.005,
                "S5", AssayValue.detected(25, 0.005));
        BlankReport rep = BlankReview.review(List.of(o), BlankSettings.DEFAULTS);
        ReportSection s = BlankSection.build(rep);
        List<String> row = table(s, "blank-findings").rows().get(0);
        // 0.3 / 0.005 = 60 × DL; 0.3 / 25 = 1.2 %; the unit has its own column, each number its own cell.
        assertEquals(List.of("S6", "g/t", "0.3", "60", "fail", "S5", "25", "1.2 %", "yes"),
                List.of(row.get(0), row.get(4), row.get(5), row.get(6), row.get(8), row.get(10), row.get(11),
                        row.get(12), row.get(13)));
        assertTrue(table(s, "blank-summary").note().contains("at least 3"));
        assertEquals(2, s.blocks().stream().filter(b -> b instanceof ReportBlock.Figure).count());
        String rules = ((ReportBlock.Paragraph) s.blocks().get(1)).text();
        // Cited author-year in the text, for the methods section's bibliography.
        assertTrue(rules.contains("Spearman 1904") && rules.contains("Zar 1972"), rules);
        assertTrue(rules.contains("5× the detection limit of its method (default)"), rules);
    }

    @Test
    void blankSectionSaysWhichThresholdTheUserSet() {
        BlankReport rep = BlankReview.review(List.of(), BlankSettings.withDefaults().failMultiple(10).build());
        ReportSection s = BlankSection.build(rep, org.cupel.config.CupelConfig.fromYaml("blanks:\n  failMultiple: 10\n",
                "cupel.yaml"));
        String rules = ((ReportBlock.Paragraph) s.blocks().get(1)).text();
        assertTrue(rules.contains("10× the detection limit of its method (user setting blanks.failMultiple; default 5×)"),
                rules);
    }

    @Test
    void insertionSectionFlagsBatchesBelowTarget() {
        InsertionRates r = InsertionRates.compute(table(), InsertionSettings.DEFAULTS);
        ReportTable tab = table(InsertionRateSection.build(r), "insertion-rates");
        // 1 CRM per 8 routine samples: 12.5 %; no duplicates: below target.
        assertEquals("1 (12.5 %)", tab.rows().get(0).get(3), "a rate as a percentage with one decimal");
        assertEquals("Field dup., Coarse dup., Pulp dup.", tab.rows().get(0).get(10));
        assertTrue(tab.note().contains("Targets: CRM 5.0 %, Blank 5.0 %, Field dup. 5.0 %"), tab.note());
        assertEquals("all batches", tab.rows().get(1).get(0));
    }
}
