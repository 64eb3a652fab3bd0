package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

/**
 * The reconciliation does not depend on the unit of the metal: a fire-assay charge of 30 g at 5 g/t holds
 * 150 µg of gold (A V Aᵀ ≈ 10⁻¹² g²), which an absolute singularity threshold of 10⁻¹¹ used to refuse.
 */
class ReconciliationScaleTest {
    /** Metal scales from 1 µg to 1 kg (the R reference holds 0.086 g of metal; 10⁻⁶ g to 10³ g). */
    private static final double[] METAL_SCALES = {1e-5, 1e-4, 1e-3, 1e-2, 1e-1, 1, 10, 100, 1e3, 1e4};

    /**
     * R 4.2 reference (reconciliation.csv: three streams, charge = button + slag, solved by lm with weights)
     * reproduced with every value multiplied by s and every variance by s²: adjusted values scale by s, χ² and
     * p do not change. Relative tolerance 1e-12: double rounding only (the solution is scale-equivariant).
     */
    @Test
    void rReferenceReproducedAtEveryScale() throws Exception {
        List<Map<String, String>> rows = ReferenceCsv.rows("reconciliation.csv");
        double[] x = rows.stream().mapToDouble(r -> ReferenceCsv.number(r, "measured")).toArray();
        double[] v = rows.stream().mapToDouble(r -> ReferenceCsv.number(r, "variance")).toArray();
        for (double s : METAL_SCALES) {
            double[] xs = new double[x.length];
            double[] vs = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                xs[i] = x[i] * s;
                vs[i] = v[i] * s * s;
            }
            Reconciliation rec = Reconciliation.adjust(xs, vs, new double[][] {{1, -1, -1}});
            for (int i = 0; i < x.length; i++) {
                double expected = ReferenceCsv.number(rows.get(i), "adjusted") * s;
                assertEquals(expected, rec.adjusted()[i], 1e-12 * Math.abs(expected), "scale " + s + ", row " + i);
            }
            assertEquals(ReferenceCsv.number(rows.get(0), "chi2"), rec.chiSquare(), 1e-9, "scale " + s);
            assertEquals(ReferenceCsv.number(rows.get(0), "p"), rec.p(), 1e-9, "scale " + s);
        }
    }

    /**
     * One constraint worked by hand at the fire-assay scale: charge 150e-6 g (variance (1.5e-6)²), button
     * 140e-6 g ((1.4e-6)²), slag 5e-6 g ((0.25e-6)²). r = 150 − 140 − 5 = 5 µg, Σ a²v = 2.25 + 1.96 + 0.0625 =
     * 4.2725 µg² (4.3e-12 g², below the former absolute threshold 1e-11), so x̂ᵢ = xᵢ − vᵢ·aᵢ·r / 4.2725,
     * V̂ᵢᵢ = vᵢ − vᵢ² / 4.2725 and χ² = r² / 4.2725 = 25 / 4.2725. Relative 1e-12.
     */
    @Test
    void microgramBalanceWorkedByHand() {
        double u = 1e-6;
        double[] x = {150 * u, 140 * u, 5 * u};
        double[] v = {2.25 * u * u, 1.96 * u * u, 0.0625 * u * u};
        double[] a = {1, -1, -1};
        Reconciliation rec = Reconciliation.adjust(x, v, new double[][] {a});
        double sum = 4.2725 * u * u;
        double r = 5 * u;
        for (int i = 0; i < 3; i++) {
            double expected = x[i] - v[i] * a[i] * r / sum;
            assertEquals(expected, rec.adjusted()[i], 1e-12 * expected);
            double expectedVariance = v[i] - v[i] * v[i] / sum;
            assertEquals(expectedVariance, rec.adjustedVariance()[i], 1e-12 * v[i]);
        }
        assertEquals(25 / 4.2725, rec.chiSquare(), 1e-12);
    }

    /**
     * Two constraints (feed = concentrate + tail, concentrate = button + slag) give the same relative
     * adjustments at every scale, and the adjusted values satisfy both constraints. Relative 1e-12.
     */
    @Test
    void twoConstraintsAreScaleFree() {
        double[] x = {10.0, 8.1, 2.05, 7.6, 0.45};
        double[] v = {0.04, 0.01, 0.02, 0.005, 0.002};
        double[][] a = {{1, -1, -1, 0, 0}, {0, 1, 0, -1, -1}};
        Reconciliation unit = Reconciliation.adjust(x, v, a);
        for (double s : new double[] {1e-9, 1e-6, 1e-3, 1e3}) {
            double[] xs = x.clone();
            double[] vs = v.clone();
            for (int i = 0; i < x.length; i++) {
                xs[i] *= s;
                vs[i] *= s * s;
            }
            Reconciliation rec = Reconciliation.adjust(xs, vs, a);
            for (int i = 0; i < x.length; i++) {
                assertEquals(unit.adjusted()[i], rec.adjusted()[i] / s, 1e-12 * unit.adjusted()[i], "scale " + s);
            }
            assertEquals(unit.chiSquare(), rec.chiSquare(), 1e-12 * unit.chiSquare(), "scale " + s);
            double[] h = rec.adjusted();
            assertEquals(0, (h[0] - h[1] - h[2]) / s, 1e-12);
            assertEquals(0, (h[1] - h[3] - h[4]) / s, 1e-12);
        }
    }

    @Test
    void dependentConstraintsAreRefusedWithAReason() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Reconciliation.adjust(
                new double[] {1, 0.9, 0.1}, new double[] {1e-14, 1e-14, 1e-14},
                new double[][] {{1, -1, -1}, {2, -2, -2}}));
        assertTrue(e.getMessage().contains("linearly dependent"), e.getMessage());
    }

    /**
     * The whole recovery analysis of a 30 g charge at 5 g/t (150 µg of gold) with every mass and the balance
     * resolution multiplied by f, from 1.5 µg to 1.5 kg of gold: recoveries by loss, direct and reconciled and
     * the closure p-value are those of f = 1. Relative 1e-10: every quantity is a ratio of scaled masses.
     */
    @Test
    void recoveriesUnchangedFromMicrogramsToKilograms() {
        RecoveryResult reference = RecoveryAnalysis.run(fireAssay(1), settings(1));
        assertEquals(6, reference.balances().size());
        for (SmeltBalance b : reference.balances()) {
            assertTrue(b.note().isEmpty(), b.note());
            assertTrue(b.reconciledRecovery() > 95 && b.reconciledRecovery() < 100, b.toString());
        }
        for (double f : new double[] {1e-2, 1e2, 1e4, 1e6, 1e7}) {
            RecoveryResult r = RecoveryAnalysis.run(fireAssay(f), settings(f));
            for (int i = 0; i < r.balances().size(); i++) {
                SmeltBalance expected = reference.balances().get(i);
                SmeltBalance got = r.balances().get(i);
                String where = "mass factor " + f + ", " + got.testId();
                assertEquals(expected.reconciledRecovery(), got.reconciledRecovery(), 1e-10 * 100, where);
                assertEquals(expected.reconciliation().p(), got.reconciliation().p(), 1e-10, where);
            }
            for (int i = 0; i < r.smelts().size(); i++) {
                SmeltRecovery expected = reference.smelts().get(i);
                SmeltRecovery got = r.smelts().get(i);
                assertEquals(expected.byLoss(), got.byLoss(), 1e-10 * 100, "mass factor " + f);
                assertEquals(expected.direct(), got.direct(), 1e-10 * 100, "mass factor " + f);
            }
            for (int i = 0; i < r.conditions().size(); i++) {
                assertEquals(reference.conditions().get(i).mean(), r.conditions().get(i).mean(), 1e-10 * 100);
            }
        }
    }

    /** Two conditions, three 30 g charges each of a 5 g/t feed (invented), every mass times {@code f}. */
    private static Testwork fireAssay(double f) {
        double[][] button = {{28.1, 5.12}, {27.6, 5.20}, {28.4, 5.05}, {28.0, 5.18}, {27.9, 5.25}, {28.3, 5.10}};
        double[] slag = {0.071, 0.064, 0.080, 0.041, 0.038, 0.045};
        List<Smelt> smelts = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            String condition = i < 3 ? "A" : "B";
            smelts.add(Fixtures.smelt("T" + (i + 1), condition, 30 * f, Fixtures.button(button[i][0] * f,
                    button[i][1]), Fixtures.slag(61.0 * f, AssayValue.detected(slag[i]))));
        }
        return Fixtures.testwork(List.of(5.02, 4.95, 5.06, 4.98), smelts);
    }

    private static RecoverySettings settings(double f) {
        return RecoverySettings.withDefaults()
                .balanceResolutionGrams(RecoverySettings.DEFAULTS.balanceResolutionGrams() * f).build();
    }
}
