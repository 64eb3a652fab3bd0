package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.cupel.assay.AssayValue;
import org.cupel.config.CupelConfig;
import org.cupel.control.ControlOutcome;
import org.cupel.control.Verdict;
import org.junit.jupiter.api.Test;

class CrmReviewTest {
    private static final LocalDate D0 = LocalDate.of(2025, 3, 3);

    /** Three CRMs over six weekly batches, read out of date order, with planted problems. */
    private static CrmFixture planted() {
        CrmFixture f = new CrmFixture().certificate("LOW", 0.50, 0.03).certificate("MID", 2.50, 0.10)
                .certificate("HIGH", 6.80, 0.25);
        for (int b = 6; b >= 1; b--) {
            f.batch("B" + b, D0.plusWeeks(b));
        }
        double[] low = {0.51, 0.49, 2.48, 0.50, 0.52, 0.48};   // batch 3: MID material in the LOW slot
        double[] mid = {2.52, 2.45, 2.55, 2.73, 2.72, 2.49};   // batches 4 and 5: 2-2s
        double[] high = {6.75, 6.90, 7.70, 6.70, 0.012, 6.85}; // batch 3: 1-3s; batch 5: blank in the slot
        for (int b = 6; b >= 1; b--) {
            String id = "B" + b;
            f.routine(id + "-01", id, 1, 1.0);
            f.crm(id + "-L", id, 2, "LOW", low[b - 1]);
            f.routine(id + "-02", id, 3, 3.0);
            f.crm(id + "-M", id, 4, "MID", mid[b - 1]);
            f.crm(id + "-H", id, 5, "HIGH", high[b - 1]);
        }
        f.crm("B6-X", "B6", 6, "LOW", AssayValue.belowDetection(0.01));
        f.crm("B6-U", "B6", 7, "ZZ-99", 1.23);
        return f;
    }

    private static Map<String, ControlOutcome> byId(CrmReview r, org.cupel.project.Project p) {
        return r.outcomes().stream().collect(Collectors.toMap(o -> p.samples().id(o.row()), o -> o));
    }

    @Test
    void seriesAreInDateThenPositionOrder() {
        CrmReview r = CrmReview.of(planted().project());
        SeriesReview mid = r.series("MID", "Au").orElseThrow();
        assertEquals(List.of("B1-M", "B2-M", "B3-M", "B4-M", "B5-M", "B6-M"),
                mid.results().stream().map(x -> x.point().sampleId()).toList());
        // z = (x − certified)/SD: (2.73 − 2.50)/0.10 = 2.3 (ISO 13528 questionable band).
        assertEquals(2.3, mid.results().get(3).z(), 1e-9);
        assertEquals(ZBand.QUESTIONABLE, mid.results().get(3).band());
    }

    @Test
    void defaultRulesGiveFailWarnAndPass() {
        var p = planted().project();
        CrmReview r = CrmReview.of(p);
        Map<String, ControlOutcome> o = byId(r, p);
        // Westgard et al. 1981: 1-2s warning on the first of the pair, 2-2s rejection on the second.
        assertEquals(Verdict.WARN, o.get("B4-M").verdict());
        assertEquals("1-2s", o.get("B4-M").rule());
        assertEquals(Verdict.FAIL, o.get("B5-M").verdict());
        assertEquals("1-2s, 2-2s", o.get("B5-M").rule());
        assertTrue(o.get("B5-M").triggersReassay());
        // (7.70 − 6.80)/0.25 = 3.6 > 3: 1-3s.
        assertEquals(Verdict.FAIL, o.get("B3-H").verdict());
        assertTrue(o.get("B3-H").rule().contains("1-3s"));
        assertEquals(Verdict.PASS, o.get("B1-L").verdict());
        assertFalse(o.get("B1-L").triggersReassay());
    }

