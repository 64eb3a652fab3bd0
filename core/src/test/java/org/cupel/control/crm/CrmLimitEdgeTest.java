package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.cupel.config.CupelConfig;
import org.cupel.control.Verdict;
import org.cupel.project.Project;
import org.junit.jupiter.api.Test;

/**
 * CRM results exactly on a limit in their reported decimals, through the whole review and through every
 * rule that compares z with 1, 2 or 3 SD. docs/control-rules.md: "A result exactly on a limit is not beyond
 * it"; ISO 13528 (2015, 9.4): |z| ≤ 2 satisfactory, 2 &lt; |z| &lt; 3 questionable, |z| ≥ 3 unsatisfactory.
 * Each decimal tie below was chosen because its computed z misses the integer (checked in Python 3), so the
 * test fails where limits are compared bit by bit.
 */
class CrmLimitEdgeTest {

    private static Map<String, CrmResult> review(String code, double certified, double sd, double... values) {
        CrmFixture f = new CrmFixture().certificate(code, certified, sd);
        for (int i = 0; i < values.length; i++) {
            f.routine("R" + i, "B" + i, 1, 1.0);
            f.crm("C" + i, "B" + i, 2, code, values[i]);
        }
        Project p = f.project();
        return CrmReview.of(p).series(code, "Au").orElseThrow().results().stream()
                .collect(Collectors.toMap(r -> r.point().sampleId(), r -> r));
    }

    @Test
    void plusAndMinusTwoSdAreTreatedAlike() {
        // 1.100 and 0.900 on 1.000 ± 0.050: z = ±0.1 / 0.05 = ±2 exactly; the doubles are 2.0000000000000018
        // and −1.9999999999999996. Both pass (not beyond 2 SD) and are satisfactory (|z| ≤ 2). 1.101 is
        // 0.101 / 0.05 = 2.02 SD: a 1-2s warning.
        Map<String, CrmResult> r = review("K", 1.000, 0.050, 1.100, 0.900, 1.101);
        assertEquals(Verdict.PASS, r.get("C0").verdict(), r.get("C0").rules().toString());
        assertEquals(Verdict.PASS, r.get("C1").verdict(), r.get("C1").rules().toString());
        assertEquals(ZBand.SATISFACTORY, r.get("C0").band());
        assertEquals(ZBand.SATISFACTORY, r.get("C1").band());
        assertEquals(Verdict.WARN, r.get("C2").verdict());
        assertEquals(List.of("1-2s"), r.get("C2").rules());
        assertEquals(ZBand.QUESTIONABLE, r.get("C2").band());
    }

    @Test
    void exactlyThreeSdWarnsButDoesNotFailAndIsUnsatisfactory() {
        // 1.377 on 1.236 ± 0.047: 0.141 / 0.047 = 3 exactly (double 3.0000000000000004); 1.095 is −3 exactly
        // (double −3.0000000000000004). Beyond 2 SD (1-2s warning), not beyond 3 SD (no 1-3s, no re-assay),
        // ISO 13528 band unsatisfactory (|z| ≥ 3). 1.378 is 0.142 / 0.047 = 3.02 SD: 1-3s fails it. Batches
        // alternate sides so that 2-2s never fires.
        Map<String, CrmResult> r = review("V", 1.236, 0.047, 1.377, 1.236, 1.095, 1.236, 1.378);
        for (String id : List.of("C0", "C2")) {
            assertEquals(Verdict.WARN, r.get(id).verdict(), id + " " + r.get(id).rules());
            assertEquals(List.of("1-2s"), r.get(id).rules());
            assertFalse(r.get(id).triggersReassay(), id);
            assertEquals(ZBand.UNSATISFACTORY, r.get(id).band(), id);
        }
        assertEquals(Verdict.FAIL, r.get("C4").verdict());
        assertTrue(r.get("C4").rules().contains("1-3s"));
        assertTrue(r.get("C4").triggersReassay());
    }

    @Test
    void twoConsecutiveResultsOnPlusTwoSdAreNotA22sFailure() {
        // 1.330 on 1.236 ± 0.047 is 0.094 / 0.047 = +2 exactly (double 2.0000000000000018); twice in a row it
        // is not "two beyond 2 SD". 1.331 (2.02 SD) twice is.
        Map<String, CrmResult> on = review("V", 1.236, 0.047, 1.330, 1.330);
        assertEquals(Verdict.PASS, on.get("C1").verdict(), on.get("C1").rules().toString());
        Map<String, CrmResult> beyond = review("V", 1.236, 0.047, 1.331, 1.331);
        assertEquals(List.of("1-2s", "2-2s"), beyond.get("C1").rules());
    }

