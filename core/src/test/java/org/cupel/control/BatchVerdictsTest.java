package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.assay.Batch;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.junit.jupiter.api.Test;

/** Batch verdicts as the worst control outcome per analyte and over analytes (common practice). */
class BatchVerdictsTest {

    @Test
    void worstOutcomeDecidesAndReasonsNameTheControl() {
        SampleTable t = new Sequences().batch("J", "RCRB").batch("K", "RCRB").batch("L", "RRR").table();
        List<ControlOutcome> outs = List.of(
                Sequences.outcome(t, "J-2", Verdict.PASS), Sequences.outcome(t, "J-4", Verdict.WARN),
                Sequences.outcome(t, "K-2", Verdict.FAIL), Sequences.outcome(t, "K-4", Verdict.PASS),
                new ControlOutcome(t.rowOf("K-4").getAsInt(), "Cu", Verdict.PASS, "blank ≤ 3×DL", "ok", false));
        List<BatchVerdict> v = BatchVerdicts.judge(t, outs);
        assertEquals(List.of("J", "K", "L"), v.stream().map(BatchVerdict::batch).toList());
        assertEquals(List.of(Verdict.WARN, Verdict.FAIL, Verdict.CANNOT_JUDGE),
                v.stream().map(BatchVerdict::verdict).toList());
        // J has no Cu control: cannot judge Cu; Au warn is worse.
        assertEquals(Verdict.CANNOT_JUDGE, v.get(0).analytes().get(1).verdict());
        VerdictReason k = v.get(1).reasons().get(0);
        assertEquals(List.of("K-2", "CRM", "1-3s"), List.of(k.sampleId(), k.role(), k.rule()));
        assertEquals(2, v.get(1).analytes().get(0).nControls());
        assertTrue(BatchVerdicts.anyFailed(v));
        assertFalse(BatchVerdicts.anyFailed(v.subList(0, 1)));
    }

    @Test
    void rowsOfOneJobReadFromTwoFilesAreOneBatch() {
        // A re-assay file read first records the job with another file name; it is still one lab batch.
        SampleTable.Builder b = SampleTable.builder();
        Batch grav = new Batch("J1", "Lab", null, "J1-GRAV.csv");
        Batch main = new Batch("J1", "Lab", null, "J1.csv");
        b.add("S2", grav, 2, QcRole.ROUTINE, "", new SourceLocation("J1-GRAV.csv", 2, 0));
        b.add("S1", main, 1, QcRole.ROUTINE, "", new SourceLocation("J1.csv", 2, 0));
        b.add("B3", main, 3, QcRole.BLANK, "", new SourceLocation("J1.csv", 3, 0));
        b.add("S4", main, 4, QcRole.ROUTINE, "", new SourceLocation("J1.csv", 4, 0));
        SampleTable t = b.build();
        List<ControlOutcome> outs = List.of(new ControlOutcome(2, "Au", Verdict.FAIL, "blank > 5×DL", "B3", true));
        List<BatchVerdict> v = BatchVerdicts.judge(t, outs);
        assertEquals(1, v.size());
        assertEquals(4, v.get(0).nSamples());
        assertEquals(1, InsertionRates.compute(t, InsertionSettings.DEFAULTS).batches().size());
        BatchSequence seq = BatchSequence.of(t);
        assertEquals("S2", t.id(seq.preceding(2)));
    }
}
