package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.SampleTable;
import org.junit.jupiter.api.Test;

/**
 * Re-assay brackets on constructed sequences. Source: common practice — re-assay the samples between the
 * failed CRM and the neighbouring passing control samples; after a contaminated blank, up to the next
 * passing blank.
 */
class ReassayListTest {

    private static List<String> ids(ReassayList list) {
        return list.entries().stream().map(ReassayEntry::sampleId).toList();
    }

    private static ReassayList run(SampleTable t, ReassaySettings.Scope scope, Object... idAndVerdict) {
        List<ControlOutcome> outs = new ArrayList<>();
        for (int i = 0; i < idAndVerdict.length; i += 2) {
            outs.add(Sequences.outcome(t, (String) idAndVerdict[i], (Verdict) idAndVerdict[i + 1]));
        }
        return ReassayList.build(t, outs, ReassaySettings.withDefaults().scope(scope).build());
    }

    @Test
    void failedCrmBetweenPassingCrms() {
        // The passing blank at 9 does not end the failed CRM's bracket: only a passing CRM does (the default
        // reassay.crmBracket: PASSING_CRM), so it reaches the batch end.
        SampleTable t = new Sequences().batch("J", "RRCRRCRRBRR").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-3", Verdict.PASS, "J-6", Verdict.FAIL,
                "J-9", Verdict.PASS);
        assertEquals(List.of("J-4", "J-5", "J-7", "J-8", "J-10", "J-11"), ids(l));
        ReassayBracket b = l.brackets().get(0);
        assertEquals(List.of(4, 11, 6), List.of(b.fromPosition(), b.toPosition(), b.nSamples()));
    }

    @Test
    void failedCrmFirstInBatchReachesBackToTheStart() {
        SampleTable t = new Sequences().batch("J", "CRRRCRR").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-1", Verdict.FAIL, "J-5", Verdict.PASS);
        assertEquals(List.of("J-2", "J-3", "J-4"), ids(l));
    }

    @Test
    void failedCrmLastInBatch() {
        SampleTable t = new Sequences().batch("J", "RRCRRC").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-3", Verdict.PASS, "J-6", Verdict.FAIL);
        assertEquals(List.of("J-4", "J-5"), ids(l));
    }

    @Test
    void noPassingControlAfterReachesTheEnd() {
        SampleTable t = new Sequences().batch("J", "RCRRCRR").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-2", Verdict.PASS, "J-5", Verdict.FAIL);
        assertEquals(List.of("J-3", "J-4", "J-6", "J-7"), ids(l));
    }

    @Test
    void consecutiveFailuresShareOneBracket() {
        SampleTable t = new Sequences().batch("J", "RCRRCRCRRCR").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-2", Verdict.PASS, "J-5", Verdict.FAIL,
                "J-7", Verdict.FAIL, "J-10", Verdict.PASS);
        assertEquals(List.of("J-3", "J-4", "J-6", "J-8", "J-9"), ids(l));
        assertEquals(List.of("J-5", "J-7"), l.entries().get(0).triggeredBy());
        assertEquals(2, l.brackets().size());
        assertEquals("CRM J-5 failed (1-3s); CRM J-7 failed (1-3s)", l.entries().get(0).reason());
    }

    @Test
    void warningControlBoundsTheBracket() {
        SampleTable t = new Sequences().batch("J", "RCRRCRRCR").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-2", Verdict.WARN, "J-5", Verdict.FAIL,
                "J-8", Verdict.CANNOT_JUDGE);
        // A warning does not fail its result; a control that cannot be judged does not bound the bracket.
        assertEquals(List.of("J-3", "J-4", "J-6", "J-7", "J-9"), ids(l));
    }

    @Test
    void failedBlankSendsBackTheSamplesUpToTheNextPassingBlank() {
        SampleTable t = new Sequences().batch("J", "RRBRRCRBRRBR").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-3", Verdict.FAIL, "J-6", Verdict.PASS,
                "J-8", Verdict.FAIL, "J-11", Verdict.PASS);
        // The passing CRM at 6 is not a blank, so it does not end the blank's bracket.
        assertEquals(List.of("J-4", "J-5", "J-7", "J-9", "J-10"), ids(l));
    }

    @Test
    void failedBlankLastInBatchSendsBackNothing() {
        SampleTable t = new Sequences().batch("J", "RRRB").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-4", Verdict.FAIL);
        assertEquals(List.of(), ids(l));
        assertEquals(0, l.brackets().get(0).nSamples());
    }

    @Test
    void duplicatesAreListedLabRepeatsAndUmpireChecksAreNot() {
        SampleTable t = new Sequences().batch("J", "CRFLPDUC").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-1", Verdict.FAIL, "J-8", Verdict.PASS);
        assertEquals(List.of("J-2", "J-3", "J-5", "J-6"), ids(l));
    }

    @Test
    void wholeBatchOption() {
        SampleTable t = new Sequences().batch("J", "RCRFBR").batch("K", "RRC").table();
        ReassayList l = run(t, ReassaySettings.Scope.WHOLE_BATCH, "J-2", Verdict.FAIL, "J-5", Verdict.PASS,
                "K-3", Verdict.PASS);
        assertEquals(List.of("J-1", "J-3", "J-4", "J-6"), ids(l));
    }

    @Test
    void otherBatchesAreUntouched() {
        SampleTable t = new Sequences().batch("J", "RCR").batch("K", "RCR").table();
        ReassayList l = run(t, ReassaySettings.Scope.BRACKET, "J-2", Verdict.FAIL, "K-2", Verdict.PASS);
        assertEquals(List.of("J-1", "J-3"), ids(l));
        assertEquals("J", l.entries().get(0).batch());
    }

    @Test
    void sampleCountCountsEachSampleOnceOverItsAnalytes() {
        // Three entries, two samples: S1 for Au and Ag, S2 for Au.
        ReassayList l = new ReassayList(List.of(
                new ReassayEntry("S1", "J", 1, "Au", List.of("C1"), "r"),
                new ReassayEntry("S1", "J", 1, "Ag", List.of("C1"), "r"),
                new ReassayEntry("S2", "J", 2, "Au", List.of("C1"), "r")), List.of(), ReassaySettings.Scope.BRACKET,
                ReassaySettings.CrmBracket.PASSING_CRM, 0);
        assertEquals(2, l.sampleCount());
    }
}
