package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.assay.SampleTable;
import org.cupel.project.Project;
import org.junit.jupiter.api.Test;

/** The combined review: blank and CRM outcomes feed one set of verdicts and one re-assay list. */
class BatchReviewTest {

    @Test
    void blankAndCrmOutcomesCombine() {
        Sequences s = new Sequences().batch("J1", "RRBRRCRRBR").batch("J2", "RCRRBR")
                .au("J1-2", AssayValue.detected(25, 0.005)).au("J1-3", AssayValue.detected(0.3, 0.005))
                .au("J1-9", AssayValue.belowDetection(0.005)).au("J2-5", AssayValue.belowDetection(0.005));
        Project p = BlankReviewTest.project(s, "reassay:\n  scope: BRACKET\ninsertion:\n  crm: 0.2\n");
        SampleTable t = p.samples();
        List<ControlOutcome> crm = List.of(Sequences.outcome(t, "J1-6", Verdict.PASS),
                Sequences.outcome(t, "J2-2", Verdict.FAIL));
        BatchReview r = BatchReview.of(p, crm);
        assertEquals(List.of(Verdict.FAIL, Verdict.FAIL), r.verdicts().stream().map(BatchVerdict::verdict).toList());
        // Blank J1-3 failed: J1-4, J1-5 up to the next passing blank J1-9 (the CRM at 6 is skipped);
        // CRM J2-2 failed: from the batch start to the batch end, since J2 has no other CRM (the passing blank
        // J2-5 shows no contamination, not accuracy at grade, so it does not bound a CRM's bracket).
        assertEquals(List.of("J1-4", "J1-5", "J1-7", "J1-8", "J2-1", "J2-3", "J2-4", "J2-6"),
                r.reassay().entries().stream().map(ReassayEntry::sampleId).toList());
        assertTrue(r.anyBatchFailed());
        // insertion.crm 0.2 from the config: 1 CRM in 10 is below it.
        assertTrue(r.insertion().batches().get(0).rates().get(0).belowTarget());
        assertEquals(1, r.blanks().carryOverFindings().size());
    }
}