    /** z of decimal results on a certificate, computed as the review computes it. */
    private static double[] z(double certified, double sd, double... values) {
        return Arrays.stream(values).map(v -> (v - certified) / sd).toArray();
    }

    private static double[] repeat(double v, int n) {
        double[] a = new double[n];
        Arrays.fill(a, v);
        return a;
    }

    private static List<RuleViolation> eval(CrmRule rule, double[] z, int[] batch) {
        return RunRules.evaluate(rule, z, batch);
    }

    private static List<RuleViolation> eval(CrmRule rule, double[] z) {
        return eval(rule, z, new int[z.length]);
    }

    @Test
    void oneSdRulesAtExactlyOneSd() {
        // 1.050 on 1.000 ± 0.050 is +1 SD exactly (double 1.0000000000000009); 1.051 is 1.02 SD.
        double[] on = z(1.000, 0.050, repeat(1.050, 8));
        double[] beyond = z(1.000, 0.050, repeat(1.051, 8));
        for (CrmRule rule : List.of(CrmRule.W_4_1S, CrmRule.WE_3, CrmRule.N_6, CrmRule.N_8)) {
            assertEquals(List.of(), eval(rule, on), rule + " fired on results exactly at 1 SD");
            assertFalse(eval(rule, beyond).isEmpty(), rule + " did not fire on results 1.02 SD out");
        }
        // N-7 "fifteen within 1 SD": 1.283 on 1.236 ± 0.047 is +1 SD exactly (double 0.9999999999999986):
        // on the limit, so not within; 1.282 (0.98 SD) is within.
        assertEquals(List.of(), eval(CrmRule.N_7, z(1.236, 0.047, repeat(1.283, 15))));
        assertFalse(eval(CrmRule.N_7, z(1.236, 0.047, repeat(1.282, 15))).isEmpty());
    }

    @Test
    void twoSdRulesAtExactlyTwoSd() {
        // Two of three at +2 SD exactly (1.100 on 1.000 ± 0.050) is not "two of three beyond 2 SD".
        for (CrmRule rule : List.of(CrmRule.WE_2, CrmRule.N_5)) {
            assertEquals(List.of(), eval(rule, z(1.000, 0.050, 1.100, 1.000, 1.100)), rule.id());
            assertFalse(eval(rule, z(1.000, 0.050, 1.101, 1.000, 1.101)).isEmpty(), rule.id());
        }
        // R-4s in one batch: 1.330 and 1.142 on 1.236 ± 0.047 are +2 and −2 SD exactly (both doubles
        // 2.0000000000000018 in size); 1.331 and 1.141 are 2.02 SD out.
        int[] oneBatch = {0, 0};
        assertEquals(List.of(), eval(CrmRule.W_R_4S, z(1.236, 0.047, 1.330, 1.142), oneBatch));
        assertEquals(1, eval(CrmRule.W_R_4S, z(1.236, 0.047, 1.331, 1.141), oneBatch).size());
    }

    @Test
    void threeSdRulesAtExactlyThreeSd() {
        // 0.850 on 1.000 ± 0.050 is −3 SD exactly (double −3.0000000000000004); 0.849 is −3.02 SD.
        for (CrmRule rule : List.of(CrmRule.W_1_3S, CrmRule.WE_1, CrmRule.N_1)) {
            assertEquals(List.of(), eval(rule, z(1.000, 0.050, 0.850)), rule.id());
            assertEquals(1, eval(rule, z(1.000, 0.050, 0.849)).size(), rule.id());
        }
    }

    @Test
    void reviewSettingsDoNotChangeTheComparison() {
        // With every rule on (warn), the exact ties above still fire nothing but what is beyond.
        CupelConfig all = CupelConfig.fromYaml("crm:\n  rules:\n" + Arrays.stream(CrmRule.values())
                .map(r -> "    \"" + r.id() + "\": warn\n").collect(Collectors.joining()), "cupel.yaml");
        CrmFixture f = new CrmFixture().certificate("K", 1.000, 0.050);
        double[] values = {1.100, 0.900, 1.100, 0.900};
        for (int i = 0; i < values.length; i++) {
            f.crm("C" + i, "B" + i, 1, "K", values[i]);
        }
        SeriesReview s = CrmReview.of(f.project(all)).series("K", "Au").orElseThrow();
        assertEquals(List.of(), s.findings(), "results exactly at ±2 SD complete no rule");
    }
}
