package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * Invariants of the rules and the bias intervals that follow from their definitions (Westgard et al. 1981;
 * Western Electric 1956; Nelson 1984; Conover 1999): every rule treats the two sides of the certified value
 * alike, so mirroring the z-scores (z → −z) fires the same rules at the same results; the bias of a CRM
 * does not depend on the order of its results.
 */
class RunRulesProperties {

    @Test
    void rulesAreSymmetricAboutTheCertifiedValue() {
        // One result; a run at either end of the range (every rule on one side fires at once).
        List<Gen<List<Double>>> edges = List.of(Gen.constant(List.of(0.0)), Gen.constant(List.of(4.0)),
                Gen.constant(java.util.Collections.nCopies(40, 4.0)), Gen.constant(java.util.Collections.nCopies(40, -4.0)));
        SeededTries.forAll(300, edges, Gen.doubles(-4, 4).list(1, 40), zs -> {
            double[] z = zs.stream().mapToDouble(Double::doubleValue).toArray();
            double[] mirrored = new double[z.length];
            int[] batch = new int[z.length];
            for (int i = 0; i < z.length; i++) {
                mirrored[i] = -z[i];
                batch[i] = i / 3;
            }
            for (CrmRule r : CrmRule.values()) {
                assertEquals(signals(RunRules.evaluate(r, z, batch)), signals(RunRules.evaluate(r, mirrored, batch)),
                        r.id());
            }
        });
    }

    @Test
    void biasDoesNotDependOnOrder() {
        // Two results: equal (no spread) at either end, and the two ends.
        List<Gen<List<Double>>> edges = List.of(Gen.constant(List.of(2.0, 2.0)), Gen.constant(List.of(3.0, 3.0)),
                Gen.constant(List.of(2.0, 3.0)));
        SeededTries.forAll(300, edges, Gen.doubles(2, 3).list(2, 30), xs -> {
            List<Double> shuffled = new ArrayList<>(xs);
            Collections.reverse(shuffled);
            BiasEstimate a = BiasEstimate.of(xs.stream().mapToDouble(Double::doubleValue).toArray(), 2.5, 0.95);
            BiasEstimate b = BiasEstimate.of(shuffled.stream().mapToDouble(Double::doubleValue).toArray(), 2.5, 0.95);
            // 1e-9: only summation order differs.
            assertEquals(a.meanBiasPct(), b.meanBiasPct(), 1e-9);
            assertEquals(a.meanLowPct(), b.meanLowPct(), 1e-9);
            assertEquals(a.median().low(), b.median().low(), 0.0);
            assertEquals(a.median().high(), b.median().high(), 0.0);
        });
    }

    private static List<Integer> signals(List<RuleViolation> v) {
        return v.stream().map(RuleViolation::signal).sorted().toList();
    }
}
