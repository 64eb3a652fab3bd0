package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

class RecoveryAnalysisTest {

    /** Two conditions of a 10 g/t feed with recoveries near 90%, where intervals sit on the recovery scale. */
    private static Testwork lowRecovery() {
        List<Smelt> s = new ArrayList<>();
        double[][] slag = {{1.10, 1.30, 1.20}, {2.0, 2.6, 2.3}};
        for (int c = 0; c < 2; c++) {
            for (int r = 0; r < 3; r++) {
                String cond = c == 0 ? "A" : "B";
                s.add(Fixtures.smelt(cond + r, cond, 100, Fixtures.button(30, 30),
                        Fixtures.slag(90, AssayValue.detected(slag[c][r]))));
            }
        }
        return Fixtures.testwork(List.of(10.1, 9.9), s);
    }

    /**
     * GUM (JCGM 100:2008 §5.1.2 and Annex G.4.1) worked by hand for condition A: recoveries by loss
     * 100(1 − 90·g/1000) = 90.1, 88.3, 89.2 %; mean 89.2, s = 0.9, u_A² = 0.27; head 10.0 ± 0.1 g/t (n = 2),
     * u_r(h) = 0.01, c_h = 100 − 89.2 = 10.8, u_H = 0.108; u_c = √(0.27 + 0.011664); ν_eff by
     * Welch–Satterthwaite with ν = 2 and 1. Tolerance 1e-9: closed form.
     */
    @Test
    void gumIntervalWorkedByHand() {
        RecoveryResult r = RecoveryAnalysis.run(lowRecovery(), RecoverySettings.DEFAULTS);
        ConditionRecovery a = r.conditions().get(0);
        assertEquals(89.2, a.mean(), 1e-9);
        assertEquals(0.9, a.sd(), 1e-9);
        double vA = 0.27;
        double vH = 0.108 * 0.108;
        double uc = Math.sqrt(vA + vH);
        double nu = (vA + vH) * (vA + vH) / (vA * vA / 2 + vH * vH / 1);
        double k = new TDistribution(null, nu).inverseCumulativeProbability(0.975);
        assertEquals(nu, a.gum().df(), 1e-9);
        assertEquals(89.2 - k * uc, a.gum().lower(), 1e-9);
        assertEquals(89.2 + k * uc, a.gum().upper(), 1e-9);
        assertEquals("recovery", a.gum().scale());
        double t = new TDistribution(null, 2).inverseCumulativeProbability(0.975);
        assertEquals(89.2 - t * 0.9 / Math.sqrt(3), a.tInterval().lower(), 1e-9);
        assertTrue(a.bootstrapNote().contains("10 distinct resamples"), a.bootstrapNote());
    }

    @Test
    void nearCompleteIntervalsStayBelowOneHundredPercent() {
        RecoveryResult r = RecoveryAnalysis.run(Fixtures.threeConditions(), RecoverySettings.DEFAULTS);
        for (ConditionRecovery c : r.conditions()) {
            assertEquals("log loss", c.tInterval().scale());
            assertTrue(c.tInterval().upper() < 100 && c.gum().upper() < 100);
            assertTrue(c.fieller().upper() <= 100);
            assertTrue(c.tInterval().lower() < c.mean() && c.mean() < c.tInterval().upper());
        }
        assertEquals(3, r.comparisons().size());
    }

    @Test
    void comparisonsGiveVerdictsAndPlans() {
        RecoveryResult r = RecoveryAnalysis.run(lowRecovery(),
                RecoverySettings.withDefaults().equivalenceMargin(0.5).build());
        PairComparison ab = r.comparisons().get(0);
        assertEquals("A", ab.first());
        assertTrue(ab.welch().difference() > 0);
        assertEquals(ab.welch().p(), ab.holmP(), 1e-15, "one pair: Holm leaves p unchanged");
        assertTrue(ab.plan().n() >= 2);
        assertEquals(ab.verdict(), ab.verdictCensoredAtZero(), "no censored assays");
    }

    /**
     * Two conditions with five tight replicates each and means 0.05 pp apart: the 90% CI of the difference
     * lies well inside ±0.5 pp, so the TOST (Schuirmann 1987) shows equivalence.
     */
    @Test
    void tightReplicatesWithinTheMarginAreEquivalent() {
        List<Smelt> s = new ArrayList<>();
        double[][] slag = {{1.10, 1.12, 1.09, 1.11, 1.10}, {1.105, 1.095, 1.115, 1.085, 1.10}};
        for (int c = 0; c < 2; c++) {
            for (int r = 0; r < 5; r++) {
                String cond = c == 0 ? "A" : "B";
                s.add(Fixtures.smelt(cond + r, cond, 100, Fixtures.button(30, 30),
                        Fixtures.slag(90, AssayValue.detected(slag[c][r]))));
            }
        }
        RecoveryResult r = RecoveryAnalysis.run(Fixtures.testwork(List.of(10.1, 9.9), s), RecoverySettings.DEFAULTS);
        PairComparison ab = r.comparisons().get(0);
        assertEquals(ComparisonVerdict.EQUIVALENT, ab.verdict());
        assertTrue(ab.tost().p() < 0.05);
    }

    /** Balance reconciliation keeps the constraint exactly and moves values within their uncertainty. */
    @Test
    void reconciledBalanceCloses() {
        RecoveryResult r = RecoveryAnalysis.run(lowRecovery(), RecoverySettings.DEFAULTS);
        for (SmeltBalance b : r.balances()) {
            double[] x = b.reconciliation().adjusted();
            assertEquals(x[0], x[1] + x[2], 1e-15);
            assertTrue(b.reconciledRecovery() > 80 && b.reconciledRecovery() < 100);
        }
        Deportment d = r.deportment().get(0);
        assertEquals(100, d.sharePercent().values().stream().mapToDouble(Double::doubleValue).sum(), 1e-9);
    }
}
