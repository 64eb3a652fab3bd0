package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Each rule against a sequence that just triggers it and one that just does not, built from the rule
 * definitions as published: Westgard, Barry, Hunt &amp; Groth 1981 (Clin. Chem. 27(3), the multirule
 * table: 1₂s, 1₃s, 2₂s, R₄s, 4₁s, 10ₓ); Western Electric Co. 1956 (Statistical Quality Control Handbook,
 * the four zone tests); Nelson 1984 (J. Qual. Technol. 16(4), tests 1 to 8). The strict-limit and
 * "in a row" conventions are Cupel's documented choices (CrmRule Javadoc).
 */
class RunRulesTest {

    private static List<RuleViolation> eval(CrmRule rule, double... z) {
        return RunRules.evaluate(rule, z, new int[z.length]);
    }

    private static void fires(CrmRule rule, int signal, double... z) {
        List<RuleViolation> v = eval(rule, z);
        assertTrue(v.stream().anyMatch(x -> x.signal() == signal), rule + " should fire at " + signal + ": " + v);
        assertTrue(v.stream().allMatch(x -> x.signal() >= signal), rule + " fired too early: " + v);
    }

    private static void silent(CrmRule rule, double... z) {
        assertEquals(List.of(), eval(rule, z), rule + " should not fire");
    }

    private static double[] repeat(double v, int n) {
        double[] a = new double[n];
        Arrays.fill(a, v);
        return a;
    }

    private static double[] append(double[] a, double... more) {
        double[] out = Arrays.copyOf(a, a.length + more.length);
        System.arraycopy(more, 0, out, a.length, more.length);
        return out;
    }

    @Test
    void westgard1_2sAnd1_3sUseStrictLimits() {
        fires(CrmRule.W_1_2S, 1, 0, 2.01);
        silent(CrmRule.W_1_2S, 0, 2.0, -2.0);
        fires(CrmRule.W_1_3S, 0, -3.01);
        silent(CrmRule.W_1_3S, 3.0, -3.0, 2.99);
        fires(CrmRule.WE_1, 0, 3.01);
        silent(CrmRule.WE_1, 3.0);
        fires(CrmRule.N_1, 0, 3.01);
        silent(CrmRule.N_1, -3.0);
    }

    @Test
    void westgard2_2sNeedsTwoConsecutiveOnTheSameSide() {
        fires(CrmRule.W_2_2S, 1, 2.1, 2.1);
        fires(CrmRule.W_2_2S, 2, 0, -2.1, -2.5);
        silent(CrmRule.W_2_2S, 2.1, -2.1);
        silent(CrmRule.W_2_2S, 2.1, 2.0);
        silent(CrmRule.W_2_2S, 2.1, 0, 2.1);
        assertEquals(List.of(0, 1), eval(CrmRule.W_2_2S, 2.1, 2.1).get(0).involved());
    }

    @Test
    void westgardR4sLooksWithinOneBatch() {
        List<RuleViolation> v = RunRules.evaluate(CrmRule.W_R_4S, new double[] {2.1, 0.3, -2.1}, new int[] {0, 0, 0});
        assertEquals(1, v.size());
        assertEquals(2, v.get(0).signal());
        assertEquals(List.of(0, 2), v.get(0).involved());
        assertEquals(List.of(), RunRules.evaluate(CrmRule.W_R_4S, new double[] {2.1, -2.1}, new int[] {0, 1}));
        assertEquals(List.of(), RunRules.evaluate(CrmRule.W_R_4S, new double[] {2.1, -2.0}, new int[] {0, 0}));
    }

    @Test
    void westgard4_1sAnd10x() {
        fires(CrmRule.W_4_1S, 3, 1.1, 1.1, 1.1, 1.1);
        silent(CrmRule.W_4_1S, 1.1, 1.1, 1.1, 1.0);
        silent(CrmRule.W_4_1S, 1.1, 1.1, -1.1, 1.1);
        fires(CrmRule.W_10_X, 9, repeat(-0.1, 10));
        silent(CrmRule.W_10_X, append(repeat(0.1, 9), 0.0));
        silent(CrmRule.W_10_X, append(repeat(0.1, 5), -0.1, 0.1, 0.1, 0.1, 0.1));
    }

    @Test
    void twoOfThreeBeyond2Sd() {
        for (CrmRule r : List.of(CrmRule.WE_2, CrmRule.N_5)) {
            fires(r, 2, 2.1, 0, 2.1);
            silent(r, 2.1, 0, 0, 2.1);
            silent(r, 2.1, 0, -2.1);
            silent(r, 2.1, 0, 2.0);
        }
    }

    @Test
    void fourOfFiveBeyond1Sd() {
        for (CrmRule r : List.of(CrmRule.WE_3, CrmRule.N_6)) {
            fires(r, 4, 1.1, 1.1, 0, 1.1, 1.1);
            silent(r, 1.1, 1.1, 0, 0, 1.1, 1.1);
            silent(r, 1.1, 1.1, -1.1, 1.1, 1.0);
        }
    }

    @Test
    void runsOnOneSide() {
        fires(CrmRule.WE_4, 7, repeat(0.5, 8));
        silent(CrmRule.WE_4, append(repeat(0.5, 7), -0.5));
        fires(CrmRule.N_2, 8, repeat(-0.5, 9));
        silent(CrmRule.N_2, append(repeat(-0.5, 8), 0.0));
    }

    @Test
    void nelsonTrendOfSixPoints() {
        fires(CrmRule.N_3, 5, 0, 0.1, 0.2, 0.3, 0.4, 0.5);
        fires(CrmRule.N_3, 5, 0.5, 0.4, 0.3, 0.2, 0.1, 0);
        silent(CrmRule.N_3, 0, 0.1, 0.2, 0.3, 0.4, 0.4);
        silent(CrmRule.N_3, 0.1, 0.2, 0.3, 0.4, 0.5);
    }

    @Test
    void nelsonFourteenAlternating() {
        double[] fourteen = new double[14];
        for (int i = 0; i < 14; i++) {
            fourteen[i] = i % 2 == 0 ? -0.5 : 0.5;
        }
        fires(CrmRule.N_4, 13, fourteen);
        silent(CrmRule.N_4, Arrays.copyOf(fourteen, 13));
        double[] tie = fourteen.clone();
        tie[7] = tie[6];
        silent(CrmRule.N_4, tie);
    }

    @Test
    void nelsonFifteenWithinAndEightBeyond1Sd() {
        fires(CrmRule.N_7, 14, repeat(0.5, 15));
        silent(CrmRule.N_7, append(repeat(0.5, 14), 1.0));
        double[] eight = new double[8];
        for (int i = 0; i < 8; i++) {
            eight[i] = i % 2 == 0 ? 1.5 : -1.5;
        }
        fires(CrmRule.N_8, 7, eight);
        double[] seven = eight.clone();
        seven[7] = 1.0;
        silent(CrmRule.N_8, seven);
    }

    @Test
    void everyRuleHasAnEvaluationAndASource() {
        for (CrmRule r : CrmRule.values()) {
            RunRules.evaluate(r, new double[] {0.1, 0.2}, new int[2]);
            assertTrue(!r.source().citation().isEmpty());
            assertEquals(r, CrmRule.byId(r.id().toUpperCase(java.util.Locale.ROOT)));
        }
    }
}
