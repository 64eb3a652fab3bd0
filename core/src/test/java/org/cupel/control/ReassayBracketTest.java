package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.SampleTable;
import org.cupel.config.CupelConfig;
import org.junit.jupiter.api.Test;

/**
 * What bounds a re-assay bracket (common practice): a failed CRM is bracketed by the nearest passing CRMs, since
 * a blank tests contamination at detection level and says nothing about accuracy at grade; a failed blank sends
 * back the samples after it until a passing blank shows the contamination has stopped, optionally at most N of
 * them. Hand-built run orders (R routine, C CRM, B blank; IDs batch-position).
 */
class ReassayBracketTest {

    private static List<String> ids(ReassayList list) {
        return list.entries().stream().map(ReassayEntry::sampleId).toList();
    }

    private static ReassayList run(SampleTable t, ReassaySettings s, Object... idAndVerdict) {
        List<ControlOutcome> outs = new ArrayList<>();
        for (int i = 0; i < idAndVerdict.length; i += 2) {
            outs.add(Sequences.outcome(t, (String) idAndVerdict[i], (Verdict) idAndVerdict[i + 1]));
        }
        return ReassayList.build(t, outs, s);
    }

    @Test
    void passingBlanksDoNotBoundAFailedCrm() {
        // J: R R C R B R C R B R C R — CRM 7 fails; passing CRMs at 3 and 11; passing blanks at 5 and 9.
        // Default: samples 4, 6, 8, 10 (between CRMs 3 and 11; blanks passed over, not listed themselves).
        SampleTable t = new Sequences().batch("J", "RRCRBRCRBRCR").table();
        Object[] outcomes = {"J-3", Verdict.PASS, "J-5", Verdict.PASS, "J-7", Verdict.FAIL, "J-9", Verdict.PASS,
            "J-11", Verdict.PASS};
        ReassayList l = run(t, ReassaySettings.DEFAULTS, outcomes);
        assertEquals(List.of("J-4", "J-6", "J-8", "J-10"), ids(l));
        assertEquals("from passing CRM J-3 to passing CRM J-11", l.brackets().get(0).note());
        assertEquals(ReassaySettings.CrmBracket.PASSING_CRM, l.crmBracket());
        // With crmBracket PASSING_CONTROL the blanks at 5 and 9 bound it: samples 6 and 8.
        ReassayList any = run(t, ReassaySettings.withDefaults()
                .crmBracket(ReassaySettings.CrmBracket.PASSING_CONTROL).build(), outcomes);
        assertEquals(List.of("J-6", "J-8"), ids(any));
        assertEquals("from passing control J-5 to passing control J-9", any.brackets().get(0).note());
    }

    @Test
    void aFailedCrmWithoutAPassingCrmAfterItReachesTheBatchEnd() {
        SampleTable t = new Sequences().batch("J", "RCRRBRR").table();
        ReassayList l = run(t, ReassaySettings.DEFAULTS, "J-2", Verdict.FAIL, "J-5", Verdict.PASS);
        assertEquals(List.of("J-1", "J-3", "J-4", "J-6", "J-7"), ids(l));
        assertTrue(l.brackets().get(0).note().contains("the end of the batch (no passing CRM after it)"),
                l.brackets().get(0).note());
    }

    @Test
    void aFailedBlankSendsBackTheSamplesAfterItUpToTheNextPassingBlankOrACap() {
        // J: R B R R C R R R B R — blank 2 fails, CRM 5 passes, blank 9 passes. Default: 3, 4, 6, 7, 8 (the CRM
        // does not end a blank's bracket; sample 1 before the blank is the likely source, not a victim).
        SampleTable t = new Sequences().batch("J", "RBRRCRRRBR").table();
        Object[] outcomes = {"J-2", Verdict.FAIL, "J-5", Verdict.PASS, "J-9", Verdict.PASS};
        assertEquals(List.of("J-3", "J-4", "J-6", "J-7", "J-8"), ids(run(t, ReassaySettings.DEFAULTS, outcomes)));
        // blankFollowing 3: the first three samples after the blank (the CRM between is not a sample): 3, 4, 6.
        ReassayList capped = run(t, ReassaySettings.withDefaults().blankFollowing(3).build(), outcomes);
        assertEquals(List.of("J-3", "J-4", "J-6"), ids(capped));
        ReassayBracket b = capped.brackets().get(0);
        assertEquals(List.of(3, 6, 3), List.of(b.fromPosition(), b.toPosition(), b.nSamples()));
        assertTrue(b.note().endsWith("at most 3 samples (reassay.blankFollowing)"), b.note());
        // A cap beyond the next passing blank changes nothing.
        assertEquals(List.of("J-3", "J-4", "J-6", "J-7", "J-8"), ids(run(t, ReassaySettings.withDefaults()
                .blankFollowing(20).build(), outcomes)));
    }

    @Test
    void settingsBindFromTheConfigAndRejectANegativeCap() {
        ReassaySettings s = CupelConfig.fromYaml("reassay:\n  crmBracket: PASSING_CONTROL\n  blankFollowing: 5\n",
                "cupel.yaml").section("reassay", ReassaySettings.class, ReassaySettings.DEFAULTS);
        assertEquals(ReassaySettings.CrmBracket.PASSING_CONTROL, s.crmBracket());
        assertEquals(5, s.blankFollowing());
        assertEquals(ReassaySettings.Scope.BRACKET, s.scope());
        org.junit.jupiter.api.Assertions.assertThrows(RuntimeException.class, () -> CupelConfig.fromYaml(
                "reassay:\n  blankFollowing: -1\n", "cupel.yaml").section("reassay", ReassaySettings.class,
                ReassaySettings.DEFAULTS));
    }
}