    @Test
    void plantedSwapsAreWarningsNotFailures() {
        var p = planted().project();
        CrmReview r = CrmReview.of(p);
        Map<String, ControlOutcome> o = byId(r, p);
        // 2.48 in the LOW slot is 66 SD from LOW and 0.2 SD from MID (Smee et al. 2024: mix-up, not lab error).
        assertEquals(Verdict.WARN, o.get("B3-L").verdict());
        assertEquals(CrmReview.SWAP_RULE, o.get("B3-L").rule());
        assertFalse(o.get("B3-L").triggersReassay());
        assertTrue(o.get("B3-L").reason().contains("CRM MID"));
        // 0.012 g/t with DL 0.005 is ≤ 5×DL: a blank in the HIGH slot.
        assertEquals(CrmReview.SWAP_RULE, o.get("B5-H").rule());
        SeriesReview low = r.series("LOW", "Au").orElseThrow();
        assertEquals("MID", low.results().get(2).swapWith());
        assertEquals(1, low.swaps());
        assertEquals(SwapCheck.BLANK, r.series("HIGH", "Au").orElseThrow().results().get(4).swapWith());
        // Swaps are left out of bias: LOW mean of the five true results (0.51+0.49+0.50+0.52+0.48)/5 = 0.50.
        assertEquals(5, low.bias().n());
        assertEquals(0.0, low.bias().meanBiasPct(), 1e-9);
        assertEquals(2, r.swaps());
    }

    @Test
    void censoredAndUnknownCodesAreExceptionsThatCannotBeJudged() {
        var p = planted().project();
        CrmReview r = CrmReview.of(p);
        Map<String, ControlOutcome> o = byId(r, p);
        assertEquals(Verdict.CANNOT_JUDGE, o.get("B6-X").verdict());
        assertEquals("censored CRM result", o.get("B6-X").rule());
        assertEquals(Verdict.CANNOT_JUDGE, o.get("B6-U").verdict());
        assertEquals("unknown CRM code", o.get("B6-U").rule());
        assertEquals(2, r.exceptions().size());
        assertEquals(18 + 2, r.outcomes().size());
    }

    @Test
    void optionalRulesAreSwitchedOnFromTheConfig() {
        var cfg = CupelConfig.fromYaml("crm:\n  rules:\n    R-4s: fail\n    1-2s: off\n", "cupel.yaml");
        CrmFixture f = new CrmFixture().certificate("LOW", 0.50, 0.03).certificate("MID", 2.50, 0.10);
        f.batch("B1", D0);
        f.crm("L1", "B1", 1, "LOW", 0.57);  // z = +2.33
        f.crm("M1", "B1", 2, "MID", 2.27);  // z = −2.3
        var p = f.project(cfg);
        CrmReview r = CrmReview.of(p);
        Map<String, ControlOutcome> o = byId(r, p);
        assertEquals(Verdict.PASS, o.get("L1").verdict());
        assertEquals(Verdict.FAIL, o.get("M1").verdict());
        assertEquals("R-4s", o.get("M1").rule());
        RuleFinding finding = r.series("MID", "Au").orElseThrow().findings().get(0);
        assertEquals(List.of("L1", "M1"), finding.involved());
    }

    @Test
    void anUnknownRuleIdInTheConfigIsAnErrorNamingIt() {
        var cfg = CupelConfig.fromYaml("crm:\n  rules:\n    9-9s: fail\n", "cupel.yaml");
        var p = planted().project(cfg);
        var e = org.junit.jupiter.api.Assertions.assertThrows(org.cupel.config.ConfigException.class,
                () -> CrmReview.of(p));
        assertTrue(e.getMessage().contains("cupel.yaml") && e.getMessage().contains("unknown CRM rule '9-9s'"),
                e.getMessage());
    }

    @Test
    void plantedDriftIsFoundByTrendEwmaAndCusum() {
        CrmFixture f = new CrmFixture().certificate("MID", 2.50, 0.10);
        for (int i = 0; i < 30; i++) {
            String b = "B" + i;
            f.batch(b, D0.plusDays(7L * i));
            // z rises from 0 to about +1.9 SD over the project: no single result is beyond 2 SD.
            f.crm(b + "-M", b, 1, "MID", 2.50 + 0.10 * (i * 0.065 + (i % 3 - 1) * 0.3));
        }
        CrmReview r = CrmReview.of(f.project());
        SeriesReview s = r.series("MID", "Au").orElseThrow();
        assertEquals(0, s.failures());
        assertTrue(s.drift().drifting());
        assertTrue(s.drift().trend().slopeExcludesZero());
        assertTrue(s.drift().cusum().firstSignal() >= 0);
        assertTrue(s.drift().ewma().firstSignal() >= 0);
        assertEquals("days since 2025-03-03", s.drift().timeAxis());
        assertTrue(r.analytes().get(0).drift().drifting());
    }
}
