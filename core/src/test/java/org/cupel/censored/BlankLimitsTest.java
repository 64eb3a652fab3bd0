package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

class BlankLimitsTest {
    /** detection_limits.csv: base R 4.2 qt, pt(ncp) with uniroot, and the limits of two blank sets. */
    private static final Map<String, Double> R = read();

    private static Map<String, Double> read() {
        try {
            Map<String, Double> out = new HashMap<>();
            List<String> lines = Files.readAllLines(Reference.dir().resolve("detection_limits.csv"));
            for (String line : lines.subList(1, lines.size())) {
                String[] kv = line.split(",");
                out.put(kv[0], Double.parseDouble(kv[1]));
            }
            return out;
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void epaStudentTForSevenReplicates() {
        // 40 CFR Part 136 Appendix B, table of Student's t: t(6, 0.99) = 3.143. 5e-4: table to 3 decimals.
        assertEquals(3.143, BlankLimits.tQuantile(6, 0.99), 5e-4);
    }

    /**
     * The noncentrality δ of Currie's t-based L_D against R's uniroot on pt(qt(0.95, ν), ν, ncp = δ) = 0.05.
     * 1e-6: Cupel's noncentral t is accurate to about 1e-8 (DistributionsTest) and ∂P/∂δ is about 0.1.
     * For large ν δ tends to 2·1.645 = 3.29, Currie's z-based L_D/σ.
     */
    @Test
    void noncentralityMatchesR() {
        for (int nu : new int[] {1, 2, 4, 6, 9, 19, 29, 99}) {
            double t = BlankLimits.tQuantile(nu, 0.95);
            assertEquals(R.get("t95_" + nu), t, 1e-9 * t, "ν = " + nu);
            assertEquals(R.get("delta_" + nu), CurrieLimits.noncentrality(nu, t, 0.05), 1e-6, "ν = " + nu);
        }
    }

    /**
     * Two invented sets of numerical blanks against detection_limits.R: 3·s, Currie t- and z-based, EPA MDL_b
     * (mean + t·s, zero for the negative mean of set b) and MDL_s (t·s). Relative 1e-9 (quantiles and closed
     * forms), 1e-6 for the t-based L_D (through δ, above).
     */
    @Test
    void limitsOfNumericalBlanksMatchR() {
        check("blanks_a", new double[] {0.0012, 0.0031, -0.0008, 0.0020, 0.0045, 0.0009, 0.0027, 0.0016, 0.0038,
            0.0004});
        check("blanks_b", new double[] {-0.0012, 0.0005, -0.0021, 0.0003, -0.0009, -0.0015, 0.0002});
    }

    private static void check(String key, double[] x) {
        List<AssayValue> values = new ArrayList<>();
        for (double v : x) {
            values.add(AssayValue.detected(v));
        }
        BlankLimits b = BlankLimits.of(values);
        assertEquals(BlankLimits.ORDINARY, b.spreadMethod());
        assertEquals(R.get(key + "_mean"), b.mean().value(), 1e-12);
        assertEquals(R.get(key + "_sd"), b.sd().value(), 1e-12);
        String[][] names = {{"3·s", "three_s"}, {"Currie L_C (t)", "lc_t"}, {"Currie L_C (z)", "lc_z"},
            {"Currie L_D (z)", "ld_z"}, {"EPA MDL_b", "mdl_b"}, {"EPA MDL_s", "mdl_s"}};
        for (String[] n : names) {
            double expected = R.get(key + "_" + n[1]);
            assertEquals(expected, b.limit(n[0]).value().value(), 1e-9 * expected, key + " " + n[0]);
        }
        double ld = R.get(key + "_ld_t");
        assertEquals(ld, b.limit("Currie L_D (t)").value().value(), 1e-6 * ld, key);
    }

    /**
     * The t-based L_C is the one-sided 95 % upper prediction limit of one new blank above the blank mean:
     * R's simulation of 200,000 sets of seven normal blanks puts 4.973 % of new blanks above it (binomial SE
     * 0.049 %), as the closed form promises 5 %.
     */
    @Test
    void tBasedCriticalLevelIsAPredictionLimit() {
        assertEquals(0.05, R.get("prediction_exceedance_n7"), 3 * Math.sqrt(0.05 * 0.95 / 200000));
    }

    /**
     * Some blanks below detection, fewer than 100 blanks: MDL_b is the highest numerical result (40 CFR 136
     * App. B Rev. 2 § II(2)(b)(ii), recalled from memory). Five <0.005 and 0.006, 0.011, 0.008: MDL_b = 0.011.
     */
    @Test
    void someNonDetectsGiveTheHighestNumericalBlank() {
        CensoredSample s = CensoredSample.builder().below(0.005).below(0.005).below(0.005).below(0.005)
                .below(0.005).detected(0.006).detected(0.011).detected(0.008).build();
        BlankLimits.LimitEstimate mdl = BlankLimits.of(s, CensoredSettings.DEFAULTS).limit("EPA MDL_b");
        assertEquals(0.011, mdl.value().value(), 0);
        assertTrue(mdl.rule().contains("highest numerical"), mdl.rule());
    }

    /**
     * 100 blanks or more with non-detects: the blank of rank round(0.99·n). The worked example of the
     * regulation as recalled from memory: 164 blanks whose highest results are 1.5, 1.7, 1.9, 5.0 and 10;
     * 164 × 0.99 = 162.36 rounds to rank 162, the third highest, 1.9. Here 155 are <1 and 1.1–1.4 fill ranks
     * 156–159.
     */
    @Test
    void hundredOrMoreBlanksGiveTheNinetyNinthPercentileRank() {
        CensoredSample.Builder b = CensoredSample.builder();
        for (int i = 0; i < 155; i++) {
            b.below(1);
        }
        for (double v : new double[] {1.1, 1.2, 1.3, 1.4, 1.5, 1.7, 1.9, 5.0, 10}) {
            b.detected(v);
        }
        BlankLimits.LimitEstimate mdl = BlankLimits.of(b.build(), CensoredSettings.DEFAULTS).limit("EPA MDL_b");
        assertEquals(1.9, mdl.value().value(), 0);
        assertTrue(mdl.rule().contains("rank 162 of 164"), mdl.rule());
    }

    /**
     * The audit's case: 120 blanks, 118 below detection (<0.005), detects 0.005 and 0.208, and three missing
     * cells. Every value is accounted for; no SD is estimated (98.3 % censored is above Helsel's 80 %), so
     * 3·s, Currie and MDL_s are not given and say why; MDL_b is rank round(118.8) = 119 of 120: the detect at
     * 0.005 (it ranks above the 118 values below 0.005). The former code reported 3·s from the two detects.
     */
    @Test
    void mostlyCensoredBlanksAreAccountedForAndRefuseAnSd() {
        List<AssayValue> values = new ArrayList<>();
        for (int i = 0; i < 118; i++) {
            values.add(AssayValue.belowDetection(0.005));
        }
        values.add(AssayValue.detected(0.005));
        values.add(AssayValue.detected(0.208));
        for (int i = 0; i < 3; i++) {
            values.add(AssayValue.missing(org.cupel.assay.MissingReason.BLANK_CELL));
        }
        BlankLimits b = BlankLimits.of(values);
        assertEquals(120, b.n());
        assertEquals(2, b.detected());
        assertEquals(118, b.below());
        assertEquals(3, b.missing());
        assertFalse(b.sd().isAvailable());
        assertTrue(b.sd().note().contains("118 of 120") && b.sd().note().contains("80 %"), b.sd().note());
        for (String name : new String[] {"3·s", "Currie L_C (t)", "Currie L_D (t)", "Currie L_C (z)", "EPA MDL_s"}) {
            assertFalse(b.limit(name).value().isAvailable(), name);
            assertTrue(b.limit(name).value().note().contains("118 of 120"), name);
        }
        assertEquals(0.005, b.limit("EPA MDL_b").value().value(), 0);
        assertTrue(b.accounting().contains("120 replicates used") && b.accounting().contains("3 missing"),
                b.accounting());
    }

    /**
     * Two of twelve below detection: the mean and SD are those of the recommended censored-data summary
     * (Kaplan–Meier below 50 % censored, Helsel 2012; SD divisor n − 1), not of the ten detects alone, and 3·s
     * uses that SD.
     */
    @Test
    void someCensoredUseTheRecommendedCensoredSummary() {
        CensoredSample s = CensoredSample.builder().below(0.002).below(0.002).detected(0.003).detected(0.004)
                .detected(0.002).detected(0.006).detected(0.005).detected(0.003).detected(0.008).detected(0.004)
                .detected(0.0025).detected(0.007).build();
        BlankLimits b = BlankLimits.of(s, CensoredSettings.DEFAULTS);
        CensoredSummary km = CensoredAnalysis.of(s, BlankLimits.spreadSettings(CensoredSettings.DEFAULTS))
                .recommended();
        assertEquals("Kaplan–Meier", km.method());
        assertEquals(km.method(), b.spreadMethod());
        assertEquals(km.sd().value(), b.sd().value(), 0);
        assertEquals(km.mean().value(), b.mean().value(), 0);
        assertEquals(3 * km.sd().value(), b.limit("3·s").value().value(), 1e-15);
        assertTrue(b.sd().note().contains("2 of 12 values censored"), b.sd().note());
        assertEquals(0.008, b.limit("EPA MDL_b").value().value(), 0);
    }

    /** Every blank below detection: MDL_b does not apply (§ II(2)(b)(i)) and no SD is estimated. */
    @Test
    void allNonDetectsLeaveMdlBNotApplicable() {
        BlankLimits b = BlankLimits.of(List.of(AssayValue.belowDetection(0.005), AssayValue.belowDetection(0.005),
                AssayValue.belowDetection(0.01)));
        assertFalse(b.limit("EPA MDL_b").value().isAvailable());
        assertTrue(b.limit("EPA MDL_b").value().note().contains("does not apply"));
        assertFalse(b.sd().isAvailable());
    }
}
