package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.stat.inference.TTest;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class DemoTestworkTest {

    private static List<String[]> heads;
    private static List<String[]> smelts;

    @BeforeAll
    static void generate() throws IOException {
        MemorySink sink = new MemorySink();
        DemoGenerator.generate(DemoSettings.defaults(), sink);
        heads = rows(sink.text("testwork/heads.csv"));
        smelts = rows(sink.text("testwork/smelts.csv"));
    }

    private static List<String[]> rows(String text) {
        List<String[]> out = new ArrayList<>();
        for (String line : text.split("\n")) {
            out.add(line.split(",", -1));
        }
        return out;
    }

    @Test
    void headsHaveFiveReplicatesAndALabDuplicate() {
        assertEquals(List.of("feed", "replicate", "Au_g/t", "Ag_g/t"), List.of(heads.get(0)));
        assertEquals(7, heads.size());
        assertTrue(heads.stream().anyMatch(r -> r[1].endsWith("-LD")));
        for (String[] r : heads.subList(1, heads.size())) {
            double au = Double.parseDouble(r[2]);
            assertTrue(au > 250 && au < 380, r[2]);
        }
    }

    @Test
    void everySmeltHasAButtonAMatteAndASlag() {
        assertEquals(List.of("test_id", "condition", "replicate", "feed", "charge_g", "product", "product_role",
                "mass_g", "Au_g/t", "Ag_g/t"), List.of(smelts.get(0)));
        Map<String, List<String>> products = new LinkedHashMap<>();
        for (String[] r : smelts.subList(1, smelts.size())) {
            products.computeIfAbsent(r[0], k -> new ArrayList<>()).add(r[5] + ":" + r[6]);
        }
        assertEquals(11, products.size());
        products.values().forEach(p -> assertEquals(List.of("button:collected", "matte:loss", "slag:loss"), p));
    }

    /** Slag Au is of order 1-5 g/t, with exactly one slag below the 0.5 g/t detection limit. */
    @Test
    void slagsAreLowGradeWithOneBelowDetection() {
        int below = 0;
        for (String[] r : smelts) {
            if (r[5].equals("slag")) {
                if (r[8].startsWith("<")) {
                    below++;
                } else {
                    double au = Double.parseDouble(r[8]);
                    assertTrue(au >= 0.5 && au < 6, r[8]);
                }
            }
        }
        assertEquals(1, below);
    }

    @Test
    void oneConditionUsesHalfTheChargeMass() {
        Map<String, Double> charge = new LinkedHashMap<>();
        smelts.subList(1, smelts.size()).forEach(r -> charge.putIfAbsent(r[1], Double.parseDouble(r[4])));
        assertEquals(4, charge.size());
        assertEquals(25, charge.get("LIT60-1050-HALF"), 0.5);
        assertEquals(50, charge.get("LIT60-1050"), 0.5);
    }

    /**
     * The design: LIT60-1050 and LIT90-1050 recoveries clearly differ, LIT60-1050 and LIT60-1100 cannot be
     * told apart with three replicates each. Checked with Welch's unequal-variance t test (Welch, 1947,
     * "The generalization of Student's problem when several different population variances are involved",
     * Biometrika 34) as Commons Math implements it; the thresholds p < 0.01 and p > 0.2 are the design's
     * margins, not a test of the t test.
     */
    @Test
    void onePairOfConditionsClearlyDiffersAndAnotherCannotBeTold() {
        double head = heads.subList(1, heads.size()).stream().mapToDouble(r -> Double.parseDouble(r[2])).average()
                .orElseThrow();
        Map<String, List<Double>> recovery = new LinkedHashMap<>();
        for (String[] r : smelts.subList(1, smelts.size())) {
            if (r[5].equals("button")) {
                double rec = Double.parseDouble(r[7]) * Double.parseDouble(r[8]) / (Double.parseDouble(r[4]) * head);
                recovery.computeIfAbsent(r[1], k -> new ArrayList<>()).add(rec);
            }
        }
        TTest t = new TTest();
        assertTrue(t.tTest(array(recovery.get("LIT60-1050")), array(recovery.get("LIT90-1050"))) < 0.01);
        assertTrue(t.tTest(array(recovery.get("LIT60-1050")), array(recovery.get("LIT60-1100"))) > 0.2);
    }

    private static double[] array(List<Double> v) {
        return v.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
