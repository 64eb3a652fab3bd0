package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.SampleTable;
import org.cupel.config.CupelConfig;
import org.cupel.project.CrmCatalog;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.Project;
import org.junit.jupiter.api.Test;

/** Blank review over a constructed project: thresholds, carry-over pairing, outcomes (common practice). */
class BlankReviewTest {
    private static final double DL = 0.005;

    static Project project(Sequences s, String yaml) {
        SampleTable t = s.table();
        AnalyteColumn au = s.column(t);
        return new Project("test", null, yaml == null ? CupelConfig.defaults() : CupelConfig.fromYaml(yaml, "cupel.yaml"),
                t, Map.of("Au", au), CrmCatalog.empty(), new ExceptionRegister(), List.of());
    }

    private static Sequences planted() {
        return new Sequences().batch("J1", "RRBRRRBRRB")
                .au("J1-1", AssayValue.detected(0.4, DL)).au("J1-2", AssayValue.detected(25.0, DL))
                .au("J1-3", AssayValue.detected(0.3, DL)).au("J1-4", AssayValue.detected(0.2, DL))
                .au("J1-5", AssayValue.detected(0.1, DL)).au("J1-6", AssayValue.detected(0.08, DL))
                .au("J1-7", AssayValue.detected(0.02, DL)).au("J1-8", AssayValue.detected(0.05, DL))
                .au("J1-9", AssayValue.detected(0.2, DL)).au("J1-10", AssayValue.belowDetection(DL));
    }

    @Test
    void failingBlankAfterHighGradeIsCarryOver() {
        BlankReport r = BlankReview.review(project(planted(), null));
        assertEquals(3, r.results().size());
        BlankResult first = r.results().get(0);
        assertEquals("J1-3", first.observation().sampleId());
        assertEquals("J1-2", first.observation().precedingId());
        assertEquals(Verdict.FAIL, first.verdict().verdict());
        assertTrue(first.carryOver());
        // 0.3 / 25 = 0.012 exactly in decimal; 1e-15: one division.
        assertEquals(0.012, first.contaminationRatio(), 1e-15);
        assertTrue(first.outcome().triggersReassay());
        assertTrue(first.outcome().reason().contains("follows J1-2"), first.outcome().reason());

        BlankResult second = r.results().get(1);
        assertEquals(Verdict.WARN, second.verdict().verdict()); // 0.02 > 3×0.005, not > 5×0.005
        assertFalse(second.carryOver());
        assertFalse(second.outcome().triggersReassay());
        assertEquals(Verdict.PASS, r.results().get(2).verdict().verdict());
        assertEquals("blank not a detected value", r.results().get(2).ratioNote());

        BlankSummary s = r.summaries().get(0);
        assertEquals(List.of(3, 1, 1, 1, 0, 1), List.of(s.n(), s.pass(), s.warn(), s.fail(), s.cannotJudge(),
                s.carryOver()));
    }

    @Test
    void failingBlankAfterLowGradeIsNotCarryOver() {
        Sequences s = new Sequences().batch("J1", "RB").au("J1-1", AssayValue.detected(0.2, DL))
                .au("J1-2", AssayValue.detected(0.1, DL));
        BlankResult r = BlankReview.review(project(s, null)).results().get(0);
        assertEquals(Verdict.FAIL, r.verdict().verdict());
        // 0.2 < 10 × 0.025 = 0.25: below the high-grade level.
        assertFalse(r.carryOver());
    }

    @Test
    void blankOpeningTheBatchHasNoPrecedingSample() {
        Sequences s = new Sequences().batch("J1", "BR").au("J1-1", AssayValue.detected(0.002, DL))
                .au("J1-2", AssayValue.detected(3, DL));
        BlankResult r = BlankReview.review(project(s, null)).results().get(0);
        assertEquals("", r.observation().precedingId());
        assertEquals("first sample in the batch", r.ratioNote());
    }

    @Test
    void settingsComeFromTheBlanksSection() {
        BlankReport r = BlankReview.review(project(planted(), "blanks:\n  failMultiple: 10\n  warnMultiple: 5\n"));
        assertEquals(Verdict.FAIL, r.results().get(0).verdict().verdict()); // 0.3 > 0.05
        assertEquals(Verdict.PASS, r.results().get(1).verdict().verdict()); // 0.02 <= 0.025
    }

    @Test
    void absoluteThresholdFromTheConfig() {
        BlankReport r = BlankReview.review(project(planted(), "blanks:\n  absolute:\n    Au: {fail: 0.25}\n"));
        assertEquals(0.25, r.results().get(0).threshold().fail(), 0);
        assertEquals(Verdict.FAIL, r.results().get(0).verdict().verdict()); // 0.3 > 0.25
        assertEquals(Verdict.PASS, r.results().get(1).verdict().verdict()); // 0.02, no separate warning level
    }

    @Test
    void badSettingIsAConfigErrorNamingTheSection() {
        var e = org.junit.jupiter.api.Assertions.assertThrows(org.cupel.config.ConfigException.class,
                () -> BlankReview.review(project(planted(), "blanks:\n  failMultipel: 10\n")));
        assertTrue(e.getMessage().contains("'failMultipel' is not a setting of blanks; did you mean 'failMultiple'?"),
                e.getMessage());
    }

    @Test
    void missingLimitFallsBackToTheMethodLimit() {
        Sequences s = new Sequences().batch("J1", "RB").au("J1-1", AssayValue.detected(1.0, 0.01))
                .au("J1-2", AssayValue.detected(0.04));
        BlankResult r = BlankReview.review(project(s, null)).results().get(0);
        assertEquals(0.01, r.observation().detectionLimit(), 0);
        assertEquals(Verdict.WARN, r.verdict().verdict());
    }
}
